import type { TableRow } from '../../lib/plate-drawing';

/** Every number of the sketch in a table: readable without the drawing, by a screen reader or on a phone. */
export function DimensionTable({ rows, caption }: { rows: TableRow[]; caption: string }) {
  return (
    <table className="w-full text-left text-sm" data-testid="plate-dimensions">
      <caption className="mb-1 text-left text-sm font-semibold text-concrete-800">{caption}</caption>
      <thead>
        <tr className="border-b border-concrete-300 text-concrete-700">
          <th scope="col" className="py-1 pr-3 font-medium">
            What
          </th>
          <th scope="col" className="py-1 pr-3 font-medium">
            Size
          </th>
          <th scope="col" className="py-1 font-medium">
            Least / problem
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.id} data-dim={r.id} className="border-b border-concrete-200 align-top">
            <th scope="row" className="py-1 pr-3 font-normal text-concrete-800">
              {r.what}
            </th>
            <td
              className={`num py-1 pr-3 font-mono ${r.tone === 'warn' ? 'font-semibold text-util-over' : 'text-concrete-900'}`}
            >
              {r.text}
            </td>
            <td
              className={`py-1 ${r.tone === 'warn' ? 'font-semibold text-util-over' : 'text-concrete-700'}`}
            >
              {r.note ?? ''}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
