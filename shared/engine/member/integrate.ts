/**
 * Rotation and deflection from curvature: theta' = kappa, y' = theta with theta(0) = y(0) = 0
 * (fixed root). kappa = M / (E I) is given at the nodes and at the midpoints of each interval and
 * is taken as the quadratic through those three values, integrated exactly:
 *   theta_b = theta_a + h/6 (k_a + 4 k_m + k_b)          (Simpson)
 *   y_b     = y_a + h theta_a + h^2 (k_a/6 + k_m/3)       (exact double integral of the quadratic)
 * Exact when kappa is quadratic on each interval (prismatic member, uniform and point loads);
 * fourth order otherwise. Deflection positive down, rotation positive tip-down.
 */

export interface Deflected {
  theta: Float64Array;
  y: Float64Array;
}

export function integrateCurvature(
  x: readonly number[],
  kNode: ArrayLike<number>,
  kMid: ArrayLike<number>,
): Deflected {
  const n = x.length;
  const theta = new Float64Array(n);
  const y = new Float64Array(n);
  integrateInto(n, x, kNode, kMid, theta, y);
  return { theta, y };
}

/**
 * The same over the first n nodes into given arrays (scratch buffers at least n long; entries
 * 1..n-1 are overwritten, entry 0 is set to zero).
 */
export function integrateInto(
  n: number,
  x: readonly number[],
  kNode: ArrayLike<number>,
  kMid: ArrayLike<number>,
  theta: Float64Array,
  y: Float64Array,
): void {
  theta[0] = 0;
  y[0] = 0;
  for (let i = 0; i < n - 1; i++) {
    const h = x[i + 1] - x[i];
    const ka = kNode[i];
    const km = kMid[i];
    const kb = kNode[i + 1];
    theta[i + 1] = theta[i] + (h / 6) * (ka + 4 * km + kb);
    y[i + 1] = y[i] + h * theta[i] + h * h * (ka / 6 + km / 3);
  }
}
