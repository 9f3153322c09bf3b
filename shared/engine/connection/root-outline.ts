/**
 * The member's section at the root as the plate layout draws it (depth, flange width and
 * thickness), from a catalog shape or the built-up plates of a document; null when it cannot be
 * read. Used by the desk's plate sketch and the calculation package, so both draw the same outline.
 */
import type { ShapeRecord } from '../shapes/types';
import type { RootFootprint } from '../types';
import { parseQuantity } from '../units';

interface SectionText {
  shape?: string;
  plates?: { rootDepth?: string; flangeWidth?: string; flangeThickness?: string };
}

function length(text: string | undefined): number | null {
  if (!text) return null;
  const r = parseQuantity(text, 'length');
  return r.ok && r.value > 0 ? r.value : null;
}

export function rootOutline(
  section: SectionText,
  find: (label: string) => ShapeRecord | undefined,
): RootFootprint | null {
  if (section.shape) {
    const shape = find(section.shape);
    if (!shape) return null;
    const d = shape.d ?? shape.Ht ?? shape.OD;
    const bf = shape.bf ?? shape.B ?? shape.OD;
    const tf = shape.tf ?? shape.tdes;
    return d && bf && tf ? { label: shape.label, family: shape.family, d, bf, tf } : null;
  }
  const p = section.plates;
  const [d, bf, tf] = [length(p?.rootDepth), length(p?.flangeWidth), length(p?.flangeThickness)];
  return d && bf && tf ? { label: 'built-up I', family: 'I', d, bf, tf } : null;
}
