/**
 * anchors.concreteBreakout: concrete breakout of the row of rods in tension, ACI 318-19 17.6.2,
 * with the pier's four edges (projected area clipped by the edges, psi_ed,N, the narrow-member rule).
 */
import type { Method } from '../types';
import type { UnitSystem } from '../units';
import { formatLength } from './result-quantity';
import { availableAci, phiConcrete } from './aci-factors';
import { breakoutTension, type TensionGroup } from './breakout-tension';
import { against, anchorConcrete, concreteProblem, NO_TENSION, type Capacity } from './capacity';
import type { CheckSpec, Evaluation } from './check-row';
import type { ComboState } from './combo-state';
import type { ConnectionGeometry } from './connection-geometry';

export const CONCRETE_BREAKOUT: CheckSpec = {
  id: 'anchors.concreteBreakout',
  title: 'Concrete breakout of the rods in tension',
  reference: 'ACI 318-19 17.6.2',
};

/** The tension row as an ACI group: edges beyond the row, behind it (across the pier) and at both ends. */
export function tensionRowGroup(geo: ConnectionGeometry): TensionGroup {
  return {
    n: geo.perSide,
    spanX: 0,
    spanY: geo.rowSpan,
    spacing: geo.perSide > 1 ? geo.g : 0,
    edges: [geo.edgeBeyondRow, geo.edgeAcrossRow, geo.edgeSide, geo.edgeSide],
    hef: geo.hef,
  };
}

/** Available breakout strength of the tension row, kip. */
export function breakoutCapacity(geo: ConnectionGeometry, method: Method, units: UnitSystem): Capacity {
  const problem = concreteProblem(geo);
  if (problem) return { ok: false, reason: problem };
  const r = breakoutTension(tensionRowGroup(geo), anchorConcrete(geo));
  const value = availableAci(r.Ncbg, phiConcrete(geo.conditionA), method);
  // With three or more edges inside the cone, deeper rods gain little or nothing (the code's
  // expressions can even fall slightly as hef grows), so say so rather than suggest more depth.
  const note =
    r.nearEdges >= 3
      ? `Within 1.5 hef of ${r.nearEdges} pier edges: breakout uses an embedment of ${formatLength(r.hefUsed, units)} (ACI 318-19 17.6.2.1.2); a larger pier helps more than deeper rods.`
      : undefined;
  return note ? { ok: true, value, note } : { ok: true, value };
}

export function evaluateConcreteBreakout(s: ComboState, cap: Capacity): Evaluation {
  const ev = against(s.groupTension, cap, 'force', NO_TENSION);
  if (ev.ratio !== null && ev.ratio > 1) {
    // Under the narrow-member rule a deeper rod gains nothing, so do not suggest it.
    const narrow = cap.ok && cap.note !== undefined;
    const fix = narrow
      ? 'Suggestion: a larger pier, or more rods spread wider.'
      : 'Suggestion: deeper embedment, more rods spread wider, or a larger pier.';
    ev.note = [ev.note, fix].filter(Boolean).join(' ');
  }
  return ev;
}
