import type { Check } from '../types';
import { quantity } from '../units';
import type { CheckContext } from './check-context';

/**
 * A member check that could not be computed (no strength from the clauses at some station):
 * failed, ratio null, and a note in plain words. Never a silent pass. For a tapered member it
 * names the station.
 */
export function notComputedRow(
  ctx: CheckContext,
  id: string,
  title: string,
  reference: string,
  note: string,
  node: number,
): Check {
  const check: Check = {
    id,
    title,
    reference,
    combination: null,
    demand: null,
    capacity: null,
    ratio: null,
    ok: false,
    note,
  };
  if (!ctx.section.prismatic) check.at = quantity(ctx.model.grid.x[node], 'length', ctx.units);
  return check;
}
