/**
 * anchors.shear: how the shear on the plate reaches the concrete.
 * Post-base: friction of the plate on the grout when the compression is enough (AISC Design Guide 1,
 * 2nd ed., 4.1: mu 0.55 steel on grout, phi 0.75 / Omega 2.00, from memory); otherwise the rods in shear.
 * Face plate: always the rods in shear. Rods in shear: the least of steel (ACI 318-19 17.7.1,
 * Vsa = 0.6 Ase futa, x 0.8 with a grout pad), concrete breakout of the row nearest the edge toward
 * which the shear acts (17.7.2) and pryout of all rods (17.7.3). Friction and rods are not added.
 */
import type { Method } from '../types';
import { PHI_ACI, availableAci, availableAisc, phiConcrete } from './aci-factors';
import { breakoutTension } from './breakout-tension';
import { anchorConcrete, concreteProblem, type Capacity } from './capacity';
import { notComputed, safeRatio, type CheckSpec, type Evaluation } from './check-row';
import type { ComboState } from './combo-state';
import type { ConnectionGeometry } from './connection-geometry';
import { breakoutShear, pryoutStrength } from './shear-breakout';

export const ANCHOR_SHEAR: CheckSpec = {
  id: 'anchors.shear',
  title: 'Shear transfer to the concrete',
  reference: 'AISC Design Guide 1 (2nd ed.) 4.1; ACI 318-19 17.7',
};

export const FRICTION_COEFFICIENT = 0.55;

/** Available friction, kip, for a compression P (kip). */
export function frictionCapacity(P: number, method: Method): number {
  return availableAisc(FRICTION_COEFFICIENT * Math.max(0, P), 0.75, 2.0, method);
}

/** The rods' shear capacity (kip, all rods together): the least of steel, breakout and pryout. */
export function rodShearCapacity(geo: ConnectionGeometry, method: Method): Capacity {
  const problem = concreteProblem(geo);
  if (problem || geo.Ase === null) return { ok: false, reason: problem ?? 'unknown rod size' };
  const conc = anchorConcrete(geo);
  const rods = 2 * geo.perSide;
  // Plates on a pier sit on grout; a face plate bears directly on the concrete.
  const grout = geo.arrangement === 'post-base' ? 0.8 : 1;
  const steel = availableAci(rods * grout * 0.6 * geo.Ase * geo.futa, PHI_ACI.steelShear, method);
  const front = breakoutShear(
    {
      n: geo.perSide,
      ca1: geo.edgeBeyondRow,
      ca2: [geo.edgeSide, geo.edgeSide],
      span: geo.rowSpan,
      spacing: geo.g,
      ha: geo.pierDepth,
      da: geo.da,
      hef: geo.hef,
    },
    conc,
  );
  const breakout = availableAci(front.Vcbg, phiConcrete(geo.conditionA), method);
  const whole = breakoutTension(
    {
      n: rods,
      spanX: 2 * geo.f,
      spanY: geo.rowSpan,
      spacing: Math.max(geo.perSide > 1 ? geo.g : 0, 2 * geo.f),
      edges: [geo.edgeBeyondRow, geo.edgeBeyondRow, geo.edgeSide, geo.edgeSide],
      hef: geo.hef,
    },
    conc,
  );
  const pryout = availableAci(pryoutStrength(geo.hef, whole.Ncbg), PHI_ACI.pulloutPryout, method);
  const modes = [
    { value: steel, reference: 'ACI 318-19 17.7.1 (rod steel in shear governs)' },
    { value: breakout, reference: 'ACI 318-19 17.7.2 (concrete breakout toward the edge governs)' },
    { value: pryout, reference: 'ACI 318-19 17.7.3 (pryout governs)' },
  ];
  const worst = modes.reduce((a, b) => (b.value < a.value ? b : a));
  return { ok: true, value: worst.value, reference: worst.reference };
}

export interface ShearOutcome {
  ev: Evaluation;
  /** Ratio of shear on the rods (0 when friction carries it), or null when unknown. */
  rodRatio: number | null;
}

export function evaluateAnchorShear(
  s: ComboState,
  rods: Capacity,
  geo: ConnectionGeometry,
  method: Method,
): ShearOutcome {
  if (geo.arrangement === 'post-base' && s.P > 0) {
    const friction = frictionCapacity(s.P, method);
    if (s.shear <= friction) {
      const ratio = safeRatio(s.shear, friction);
      const ev: Evaluation = {
        demand: s.shear,
        capacity: friction,
        kind: 'force',
        ratio,
        reference: 'AISC Design Guide 1 (2nd ed.) 4.1 (friction on grout)',
      };
      return { ev, rodRatio: 0 };
    }
  }
  if (!rods.ok) return { ev: notComputed('force', rods.reason), rodRatio: null };
  const ratio = safeRatio(s.shear, rods.value);
  const ev: Evaluation = {
    demand: s.shear,
    capacity: rods.value,
    kind: 'force',
    ratio,
    reference: rods.reference,
  };
  ev.note = 'Shear shared by all rods: weld the plate washers to the plate after erection (oversized holes).';
  if (ratio !== null && ratio > 1)
    ev.note += ' Suggestion: more or larger rods, rods farther from the edge, or a shear lug.';
  return { ev, rodRatio: ratio };
}
