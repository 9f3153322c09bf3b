/**
 * The stations along the member: evenly spaced nodes with every point load's position added, so a
 * point load always sits on a node and the moment's kink falls on a node (the integration below is
 * then exact for the prismatic cases of AISC Manual Table 3-23).
 */

export interface Grid {
  L: number;
  /** Node positions from 0 to L, in. */
  x: number[];
  /** Midpoints of the intervals (length x.length - 1). */
  mid: number[];
}

/** Nodes at n equal intervals plus the given positions (in, inside [0, L]). */
export function buildGrid(L: number, n: number, extra: readonly number[]): Grid {
  const x: number[] = [];
  for (let i = 0; i <= n; i++) x.push((L * i) / n);
  const tol = L * 1e-9;
  for (const a of extra) {
    if (a <= 0 || a >= L) continue;
    const k = Math.floor((a / L) * n);
    if (Math.abs(x[k] - a) > tol && Math.abs(x[k + 1] - a) > tol && !x.includes(a)) x.push(a);
  }
  if (x.length > n + 1) x.sort((p, q) => p - q);
  const mid = new Array<number>(x.length - 1);
  for (let i = 0; i < mid.length; i++) mid[i] = (x[i] + x[i + 1]) / 2;
  return { L, x, mid };
}
