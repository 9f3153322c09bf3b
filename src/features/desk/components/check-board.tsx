import { useId } from 'react';
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

/** The bar runs to this ratio, so the limit (1.00) sits at 80 % of its length. */
const BAR_END = 1.25;

function UtilBar({ ratio, tone }: { ratio: number | null; tone: Tone }) {
  if (ratio === null)
    return (
      <div
        className="h-2 w-full rounded bg-[repeating-linear-gradient(45deg,#dcd8d1_0_4px,#f7f6f4_4px_8px)]"
        aria-hidden="true"
      />
    );
  const width = Math.min(ratio / BAR_END, 1) * 100;
  return (
    // The ratio is written beside the bar; the bar only draws it, so it is hidden from screen readers.
    <div className="relative h-2 w-full rounded bg-concrete-200" aria-hidden="true">
      <div className={`h-2 rounded ${BAR[tone]}`} style={{ width: `${width}%` }} />
      <div
        className="absolute top-[-2px] h-3 w-px bg-concrete-800"
        style={{ left: `${100 / BAR_END}%` }}
        data-testid="limit-mark"
        title="limit 1.00"
      />
    </div>
  );
}

/** The two terms of the tension-and-shear interaction (ACI 318-19 17.8), read from the engine's note. */
export interface InteractionTerms {
  tension: number;
  shear: number;
  /** true: (N + V) against 1.2 (both terms above 0.2); false: the larger term alone against 1.0. */
  combined: boolean;
}

/**
 * The interaction check carries no demand or capacity quantity (it combines two ratios); the engine
 * states both ratios in its note, "Tension ratio 0.45 + shear ratio 0.30 against 1.2." when they are
 * summed, or "Tension ratio 0.24 and shear ratio 0.00: …" when one is at most 0.2.
 */
export function interactionTerms(check: Check): InteractionTerms | null {
  if (check.id !== 'anchors.interaction' || !check.note) return null;
  const m = /Tension ratio (\d+(?:\.\d+)?) (\+|and) shear ratio (\d+(?:\.\d+)?)/.exec(check.note);
  if (!m) return null;
  return { tension: Number(m[1]), shear: Number(m[3]), combined: m[2] === '+' };
}

function Demand({ check, terms }: { check: Check; terms: InteractionTerms | null }) {
  if (terms)
    return (
      <span className="flex flex-col items-end" data-testid="interaction-demand">
        <span>Nua/φNn {terms.tension.toFixed(2)}</span>
        <span>Vua/φVn {terms.shear.toFixed(2)}</span>
        <span>
          {terms.combined
            ? `sum ${(terms.tension + terms.shear).toFixed(2)}`
            : `larger ${Math.max(terms.tension, terms.shear).toFixed(2)}`}
        </span>
      </span>
    );
  return <>{check.demand ? formatQuantity(check.demand) : '—'}</>;
}

function Capacity({ check, terms }: { check: Check; terms: InteractionTerms | null }) {
  if (terms)
    return (
      <span className="flex flex-col items-end" data-testid="interaction-capacity">
        <span>{terms.combined ? '1.20' : '1.00'}</span>
        <span className="text-xs text-concrete-600">
          {terms.combined ? 'both above 0.2: sum' : 'one at most 0.2: larger alone'}
        </span>
      </span>
    );
  return <>{check.capacity ? formatQuantity(check.capacity) : '—'}</>;
}

/** A cell's column name, shown only on the stacked cards of a narrow screen (the header row says it above 640 px). */
function CardLabel({ children }: { children: string }) {
  return (
    <span className="text-xs text-concrete-600 sm:hidden" aria-hidden="true">
      {children}
    </span>
  );
}

/**
 * Every check as a row, worst first; each with its clause, combination, demand, capacity, bar, ratio
 * and word. Under 640 px each row is a card (a grid of its cells), so ratio and status are never cut.
 */
