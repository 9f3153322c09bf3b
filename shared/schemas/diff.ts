/**
 * Field-by-field difference of two design documents, for the compare screen and the stale-save
 * dialog. Paths are written the way errors name fields: member.section.shape, loads.area[1].value.
 */
export interface FieldChange {
  path: string;
  before: string | number | boolean | null;
  after: string | number | boolean | null;
}

type Leaf = string | number | boolean | null;

function flatten(value: unknown, prefix: string, out: Map<string, Leaf>): void {
  if (Array.isArray(value)) {
    value.forEach((item, i) => flatten(item, `${prefix}[${i}]`, out));
    if (value.length === 0 && prefix) out.set(prefix, '(none)');
    return;
  }
  if (value !== null && typeof value === 'object') {
    for (const [key, child] of Object.entries(value as Record<string, unknown>)) {
      flatten(child, prefix ? `${prefix}.${key}` : key, out);
    }
    return;
  }
  if (value === undefined) return;
  out.set(prefix, value as Leaf);
}

/** Every leaf that differs between `before` and `after`, in a stable order. */
export function diffDesigns(before: unknown, after: unknown): FieldChange[] {
  const a = new Map<string, Leaf>();
  const b = new Map<string, Leaf>();
  flatten(before, '', a);
  flatten(after, '', b);
  const paths = [...new Set([...a.keys(), ...b.keys()])].sort();
  const changes: FieldChange[] = [];
  for (const path of paths) {
    const x = a.has(path) ? (a.get(path) as Leaf) : null;
    const y = b.has(path) ? (b.get(path) as Leaf) : null;
    if (x !== y) changes.push({ path, before: x, after: y });
  }
  return changes;
}

/** The top-level part of the document a path belongs to, for edit rights: member, loads, connection… */
export function documentPart(path: string): string {
  return path.split(/[.[]/)[0];
}
