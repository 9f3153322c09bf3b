/**
 * anchors.pullout: the nut of one rod pulling through the concrete, ACI 318-19 17.6.3:
 * Npn = psi_c,P 8 Abrg f'c with the heavy hex nut's bearing area; phi 0.70 (condition B always).
 */
import type { Method } from '../types';
import { PHI_ACI, availableAci } from './aci-factors';
import { against, anchorConcrete, rodProblem, NO_TENSION, type Capacity } from './capacity';
import type { CheckSpec, Evaluation } from './check-row';
import type { ComboState } from './combo-state';
import type { ConnectionGeometry } from './connection-geometry';
import { pulloutStrength } from './pullout-blowout';

export const PULLOUT: CheckSpec = {
  id: 'anchors.pullout',
  title: 'Rod nut pulling through the concrete',
  reference: 'ACI 318-19 17.6.3',
};

/** Available pullout strength of one rod, kip. */
export function pulloutCapacity(geo: ConnectionGeometry, method: Method): Capacity {
  const problem = rodProblem(geo);
  if (problem || geo.Abrg === null) return { ok: false, reason: problem ?? 'unknown rod size' };
  return {
    ok: true,
    value: availableAci(pulloutStrength(geo.Abrg, anchorConcrete(geo)), PHI_ACI.pulloutPryout, method),
  };
}

export function evaluatePullout(s: ComboState, cap: Capacity): Evaluation {
  const ev = against(s.rodTension, cap, 'force', NO_TENSION);
  if (ev.ratio !== null && ev.ratio > 1)
    ev.note = 'Suggestion: a larger rod (bigger nut), a plate washer at the embedded nut, or more rods.';
  return ev;
}
