/** The shapes list is one Tab stop, moved through with the arrows, Page Up/Down, Home/End and type-ahead. */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { SHAPES, SHAPES_SOURCE } from '../../shared/engine/shapes/table';
import { ShapesBrowser, type ShapeAction } from '../../src/components/shapes/shapes-browser';
import { typeAheadMatch } from '../../src/components/shapes/use-row-keys';
import { windowPieces } from '../../src/components/shapes/use-row-window';
import { shapeKeys } from '../../src/lib/api/shapes/shape-keys';

/**
 * Part of the open shapes table as shipped (data/shapes.json), in its own order: every 6th shape and
 * every W12 and HSS8, so that jsdom keeps up (the browser test opens the whole table).
 */
const FIXTURE = SHAPES.filter((s, i) => i % 6 === 0 || /^(W12|HSS8)/.test(s.label));
const labels = FIXTURE.map((s) => s.label);

function renderBrowser(actions: ShapeAction[] = [], initial: string | null = null) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  client.setQueryData(shapeKeys.list(undefined), { shapes: FIXTURE, source: SHAPES_SOURCE });
  render(
    <QueryClientProvider client={client}>
      <ShapesBrowser actions={actions} initial={initial} />
    </QueryClientProvider>,
  );
  const grid = screen.getByRole('grid', { name: 'Shapes' });
  const rows = () => within(grid).getAllByRole('row').slice(1);
  const focused = () => (document.activeElement as HTMLElement | null)?.dataset.shape;
  const selected = () => rows().filter((r) => r.getAttribute('aria-selected') === 'true');
  return { grid, rows, focused, selected };
}

