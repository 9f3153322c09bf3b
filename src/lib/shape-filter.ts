import type { ShapeFamily, ShapeRecord } from '../../shared/engine/shapes/types';

/** The overall depth of a shape along its strong axis, in: d (W, C), Ht (HSS) or OD (pipe). */
export function shapeDepth(s: ShapeRecord): number | undefined {
  return s.d ?? s.Ht ?? s.OD;
}

export interface ShapeFilter {
  q: string;
  family: ShapeFamily | '';
  minDepth: number | null;
  maxDepth: number | null;
}

export function filterShapes(shapes: readonly ShapeRecord[], f: ShapeFilter): ShapeRecord[] {
  const q = f.q.trim().toUpperCase().replace(/\s+/g, '');
  return shapes.filter((s) => {
    if (f.family && s.family !== f.family) return false;
    if (q && !s.label.toUpperCase().includes(q)) return false;
    const d = shapeDepth(s);
    if (f.minDepth !== null && (d === undefined || d < f.minDepth)) return false;
    if (f.maxDepth !== null && (d === undefined || d > f.maxDepth)) return false;
    return true;
  });
}
