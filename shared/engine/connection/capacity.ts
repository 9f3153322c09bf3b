/**
 * A capacity computed once per call (it does not depend on the combination), or the plain reason
 * it could not be computed. Shared helpers for the anchor checks.
 */
import type { AnchorConcrete } from './aci-factors';
import type { ConnectionGeometry } from './connection-geometry';
import { notComputed, safeRatio, type Evaluation } from './check-row';
import type { ResultKind } from '../units';

export type Capacity =
  { ok: true; value: number; reference?: string; note?: string } | { ok: false; reason: string };

/** The ACI concrete inputs of a connection. */
export function anchorConcrete(geo: ConnectionGeometry): AnchorConcrete {
  return { fc: geo.fc, lambdaA: geo.lambda, cracked: geo.cracked };
}

/** Why the rod checks cannot run for this geometry, or null when they can. */
export function rodProblem(geo: ConnectionGeometry): string | null {
  if (!geo.rod || geo.Ase === null || geo.Abrg === null) {
    return 'The rod diameter is not a size in AISC Design Guide 1 Table 2.3 (3/4, 7/8, 1, 1-1/4, 1-1/2, 1-3/4 or 2 in); choose a listed size.';
  }
  return null;
}

/** Why the concrete checks cannot run (a rod outside the pier), or null. */
export function concreteProblem(geo: ConnectionGeometry): string | null {
  const rod = rodProblem(geo);
  if (rod) return rod;
  if (!(geo.edgeBeyondRow > 0) || !(geo.edgeSide > 0)) {
    return 'A rod lies on or outside the pier edge, so the concrete cannot hold it. Move the rods in or use a larger pier.';
  }
  return null;
}

/** demand against a capacity, or a not-computed evaluation carrying the capacity's reason. */
export function against(
  demand: number | null,
  cap: Capacity,
  kind: ResultKind,
  whyNoDemand: string,
): Evaluation {
  if (!cap.ok) return notComputed(kind, cap.reason);
  if (demand === null) return { demand: null, capacity: cap.value, kind, ratio: null, note: whyNoDemand };
  const ev: Evaluation = { demand, capacity: cap.value, kind, ratio: safeRatio(demand, cap.value) };
  if (cap.reference) ev.reference = cap.reference;
  if (cap.note) ev.note = cap.note;
  return ev;
}

export const NO_TENSION =
  'No real bearing length, so the rod tension could not be found. Enlarge the plate (N, B) or move the rods out.';