export function CheckBoard({
  checks,
  directions = {},
}: {
  checks: readonly Check[];
  /** Each combination's direction (result.member.combinations): "up" is marked as uplift. */
  directions?: Readonly<Record<string, 'down' | 'up'>>;
}) {
  const rows = sortWorstFirst(checks);
  const legendId = useId();
  // Explicit roles keep the table's meaning for assistive technology when the cards change its display.
  return (
    <div>
      <table
        role="table"
        className="block w-full border-collapse text-sm sm:table"
        aria-label="Check board"
        aria-describedby={legendId}
      >
        <thead role="rowgroup" className="sr-only sm:not-sr-only sm:table-header-group">
          <tr role="row" className="border-b border-concrete-300 text-left text-xs text-concrete-600">
            <th role="columnheader" className="py-1 pr-2 font-medium">
              Check
            </th>
            <th role="columnheader" className="py-1 pr-2 font-medium">
              Combination
            </th>
            <th role="columnheader" className="py-1 pr-2 text-right font-medium">
              Demand
            </th>
            <th role="columnheader" className="py-1 pr-2 text-right font-medium">
              Capacity
            </th>
            <th role="columnheader" className="w-32 py-1 pr-2 font-medium">
              Utilisation
            </th>
            <th role="columnheader" className="py-1 pr-2 text-right font-medium">
              Ratio
            </th>
            <th role="columnheader" className="py-1 font-medium">
              Status
            </th>
          </tr>
        </thead>
        <tbody role="rowgroup" className="flex flex-col gap-2 sm:table-row-group">
          {rows.map((c) => {
            const word = checkWord(c);
            const tone = checkTone(word);
            const terms = interactionTerms(c);
            return (
              <tr
                key={c.id}
                role="row"
                data-check={c.id}
                data-word={word}
                className="grid grid-cols-2 gap-x-3 gap-y-1 rounded border border-concrete-200 p-2 align-top sm:table-row sm:rounded-none sm:border-0 sm:border-b sm:p-0"
              >
                <td role="cell" className="col-span-2 min-w-0 sm:py-1.5 sm:pr-2">
                  <div className="font-medium">{c.title}</div>
                  <div className="text-xs text-concrete-600">
                    {c.reference}
                    {c.at ? ` · at ${formatQuantity(c.at)}` : ''}
                  </div>
                  {c.note ? <div className="text-xs text-concrete-700">{c.note}</div> : null}
                </td>
                <td role="cell" className="col-span-2 text-xs sm:py-1.5 sm:pr-2">
                  <CardLabel>Combination: </CardLabel>
                  {c.combination ?? '—'}
                  {c.combination && directions[c.combination] === 'up' ? (
                    <div className="text-concrete-600">uplift: top flange in compression</div>
                  ) : null}
                </td>
                <td
                  role="cell"
                  className="num flex flex-col sm:table-cell sm:py-1.5 sm:pr-2 sm:text-right sm:whitespace-nowrap"
                >
                  <CardLabel>Demand</CardLabel>
                  <Demand check={c} terms={terms} />
                </td>
                <td
                  role="cell"
                  className="num flex flex-col text-right sm:table-cell sm:py-1.5 sm:pr-2 sm:whitespace-nowrap"
                >
                  <CardLabel>Capacity</CardLabel>
                  <Capacity check={c} terms={terms} />
                </td>
                <td role="cell" className="col-span-2 py-1 sm:py-2.5 sm:pr-2">
                  <UtilBar ratio={c.ratio} tone={tone} />
                </td>
                <td
                  role="cell"
                  className="num font-mono text-base sm:py-1.5 sm:pr-2 sm:text-right sm:text-sm"
                >
                  <CardLabel>Ratio </CardLabel>
                  {c.ratio === null ? '—' : c.ratio.toFixed(2)}
                </td>
                <td
                  role="cell"
                  className={`text-right text-xs font-semibold whitespace-nowrap sm:py-1.5 sm:text-left ${TEXT[tone]}`}
                >
                  <span aria-hidden="true">{CHECK_MARKS[tone]} </span>
                  {word}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p id={legendId} className="mt-2 text-xs text-concrete-600">
        Each bar runs to a ratio of {BAR_END.toFixed(2)}; the mark across it is the limit, 1.00.
      </p>
    </div>
  );
}
