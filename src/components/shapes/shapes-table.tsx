import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useState } from 'react';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { shapeDepth } from '../../lib/shape-filter';

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

/** The shapes, sortable by any column; a row is chosen with a click or Enter. */
export function ShapesTable({
  shapes,
  selected,
  onSelect,
}: {
  shapes: ShapeRecord[];
  selected: string | null;
  onSelect: (label: string) => void;
}) {
  const [sorting, setSorting] = useState<SortingState>([]);
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
  return (
    <table className="w-full border-collapse text-sm" aria-label="Shapes">
      <thead className="sticky top-0 bg-concrete-100">
        {table.getHeaderGroups().map((g) => (
          <tr key={g.id}>
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
      <tbody>
        {table.getRowModel().rows.map((row) => {
          const label = row.original.label;
          const isSelected = label === selected;
          return (
            <tr
              key={row.id}
              tabIndex={0}
              aria-selected={isSelected}
              data-shape={label}
              onClick={() => onSelect(label)}
              onKeyDown={(e) => {
                if (e.key === 'Enter' || e.key === ' ') {
                  e.preventDefault();
                  onSelect(label);
                }
              }}
              className={`cursor-pointer border-b border-concrete-200 focus-visible:outline-2 focus-visible:outline-oxide-500 ${isSelected ? 'bg-oxide-50' : 'hover:bg-concrete-100'}`}
            >
              {row.getVisibleCells().map((cell) => (
                <td
                  key={cell.id}
                  className={`num px-2 py-1 ${cell.column.id === 'label' ? 'font-mono font-medium' : ''}`}
                >
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  {cell.column.id === 'label' && row.original.custom ? (
                    <span className="ml-1 text-[10px] text-oxide-700">imported</span>
                  ) : null}
                </td>
              ))}
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
