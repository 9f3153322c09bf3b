/**
 * Even axis steps for the overlaid curves, from d3-scale (the scale library recharts itself uses):
 * the value axis widened to whole steps of 1, 2 or 5 x 10^k that hold both revisions' values and
 * zero; the distance axis exactly root to the longer reach, ticks at whole steps inside it.
 */
import { scaleLinear } from 'd3-scale';
import type { Point } from './series';

export interface AxisTicks {
  domain: [number, number];
  ticks: number[];
}

export function valueAxis(values: readonly number[], count = 5): AxisTicks {
  let lo = 0;
  let hi = 0;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo === hi) return { domain: [0, 1], ticks: [0, 1] };
  // Rounding noise around a zero end (-1e-15 at the tip) must not add a whole step beyond zero.
  const noise = (hi - lo) * 1e-9;
  if (lo < 0 && -lo < noise) lo = 0;
  if (hi > 0 && hi < noise) hi = 0;
  const scale = scaleLinear().domain([lo, hi]).nice(count);
  const [a, b] = scale.domain() as [number, number];
  return { domain: [a, b], ticks: scale.ticks(count) };
}

export function distanceAxis(length: number, count = 6): AxisTicks {
  if (!(length > 0) || !Number.isFinite(length)) return { domain: [0, 1], ticks: [0, 1] };
  return { domain: [0, length], ticks: scaleLinear().domain([0, length]).ticks(count) };
}

/** Both axes for the curves on one chart (and a limit the value axis must reach). */
export function curveAxes(curves: (Point[] | null)[], extra: number[] = []): { x: AxisTicks; y: AxisTicks } {
  const points = curves.flatMap((c) => c ?? []);
  return {
    x: distanceAxis(Math.max(0, ...points.map((p) => p.x))),
    y: valueAxis([...points.map((p) => p.y), ...extra]),
  };
}

/** A unit as the desk writes it: "kip ft" reads "kip·ft". */
export const unitText = (unit: string) => unit.replace(/ /g, '·');