describe('shapes picker: one Tab stop with list keys', () => {
  it('takes one Tab stop for all the rows, and Tab leaves the list for the actions', async () => {
    const user = userEvent.setup();
    const initial = labels.find((l) => l.startsWith('W12'))!;
    const { rows, focused } = renderBrowser([{ label: 'Use for member', onUse: vi.fn() }], initial);
    expect(rows()).toHaveLength(FIXTURE.length);
    const tabbable = rows().filter((r) => r.tabIndex === 0);
    expect(tabbable.map((r) => r.dataset.shape)).toEqual([initial]);
    // from the last column header's sort button, Tab goes into the list once and then out of it
    const headers = screen.getAllByRole('columnheader');
    await user.click(within(headers.at(-1)!).getByRole('button'));
    await user.click(within(headers.at(-1)!).getByRole('button'));
    await user.click(within(headers.at(-1)!).getByRole('button')); // back to unsorted
    await user.tab();
    expect(focused()).toBe(initial);
    await user.tab();
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Use for member' }));
  });

  it('moves with ArrowDown/ArrowUp, Home/End and Page Down/Up, choosing the row it lands on', async () => {
    const user = userEvent.setup();
    const { rows, focused, selected } = renderBrowser();
    act(() => rows()[0]!.focus());
    await user.keyboard('{ArrowDown}');
    expect(focused()).toBe(labels[1]);
    expect(selected().map((r) => r.dataset.shape)).toEqual([labels[1]]);
    expect(screen.getByRole('complementary', { name: 'Shape details' })).toHaveTextContent(labels[1]!);
    await user.keyboard('{ArrowDown}{ArrowDown}{ArrowUp}');
    expect(focused()).toBe(labels[2]);
    await user.keyboard('{End}');
    expect(focused()).toBe(labels.at(-1));
    await user.keyboard('{ArrowDown}');
    expect(focused()).toBe(labels.at(-1));
    await user.keyboard('{Home}');
    expect(focused()).toBe(labels[0]);
    await user.keyboard('{ArrowUp}');
    expect(focused()).toBe(labels[0]);
    // jsdom lays nothing out: a page is then 10 rows
    await user.keyboard('{PageDown}');
    expect(focused()).toBe(labels[10]);
    await user.keyboard('{PageUp}');
    expect(focused()).toBe(labels[0]);
    expect(
      rows()
        .filter((r) => r.tabIndex === 0)
        .map((r) => r.dataset.shape),
    ).toEqual([labels[0]]);
  });

  it('jumps to the first shape whose label starts with what is typed', async () => {
    const user = userEvent.setup();
    const { rows, focused } = renderBrowser();
    act(() => rows()[0]!.focus());
    await user.keyboard('W12');
    expect(focused()).toBe(labels.find((l) => l.startsWith('W12')));
    await new Promise((r) => setTimeout(r, 1100)); // the typed letters are forgotten after 1 s
    await user.keyboard('hss8');
    expect(focused()).toBe(labels.find((l) => l.startsWith('HSS8')));
  });

  it('runs the main action on Enter, and follows the sorted order', async () => {
    const user = userEvent.setup();
    const use = vi.fn();
    const other = vi.fn();
    const { rows, focused } = renderBrowser([
      { label: 'Use for member', onUse: use },
      { label: 'Use for post footprint', onUse: other },
    ]);
    // numbers sort heaviest first on the first click, lightest first on the second
    await user.click(screen.getByRole('button', { name: 'Weight (lb/ft)' }));
    await user.click(screen.getByRole('button', { name: /Weight \(lb\/ft\)/ }));
    const lightest = [...FIXTURE].sort((a, b) => a.W - b.W)[0]!.label;
    expect(rows()[0]!.dataset.shape).toBe(lightest);
    act(() => rows()[0]!.focus());
    await user.keyboard('{Enter}');
    expect(use).toHaveBeenCalledWith(lightest);
    expect(other).not.toHaveBeenCalled();
    await user.keyboard('{ArrowDown}');
    expect(focused()).toBe(rows()[1]!.dataset.shape);
  });

  it('keeps filtering: the search narrows the rows and the keys move among those left', async () => {
    const user = userEvent.setup();
    const { rows, focused } = renderBrowser();
    await user.type(screen.getByRole('searchbox'), 'W8X');
    const left = labels.filter((l) => l.includes('W8X'));
    await vi.waitFor(() => expect(rows().map((r) => r.dataset.shape)).toEqual(left));
    await user.tab(); // family
    await user.tab(); // depth from
    await user.tab(); // depth to
    for (let i = 0; i < 10; i++) await user.tab(); // the sort buttons of the ten columns
    await user.tab();
    expect(focused()).toBe(left[0]);
    await user.keyboard('{End}');
    expect(focused()).toBe(left.at(-1));
  });

  it('type-ahead: one letter typed again moves on to the next label with it', () => {
    const list = ['W12X26', 'W10X33', 'HSS8X8X1/2', 'W8X18'];
    expect(typeAheadMatch(list, 'W', 0)).toBe(1);
    expect(typeAheadMatch(list, 'WW', 1)).toBe(3);
    expect(typeAheadMatch(list, 'W', 3)).toBe(0);
    expect(typeAheadMatch(list, 'w8', 0)).toBe(3);
    expect(typeAheadMatch(list, 'X', 0)).toBe(-1);
  });

  it('draws only the rows in view and the active one; gaps keep the full height; no layout draws all', () => {
    // 600 rows of 30 px, a 300 px box scrolled to row 100, overscan 5: rows 95-115 drawn
    expect(windowPieces(600, 100, 3000, 300, 30, 5)).toEqual([
      { kind: 'gap', rows: 95 },
      { kind: 'rows', from: 95, to: 115 },
      { kind: 'gap', rows: 485 },
    ]);
    // the active row far below is drawn in its place, between two gaps
    expect(windowPieces(600, 400, 0, 300, 30, 5)).toEqual([
      { kind: 'rows', from: 0, to: 15 },
      { kind: 'gap', rows: 385 },
      { kind: 'rows', from: 400, to: 401 },
      { kind: 'gap', rows: 199 },
    ]);
    const pieces = windowPieces(653, 652, 6000, 420, 29);
    const total = pieces.reduce((n, p) => n + (p.kind === 'gap' ? p.rows : p.to - p.from), 0);
    expect(total).toBe(653);
    expect(windowPieces(50, 3, 0, 0, 29)).toEqual([{ kind: 'rows', from: 0, to: 50 }]);
    // not measured yet: the first 40 rows and the active one
    expect(windowPieces(600, 300, 0, -1, 29)).toEqual([
      { kind: 'rows', from: 0, to: 40 },
      { kind: 'gap', rows: 260 },
      { kind: 'rows', from: 300, to: 301 },
      { kind: 'gap', rows: 299 },
    ]);
    expect(windowPieces(0, 0, 0, 300, 29)).toEqual([]);
  });
});
