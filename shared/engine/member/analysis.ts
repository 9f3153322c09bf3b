/**
 * The member's response to each load case at the stations: shear and moment in closed form,
 * rotation and deflection by integrating M / (E I(x)). Combinations are sums of the cases
 * (linear elastic, small deflections).
 */
import type { LoadCase } from '../../schemas/member';
import type { MemberSection, SectionProps } from '../sections/section-types';
import type { CaseLoads } from './case-loads';
import type { Factors } from './combinations';
import { buildGrid, type Grid } from './grid';
import { integrateCurvature } from './integrate';
import { momentAt, shearAt } from './statics';

/** Station arrays, internal units (kip, kip·in, rad, in). */
export interface Response {
  V: Float64Array;
  M: Float64Array;
  theta: Float64Array;
  y: Float64Array;
}

export interface MemberModel {
  L: number;
  E: number;
  grid: Grid;
  /** Section properties at each node. */
  props: SectionProps[];
  EInode: Float64Array;
  EImid: Float64Array;
  cases: { case: LoadCase; loads: CaseLoads; response: Response }[];
}

/** Default number of equal intervals; point loads add nodes. Converged to far better than 0.1 %. */
export const DEFAULT_INTERVALS = 40;

export function analyseMember(
  section: MemberSection,
  L: number,
  E: number,
  caseLoads: CaseLoads[],
  intervals = DEFAULT_INTERVALS,
): MemberModel {
  const points = caseLoads.flatMap((c) => c.points.map((p) => p.a));
  // A prismatic member under uniform and point loads is integrated exactly on any grid.
  const grid = buildGrid(L, intervals, points);
  const { x, mid } = grid;
  const props: SectionProps[] = x.map((xi) => section.at(xi / L));
  const EInode = new Float64Array(x.length);
  const EImid = new Float64Array(mid.length);
  for (let i = 0; i < x.length; i++) EInode[i] = E * props[i].Ix;
  for (let i = 0; i < mid.length; i++) EImid[i] = E * section.IxAt(mid[i] / L);
  const model: MemberModel = { L, E, grid, props, EInode, EImid, cases: [] };
  model.cases = caseLoads.map((c) => ({ case: c.case, loads: c, response: respond(model, c) }));
  return model;
}

function respond(model: MemberModel, c: CaseLoads): Response {
  const { L, grid, EInode, EImid } = model;
  const { x, mid } = grid;
  const V = new Float64Array(x.length);
  const M = new Float64Array(x.length);
  const kNode = new Float64Array(x.length);
  const kMid = new Float64Array(mid.length);
  for (let i = 0; i < x.length; i++) {
    V[i] = shearAt(c, L, x[i]);
    M[i] = momentAt(c, L, x[i]);
    kNode[i] = M[i] / EInode[i];
  }
  for (let i = 0; i < mid.length; i++) kMid[i] = momentAt(c, L, mid[i]) / EImid[i];
  const { theta, y } = integrateCurvature(x, kNode, kMid);
  return { V, M, theta, y };
}

/** The response to a combination of the cases present (absent cases contribute nothing). */
export function combine(model: MemberModel, factors: Factors): Response {
  const n = model.grid.x.length;
  const out: Response = { V: new Float64Array(n), M: new Float64Array(n), theta: new Float64Array(n), y: new Float64Array(n) };
  for (const { case: c, response: r } of model.cases) {
    const f = factors[c];
    if (!f) continue;
    for (let i = 0; i < n; i++) {
      out.V[i] += f * r.V[i];
      out.M[i] += f * r.M[i];
      out.theta[i] += f * r.theta[i];
      out.y[i] += f * r.y[i];
    }
  }
  return out;
}
