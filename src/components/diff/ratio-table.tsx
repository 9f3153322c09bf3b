import { ArrowDown, ArrowUp, Minus, Plus, X, CircleHelp, type LucideIcon } from 'lucide-react';
import { TREND_WORDS } from '../../../shared/words/check-words';
import type { RatioRow, RatioTrend } from '../../lib/ratio-rows';
import { TREND_TEXT } from '../../lib/verdict-style';
import { RatioCell } from './ratio-cell';
import { ScrollBox } from '../ui/scroll-box';
import { ColumnHeads } from '../ui/column-heads';

const ICONS: Record<RatioTrend, LucideIcon> = {
  up: ArrowUp,
  down: ArrowDown,
  same: Minus,
  new: Plus,
  gone: X,
  none: CircleHelp,
};

function signed(change: number | null): string {
  if (change === null) return '—';
  const text = Math.abs(change).toFixed(2);
  if (text === '0.00') return text;
  return change > 0 ? `+${text}` : change < 0 ? `−${text}` : text;
}

/** Every check's ratio before and after, the change and a word for it. */
export function RatioTable({ rows, labelA, labelB }: { rows: RatioRow[]; labelA: string; labelB: string }) {
  return (
    <ScrollBox label={`Check ratios, ${labelA} and ${labelB}`}>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">
          Check ratios, {labelA} and {labelB}
        </caption>
        <ColumnHeads names={['Check', labelA, labelB, 'Change', 'Trend']} />
        <tbody>
          {rows.map((row) => {
            const Icon = ICONS[row.trend];
            return (
              <tr key={row.id} className="border-b border-concrete-100" data-check={row.id}>
                <th scope="row" className="py-1 pr-3 text-left font-normal text-concrete-900">
                  {row.title}
                </th>
                <td className="py-1 pr-3">
                  <RatioCell ratio={row.ratioA} ok={row.okA} />
                </td>
                <td className="py-1 pr-3">
                  <RatioCell ratio={row.ratioB} ok={row.okB} />
                </td>
                <td className="py-1 pr-3 font-mono tabular-nums">{signed(row.change)}</td>
                <td className={`py-1 ${TREND_TEXT[row.trend]}`}>
                  <span className="inline-flex items-center gap-1">
                    <Icon aria-hidden="true" className="h-4 w-4" />
                    {TREND_WORDS[row.trend]}
                  </span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollBox>
  );
}
