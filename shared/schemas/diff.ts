/**
 * Field-by-field difference of two design documents: the one rule for every place that asks
 * whether a design changed (edit rights on the server, Compare, Review's changed inputs, the
 * desk's unsaved marker, the stale-save dialog). Paths are written the way errors name fields:
 * member.section.shape, loads.area[1].value.
 *
 * Quantities are compared by value, not by text: "8 in" and "203.2 mm" are the same input. Two
 * quantities of one dimension are the same when they differ by at most QUANTITY_TOLERANCE of the
 * larger (the desk writes a converted value to 4 significant figures, a relative change of at most
 * 5e-4). `units` only chooses how values are shown, so it is never a change.
 */
import { DIMENSIONS, parseQuantity, type Dimension } from '../engine/units';

/** Relative difference below which two quantities are the same input (0.1 %). */
export const QUANTITY_TOLERANCE = 1e-3;

/** Top-level keys that choose the display only and never make two designs differ. */
const DISPLAY_ONLY = new Set(['units']);

const DIMENSION_NAMES = Object.keys(DIMENSIONS) as Dimension[];

function quantityValue(text: string, dimension?: Dimension): { dimension: Dimension; value: number } | null {
  if (!/\d/.test(text) || !/[A-Za-z]/.test(text)) return null;
  for (const d of dimension ? [dimension] : DIMENSION_NAMES) {
    const parsed = parseQuantity(text, d);
    if (parsed.ok) return { dimension: d, value: parsed.value };
  }
  return null;
}

/** Whether two leaves are the same input: equal, or the same quantity written in other units. */
export function sameLeaf(x: Leaf, y: Leaf): boolean {
  if (x === y) return true;
  if (typeof x !== 'string' || typeof y !== 'string') return false;
  const a = quantityValue(x);
  if (!a) return false;
  const b = quantityValue(y, a.dimension);
  if (!b) return false;
  const scale = Math.max(Math.abs(a.value), Math.abs(b.value));
  return Math.abs(a.value - b.value) <= QUANTITY_TOLERANCE * scale;
}

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

/** Every input that differs between `before` and `after` (by value, `units` aside), in a stable order. */
export function diffDesigns(before: unknown, after: unknown): FieldChange[] {
  const a = new Map<string, Leaf>();
  const b = new Map<string, Leaf>();
  flatten(before, '', a);
  flatten(after, '', b);
  const paths = [...new Set([...a.keys(), ...b.keys()])]
    .filter((path) => !DISPLAY_ONLY.has(documentPart(path)))
    .sort();
  const changes: FieldChange[] = [];
  for (const path of paths) {
    const x = a.has(path) ? (a.get(path) as Leaf) : null;
    const y = b.has(path) ? (b.get(path) as Leaf) : null;
    if (!sameLeaf(x, y)) changes.push({ path, before: x, after: y });
  }
  return changes;
}

/** The top-level part of the document a path belongs to, for edit rights: member, loads, connection… */
export function documentPart(path: string): string {
  return path.split(/[.[]/)[0];
}
