/**
 * What each dimension of the plate sketch is, and which rods the fabricator must not set as drawn:
 * a rod off the pier or the plate, or nearer an edge than the least distance the engine's
 * anchors.layout check accepts (DG1 Table 2.3 holes and washers; pier edge 2 in + da/2, 6 da torqued).
 */
import type { PlateLayout } from '../../../../shared/engine/connection/plate-layout';
import type { UnitSystem } from '../../../../shared/engine/units';
import type { Segment, Station } from './plate-drawing-dims';
import { lengthText } from './plate-drawing-format';

/** The role each row of rods plays under the combination that governs the plate (null: not computed). */
export type RodRoles = Record<'tension' | 'compression', 'tension' | 'compression' | null>;

/** The least rod centre to pier edge: the engine's own rule, the one anchors.layout checks. */
export { pierEdgeMinimum } from '../../../../shared/engine/connection/check-anchor-layout';

/** The row at +x (toward the tension row under a downward moment) and at -x, in words. */
export function rowWords(arrangement: PlateLayout['arrangement'], x: number): string {
  if (arrangement === 'face-plate') return x > 0 ? 'top row' : 'bottom row';
  return x > 0 ? 'row away from the tip' : 'row on the tip side';
}

const EPS = 1e-9;

function edgeProblem(
  distance: number,
  outside: boolean,
  minimum: number | null,
  what: 'plate' | 'pier',
  units: UnitSystem,
): string | undefined {
  if (outside) return `outside the ${what} (${lengthText(distance, units)} beyond its edge)`;
  if (minimum !== null && distance < minimum - EPS)
    return `edge ${lengthText(distance, units)} < ${lengthText(minimum, units)} min`;
  return undefined;
}

/** Names the segment between two consecutive stations of a chain along N or along B. */
export function segmentFor(L: PlateLayout, units: UnitSystem, pierMin: number) {
  const plateMin = L.edgeDistances.minimumToPlate;
  return (axis: 'N' | 'B') =>
    (a: Station, b: Station): Segment | null => {
      const tags = [a.tag, b.tag].sort().join('-');
      const rod = a.tag === 'rod' ? a : b;
      const other = rod === a ? b : a;
      const distance = Math.abs(b.value - a.value);
      const sign = Math.sign(rod.value) || Math.sign(other.value);
      const bWords =
        L.arrangement === 'face-plate'
          ? sign > 0
            ? 'right-hand edge'
            : 'left-hand edge'
          : sign > 0
            ? 'upper edge'
            : 'lower edge';
      const where = axis === 'N' ? rowWords(L.arrangement, sign) : bWords;
      const pos = sign > 0 ? 'pos' : 'neg';
      if (tags === 'plate-rod' || tags === 'pier-rod') {
        const kind = other.tag as 'plate' | 'pier';
        const outside = Math.abs(rod.value) > Math.abs(other.value) + EPS;
        const minimum = kind === 'plate' ? plateMin : pierMin;
        const problem = edgeProblem(distance, outside, minimum, kind, units);
        const seg: Segment = {
          id: `rod.${kind}Edge.${axis}.${pos}`,
          what: `Rod to ${kind} edge along ${axis} (${where})`,
          tone: problem ? 'warn' : 'ink',
        };
        if (minimum !== null) seg.minimum = minimum;
        if (problem) seg.problem = problem;
        return seg;
      }
      if (tags === 'centre-rod')
        return { id: `rod.offset.${pos}`, what: `Rod offset f, plate centre to the ${where}` };
      if (tags === 'rod-rod' && axis === 'N')
        return { id: 'rods.rowsApart', what: 'Between the two rows (2f)' };
      if (tags === 'rod-rod') {
        const n = L.rods.length / 2;
        const g = distance / (n - 1);
        return {
          id: 'rods.gauge',
          what: n > 2 ? `Gauge g, ${n} rods in a row` : 'Gauge g (rod spacing in a row)',
          text: n > 2 ? `${n - 1} @ ${lengthText(g, units)} = ${lengthText(distance, units)}` : undefined,
        };
      }
      if (tags === 'centre-plate')
        return { id: `plate.half.${b.value > 0 ? 'pos' : 'neg'}`, what: 'Plate centre to plate edge' };
      return null;
    };
}

export interface RodCheck {
  problems: string[];
}

/** Per rod: off the pier or the plate, or nearer an edge than the least distance. */
export function rodChecks(L: PlateLayout, pierMin: number): RodCheck[] {
  const plateMin = L.edgeDistances.minimumToPlate ?? 0;
  return L.rods.map((r) => {
    const problems: string[] = [];
    const toPlate = Math.min(L.plate.N / 2 - Math.abs(r.x), L.plate.B / 2 - Math.abs(r.y));
    const toPier = Math.min(L.pier.length / 2 - Math.abs(r.x), L.pier.width / 2 - Math.abs(r.y));
    if (toPier < -EPS) problems.push('outside the pier');
    else if (toPier < pierMin - EPS) problems.push('too near the pier edge');
    if (toPlate < -EPS) problems.push('outside the plate');
    else if (toPlate < plateMin - EPS) problems.push('too near the plate edge');
    return { problems };
  });
}

/** The plate must sit on the pier (plate.geometry): words for each direction it overhangs. */
export function plateOverhang(L: PlateLayout, units: UnitSystem): string[] {
  const out: string[] = [];
  if (L.plate.N > L.pier.length + EPS)
    out.push(
      `Plate N ${lengthText(L.plate.N, units)} > pier ${lengthText(L.pier.length, units)}: the plate overhangs the pier`,
    );
  if (L.plate.B > L.pier.width + EPS)
    out.push(
      `Plate B ${lengthText(L.plate.B, units)} > pier ${lengthText(L.pier.width, units)}: the plate overhangs the pier`,
    );
  return out;
}
