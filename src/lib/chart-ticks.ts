/**
 * Axis ticks for the desk's diagrams and the compare curves, worked out once per result with
 * d3-scale (the scale library recharts itself uses): handing the chart a fixed domain and tick
 * list spares it the "nice ticks" search on every redraw.
 */
import { scaleLinear } from 'd3-scale';

export interface AxisTicks {
  domain: [number, number];
  ticks: number[];
}

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
  const scale = scaleLinear().domain([lo, hi]).nice(count);
  const [a, b] = scale.domain() as [number, number];
  return { domain: [a, b], ticks: scale.ticks(count) };
}

/** The position axis: exactly root to tip (the line spans the plot), ticks at whole steps inside it. */
export function positionTicks(length: number, count = 5): AxisTicks {
  if (!(length > 0) || !Number.isFinite(length)) return { domain: [0, 1], ticks: [0, 1] };
  return { domain: [0, length], ticks: scaleLinear().domain([0, length]).ticks(count) };
}
