/**
 * Bearing under a plate with moment, AISC Design Guide 1 (2nd ed.) section 3.3/3.4, with the
 * bearing strength of AISC 360-16 J8. Internal units: kip, in, ksi, kip·in.
 *
 * The equations are written with M + P f so that they hold for P = 0 (an end plate on a pier face)
 * and for a pull (P < 0, used when a face plate also carries an axial force).
 */
import type { Method } from '../types';

/** sqrt(A2/A1) for a plate N x B centred on a pier L x W (largest geometrically similar area), 1..2. */
export function confinementFactor(N: number, B: number, pierLength: number, pierWidth: number): number {
  const k = Math.min(pierLength / N, pierWidth / B);
  return Math.min(2, Math.max(1, k));
}

/**
 * Available bearing stress fp,max, ksi (AISC 360-16 J8, Eq. J8-2 with sqrt(A2/A1) <= 2):
 * 0.85 f'c sqrt(A2/A1) times phi_c 0.65 (LRFD) or divided by Omega_c 2.31 (ASD).
 */
export function availableBearingStress(fc: number, sqrtA2A1: number, method: Method): number {
  const nominal = 0.85 * fc * sqrtA2A1;
  return method === 'LRFD' ? 0.65 * nominal : nominal / 2.31;
}

export type BearingCase = 'small-moment' | 'large-moment' | 'no-bearing' | 'overload' | 'no-solution';

export interface BearingSolution {
  case: BearingCase;
  /** Bearing length from the compression edge, in (null: no solution). */
  Y: number | null;
  /** Bearing pressure under the plate, ksi. */
  fp: number | null;
  /** Tension in the tension row (T) and in the other row (only for 'no-bearing'), kip. */
  T: number | null;
  Tother: number;
  /** Eccentricity M/P and the critical eccentricity, in (null when P <= 0). */
  e: number | null;
  eCrit: number | null;
  /** Line bearing capacity qmax = fp,max B, kip/in. */
  qMax: number;
  /** Moment about the tension row that bearing must hold (M + P f), and the most it can, kip·in. */
  demandMoment: number;
  capacityMoment: number;
}

export interface BearingInput {
  N: number;
  B: number;
  /** Plate centre to the rod row, in. */
  f: number;
  /** Compression on the plate, kip (negative for a pull). */
  P: number;
  /** Moment, kip·in (magnitude). */
  M: number;
  /** Available bearing stress, ksi. */
  fpMax: number;
}

/** Solves the DG1 bearing block: small-moment (uniform bearing Y = N - 2e) or large-moment (rods in tension). */
export function solveBearing({ N, B, f, P, M, fpMax }: BearingInput): BearingSolution {
  const qMax = fpMax * B;
  const A = f + N / 2;
  const Mr = M + P * f;
  // The largest moment about the rods a bearing block can hold: the vertex of the DG1 quadratic.
  const cap = (qMax * A * A) / 2;
  // A vanishing P can overflow M/P; then there is no usable eccentricity and the large-moment case applies.
  const ratio = M / P;
  const e = P > 0 && Number.isFinite(ratio) ? ratio : null;
  const eCrit = P > 0 ? N / 2 - P / (2 * qMax) : null;
  // One object shape for every case keeps this hot path monomorphic (solution, below).
  const k = { e, eCrit, qMax, Mr, cap };
  if (P > 0 && P >= qMax * N) return solution('overload', N, P / (B * N), 0, 0, k);
  if (e !== null && eCrit !== null && e <= eCrit) {
    const Y = N - 2 * e;
    return solution('small-moment', Y, P / (B * Y), 0, 0, k);
  }
  if (Mr <= 0) {
    // A pull larger than the moment can turn: no bearing, both rows in tension (statics about the centre).
    const pull = -P;
    const T = pull / 2 + (f > 0 ? M / (2 * f) : 0);
    return solution('no-bearing', 0, 0, T, Math.max(0, pull - T), k);
  }
  const disc = A * A - (2 * Mr) / qMax;
  if (disc < 0) return solution('no-solution', null, null, null, 0, k);
  // Y = A - sqrt(disc), written without the cancellation of two nearly equal numbers.
  const Y = (2 * Mr) / qMax / (A + Math.sqrt(disc));
  if (Y > N) return solution('no-solution', null, null, null, 0, k);
  return solution('large-moment', Y, fpMax, Math.max(0, qMax * Y - P), 0, k);
}

function solution(
  c: BearingCase,
  Y: number | null,
  fp: number | null,
  T: number | null,
  Tother: number,
  k: { e: number | null; eCrit: number | null; qMax: number; Mr: number; cap: number },
): BearingSolution {
  return {
    case: c,
    Y,
    fp,
    T,
    Tother,
    e: k.e,
    eCrit: k.eCrit,
    qMax: k.qMax,
    demandMoment: k.Mr,
    capacityMoment: k.cap,
  };
}
