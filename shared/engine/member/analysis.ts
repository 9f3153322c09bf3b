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
import { integrateInto } from './integrate';
import { momentAt } from './statics';

/** Station arrays, internal units (kip, kip·in, rad, in). */
export interface Response {
  V: Float64Array;
  M: Float64Array;
  /** Rotation and deflection at every node (empty for a combination built without them). */
  theta: Float64Array;
  y: Float64Array;
  /** Deflection of the tip, in. */
  tip: number;
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
  /** Where this model's station arrays (and its combinations') are cut from. */
  arena: Arena;
}

/**
 * Zeroed Float64Array views cut from one block: a design needs a few dozen station arrays, and a
 * view costs a fraction of a typed array with a backing store of its own (a study runs thousands
 * of designs). A full block is replaced by a new one; views already handed out stay valid.
 */
export class Arena {
  private block: Float64Array;
  private used = 0;

  constructor(private readonly blockSize: number) {
    this.block = new Float64Array(blockSize);
  }

  /**
   * Starts over in the same block, for a caller whose earlier views are all dropped (the engine's
   * entry, one design at a time): the block is zeroed where it was used, and the next design then
   * allocates nothing. Views handed out before are overwritten.
   */
  reset(): this {
    this.block.fill(0, 0, this.used);
    this.used = 0;
    return this;
  }

  take(n: number): Float64Array {
    if (this.used + n > this.block.length) {
      this.block = new Float64Array(Math.max(this.blockSize, n));
      this.used = 0;
    }
    const view = this.block.subarray(this.used, this.used + n);
    this.used += n;
    return view;
  }
}

/** Default number of equal intervals; point loads add nodes. Converged to far better than 0.1 %. */
export const DEFAULT_INTERVALS = 40;

export function analyseMember(
  section: MemberSection,
  L: number,
  E: number,
  caseLoads: CaseLoads[],
  intervals = DEFAULT_INTERVALS,
  /** Further positions that must be nodes (bottom-flange braces: a segment ends on a node). */
  extraNodes: readonly number[] = [],
  /** Where the station arrays are cut from; default a new arena (a reused one: see Arena.reset). */
  arenaIn?: Arena,
): MemberModel {
  const points = [...caseLoads.flatMap((c) => c.points.map((p) => p.a)), ...extraNodes];
  // A prismatic member under uniform and point loads is integrated exactly on any grid.
  const grid = buildGrid(L, intervals, points);
  const { x, mid } = grid;
  const props: SectionProps[] = x.map((xi) => section.at(xi / L));
  // Room for EI, every case's six arrays and eight combinations; more take a second block.
  const arena = arenaIn ?? new Arena(x.length * (2 + 6 * caseLoads.length + 16));
  const EInode = arena.take(x.length);
  const EImid = arena.take(mid.length);
  for (let i = 0; i < x.length; i++) EInode[i] = E * props[i].Ix;
  for (let i = 0; i < mid.length; i++) EImid[i] = E * section.IxAt(mid[i] / L);
  const model: MemberModel = { L, E, grid, props, EInode, EImid, cases: [], arena };
  model.cases = caseLoads.map((c) => ({ case: c.case, loads: c, response: respond(model, c) }));
  return model;
}

function respond(model: MemberModel, c: CaseLoads): Response {
  const { L, grid, EInode, EImid, arena } = model;
  const { x, mid } = grid;
  const n = x.length;
  const V = arena.take(n);
  const M = arena.take(n);
  const kNode = arena.take(n);
  const kMid = arena.take(n - 1);
  const { q0, q1, points } = c;
  // The closed forms of statics.ts, inlined: this loop runs for every case of every design.
  for (let i = 0; i < n; i++) {
    const xi = x[i];
    const r = L - xi;
    let v = q0 * r + 0.5 * q1 * (L * L - xi * xi);
    let m = 0.5 * q0 * r * r + (q1 * r * r * (2 * L + xi)) / 6;
    for (let k = 0; k < points.length; k++) {
      const arm = points[k].a - xi;
      if (arm >= 0) {
        v += points[k].P;
        m += points[k].P * arm;
      }
    }
    V[i] = v;
    M[i] = m;
    kNode[i] = m / EInode[i];
  }
  for (let i = 0; i < n - 1; i++) kMid[i] = momentAt(c, L, mid[i]) / EImid[i];
  const theta = arena.take(n);
  const y = arena.take(n);
  integrateInto(n, x, kNode, kMid, theta, y);
  return { V, M, theta, y, tip: y[n - 1] };
}

const EMPTY = new Float64Array(0);

/** The moment of a combination at any x (kip·in, hogging positive), from the cases' closed forms. */
export function momentOfCombination(model: MemberModel, factors: Factors, x: number): number {
  let m = 0;
  for (const c of model.cases) {
    const f = factors[c.case];
    if (f) m += f * momentAt(c.loads, model.L, x);
  }
  return m;
}

/**
 * The response to a combination of the cases present (absent cases contribute nothing).
 * @param full also sum rotation and deflection at every node (for the station arrays); the checks
 *   need only V, M and the tip deflection.
 */
export function combine(model: MemberModel, factors: Factors, full: boolean): Response {
  const n = model.grid.x.length;
  const { arena } = model;
  const V = arena.take(n);
  const M = arena.take(n);
  const theta = full ? arena.take(n) : EMPTY;
  const y = full ? arena.take(n) : EMPTY;
  let tip = 0;
  for (const { case: c, response: r } of model.cases) {
    const f = factors[c];
    if (!f) continue;
    for (let i = 0; i < n; i++) {
      V[i] += f * r.V[i];
      M[i] += f * r.M[i];
    }
    if (full) {
      for (let i = 0; i < n; i++) {
        theta[i] += f * r.theta[i];
        y[i] += f * r.y[i];
      }
    }
    tip += f * r.tip;
  }
  return { V, M, theta, y, tip };
}
