/**
 * The section at the root as the engine's plate layout takes it, from the stored sections of a
 * revision (or the published table), and the layout itself; null without a connection.
 */
import { plateLayout, type PlateLayout } from '../../../shared/engine/connection/plate-layout';
import type { ShapeLookup } from '../../../shared/engine/shapes/types';
import type { RootFootprint } from '../../../shared/engine/types';
import { parseQuantity } from '../../../shared/engine/units';
import type { DesignInput } from '../../../shared/schemas/design';

function len(text: string | undefined): number | null {
  if (!text) return null;
  const r = parseQuantity(text, 'length');
  return r.ok && r.value > 0 ? r.value : null;
}

function rootOf(input: DesignInput, find: ShapeLookup): RootFootprint | null {
  const s = input.member.section;
  if (s.shape) {
    const shape = find(s.shape);
    if (!shape) return null;
    const d = shape.d ?? shape.Ht ?? shape.OD;
    const bf = shape.bf ?? shape.B ?? shape.OD;
    const tf = shape.tf ?? shape.tdes;
    return d && bf && tf ? { label: shape.label, family: shape.family, d, bf, tf } : null;
  }
  const [d, bf, tf] = [len(s.plates?.rootDepth), len(s.plates?.flangeWidth), len(s.plates?.flangeThickness)];
  return d && bf && tf ? { label: 'built-up I', family: 'I', d, bf, tf } : null;
}

export function layoutFor(input: DesignInput, find: ShapeLookup): PlateLayout | null {
  if (!input.connection) return null;
  const root = rootOf(input, find);
  if (!root) return null;
  try {
    return plateLayout(input.connection, root, find);
  } catch {
    return null;
  }
}
