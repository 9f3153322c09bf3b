/**
 * The elevation's shared horizontal frame: the drawing and the three diagrams put x = `from` .. `to`
 * (the stations' x unit; `from` < 0 holds the support behind the root) on the same pixels, so one
 * cursor line crosses all of them at the same x.
 */
import { useEffect, useRef, useState } from 'react';

/** Pixels left of the plot (the value axis) and right of it, the same in every strip. */
export const AXIS_WIDTH = 60;
export const RIGHT_GAP = 20;

export interface Frame {
  width: number;
  from: number;
  to: number;
}

export const plotWidth = (f: Frame) => Math.max(1, f.width - AXIS_WIDTH - RIGHT_GAP);

/** The pixel (from the frame's left edge) of an x. */
export const pixelOf = (f: Frame, x: number) =>
  AXIS_WIDTH + ((x - f.from) / (f.to - f.from || 1)) * plotWidth(f);

/** The x at a pixel from the frame's left edge. */
export const xOfPixel = (f: Frame, px: number) =>
  f.from + ((px - AXIS_WIDTH) / plotWidth(f)) * (f.to - f.from);

/** The width of an element, followed with a ResizeObserver (a fixed guess where there is none). */
export function useWidth<T extends HTMLElement>(fallback = 720) {
  const ref = useRef<T | null>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const measure = () => {
      const w = Math.round(el.getBoundingClientRect().width);
      if (w > 0) setWidth((old) => (old === w ? old : w));
    };
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

const sameNumbers = (a: readonly number[], b: readonly number[]) =>
  a.length === b.length && a.every((v, i) => v === b[i]);

/**
 * The previous axis (domain and ticks) while a new result gives the same one: an axis prop with a
 * new identity makes recharts register the axis again and recompute every selector of the chart.
 */
export function useSameAxis<T extends { domain: [number, number]; ticks: number[] }>(axis: T): T {
  const [kept, setKept] = useState(axis);
  if (kept === axis || (sameNumbers(kept.domain, axis.domain) && sameNumbers(kept.ticks, axis.ticks)))
    return kept;
  // A new axis: kept from here on (React renders again at once with the stored value).
  setKept(axis);
  return axis;
}

/** The previous list while a new one holds the same numbers. */
export function useSameNumbers(values: number[]): number[] {
  const [kept, setKept] = useState(values);
  if (kept === values || sameNumbers(kept, values)) return kept;
  setKept(values);
  return values;
}
