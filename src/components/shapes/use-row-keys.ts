import { useEffect, useRef, type KeyboardEvent, type RefObject } from 'react';

/** How long the typed letters of a type-ahead search are kept together. */
const TYPE_AHEAD_MS = 1000;

/** The row a key moves to from `from` among `count` rows (`page` rows per page), or null for other keys. */
export function rowAfterKey(key: string, from: number, count: number, page: number): number | null {
  const last = count - 1;
  switch (key) {
    case 'ArrowDown':
      return Math.min(last, from + 1);
    case 'ArrowUp':
      return Math.max(0, from - 1);
    case 'PageDown':
      return Math.min(last, from + page);
    case 'PageUp':
      return Math.max(0, from - page);
    case 'Home':
      return 0;
    case 'End':
      return last;
    default:
      return null;
  }
}

/**
 * The first label that starts with `typed` (case and spaces ignored); one letter typed again moves
 * on to the next label with that letter, as a listbox does.
 */
export function typeAheadMatch(labels: readonly string[], typed: string, from: number): number {
  const norm = (s: string) => s.toUpperCase().replace(/\s+/g, '');
  const q = norm(typed);
  if (!q) return -1;
  const repeated = q.length > 1 && [...q].every((c) => c === q[0]);
  const prefix = repeated ? q[0]! : q;
  const start = repeated || q.length === 1 ? from + 1 : 0;
  for (let k = 0; k < labels.length; k++) {
    const i = (start + k) % labels.length;
    if (norm(labels[i]!).startsWith(prefix)) return i;
  }
  return -1;
}

/**
 * Keys of a one-Tab-stop list of rows (roving tabindex): arrows, Page Up/Down, Home/End and
 * type-ahead move the active row (`onMove`), Enter activates it, Space selects it. The row that
 * receives the move is focused after the render that makes it active.
 */
export function useRowKeys({
  labels,
  active,
  onMove,
  onActivate,
  body,
}: {
  labels: readonly string[];
  active: number;
  onMove: (label: string) => void;
  onActivate?: (label: string) => void;
  body: RefObject<HTMLElement | null>;
}) {
  const typed = useRef({ text: '', at: 0 });
  const pendingFocus = useRef<string | null>(null);

  useEffect(() => {
    const label = pendingFocus.current;
    if (label === null || labels[active] !== label) return;
    pendingFocus.current = null;
    const row = body.current?.querySelector<HTMLElement>(`[data-shape="${CSS.escape(label)}"]`);
    row?.focus({ preventScroll: true });
    row?.scrollIntoView?.({ block: 'nearest' });
  });

  function pageSize(): number {
    const row = body.current?.querySelector<HTMLElement>('[data-shape]');
    const box = body.current?.closest<HTMLElement>('[data-scroll]');
    if (!row || !box || row.offsetHeight === 0) return 10;
    return Math.max(1, Math.floor(box.clientHeight / row.offsetHeight) - 2);
  }

  function move(index: number) {
    const label = labels[index];
    if (label === undefined) return;
    if (index !== active) pendingFocus.current = label;
    onMove(label);
  }

  function onKeyDown(event: KeyboardEvent<HTMLElement>) {
    if (labels.length === 0 || event.altKey || event.metaKey) return;
    const target = rowAfterKey(event.key, active, labels.length, pageSize());
    if (target !== null) {
      event.preventDefault();
      move(target);
      return;
    }
    if (event.ctrlKey) return;
    if (event.key === 'Enter') {
      event.preventDefault();
      const label = labels[active]!;
      onMove(label);
      onActivate?.(label);
      return;
    }
    const now = Date.now();
    const fresh = now - typed.current.at > TYPE_AHEAD_MS;
    if (event.key === ' ' && (fresh || typed.current.text === '')) {
      event.preventDefault();
      onMove(labels[active]!);
      return;
    }
    if (event.key.length !== 1) return;
    event.preventDefault();
    typed.current = { text: (fresh ? '' : typed.current.text) + event.key, at: now };
    const found = typeAheadMatch(labels, typed.current.text, active);
    if (found >= 0) move(found);
  }

  return { onKeyDown };
}
