/**
 * First natural frequency of the cantilever in bending, by Stodola's iteration (inverse iteration
 * on the deflected shape) with a Rayleigh-type quotient: start from the static deflection under
 * the weights, load the member with weight x shape, repeat once. One repeat converges the first mode of
 * a uniform cantilever to within 0.001 % of Roark's 3.516 / (2 pi) sqrt(E I g / (w L^4)), and the
 * same code handles a tapered member and point masses (e.g. a guard at the tip).
 * Internal units: kip, in, s; g = 386.09 in/s^2.
 */
import type { MemberModel } from './analysis';
import type { CaseLoads } from './case-loads';
import { integrateInto } from './integrate';
import { momentAt } from './statics';

const G = 386.0886; // in/s^2, standard gravity
const ITERATIONS = 1;

/** A flexible root: rotation = (M + V x offset) x flexibility (connection/root-stiffness.ts). */
export interface RootSpring {
  flexibility: number;
  offset: number;
}

/**
 * Scratch arrays, reused from design to design (a study runs thousands): grown when a grid is
 * longer than any before. Every function below works on the first n (or n - 1) entries only.
 */
class Scratch {
  size = 0;
  wNode = new Float64Array(0);
  wMid = new Float64Array(0);
  pNode = new Float64Array(0);
  kN = new Float64Array(0);
  kM = new Float64Array(0);
  qN = new Float64Array(0);
  qM = new Float64Array(0);
  pN = new Float64Array(0);
  theta = new Float64Array(0);
  ones: Shape = { node: new Float64Array(0), mid: new Float64Array(0) };
  a: Shape = { node: new Float64Array(0), mid: new Float64Array(0) };
  b: Shape = { node: new Float64Array(0), mid: new Float64Array(0) };

  ensure(n: number): this {
    if (n <= this.size) return this;
    const size = Math.max(n, 2 * this.size);
    const f = () => new Float64Array(size);
    this.size = size;
    this.wNode = f();
    this.wMid = f();
    this.pNode = f();
    this.kN = f();
    this.kM = f();
    this.qN = f();
    this.qM = f();
    this.pN = f();
    this.theta = f();
    this.ones = { node: f().fill(1), mid: f().fill(1) };
    this.a = { node: f(), mid: f() };
    this.b = { node: f(), mid: f() };
    return this;
  }
}

const scratch = new Scratch();

/**
 * Frequency in Hz of the first bending mode under the weights `mass` (kip/in and kip at points).
 * With a root spring the shapes include the rigid-body rotation of the root.
 */
export function firstFrequency(model: MemberModel, mass: CaseLoads, root?: RootSpring): number {
  const { grid, EInode, EImid, L } = model;
  const { x, mid } = grid;
  const n = x.length;
  const s = scratch.ensure(n);
  const { wNode, wMid, pNode, kN, kM } = s;
  for (let i = 0; i < n; i++) wNode[i] = mass.q0 + mass.q1 * x[i];
  for (let i = 0; i < n - 1; i++) wMid[i] = mass.q0 + mass.q1 * mid[i];
  pNode.fill(0, 0, n);
  let pointWeight = 0;
  for (const p of mass.points) {
    pNode[nearest(x, p.a)] += p.P;
    pointWeight += p.P;
  }

  // Static deflection under the weights (closed-form moments): the shape for the first estimate.
  for (let i = 0; i < n; i++) kN[i] = momentAt(mass, L, x[i]) / EInode[i];
  for (let i = 0; i < n - 1; i++) kM[i] = momentAt(mass, L, mid[i]) / EImid[i];
  const V0 = mass.q0 * L + 0.5 * mass.q1 * L * L + pointWeight;
  let shape = s.a;
  let next = s.b;
  deflectedShape(n, x, kN, kM, s.theta, shape);
  withRootRotation(n, shape, x, root, momentAt(mass, L, 0), V0);
  let omega2 = G / quotient(n, x, wNode, wMid, pNode, s.ones, shape);
  for (let k = 0; k < ITERATIONS; k++) {
    const { qN, qM, pN } = s;
    for (let i = 0; i < n; i++) {
      qN[i] = wNode[i] * shape.node[i];
      pN[i] = pNode[i] * shape.node[i];
    }
    for (let i = 0; i < n - 1; i++) qM[i] = wMid[i] * shape.mid[i];
    const loaded = shapeUnderLoad(n, x, qN, qM, pN, EInode, EImid, s, next);
    withRootRotation(n, next, x, root, loaded.M0, loaded.V0);
    omega2 = G / quotient(n, x, wNode, wMid, pNode, shape, next);
    [shape, next] = [next, shape];
  }
  return Math.sqrt(omega2) / (2 * Math.PI);
}

