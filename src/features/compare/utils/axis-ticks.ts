/**
 * Even axis steps for the overlaid curves, from d3-scale (the scale library recharts itself uses):
 * the value axis widened to whole steps of 1, 2 or 5 x 10^k that hold both revisions' values and
 * zero; the distance axis exactly root to the longer reach, ticks at whole steps inside it.
 */
import { positionTicks, valueTicks, type AxisTicks } from '../../../lib/chart-ticks';
import type { Point } from './series';

export type { AxisTicks };

/** The value axis of the overlaid curves (five steps). */
export const valueAxis = (values: readonly number[], count = 5): AxisTicks => valueTicks(values, count);

/** The distance axis of the overlaid curves (six steps). */
export const distanceAxis = (length: number, count = 6): AxisTicks => positionTicks(length, count);

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
