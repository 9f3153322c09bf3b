/** Where the rods are, and how close to a plate edge they may be (common practice, no source). */
import type { ConnectionGeometry } from './connection-geometry';
import type { RodSize } from './rod-data';

export interface RodPosition {
  /** Plate coordinates, in: x along N toward the tension row, y along B. */
  x: number;
  y: number;
  row: 'tension' | 'compression';
}

/** Both rows, perSide rods each, centred on the plate. */
export function rodPositions(geo: Pick<ConnectionGeometry, 'f' | 'g' | 'perSide'>): RodPosition[] {
  const out: RodPosition[] = [];
  for (const [x, row] of [
    [geo.f, 'tension'],
    [-geo.f, 'compression'],
  ] as const) {
    for (let i = 0; i < geo.perSide; i++) out.push({ x, y: (i - (geo.perSide - 1) / 2) * geo.g, row });
  }
  return out;
}

/** Least rod-centre-to-plate-edge distance, in: max(1.5 da, hole/2 + 1/2 in, washer/2). */
export function rodEdgeMinimum(rod: RodSize): number {
  return Math.max(1.5 * rod.diameter, rod.hole / 2 + 0.5, rod.washerSize / 2);
}
