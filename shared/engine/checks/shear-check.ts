/**
 * member.shear: AISC 360-16 Chapter G against the shear of each combination. Largest at the root
 * of a prismatic cantilever; checked at every station of a tapered one (the web depth shrinks
 * toward the tip). The vertical component of the inclined flange force, which relieves the web of
 * a tapered cantilever, is ignored (conservative; METHOD.md).
 */
import type { Check } from '../types';
import { quantity } from '../units';
import { worstRatio, type CheckContext } from './check-context';
import { shearStrength, type ShearStrength } from './shear-strength';
import { available } from './strength-types';
import { notComputedRow } from './not-computed';

export function shearCheck(ctx: CheckContext): Check {
  const { model, section, method, units, Fy, E } = ctx;
  const nodes = model.grid.x.length;
  const strengths: ShearStrength[] = [];
  // A prismatic member has one strength; with signed loads its largest shear need not be at the root.
  for (let i = 0; i < (section.prismatic ? 1 : nodes); i++) {
    strengths.push(shearStrength(model.props[i], section.family, section.rolled, Fy, E, model.L));
  }
  const caps = strengths.map((s) => available(s.Vn, method, s.phi, s.omega));
  const capacity = section.prismatic ? () => caps[0] : (i: number) => caps[i];
  const w = worstRatio(
    ctx.combos,
    (r, i) => Math.abs(r.V[i]),
    capacity,
    section.prismatic && !ctx.signed ? 1 : nodes,
  );
  if (w.noCapacity >= 0) {
    // No positive shear strength at a station: a failed, uncomputed check, never a silent pass.
    return notComputedRow(
      ctx,
      'member.shear',
      'Shear',
      `AISC 360-16 ${strengths[section.prismatic ? 0 : w.noCapacity].clause}`,
      'no shear strength could be computed for this section; check the web dimensions',
      w.noCapacity,
    );
  }
  const s = strengths[section.prismatic ? 0 : w.node];
  const combo = ctx.combos[w.combo];
  const factor = method === 'LRFD' ? `phi_v = ${s.phi.toFixed(2)}` : `Omega_v = ${s.omega.toFixed(2)}`;
  const check: Check = {
    id: 'member.shear',
    title: section.prismatic ? 'Shear at the root' : 'Shear along the tapered member',
    reference: `AISC 360-16 ${s.clause}`,
    combination: combo?.name ?? null,
    demand: quantity(combo ? Math.abs(combo.response.V[w.node]) : 0, 'force', units),
    capacity: quantity(capacity(w.node), 'force', units),
    ratio: w.ratio,
    ok: w.ratio <= 1,
    note: w.ratio <= 1 ? factor : `${factor}; over capacity: a thicker or deeper web would help`,
  };
  if (!section.prismatic || w.node !== 0) check.at = quantity(model.grid.x[w.node], 'length', units);
  return check;
}
