/**
 * anchors.sideFaceBlowout: ACI 318-19 17.6.4, only where it applies (hef > 2.5 ca1 for some edge of
 * the tension row); otherwise the check is omitted, because the code makes it a failure mode only
 * for deep anchors close to an edge. The row along an edge acts as a group (17.6.4.2); the end rod
 * of the row facing a side edge acts alone.
 */
import type { Method } from '../types';
import type { UnitSystem } from '../units';
import { formatLength } from './result-quantity';
import { availableAci, phiConcrete } from './aci-factors';
import { anchorConcrete, concreteProblem } from './capacity';
import { notComputed, safeRatio, type CheckSpec, type Evaluation } from './check-row';
import type { ComboState } from './combo-state';
import type { ConnectionGeometry } from './connection-geometry';
import { blowoutApplies, blowoutGroupFactor, sideFaceBlowout } from './pullout-blowout';

export const SIDE_FACE_BLOWOUT: CheckSpec = {
  id: 'anchors.sideFaceBlowout',
  title: 'Side-face blowout near the pier edge',
  reference: 'ACI 318-19 17.6.4',
};

export interface BlowoutCase {
  /** 'row': the whole tension row against the edge; 'rod': the end rod alone. */
  basis: 'row' | 'rod';
  ca1: number;
  /** Available strength, kip. */
  value: number;
}

export type BlowoutCapacity =
  { applies: false } | { applies: true; cases: BlowoutCase[] } | { applies: true; reason: string };

/** The blowout cases that apply to the tension row, each with its available strength. */
export function blowoutCapacity(geo: ConnectionGeometry, method: Method): BlowoutCapacity {
  const edges = [geo.edgeBeyondRow, geo.edgeAcrossRow, geo.edgeSide];
  if (!edges.some((c) => blowoutApplies(geo.hef, c))) return { applies: false };
  const problem = concreteProblem(geo);
  if (problem || geo.Abrg === null) return { applies: true, reason: problem ?? 'unknown rod size' };
  const conc = anchorConcrete(geo);
  const phi = phiConcrete(geo.conditionA);
  const cases: BlowoutCase[] = [];
  for (const ca1 of [geo.edgeBeyondRow, geo.edgeAcrossRow]) {
    if (!blowoutApplies(geo.hef, ca1)) continue;
    const nsb = sideFaceBlowout(ca1, geo.edgeSide, geo.Abrg, conc);
    const value = availableAci(blowoutGroupFactor(geo.perSide, geo.rowSpan, ca1) * nsb, phi, method);
    cases.push({ basis: 'row', ca1, value });
  }
  if (blowoutApplies(geo.hef, geo.edgeSide)) {
    const nsb = sideFaceBlowout(geo.edgeSide, geo.edgeBeyondRow, geo.Abrg, conc);
    cases.push({ basis: 'rod', ca1: geo.edgeSide, value: availableAci(nsb, phi, method) });
  }
  return { applies: true, cases };
}

/** The worst applicable case for one combination. */
export function evaluateSideFaceBlowout(
  s: ComboState,
  cap: BlowoutCapacity,
  units: UnitSystem,
): Evaluation | null {
  if (!cap.applies) return null;
  if ('reason' in cap) return notComputed('force', cap.reason);
  if (s.groupTension === null || s.rodTension === null) {
    return notComputed(
      'force',
      'No real bearing length, so the rod tension could not be found. Enlarge the plate.',
    );
  }
  let worst: Evaluation | null = null;
  for (const c of cap.cases) {
    const demand = c.basis === 'row' ? s.groupTension : s.rodTension;
    const ratio = safeRatio(demand, c.value);
    if (ratio === null) return notComputed('force', 'The side-face blowout strength could not be computed.');
    if (!worst || (worst.ratio !== null && ratio > worst.ratio)) {
      worst = { demand, capacity: c.value, kind: 'force', ratio };
      worst.note = `The rods sit ${formatLength(c.ca1, units)} from a pier edge with hef > 2.5 ca1${
        ratio > 1 ? '; move the rods away from the edge, use a larger nut or washer, or a larger pier' : ''
      }.`;
    }
  }
  return worst;
}
