/** What every member check reads: the analysis, the combinations, the steel and the output units. */
import type { MemberModel, Response } from '../member/analysis';
import type { Factors } from '../member/combinations';
import type { LateralSupport } from './lateral-support';
import type { MemberSection } from '../sections/section-types';
import type { Method } from '../types';
import type { UnitSystem } from '../units';
import { clearlyGreater } from '../ties';

export interface CombinationResponse {
  name: string;
  /** Factors on the unfactored cases (Ev folded into D). */
  factors: Factors;
  response: Response;
}

export interface CheckContext {
  model: MemberModel;
  section: MemberSection;
  method: Method;
  units: UnitSystem;
  Fy: number;
  E: number;
  /** Unbraced length of the bottom flange, in (the older member.unbracedLength rule). */
  Lb: number;
  /** Some load acts upward (wind): shear and moment may change sign along the member. */
  signed: boolean;
  /** member.lateralSupport with its defaults. */
  lateral: LateralSupport;
  /** Combinations of the chosen method (strength or allowable). */
  combos: CombinationResponse[];
}

export interface Worst {
  ratio: number;
  combo: number;
  node: number;
  /** The first node with no positive capacity (a section outside the clause), or -1. */
  noCapacity: number;
}

/** The node and combination where demand / capacity is largest. */
export function worstRatio(
  combos: readonly CombinationResponse[],
  demandOf: (r: Response, i: number) => number,
  capacityAt: (i: number) => number,
  nodes: number,
): Worst {
  const best: Worst = { ratio: 0, combo: 0, node: 0, noCapacity: -1 };
  for (let i = 0; i < nodes; i++) {
    const cap = capacityAt(i);
    if (!(cap > 0)) {
      if (best.noCapacity < 0) best.noCapacity = i;
      continue;
    }
    for (let c = 0; c < combos.length; c++) {
      const ratio = demandOf(combos[c].response, i) / cap;
      if (clearlyGreater(ratio, best.ratio)) {
        best.ratio = ratio;
        best.combo = c;
        best.node = i;
      }
    }
  }
  return best;
}
