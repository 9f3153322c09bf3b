import { memo, useCallback, useEffect, useMemo, useState } from 'react';
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { DesignResult } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';
import { chartRows, defaultSeriesKey, deflectionLimit, describeSeries, seriesChoices, type ChartRow } from '../lib/chart-data';

interface ChartProps {
  title: string;
  rows: ChartRow[];
  dataKey: 'M' | 'V' | 'd';
  unit: string;
  xUnit: string;
  summary: string;
  color: string;
  limitValue?: number | null;
  limitLabel?: string;
}

const fmt = (value: number, unit: string) => formatQuantity({ value, unit });

// Constant props live outside the component: recharts 3 re-registers an axis or tooltip whose props
// change identity, which costs a second render of the whole chart on every update.
const MARGIN = { top: 4, right: 12, bottom: 0, left: 0 };
const TICK = { fontSize: 10 };
const X_DOMAIN: [number, string] = [0, 'dataMax'];
const CONTENT_STYLE = { fontSize: 12, fontVariantNumeric: 'tabular-nums' };
const tickFormat = (v: number) => `${Number(v.toPrecision(3))}`;

const Chart = memo(function Chart({ title, rows, dataKey, unit, xUnit, summary, color, limitValue, limitLabel }: ChartProps) {
  const formatter = useCallback(
    (v: unknown, name: unknown) => [fmt(Number(v), unit), name === limitLabel ? `limit ${limitLabel}` : title] as [string, string],
    [unit, title, limitLabel],
  );
  const labelFormatter = useCallback((x: unknown) => `x = ${fmt(Number(x), xUnit)} from the root`, [xUnit]);
  return (
    <figure className="rounded border border-concrete-200 bg-white p-2">
      <div className="mb-1 text-xs font-semibold text-concrete-700">
        {title} <span className="font-normal text-concrete-500">({unit.replace(/ /g, '·')})</span>
        {limitValue != null ? <span className="ml-2 font-normal text-util-over">- - limit {limitLabel}</span> : null}
      </div>
      <div className="h-36 [contain:strict]" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={MARGIN}>
            <CartesianGrid stroke="#eeece8" />
            <XAxis dataKey="x" type="number" interval={0} domain={X_DOMAIN} tick={TICK} tickFormatter={tickFormat} />
            <YAxis interval={0} tick={TICK} width={48} reversed={dataKey === 'd'} tickFormatter={tickFormat} />
            <Tooltip formatter={formatter} labelFormatter={labelFormatter} contentStyle={CONTENT_STYLE} />
            {limitValue != null ? <Line dataKey="limit" name={limitLabel} stroke="#b3261e" strokeDasharray="4 3" strokeWidth={1} dot={false} activeDot={false} isAnimationActive={false} /> : null}
            <Line type="monotone" dataKey={dataKey} stroke={color} strokeWidth={2} dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">{summary}</figcaption>
    </figure>
  );
});

/** Moment, shear and deflection along the member for a chosen case or combination. */
export function DeskCharts({ result, resultId, liveLimit, totalLimit }: { result: DesignResult; resultId: number; liveLimit: number; totalLimit: number }) {
  const choices = useMemo(() => seriesChoices(result), [result]);
  const [picked, setPicked] = useState<string | null>(null);
  const key = choices.some((c) => c.key === picked) ? (picked as string) : defaultSeriesKey(result);
  const choice = choices.find((c) => c.key === key);

  useEffect(() => {
    // Measured once React has finished the work queued by this commit (recharts settles its own
    // store in effects): a MessageChannel task runs after the scheduler's tasks already queued.
    const mark = `desk-input-${resultId}`;
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      if (performance.getEntriesByName(mark, 'mark').length === 0) return;
      performance.measure('desk-redraw', mark);
      performance.clearMarks(mark);
    };
    channel.port2.postMessage(null);
    return () => channel.port1.close();
  }, [resultId]);

  const isLive = choice?.kind === 'case' && choice.series.name === 'L';
  const ratio = isLive ? liveLimit : totalLimit;
  const limit = useMemo(() => deflectionLimit(result, ratio), [result, ratio]);
  const rows = useMemo(() => (result.stations && choice ? chartRows(result.stations.x, choice.series, limit?.value ?? null) : []), [result, choice, limit]);
  if (!result.stations || !choice) return <p className="text-sm text-concrete-600">No station data in this result.</p>;
  const s = result.stations;
  const words = describeSeries(result, choice.series, limit);
  const summary = choice.kind === 'case' ? result.member.cases[choice.series.name as 'D'] : result.member.combinations.find((c) => c.name === choice.series.name);
  return (
    <section aria-label="Diagrams along the member" className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <p className="text-sm" data-testid="effect-words">
          {summary ? (
            <>
              Under <strong>{choice.series.name}</strong> the tip moves down <strong className="num" data-testid="tip-deflection">{formatQuantity(summary.tipDeflection)}</strong>
              {limit ? <> (limit {formatQuantity(limit)} = span/{ratio})</> : null}; the root carries a moment of{' '}
              <strong className="num" data-testid="root-moment">{formatQuantity(summary.rootMoment)}</strong> and a shear of <span className="num">{formatQuantity(summary.rootShear)}</span>.
            </>
          ) : null}
        </p>
        <label className="flex items-center gap-1 text-xs text-concrete-700">
          Show
          <select value={key} onChange={(e) => setPicked(e.target.value)} className="rounded border border-concrete-300 bg-white px-1 py-0.5 text-xs focus-visible:ring-2 focus-visible:ring-oxide-500">
            <optgroup label="Combinations">
              {choices.filter((c) => c.kind === 'combination').map((c) => <option key={c.key} value={c.key}>{c.label}</option>)}
            </optgroup>
            <optgroup label="Load cases">
              {choices.filter((c) => c.kind === 'case').map((c) => <option key={c.key} value={c.key}>{c.label}</option>)}
            </optgroup>
          </select>
        </label>
      </div>
      <div className="grid gap-2 xl:grid-cols-3">
        <Chart title="Moment" rows={rows} dataKey="M" unit={s.units.M} xUnit={s.units.x} summary={words.moment} color="#c8571b" />
        <Chart title="Shear" rows={rows} dataKey="V" unit={s.units.V} xUnit={s.units.x} summary={words.shear} color="#56504a" />
        <Chart title="Deflection (down)" rows={rows} dataKey="d" unit={s.units.deflection} xUnit={s.units.x} summary={words.deflection} color="#5b8a72"
          limitValue={limit?.value ?? null} limitLabel={`span/${ratio}`} />
      </div>
    </section>
  );
}
