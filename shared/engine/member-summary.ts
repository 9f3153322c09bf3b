/**
 * The member part of the result: root demand and tip deflection by case and by combination, the
 * weights, and (when asked) the station arrays for the charts, all in the chosen unit system.
 */
import type { LoadCase } from '../schemas/member';
import type { CombinationResponse } from './checks/check-context';
import type { MemberModel, Response } from './member/analysis';
import type { EffectSummary, Stations, StationSeries } from './types';
import { displayFactor, quantity, RESULT_UNITS, type UnitSystem } from './units';

/** Root moment and shear as magnitudes (the direction says which way); tip deflection signed, down +. */
function summary(r: Response, units: UnitSystem): EffectSummary {
  return {
    rootMoment: quantity(Math.abs(r.M[0]), 'moment', units),
    rootShear: quantity(Math.abs(r.V[0]), 'force', units),
    tipDeflection: quantity(r.tip, 'smallLength', units),
  };
}

export function caseSummaries(
  model: MemberModel,
  units: UnitSystem,
): Partial<Record<LoadCase, EffectSummary>> {
  const out: Partial<Record<LoadCase, EffectSummary>> = {};
  for (const c of model.cases) out[c.case] = summary(c.response, units);
  return out;
}

export function combinationSummaries(combos: readonly CombinationResponse[], units: UnitSystem) {
  return combos.map((c) => ({
    name: c.name,
    direction: directionOf(c.response),
    ...summary(c.response, units),
  }));
}

/** "up" when the root moment is sagging (net load lifts the tip), else "down". */
export function directionOf(r: Response): 'down' | 'up' {
  return r.M[0] < 0 ? 'up' : 'down';
}

function series(
  name: string,
  r: Response,
  units: UnitSystem,
  x: readonly number[],
  theta0 = 0,
): StationSeries {
  const fV = displayFactor('force', units);
  const fM = displayFactor('moment', units);
  const fy = displayFactor('smallLength', units);
  // Plain loops into arrays of their final length: Array.from(typed array, fn) walks an iterator
  // and calls fn per value, which made the station arrays cost more than the design itself.
  const n = r.V.length;
  const V = new Array<number>(n);
  const M = new Array<number>(n);
  const deflection = new Array<number>(n);
  const rotation = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    V[i] = r.V[i] * fV;
    M[i] = r.M[i] * fM;
    // With a flexible root the whole member also turns by the root's rotation theta0.
    deflection[i] = (r.y[i] + theta0 * x[i]) * fy;
    rotation[i] = r.theta[i] + theta0;
  }
  return { name, V, M, deflection, rotation };
}

/** Station arrays in display units: x along the member, V, M, deflection, and the depth. */
export function stationArrays(
  model: MemberModel,
  combos: readonly CombinationResponse[],
  units: UnitSystem,
  /** Root rotation of each case, rad (a flexible root); absent: a rigid root. */
  rootRotation: Partial<Record<LoadCase, number>> = {},
): Stations {
  const x = model.grid.x;
  const comboRotation = (c: CombinationResponse) => {
    let t = 0;
    for (const [k, f] of Object.entries(c.factors) as [LoadCase, number][]) t += f * (rootRotation[k] ?? 0);
    return t;
  };
  const u = RESULT_UNITS[units];
  const fx = displayFactor('length', units);
  const fd = displayFactor('smallLength', units);
  const n = x.length;
  const xs = new Array<number>(n);
  const depth = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    xs[i] = x[i] * fx;
    // The model's properties at each node are section.at(x / L), already computed.
    depth[i] = model.props[i].d * fd;
  }
  return {
    units: { x: u.length, V: u.force, M: u.moment, deflection: u.smallLength, rotation: 'rad' },
    x: xs,
    cases: model.cases.map((c) => series(c.case, c.response, units, x, rootRotation[c.case] ?? 0)),
    combinations: combos.map((c) => series(c.name, c.response, units, x, comboRotation(c))),
    depth,
  };
}
