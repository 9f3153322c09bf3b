/**
 * anchors.steelTension: one rod's steel in tension, the lesser of AISC 360-16 J3.6 (Rn = 0.75 Fu Ab,
 * phi 0.75 / Omega 2.00) and ACI 318-19 17.6.1 (Nsa = Ase,N futa, phi 0.75 for a ductile rod).
 */
import type { Method } from '../types';
import { PHI_ACI, availableAci, availableAisc } from './aci-factors';
import { against, rodProblem, NO_TENSION, type Capacity } from './capacity';
import type { CheckSpec, Evaluation } from './check-row';
import type { ComboState } from './combo-state';
import type { ConnectionGeometry } from './connection-geometry';
import { F1554_GRADES, grossArea } from './rod-data';

export const STEEL_TENSION: CheckSpec = {
  id: 'anchors.steelTension',
  title: 'Rod steel in tension',
  reference: 'AISC 360-16 J3.6; ACI 318-19 17.6.1',
};

/** AISC 360-16 J3.6 available tension of one rod, kip: 0.75 Fu Ab with phi 0.75 (LRFD) or Omega 2.00 (ASD). */
export function aiscRodTension(da: number, fu: number, method: Method): number {
  return availableAisc(0.75 * fu * grossArea(da), 0.75, 2.0, method);
}

/** ACI 318-19 17.6.1.2 available tension of one rod, kip: Nsa = Ase futa, phi 0.75 (ASD: / 1.6). */
export function aciRodTension(Ase: number, futa: number, method: Method): number {
  return availableAci(Ase * futa, PHI_ACI.steelTension, method);
}

/** The governing (smaller) of the two, per rod, kip. */
export function steelTensionCapacity(geo: ConnectionGeometry, method: Method): Capacity {
  const problem = rodProblem(geo);
  if (problem || geo.Ase === null) return { ok: false, reason: problem ?? 'unknown rod size' };
  const aisc = aiscRodTension(geo.da, F1554_GRADES[geo.grade].fu, method);
  const aci = aciRodTension(geo.Ase, geo.futa, method);
  return aisc <= aci
    ? { ok: true, value: aisc, reference: 'AISC 360-16 J3.6 (governs); ACI 318-19 17.6.1' }
    : { ok: true, value: aci, reference: 'ACI 318-19 17.6.1 (governs); AISC 360-16 J3.6' };
}

export function evaluateSteelTension(s: ComboState, cap: Capacity): Evaluation {
  return against(s.rodTension, cap, 'force', NO_TENSION);
}
