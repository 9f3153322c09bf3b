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
import type { DesignResult } from '../../../../shared/engine/types';
import { rootOutline } from '../../../../shared/engine/connection/root-outline';
import { parsedConnectionSchema } from '../../../../shared/schemas/parsed-design';
import type { DesignDocument } from '../../../../shared/schemas/design';

export interface PlatePlan {
  layout: PlateLayout;
  bearing: Rect | null;
}

export function platePlan(
  doc: DesignDocument,
  result: DesignResult | null,
  custom: readonly ShapeRecord[] = [],
): PlatePlan | null {
  const parsed = parsedConnectionSchema.safeParse(doc.connection);
  if (!doc.connection || !parsed.success) return null;
  const find = lookupWith(custom);
  const root = rootOutline(doc.member.section, find);
  if (!root) return null;
  try {
    const layout = plateLayout(parsed.data, root, find);
    return { layout, bearing: bearingZoneFromResult(layout, result?.connection ?? null) };
  } catch {
    return null;
  }
}
