/** Issue paths as the engine and the API write them ("loads.area[1].value") as form field names ("loads.area.1.value"). */
export function toFieldName(path: string): string {
  return path.replace(/\[(\d+)\]/g, '.$1');
}

export interface Issue {
  path: string;
  message: string;
}

/** Issues keyed by form field name; several on one field are joined. */
export function issuesByField(issues: readonly Issue[]): Map<string, string> {
  const map = new Map<string, string>();
  for (const issue of issues) {
    const name = toFieldName(issue.path);
    map.set(name, map.has(name) ? `${map.get(name)}; ${issue.message}` : issue.message);
  }
  return map;
}
