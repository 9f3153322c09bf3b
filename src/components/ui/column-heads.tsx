import type { ReactNode } from 'react';

/**
 * A table's header row as the app's data tables draw it: one column heading per entry, each with
 * room to its right but the last.
 */
export function ColumnHeads({ names }: { names: readonly ReactNode[] }) {
  return (
    <thead>
      <tr className="border-b border-concrete-300 text-left text-concrete-700">
        {names.map((name, i) => (
          <th
            // The headings are fixed for the table: their place is their identity.
            key={i}
            scope="col"
            className={i === names.length - 1 ? 'py-1 font-medium' : 'py-1 pr-3 font-medium'}
          >
            {name}
          </th>
        ))}
      </tr>
    </thead>
  );
}
