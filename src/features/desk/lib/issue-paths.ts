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

/**
 * Every message in a react-hook-form error tree, with its field name ("loads.area.0.value"), in
 * the order of the form. A message on an object (a section that names neither shape nor plates)
 * keeps the object's name.
 */
export function formErrorList(errors: unknown, prefix = ''): Issue[] {
  const out: Issue[] = [];
  if (errors === null || typeof errors !== 'object') return out;
  const node = errors as Record<string, unknown>;
  if (typeof node.message === 'string' && node.message && prefix)
    out.push({ path: prefix, message: node.message });
  for (const [key, value] of Object.entries(node)) {
    if (key === 'ref' || key === 'message' || key === 'type' || key === 'types') continue;
    // An array's own problem (too many loads) sits under "root".
    const name = key === 'root' ? prefix : prefix ? `${prefix}.${key}` : key;
    out.push(...formErrorList(value, name));
  }
  return out;
}

/** Form problems first, then the engine's on fields the form has no problem with; one entry per field. */
export function mergeIssues(form: readonly Issue[], engine: ReadonlyMap<string, string>): Issue[] {
  const seen = new Set(form.map((i) => toFieldName(i.path)));
  const extra = [...engine].filter(([name]) => !seen.has(name)).map(([path, message]) => ({ path, message }));
  return [...form, ...extra];
}
