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

/** Form problems first, then the engine's on fields the form has no problem with; one entry per field. */
export function mergeIssues(form: readonly Issue[], engine: ReadonlyMap<string, string>): Issue[] {
  const seen = new Set(form.map((i) => toFieldName(i.path)));
  const extra = [...engine].filter(([name]) => !seen.has(name)).map(([path, message]) => ({ path, message }));
  return [...form, ...extra];
}