interface Shape {
  node: Float64Array;
  mid: Float64Array;
}

/** int(w b b) / int(w a b): with a the last shape and b the shape it produces, omega^2 = g / this. */
function quotient(
  n: number,
  x: readonly number[],
  wN: Float64Array,
  wM: Float64Array,
  pN: Float64Array,
  a: Shape,
  b: Shape,
): number {
  let ab = 0;
  let bb = 0;
  for (let i = 0; i < n - 1; i++) {
    const h = x[i + 1] - x[i];
    ab +=
      (h / 6) *
      (wN[i] * a.node[i] * b.node[i] +
        4 * wM[i] * a.mid[i] * b.mid[i] +
        wN[i + 1] * a.node[i + 1] * b.node[i + 1]);
    bb +=
      (h / 6) *
      (wN[i] * b.node[i] * b.node[i] +
        4 * wM[i] * b.mid[i] * b.mid[i] +
        wN[i + 1] * b.node[i + 1] * b.node[i + 1]);
  }
  for (let i = 0; i < n; i++) {
    ab += pN[i] * a.node[i] * b.node[i];
    bb += pN[i] * b.node[i] * b.node[i];
  }
  return bb / ab;
}

/** Adds the root's rotation theta0 = (M0 + V0 offset) x flexibility as theta0 x x to a shape. */
function withRootRotation(
  n: number,
  s: Shape,
  x: readonly number[],
  root: RootSpring | undefined,
  M0: number,
  V0: number,
): void {
  if (!root || root.flexibility === 0) return;
  const t0 = (M0 + V0 * root.offset) * root.flexibility;
  for (let i = 0; i < n; i++) s.node[i] += t0 * x[i];
  for (let i = 0; i < n - 1; i++) s.mid[i] += t0 * 0.5 * (x[i] + x[i + 1]);
}

/**
 * Deflection at nodes and midpoints from curvature (midpoint: exact for a quadratic curvature),
 * into `out`; `theta` is scratch.
 */
function deflectedShape(
  n: number,
  x: readonly number[],
  kN: Float64Array,
  kM: Float64Array,
  theta: Float64Array,
  out: Shape,
): void {
  const y = out.node;
  integrateInto(n, x, kN, kM, theta, y);
  const mid = out.mid;
  for (let i = 0; i < n - 1; i++) {
    const h = x[i + 1] - x[i];
    mid[i] = y[i] + (h / 2) * theta[i] + (h * h * (7 * kN[i] + 6 * kM[i] - kN[i + 1])) / 96;
  }
}

/** Shape under a distributed load given at nodes and midpoints plus point loads at nodes, into `out`. */
function shapeUnderLoad(
  n: number,
  x: readonly number[],
  qN: Float64Array,
  qM: Float64Array,
  pN: Float64Array,
  EIn: Float64Array,
  EIm: Float64Array,
  s: Scratch,
  out: Shape,
): { M0: number; V0: number } {
  const { kN, kM } = s;
  kN[n - 1] = 0;
  let Vb = pN[n - 1]; // shear just on the root side of node i + 1
  let Mb = 0;
  for (let i = n - 2; i >= 0; i--) {
    const h = x[i + 1] - x[i];
    const Vm = Vb + (h / 24) * (-qN[i] + 8 * qM[i] + 5 * qN[i + 1]);
    const Va = Vb + (h / 6) * (qN[i] + 4 * qM[i] + qN[i + 1]);
    const Mm = Mb + (h / 24) * (-Va + 8 * Vm + 5 * Vb);
    const Ma = Mb + (h / 6) * (Va + 4 * Vm + Vb);
    kM[i] = Mm / EIm[i];
    kN[i] = Ma / EIn[i];
    Vb = Va + pN[i];
    Mb = Ma;
  }
  deflectedShape(n, x, kN, kM, s.theta, out);
  return { M0: Mb, V0: Vb };
}

function nearest(x: readonly number[], a: number): number {
  let best = 0;
  for (let i = 1; i < x.length; i++) if (Math.abs(x[i] - a) < Math.abs(x[best] - a)) best = i;
  return best;
}
