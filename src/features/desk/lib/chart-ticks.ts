/**
 * Axis ticks for the desk's diagrams, worked out once per result: handing the chart library a fixed
 * domain and tick list spares it the arbitrary-precision "nice ticks" search on every redraw.
 */

export interface AxisTicks {
  domain: [number, number];
  ticks: number[];
}

/** The step of 1, 2, 2.5 or 5 × 10^k that splits `span` into about `count` parts. */
export function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const m = raw / power;
  const f = m <= 1 ? 1 : m <= 2 ? 2 : m <= 2.5 ? 2.5 : m <= 5 ? 5 : 10;
  return f * power;
}

// Rounds away the binary noise of repeated steps (0.30000000000000004 → 0.3).
const clean = (v: number) => Number(v.toPrecision(12));

/** A value axis: the domain widened to whole steps so that it holds every value (and zero). */
export function valueTicks(values: readonly number[], count = 4): AxisTicks {
  let lo = 0;
  let hi = 0;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo === hi) return { domain: [0, 1], ticks: [0, 1] };
  // Rounding leaves values like -1e-15 where the diagram is zero (at the tip, at the root): they must
  // not add a whole step below zero.
  const noise = (hi - lo) * 1e-9;
  if (lo < 0 && -lo < noise) lo = 0;
  if (hi > 0 && hi < noise) hi = 0;
  const step = niceStep(hi - lo, count);
  const start = Math.floor(lo / step + 1e-9) * step;
  const end = Math.ceil(hi / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let i = 0; start + i * step <= end + step / 2; i += 1) ticks.push(clean(start + i * step));
  return { domain: [ticks[0], ticks[ticks.length - 1]], ticks };
}

/** The position axis: exactly root to tip (the line spans the plot), ticks at whole steps inside it. */
export function positionTicks(length: number, count = 5): AxisTicks {
  if (!(length > 0) || !Number.isFinite(length)) return { domain: [0, 1], ticks: [0, 1] };
  const step = niceStep(length, count);
  const ticks: number[] = [];
  for (let i = 0; i * step <= length * (1 + 1e-9); i += 1) ticks.push(clean(i * step));
  return { domain: [0, length], ticks };
}
