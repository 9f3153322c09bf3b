/**
 * The plate in plan on the pier for the sketch, from the engine's own layout (plateLayout: plate,
 * pier, footprint outline, rods, DG1 holes and washers, edge distances) and the result's bearing
 * length. Internal inches; x along N toward the tension row, y along B, origin at the plate centre.
 */
import {
  bearingZoneFromResult,
  plateLayout,
  type PlateLayout,
  type Rect,
} from '../../../../shared/engine/connection/plate-layout';
import { lookupWith } from '../../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { DesignResult, RootFootprint } from '../../../../shared/engine/types';
import { parseQuantity } from '../../../../shared/engine/units';
import { connectionSchema } from '../../../../shared/schemas/connection';
import type { DesignDocument } from '../../../../shared/schemas/design';

export interface PlatePlan {
  layout: PlateLayout;
  bearing: Rect | null;
}

function len(text: string | undefined): number | null {
  if (!text) return null;
  const r = parseQuantity(text, 'length');
  return r.ok && r.value > 0 ? r.value : null;
}

/** The member's section at the root, the default footprint (as the engine takes it). */
function rootOf(doc: DesignDocument, find: (label: string) => ShapeRecord | undefined): RootFootprint | null {
  const s = doc.member.section;
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

export function platePlan(
  doc: DesignDocument,
  result: DesignResult | null,
  custom: readonly ShapeRecord[] = [],
): PlatePlan | null {
  const parsed = connectionSchema.safeParse(doc.connection);
  if (!doc.connection || !parsed.success) return null;
  const find = lookupWith(custom);
  const root = rootOf(doc, find);
  if (!root) return null;
  try {
    const layout = plateLayout(parsed.data, root, find);
    return { layout, bearing: bearingZoneFromResult(layout, result?.connection ?? null) };
  } catch {
    return null;
  }
}
