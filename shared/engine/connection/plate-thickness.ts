/**
 * Required base plate thickness, AISC Design Guide 1 (2nd ed.) sections 3.3-3.4: plate cantilevers
 * m and n on the bearing side, the rod row's lever arm x on the tension side. Units: in, ksi, kip.
 */
import type { Method } from '../types';
import type { Footprint } from './footprint';
import type { BearingSolution } from './bearing';

/**
 * Plate cantilevers m (along N) and n (along B), in. DG1 3.1: m = (N - 0.95 d)/2; n = (B - 0.8 bf)/2
 * for I-shapes (and channels, treated alike); 0.95 of the width for rectangular HSS; 0.8 of the
 * diameter both ways for round HSS and pipe (DG1 3.1.2, from memory). Negative values are clamped to 0.
 */
export function plateCantilevers(N: number, B: number, fp: Footprint): { m: number; n: number } {
  const kd = fp.kind === 'round' ? 0.8 : 0.95;
  const kb = fp.kind === 'box' ? 0.95 : 0.8;
  return { m: Math.max(0, (N - kd * fp.d) / 2), n: Math.max(0, (B - kb * fp.bf) / 2) };
}

/**
 * Lever arm of the tension row to the centre of the footprint's tension flange: x = f - d/2 + tf/2, in
 * (DG1 3.4). Not positive when the row is not beyond the flange (rods beside the section): the DG1
 * tension-side strip does not describe that plate, and requiredThickness then flags it.
 */
export function tensionLever(f: number, fp: Footprint): number {
  return f - fp.d / 2 + fp.tf / 2;
}

/**
 * One cantilever l (m or n) on the bearing side: Y >= l: uniform 1.5 l sqrt(fp/Fy); Y < l: the load of
 * the bearing zone only, 2.11 sqrt(fp Y (l - Y/2)/Fy) (ASD 1.83 / 2.58).
 */
function bearingCantilever(
  l: number,
  Y: number,
  fp: number,
  Fy: number,
  c: { uniform: number; partial: number },
): number {
  if (l <= 0) return 0;
  return Y >= l ? c.uniform * l * Math.sqrt(fp / Fy) : c.partial * Math.sqrt((fp * Y * (l - Y / 2)) / Fy);
}

const COEFF = { LRFD: { uniform: 1.5, partial: 2.11 }, ASD: { uniform: 1.83, partial: 2.58 } } as const;

export interface ThicknessParts {
  bearingSide: number;
  tensionSide: number;
  required: number;
  m: number;
  n: number;
  x: number;
  /** Width of the tension-side strip, in: the plate width B, or less with few rods (45-degree spread). */
  tensionWidth: number;
  /**
   * False when the rods carry tension but the row is not beyond the tension flange (x <= 0): the DG1
   * tension-side model does not apply, `tensionSide` is not a requirement and the check must fail.
   */
  tensionModelled: boolean;
}

/**
 * Required thickness, in, for a solved bearing block (null when the bearing has no solution).
 * Bearing side: for l = m and l = n, Y >= l: 1.5 l sqrt(fp/Fy); Y < l: 2.11 sqrt(fp Y (l - Y/2)/Fy).
 * Tension side: 2.11 sqrt(T x/(b Fy)) with b = min(B, (perSide - 1) g + 2x) when the rows are given
 * (the DG1 strip takes B; with one or two rods a row cannot engage the whole width). ASD: 1.83 and 2.58.
 */
export function requiredThickness(
  s: BearingSolution,
  plate: { N: number; B: number; f: number; Fy: number; perSide?: number; gauge?: number },
  fp: Footprint,
  method: Method,
): ThicknessParts | null {
  if (s.Y === null || s.fp === null || s.T === null) return null;
  const c = COEFF[method];
  const { m, n } = plateCantilevers(plate.N, plate.B, fp);
  const lever = tensionLever(plate.f, fp);
  const x = Math.max(0, lever);
  const { Y, fp: p } = s;
  let bearingSide = 0;
  if (p > 0 && Y > 0)
    bearingSide = Math.max(bearingCantilever(m, Y, p, plate.Fy, c), bearingCantilever(n, Y, p, plate.Fy, c));
  const tension = Math.max(s.T, s.Tother);
  // The rods' pull spreads at 45 degrees toward the flange line x away: a row of n rods at gauge g
  // engages (n - 1) g + 2x of the plate, never more than B (common practice, no source).
  const spread = plate.perSide ? (plate.perSide - 1) * (plate.gauge ?? 0) + 2 * x : plate.B;
  const tensionWidth = Math.min(plate.B, spread > 0 ? spread : plate.B);
  const tensionSide = tension > 0 ? c.partial * Math.sqrt((tension * x) / (tensionWidth * plate.Fy)) : 0;
  const tensionModelled = !(tension > 0 && lever <= 0);
  return {
    bearingSide,
    tensionSide,
    required: Math.max(bearingSide, tensionSide),
    m,
    n,
    x,
    tensionWidth,
    tensionModelled,
  };
}

/**
 * The next plate thickness a shop stocks at or above `required`, in: 1/8 in steps up to 1-1/4 in,
 * then 1/4 in steps (common practice, no source). Never less than 1/4 in.
 */
export function nextStandardThickness(required: number): number {
  const eps = 1e-9;
  if (required <= 1.25 + eps) return Math.max(0.25, Math.ceil(required * 8 - eps) / 8);
  return 1.25 + Math.ceil((required - 1.25) * 4 - eps) / 4;
}
