import { memo, useCallback, useMemo, useState } from 'react';
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatQuantity } from '../../../../shared/engine/units';
import type { ChartRow } from '../lib/chart-data';
import { positionTicks, valueTicks } from '../lib/chart-ticks';
import { AxisTick } from './axis-tick';

export interface DiagramChartProps {
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
const CONTENT_STYLE = { fontSize: 12, fontVariantNumeric: 'tabular-nums' };
const TICK = <AxisTick />;

/** One diagram along the member (recharts), with its hover readout and a text summary for screen readers. */
export const DiagramChart = memo(function DiagramChart({
  title,
  rows,
  dataKey,
  unit,
  xUnit,
  summary,
  color,
  limitValue,
  limitLabel,
}: DiagramChartProps) {
  const formatter = useCallback(
    (v: unknown, name: unknown) =>
      [fmt(Number(v), unit), name === limitLabel ? `limit ${limitLabel}` : title] as [string, string],
    [unit, title, limitLabel],
  );
  const labelFormatter = useCallback((x: unknown) => `x = ${fmt(Number(x), xUnit)} from the root`, [xUnit]);
  const xAxis = useMemo(() => positionTicks(rows.length > 0 ? rows[rows.length - 1].x : 0), [rows]);
  const yAxis = useMemo(
    () => valueTicks([...rows.map((r) => r[dataKey]), ...(limitValue != null ? [limitValue] : [])]),
    [rows, dataKey, limitValue],
  );
  // The tooltip is mounted only while the pointer (or focus) is on the chart: mounted, it follows
  // every data change through the chart's store, a few ms per chart per redraw.
  const [pointing, setPointing] = useState(false);
  const on = useCallback(() => setPointing(true), []);
  const off = useCallback(() => setPointing(false), []);
  return (
    <figure className="rounded border border-concrete-200 bg-white p-2">
      <div className="mb-1 text-xs font-semibold text-concrete-700">
        {title} <span className="font-normal text-concrete-500">({unit.replace(/ /g, '·')})</span>
        {limitValue != null ? (
          <span className="ml-2 font-normal text-util-over">- - limit {limitLabel}</span>
        ) : null}
      </div>
      <div
        className="h-36 [contain:strict]"
        aria-hidden="true"
        data-testid={`chart-${dataKey}`}
        onPointerEnter={on}
        onPointerLeave={off}
        onFocus={on}
        onBlur={off}
      >
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={MARGIN} accessibilityLayer={false}>
            <CartesianGrid stroke="#eeece8" />
            <XAxis
              dataKey="x"
              type="number"
              interval={0}
              domain={xAxis.domain}
              ticks={xAxis.ticks}
              niceTicks="none"
              tick={TICK}
            />
            <YAxis
              interval={0}
              width={48}
              reversed={dataKey === 'd'}
              domain={yAxis.domain}
              ticks={yAxis.ticks}
              niceTicks="none"
              tick={TICK}
            />
            {pointing ? (
              <Tooltip formatter={formatter} labelFormatter={labelFormatter} contentStyle={CONTENT_STYLE} />
            ) : null}
            {limitValue != null ? (
              <Line
                dataKey="limit"
                name={limitLabel}
                stroke="#b3261e"
                strokeDasharray="4 3"
                strokeWidth={1}
                dot={false}
                activeDot={false}
                isAnimationActive={false}
              />
            ) : null}
            <Line
              type="monotone"
              dataKey={dataKey}
              stroke={color}
              strokeWidth={2}
              dot={false}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">{summary}</figcaption>
    </figure>
  );
});
