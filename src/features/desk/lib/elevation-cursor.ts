/**
 * What the elevation's cursor reads: shear, moment, deflection and the section depth at a distance
 * x from the root, interpolated linearly between the engine's stations (exactly the engine's values
 * on a station), the keyboard's steps from station to station, and the place of the deflection
 * limit's marker at the tip.
 */
import type { StationSeries } from '../../../../shared/engine/types';

export interface CursorValues {
  x: number;
  V: number;
  M: number;
  deflection: number;
  depth: number;
}

/** The index i with x[i] <= at <= x[i + 1] and the fraction of the way from x[i] to x[i + 1]. */
function bracket(x: readonly number[], at: number): { i: number; t: number } {
  const last = x.length - 1;
  if (last <= 0 || at <= x[0]) return { i: 0, t: 0 };
  if (at >= x[last]) return { i: last, t: 0 };
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= at) lo = mid;
    else hi = mid;
  }
  const span = x[hi] - x[lo];
  return { i: lo, t: span > 0 ? (at - x[lo]) / span : 0 };
}

function lerp(values: readonly number[], i: number, t: number): number {
  const a = values[i] ?? 0;
  return t === 0 ? a : a + (values[i + 1] - a) * t;
}

/** The series' values and the section depth at `at` (in the stations' x unit), clamped to the member. */
export function valuesAt(
  x: readonly number[],
  depth: readonly number[],
  series: StationSeries,
  at: number,
): CursorValues {
  const length = x[x.length - 1] ?? 0;
  const clamped = Math.min(Math.max(at, 0), length);
  const { i, t } = bracket(x, clamped);
  return {
    x: clamped,
    V: lerp(series.V, i, t),
    M: lerp(series.M, i, t),
    deflection: lerp(series.deflection, i, t),
    depth: lerp(depth, i, t),
  };
}

export type CursorKey =
  'ArrowRight' | 'ArrowUp' | 'ArrowLeft' | 'ArrowDown' | 'PageUp' | 'PageDown' | 'Home' | 'End';

const STEPS: Record<CursorKey, number> = {
  ArrowRight: 1,
  ArrowUp: 1,
  ArrowLeft: -1,
  ArrowDown: -1,
  PageUp: 5,
  PageDown: -5,
  Home: -Infinity,
  End: Infinity,
};

export function isCursorKey(key: string): key is CursorKey {
  return key in STEPS;
}

/**
 * The station the cursor moves to from `at` for a key: the next station toward the tip (or the
 * root), five stations for Page Up / Page Down, the root for Home and the tip for End. From a point
 * between stations the first step lands on the neighbouring station.
 */
export function stepCursor(x: readonly number[], at: number | null, key: CursorKey): number {
  const last = x.length - 1;
  if (last < 0) return 0;
  const steps = STEPS[key];
  if (steps === -Infinity) return x[0];
  if (steps === Infinity) return x[last];
  if (at === null) return steps > 0 ? x[0] : x[last];
  const eps = (x[last] - x[0]) * 1e-9;
  let i: number;
  if (steps > 0) {
    i = x.findIndex((xi) => xi > at + eps);
    if (i < 0) return x[last];
    i += steps - 1;
  } else {
    i = -1;
    for (let k = last; k >= 0; k -= 1)
      if (x[k] < at - eps) {
        i = k;
        break;
      }
    if (i < 0) return x[0];
    i += steps + 1;
  }
  return x[Math.min(last, Math.max(0, i))];
}

/**
 * How far past the largest deflection the axis may reach to hold the limit: beyond this the curve
 * would be squashed into less than a third of the strip, so the marker sits at the edge instead.
 */
export const LIMIT_REACH = 3;

export interface LimitMarker {
  /** Where the marker is drawn on the deflection axis (the limit, or the axis edge when off the scale). */
  y: number;
  /** True when the limit lies beyond the drawn axis (the marker points past the edge). */
  offScale: boolean;
  /** The values the deflection axis must hold (the curve's, plus the limit when it is on the scale). */
  axisValues: number[];
}

/**
 * The deflection limit as a marker at the tip, on the side the tip moves. On the scale when the limit
 * is at most LIMIT_REACH times the largest deflection; otherwise at the edge of an axis that holds
 * LIMIT_REACH times the largest deflection, marked as off the scale.
 */
export function limitMarker(deflection: readonly number[], limit: number): LimitMarker {
  let largest = 0;
  for (const d of deflection) if (Math.abs(d) > Math.abs(largest)) largest = d;
  const tip = deflection[deflection.length - 1] ?? 0;
  const sign = (tip !== 0 ? tip : largest) < 0 ? -1 : 1;
  const magnitude = Math.abs(largest);
  if (magnitude === 0 || limit <= LIMIT_REACH * magnitude)
    return { y: sign * limit, offScale: false, axisValues: [...deflection, sign * limit] };
  const edge = sign * LIMIT_REACH * magnitude;
  return { y: edge, offScale: true, axisValues: [...deflection, edge] };
}
