/**
 * Shear and moment of a cantilever fixed at x = 0 and free at x = L, closed form for a distributed
 * load q(s) = q0 + q1 s and point loads (AISC Manual Table 3-23 cantilever cases, by superposition).
 * V(x) is the load between x and the tip, M(x) its moment about x (hogging), both positive.
 * A point load at x counts on the root side of x (the shear just toward the support).
 * The shear, and the moment at the nodes, are inlined in analysis.ts (the hot loop); this is the
 * moment anywhere else (interval midpoints, the frequency's static shape).
 */
import type { CaseLoads } from './case-loads';

/** Moment at x, kip·in. */
export function momentAt(c: CaseLoads, L: number, x: number): number {
  const r = L - x;
  let M = 0.5 * c.q0 * r * r;
  // q1 part: integral of q1 s (s - x) ds from x to L = q1 r^2 (2L + x) / 6
  if (c.q1 !== 0) M += (c.q1 * r * r * (2 * L + x)) / 6;
  const pts = c.points;
  for (let k = 0; k < pts.length; k++) {
    const arm = pts[k].a - x;
    if (arm > 0) M += pts[k].P * arm;
  }
  return M;
}
