import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type Row,
  type SortingState,
} from '@tanstack/react-table';
import { memo, useMemo, useRef, useState, type ReactNode } from 'react';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { shapeDepth } from '../../lib/shape-filter';
import { useRowKeys } from './use-row-keys';
import { useRowWindow, useScrollToRowOnce, windowPieces } from './use-row-window';

const col = createColumnHelper<ShapeRecord>();
const num = (v: number | undefined) => (v === undefined ? '—' : String(v));

const COLUMNS = [
  col.accessor('label', { header: 'Shape' }),
  col.accessor('family', { header: 'Family' }),
  col.accessor('W', { header: 'Weight (lb/ft)', cell: (c) => num(c.getValue()) }),
  col.accessor((s) => shapeDepth(s), { id: 'depth', header: 'Depth (in)', cell: (c) => num(c.getValue()) }),
  col.accessor((s) => s.bf ?? s.B ?? s.OD, {
    id: 'width',
    header: 'Width (in)',
    cell: (c) => num(c.getValue()),
  }),
  col.accessor('A', { header: 'A (in²)', cell: (c) => num(c.getValue()) }),
  col.accessor('Ix', { header: 'Ix (in⁴)', cell: (c) => num(c.getValue()) }),
  col.accessor('Zx', { header: 'Zx (in³)', cell: (c) => num(c.getValue()) }),
  col.accessor('Sx', { header: 'Sx (in³)', cell: (c) => num(c.getValue()) }),
  col.accessor('ry', { header: 'ry (in)', cell: (c) => num(c.getValue()) }),
];

/**
 * The shapes as a grid, sortable by any column, that is one Tab stop: the active row carries the
 * only tabindex 0 (roving tabindex). ArrowUp/Down, Page Up/Down, Home/End and typing the start of
 * a label ("W12") move it and choose that shape; Enter activates it (the picker's main action).
 * Only the rows in view (and the active one) are drawn; the others are gaps of their height.
 */
export function ShapesTable({
  shapes,
  selected,
  onSelect,
  onActivate,
  describedBy,
}: {
  shapes: ShapeRecord[];
  selected: string | null;
  onSelect: (label: string) => void;
  /** Enter on a row: the main action of the screen, if it has one. */
  onActivate?: (label: string) => void;
  /** The id of the words that say how the keys move through the list. */
  describedBy?: string;
}) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const body = useRef<HTMLTableSectionElement>(null);
  // TanStack Table returns fresh functions each render; the compiler skips this component, which is fine here.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: shapes,
    columns: COLUMNS,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const rows = table.getRowModel().rows;
  const labels = useMemo(() => rows.map((r) => r.original.label), [rows]);
  const selectedIndex = selected === null ? -1 : labels.indexOf(selected);
  const active = Math.max(0, selectedIndex);
  const keys = useRowKeys({ labels, active, onMove: onSelect, onActivate, body });

  const view = useRowWindow(body);
  useScrollToRowOnce(body, selectedIndex, view.rowPx);
  const pieces = windowPieces(rows.length, active, view.scrollPx, view.viewPx, view.rowPx);
  // One flat keyed list: a drawn row keeps its place among the others as the window moves, so
  // React never re-creates or moves it (a focused row would lose the focus). A gap is named by
  // the row it starts at.
  const drawn: ReactNode[] = [];
  let at = 0;
  for (const piece of pieces) {
    if (piece.kind === 'gap') {
      drawn.push(
        <tr key={`gap-${at}`} aria-hidden="true">
          <td colSpan={COLUMNS.length} style={{ height: piece.rows * view.rowPx, padding: 0 }} />
        </tr>,
      );
      at += piece.rows;
      continue;
    }
    for (let i = piece.from; i < piece.to; i++) {
      const row = rows[i]!;
      drawn.push(
        <ShapeRow
          key={row.id}
          row={row}
          index={i}
          selected={i === selectedIndex}
          tabbable={i === active}
          onSelect={onSelect}
        />,
      );
    }
    at = piece.to;
  }

  return (
    <table
      role="grid"
      className="w-full border-collapse text-sm"
      aria-label="Shapes"
      aria-describedby={describedBy}
      aria-rowcount={rows.length + 1}
    >
      <thead className="sticky top-0 z-10 bg-concrete-100">
        {table.getHeaderGroups().map((g) => (
          <tr key={g.id} aria-rowindex={1}>
            {g.headers.map((h) => {
              const sorted = h.column.getIsSorted();
              return (
                <th
                  key={h.id}
                  scope="col"
                  aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                  className="border-b border-concrete-300 px-2 py-1 text-left text-xs font-medium text-concrete-700"
                >
                  <button
                    type="button"
                    onClick={h.column.getToggleSortingHandler()}
                    className="rounded hover:text-oxide-700"
                  >
                    {flexRender(h.column.columnDef.header, h.getContext())}
                    {sorted === 'asc' ? ' ▲' : sorted === 'desc' ? ' ▼' : ''}
                  </button>
                </th>
              );
            })}
          </tr>
        ))}
      </thead>
      <tbody ref={body} onKeyDown={keys.onKeyDown}>
        {drawn}
      </tbody>
    </table>
  );
}

/** One row; memoised so that a move re-renders the two rows whose state changes. */
const ShapeRow = memo(function ShapeRow({
  row,
  index,
  selected,
  tabbable,
  onSelect,
}: {
  row: Row<ShapeRecord>;
  index: number;
  selected: boolean;
  tabbable: boolean;
  onSelect: (label: string) => void;
}) {
  const label = row.original.label;
  return (
    <tr
      tabIndex={tabbable ? 0 : -1}
      aria-rowindex={index + 2}
      aria-selected={selected}
      data-shape={label}
      onClick={() => onSelect(label)}
      className={`scroll-mt-8 cursor-pointer border-b border-concrete-200 focus-visible:outline-2 focus-visible:-outline-offset-2 focus-visible:outline-oxide-500 ${selected ? 'bg-oxide-50' : 'hover:bg-concrete-100'}`}
    >
      {row.getVisibleCells().map((cell) => (
        <td
          key={cell.id}
          className={`num whitespace-nowrap px-2 py-1 ${cell.column.id === 'label' ? 'font-mono font-medium' : ''}`}
        >
          {flexRender(cell.column.columnDef.cell, cell.getContext())}
          {cell.column.id === 'label' && row.original.custom ? (
            <span className="ml-1 text-[10px] text-oxide-700">imported</span>
          ) : null}
        </td>
      ))}
    </tr>
  );
});
