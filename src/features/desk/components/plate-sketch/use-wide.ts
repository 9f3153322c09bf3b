import { useEffect, useState, type RefObject } from 'react';

/**
 * Whether the element is at least `min` px wide (plan and section side by side) or narrower
 * (stacked, so each stays large enough to read). Without ResizeObserver (jsdom) it stays wide.
 */
export function useWide(ref: RefObject<HTMLElement | null>, min: number): boolean {
  const [wide, setWide] = useState(true);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const ro = new ResizeObserver((entries) => {
      const w = entries[0]?.contentRect.width ?? min;
      setWide(w >= min);
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, [ref, min]);
  return wide;
}
