/**
 * Contour lines over the study grid with d3-contour (marching squares), as open polylines in grid
 * coordinates (x from 0 to nx, y from 0 to ny; the value of point (i, j) sits at (i + 0.5, j + 0.5)).
 * d3-contour returns closed rings that run along the grid's border where a band meets it; those
 * border runs are dropped so that only the lines themselves are drawn. Points without a value
 * (invalid designs) count as below every level.
 */
import { contours } from 'd3-contour';

export interface ContourLine {
  level: number;
  lines: [number, number][][];
}

/** About `count` round levels (1, 2 or 5 times a power of ten) strictly inside [min, max]. */
export function niceLevels(values: ArrayLike<number>, count = 5): number[] {
  let min = Infinity;
  let max = -Infinity;
  for (let k = 0; k < values.length; k++) {
    const v = values[k];
    if (Number.isFinite(v)) {
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  if (!(max > min)) return [];
  const raw = (max - min) / count;
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * p).find((s) => s >= raw) ?? 10 * p;
  const out: number[] = [];
  for (let v = Math.ceil(min / step) * step; v < max; v += step) {
    const r = Number(v.toPrecision(12));
    if (r > min) out.push(r);
  }
  return out;
}

export function contourLines(values: number[], nx: number, ny: number, levels: number[]): ContourLine[] {
  if (nx < 2 || ny < 2 || levels.length === 0) return [];
  const gen = contours().size([nx, ny]).thresholds(levels);
  return gen(values).map((mp) => {
    const lines: [number, number][][] = [];
    for (const polygon of mp.coordinates)
      for (const ring of polygon) {
        let current: [number, number][] = [];
        for (let k = 0; k + 1 < ring.length; k++) {
          const a = ring[k] as [number, number];
          const b = ring[k + 1] as [number, number];
          if (onBorder(a, b, nx, ny)) {
            if (current.length > 1) lines.push(current);
            current = [];
            continue;
          }
          if (current.length === 0) current.push(a);
          current.push(b);
        }
        if (current.length > 1) lines.push(current);
      }
    return { level: mp.value, lines };
  });
}

function onBorder(a: [number, number], b: [number, number], nx: number, ny: number): boolean {
  const eps = 1e-9;
  const side = (v: number, edge: number) => Math.abs(v - edge) < eps;
  return (
    (side(a[0], 0) && side(b[0], 0)) ||
    (side(a[0], nx) && side(b[0], nx)) ||
    (side(a[1], 0) && side(b[1], 0)) ||
    (side(a[1], ny) && side(b[1], ny))
  );
}
