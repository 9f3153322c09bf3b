/** What every member check reads: the analysis, the combinations, the steel and the output units. */
import type { MemberModel, Response } from '../member/analysis';
import type { MemberSection } from '../sections/section-types';
import type { Method } from '../types';
import type { UnitSystem } from '../units';

export interface CombinationResponse {
  name: string;
  response: Response;
}

export interface CheckContext {
  model: MemberModel;
  section: MemberSection;
  method: Method;
  units: UnitSystem;
  Fy: number;
  E: number;
  /** Unbraced length of the bottom flange, in. */
  Lb: number;
  /** Combinations of the chosen method (strength or allowable). */
  combos: CombinationResponse[];
}

/** The node and combination where demand / capacity is largest. */
export function worstRatio(
  combos: readonly CombinationResponse[],
  demandOf: (r: Response, i: number) => number,
  capacityAt: (i: number) => number,
  nodes: number,
): { ratio: number; combo: number; node: number } {
  let best = { ratio: 0, combo: 0, node: 0 };
  for (let c = 0; c < combos.length; c++) {
    for (let i = 0; i < nodes; i++) {
      const cap = capacityAt(i);
      const ratio = cap > 0 ? demandOf(combos[c].response, i) / cap : Number.POSITIVE_INFINITY;
      if (ratio > best.ratio) best = { ratio, combo: c, node: i };
    }
  }
  return best;
}
