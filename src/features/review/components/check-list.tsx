import type { Check } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';
import { RatioCell } from '../../../components/diff/ratio-cell';
import { ScrollBox } from '../../../components/ui/scroll-box';
import { ColumnHeads } from '../../../components/ui/column-heads';

/** Worst first; a check that could not be computed counts as the worst. */
export function worstFirst(checks: Check[]): Check[] {
  const key = (c: Check) => (c.ratio === null || !Number.isFinite(c.ratio) ? Infinity : c.ratio);
  return [...checks].sort((a, b) => key(b) - key(a));
}

/** Every check with its clause, combination, demand, capacity and ratio, worst first. */
export function CheckList({ checks }: { checks: Check[] }) {
  if (checks.length === 0)
    return <p className="text-sm text-util-over">The stored result has no checks: nothing was verified.</p>;
  return (
    <ScrollBox label={'Checks of this revision'}>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Checks of this revision, worst first</caption>
        <ColumnHeads names={['Check', 'Combination', 'Demand', 'Capacity', 'Ratio']} />
        <tbody>
          {worstFirst(checks).map((check) => (
            <tr key={check.id} className="border-b border-concrete-100 align-top" data-check={check.id}>
              <th scope="row" className="py-1 pr-3 text-left font-normal text-concrete-900">
                {check.title}
                <span className="block text-[11px] text-concrete-600">{check.reference}</span>
                {check.note && <span className="block text-xs text-concrete-700">{check.note}</span>}
              </th>
              <td className="py-1 pr-3 text-concrete-700">{check.combination ?? '—'}</td>
              <td className="py-1 pr-3 font-mono tabular-nums">
                {check.demand ? formatQuantity(check.demand) : '—'}
              </td>
              <td className="py-1 pr-3 font-mono tabular-nums">
                {check.capacity ? formatQuantity(check.capacity) : '—'}
              </td>
              <td className="py-1">
                <RatioCell ratio={check.ratio} ok={check.ok} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
