/** Figures of the benchmark scripts. */

/** The nearest-rank percentile `p` (0 to 1) of values sorted ascending; NaN when there are none. */
export function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1));
  return sorted[i];
}
