import type { Check } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';
import {
  CHECK_MARKS,
  checkTone,
  checkWord,
  sortWorstFirst,
  type Tone,
} from '../../../../shared/words/check-words';
import { CHECK_BAR as BAR, CHECK_TEXT as TEXT } from '../../../lib/verdict-style';

function UtilBar({ ratio, tone }: { ratio: number | null; tone: Tone }) {
  if (ratio === null)
    return (
      <div
        className="h-2 w-full rounded bg-[repeating-linear-gradient(45deg,#dcd8d1_0_4px,#f7f6f4_4px_8px)]"
        aria-hidden="true"
      />
    );
  const width = Math.min(ratio / 1.25, 1) * 100;
  return (
    <div className="relative h-2 w-full rounded bg-concrete-200" aria-hidden="true">
      <div className={`h-2 rounded ${BAR[tone]}`} style={{ width: `${width}%` }} />
      <div
        className="absolute top-[-2px] h-3 w-px bg-concrete-800"
        style={{ left: '80%' }}
        title="capacity"
      />
    </div>
  );
}

/** Every check as a row, worst first; each with its clause, combination, demand, capacity, bar, ratio and word. */
export function CheckBoard({
  checks,
  directions = {},
}: {
  checks: readonly Check[];
  /** Each combination's direction (result.member.combinations): "up" is marked as uplift. */
  directions?: Readonly<Record<string, 'down' | 'up'>>;
}) {
  const rows = sortWorstFirst(checks);
  return (
    <table className="w-full border-collapse text-sm" aria-label="Check board">
      <thead>
        <tr className="border-b border-concrete-300 text-left text-xs text-concrete-600">
          <th className="py-1 pr-2 font-medium">Check</th>
          <th className="py-1 pr-2 font-medium">Combination</th>
          <th className="py-1 pr-2 text-right font-medium">Demand</th>
          <th className="py-1 pr-2 text-right font-medium">Capacity</th>
          <th className="w-32 py-1 pr-2 font-medium">Utilisation</th>
          <th className="py-1 pr-2 text-right font-medium">Ratio</th>
          <th className="py-1 font-medium">Status</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((c) => {
          const word = checkWord(c);
          const tone = checkTone(word);
          return (
            <tr
              key={c.id}
              data-check={c.id}
              data-word={word}
              className="border-b border-concrete-200 align-top"
            >
              <td className="py-1.5 pr-2">
                <div className="font-medium">{c.title}</div>
                <div className="text-xs text-concrete-500">
                  {c.reference}
                  {c.at ? ` · at ${formatQuantity(c.at)}` : ''}
                </div>
                {c.note ? <div className="text-xs text-concrete-700">{c.note}</div> : null}
              </td>
              <td className="py-1.5 pr-2 text-xs">
                {c.combination ?? '—'}
                {c.combination && directions[c.combination] === 'up' ? (
                  <div className="text-concrete-500">uplift: top flange in compression</div>
                ) : null}
              </td>
              <td className="num py-1.5 pr-2 text-right whitespace-nowrap">
                {c.demand ? formatQuantity(c.demand) : '—'}
              </td>
              <td className="num py-1.5 pr-2 text-right whitespace-nowrap">
                {c.capacity ? formatQuantity(c.capacity) : '—'}
              </td>
              <td className="py-2.5 pr-2">
                <UtilBar ratio={c.ratio} tone={tone} />
              </td>
              <td className="num py-1.5 pr-2 text-right font-mono">
                {c.ratio === null ? '—' : c.ratio.toFixed(2)}
              </td>
              <td className={`py-1.5 text-xs font-semibold whitespace-nowrap ${TEXT[tone]}`}>
                <span aria-hidden="true">{CHECK_MARKS[tone]} </span>
                {word}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
