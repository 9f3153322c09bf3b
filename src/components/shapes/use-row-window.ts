import { useEffect, useLayoutEffect, useState, type RefObject } from 'react';

/** Rows drawn above and below the visible ones, so a fast scroll or Page Down shows no gap. */
const OVERSCAN = 12;
/** The height of one row before one is measured (text-sm with py-1 and a 1 px rule). */
const DEFAULT_ROW_PX = 29;
/** Rows drawn before the box is measured (the first render of the dialog): about a screenful. */
const FIRST_ROWS = 40;

export type WindowPiece = { kind: 'rows'; from: number; to: number } | { kind: 'gap'; rows: number };

/**
 * Which rows to draw: those in view (plus overscan) and always the active one, which carries the
 * list's Tab stop and may hold the focus while scrolled away. The rows between are gaps of the
 * same height, so the scrollbar and every row's position are those of the full list. Before the
 * box is measured (`viewPx` below 0) a screenful is drawn; with no layout (`viewPx` 0: hidden, or
 * a test without one) every row is.
 */
export function windowPieces(
  count: number,
  active: number,
  scrollPx: number,
  viewPx: number,
  rowPx: number,
  overscan = OVERSCAN,
): WindowPiece[] {
  if (count === 0) return [];
  if (viewPx === 0 || rowPx <= 0) return [{ kind: 'rows', from: 0, to: count }];
  if (viewPx < 0) return windowPieces(count, active, 0, FIRST_ROWS * rowPx, rowPx, 0);
  const from = Math.max(0, Math.floor(scrollPx / rowPx) - overscan);
  const to = Math.min(count, Math.ceil((scrollPx + viewPx) / rowPx) + overscan);
  const spans: [number, number][] = [[from, to]];
  if (active >= 0 && active < count && (active < from || active >= to)) {
    spans.push([active, active + 1]);
    spans.sort((a, b) => a[0] - b[0]);
  }
  const pieces: WindowPiece[] = [];
  let at = 0;
  for (const [a, b] of spans) {
    if (a > at) pieces.push({ kind: 'gap', rows: a - at });
    pieces.push({ kind: 'rows', from: a, to: b });
    at = b;
  }
  if (at < count) pieces.push({ kind: 'gap', rows: count - at });
  return pieces;
}

/**
 * The scroll position and height of the box around a long list (`[data-scroll]` above `body`) and
 * the measured row height, for `windowPieces`.
 */
export function useRowWindow(body: RefObject<HTMLElement | null>) {
  const [view, setView] = useState({ scrollPx: 0, viewPx: -1, rowPx: DEFAULT_ROW_PX });

  useLayoutEffect(() => {
    const box = body.current?.closest<HTMLElement>('[data-scroll]') ?? null;
    const read = () => {
      if (!box) {
        // no scrolling box: draw every row
        setView((v) => (v.viewPx === 0 ? v : { ...v, viewPx: 0 }));
        return;
      }
      const row = body.current?.querySelector<HTMLElement>('tr[data-shape]');
      const top = body.current ? body.current.offsetTop : 0;
      setView((v) => {
        const next = {
          // the head of the table sits above the first row inside the box
          scrollPx: Math.max(0, box.scrollTop - top),
          viewPx: box.clientHeight,
          rowPx: row && row.offsetHeight > 0 ? row.offsetHeight : v.rowPx,
        };
        return next.scrollPx === v.scrollPx && next.viewPx === v.viewPx && next.rowPx === v.rowPx ? v : next;
      });
    };
    read();
    if (!box) return;
    box.addEventListener('scroll', read, { passive: true });
    const resize = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(read);
    resize?.observe(box);
    return () => {
      box.removeEventListener('scroll', read);
      resize?.disconnect();
    };
  }, [body]);

  return view;
}

/** Scrolls the list's box so that row `index` is in the middle (on opening on a chosen shape). */
export function useScrollToRowOnce(body: RefObject<HTMLElement | null>, index: number, rowPx: number) {
  useEffect(() => {
    const box = body.current?.closest<HTMLElement>('[data-scroll]');
    if (!box || index <= 0 || box.clientHeight === 0) return;
    const top = (body.current?.offsetTop ?? 0) + index * rowPx;
    box.scrollTop = Math.max(0, top - box.clientHeight / 2);
    // once, on opening: later moves scroll the row into view themselves
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
}
