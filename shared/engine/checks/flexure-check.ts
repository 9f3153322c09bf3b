/**
 * member.flexure: the governing flexural limit state (AISC 360-16 Chapter F) against the moment of
 * each combination. A prismatic cantilever under gravity has its largest moment at the root; a
 * tapered one is checked at every station with the local section, and the worst ratio is reported
 * with its position.
 */
import type { Check } from '../types';
import { formatQuantity, quantity } from '../units';
import type { CheckContext } from './check-context';
import { worstRatio } from './check-context';
import { CANTILEVER_CB, flexuralStrengthOf } from './flexural-strength';
import { available, type Strength } from './strength-types';
import { notComputedRow } from './not-computed';

const PHI_B = 0.9;
const OMEGA_B = 1.67;

export function flexureCheck(ctx: CheckContext): Check {
  const { model, section, method, units, Fy, E, Lb } = ctx;
  const nodes = section.prismatic ? 1 : model.grid.x.length - 1; // the tip carries no moment
  const strengthOf = flexuralStrengthOf(section, { Fy, E, Lb });
  const strengths: Strength[] = [];
  for (let i = 0; i < nodes; i++) strengths.push(strengthOf(model.props[i]));
  const capacity = (i: number) => available(strengths[i].nominal, method, PHI_B, OMEGA_B);
  const w = worstRatio(ctx.combos, (r, i) => r.M[i], capacity, nodes);
  if (w.noCapacity >= 0) return noCapacityRow(ctx, strengths[w.noCapacity], w.noCapacity);
  const s = strengths[w.node];
  const combo = ctx.combos[w.combo];
  // Cb and the unbraced length matter only to lateral-torsional buckling, so they are named with it.
  const notes = [
    s.limitState === 'lateral-torsional buckling'
      ? `${s.limitState} governs (Cb = ${CANTILEVER_CB.toFixed(1)}, unbraced bottom flange ${(Lb / 12).toFixed(2)} ft)`
      : `${s.limitState} governs`,
  ];
  // A station outside the clauses (e.g. the deep root of a taper beyond F13.2) fails the check even
  // when another station has the worst ratio.
  const outside = s.outOfScope ? w.node : strengths.findIndex((st) => st.outOfScope !== undefined);
  if (outside >= 0) {
    const where = section.prismatic
      ? ''
      : ` (at ${formatQuantity(quantity(model.grid.x[outside], 'length', units))} from the root)`;
    notes.push(`${strengths[outside].outOfScope}${where}`);
  }
  const ok = w.ratio <= 1 && outside < 0;
  if (w.ratio > 1)
    notes.push('over capacity: a deeper or heavier section, or a brace on the bottom flange, would help');
  const check: Check = {
    id: 'member.flexure',
    title: section.prismatic ? 'Bending at the root' : 'Bending along the tapered member',
    reference: `AISC 360-16 ${s.clause}`,
    combination: combo?.name ?? null,
    demand: quantity(combo ? combo.response.M[w.node] : 0, 'moment', units),
    capacity: quantity(capacity(w.node), 'moment', units),
    ratio: w.ratio,
    ok,
    note: notes.join('; '),
  };
  if (!section.prismatic) check.at = quantity(model.grid.x[w.node], 'length', units);
  return check;
}

/** A section the clauses give no strength (e.g. a web far beyond F13.2): failed, not computed. */
function noCapacityRow(ctx: CheckContext, s: Strength, node: number): Check {
  const note = `no flexural strength could be computed for this section (${s.outOfScope ?? s.limitState}); use a stockier web or flange`;
  return notComputedRow(ctx, 'member.flexure', 'Bending', `AISC 360-16 ${s.clause}`, note, node);
}
