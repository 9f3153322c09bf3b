/** A value at the end of a design document's tree: what a person reads as one input. */
export type DocumentLeaf = string | number | boolean | null;

/**
 * Every leaf of a document with its path as the engine names fields ("loads.area[0].value"); an
 * empty list is one leaf "(none)". Used by the read-only input lists of the desk and the package.
 */
export function documentLeaves(value: unknown, prefix = ''): [string, DocumentLeaf][] {
  const out: [string, DocumentLeaf][] = [];
  const walk = (v: unknown, at: string) => {
    if (Array.isArray(v)) {
      if (v.length === 0) out.push([at, '(none)']);
      v.forEach((item, i) => walk(item, `${at}[${i}]`));
    } else if (v !== null && typeof v === 'object') {
      for (const [k, inner] of Object.entries(v as Record<string, unknown>))
        walk(inner, at ? `${at}.${k}` : k);
    } else if (v !== undefined) out.push([at, v as DocumentLeaf]);
  };
  walk(value, prefix);
  return out;
}
