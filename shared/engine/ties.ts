/**
 * Physically tied combinations (e.g. D + L and D + 0.75L + 0.75S when L = 3S) differ only by
 * floating-point noise; the one that "governs" must not flip with the last bit of a sum. A later
 * combination takes over only when it is larger by more than that noise, so on a tie the earlier,
 * simpler combination keeps governing.
 */
const RELATIVE_NOISE = 1e-9;

export function clearlyGreater(a: number, b: number): boolean {
  return a > b + RELATIVE_NOISE * Math.max(Math.abs(a), Math.abs(b));
}
