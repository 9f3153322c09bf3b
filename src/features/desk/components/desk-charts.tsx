import { useEffect, useMemo, useState } from 'react';
import type { DesignResult } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';
import {
  chartRows,
  defaultSeriesKey,
  deflectionLimit,
  describeSeries,
  seriesChoices,
} from '../lib/chart-data';
import { noteChartsCommitted } from '../lib/redraw-measure';
import { DiagramChart } from './diagram-chart';
import { TipDeflectionSplit } from './tip-deflection-split';

/** Moment, shear and deflection along the member for a chosen case or combination. */
export function DeskCharts({
  result,
  resultId,
  liveLimit,
  totalLimit,
}: {
  result: DesignResult;
  resultId: number;
  liveLimit: number;
  totalLimit: number;
}) {
  const choices = useMemo(() => seriesChoices(result), [result]);
  const [picked, setPicked] = useState<string | null>(null);
  const key = choices.some((c) => c.key === picked) ? (picked as string) : defaultSeriesKey(result);
  const choice = choices.find((c) => c.key === key);

  useEffect(() => noteChartsCommitted(resultId), [resultId]);

  const isLive = choice?.kind === 'case' && choice.series.name === 'L';
  const ratio = isLive ? liveLimit : totalLimit;
  const limit = useMemo(() => deflectionLimit(result, ratio), [result, ratio]);
  const rows = useMemo(
    () =>
      result.stations && choice ? chartRows(result.stations.x, choice.series, limit?.value ?? null) : [],
    [result, choice, limit],
  );
  if (!result.stations || !choice)
    return <p className="text-sm text-concrete-600">No station data in this result.</p>;
  const s = result.stations;
  const words = describeSeries(result, choice.series, limit);
  const summary =
    choice.kind === 'case'
      ? result.member.cases[choice.series.name as 'D']
      : result.member.combinations.find((c) => c.name === choice.series.name);
  return (
    <section aria-label="Diagrams along the member" className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <p className="text-sm" data-testid="effect-words">
          {summary ? (
            <>
              Under <strong>{choice.series.name}</strong> the tip moves{' '}
              {summary.tipDeflection.value < 0 ? 'up' : 'down'}{' '}
              <strong className="num" data-testid="tip-deflection">
                {formatQuantity({
                  value: Math.abs(summary.tipDeflection.value),
                  unit: summary.tipDeflection.unit,
                })}
              </strong>
              {limit ? (
                <>
                  {' '}
                  (limit {formatQuantity(limit)} = span/{ratio})
                </>
              ) : null}
              ; the root carries a moment of{' '}
              <strong className="num" data-testid="root-moment">
                {formatQuantity(summary.rootMoment)}
              </strong>{' '}
              and a shear of <span className="num">{formatQuantity(summary.rootShear)}</span>.
            </>
          ) : null}
        </p>
        <label className="flex items-center gap-1 text-xs text-concrete-700">
          Show
          <select
            value={key}
            onChange={(e) => setPicked(e.target.value)}
            className="rounded border border-concrete-300 bg-white px-1 py-0.5 text-xs focus-visible:ring-2 focus-visible:ring-oxide-500"
          >
            <optgroup label="Combinations">
              {choices
                .filter((c) => c.kind === 'combination')
                .map((c) => (
                  <option key={c.key} value={c.key}>
                    {c.label}
                  </option>
                ))}
            </optgroup>
            <optgroup label="Load cases">
              {choices
                .filter((c) => c.kind === 'case')
                .map((c) => (
                  <option key={c.key} value={c.key}>
                    {c.label}
                  </option>
                ))}
            </optgroup>
          </select>
        </label>
      </div>
      <div className="grid gap-2 xl:grid-cols-3">
        <DiagramChart
          title="Moment"
          rows={rows}
          dataKey="M"
          unit={s.units.M}
          xUnit={s.units.x}
          summary={words.moment}
          color="#c8571b"
        />
        <DiagramChart
          title="Shear"
          rows={rows}
          dataKey="V"
          unit={s.units.V}
          xUnit={s.units.x}
          summary={words.shear}
          color="#56504a"
        />
        <div className="flex flex-col gap-2">
          <DiagramChart
            title="Deflection (down)"
            rows={rows}
            dataKey="d"
            unit={s.units.deflection}
            xUnit={s.units.x}
            summary={words.deflection}
            color="#5b8a72"
            limitValue={limit?.value ?? null}
            limitLabel={`span/${ratio}`}
          />
          <TipDeflectionSplit result={result} />
        </div>
      </div>
    </section>
  );
}
