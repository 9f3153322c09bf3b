import { memo, useMemo } from 'react';
import { CartesianGrid, Line, LineChart, XAxis, YAxis, type LineDrawShapeProps } from 'recharts';

import type { AxisTicks } from '../../../../lib/chart-ticks';
import type { ChartRow } from '../../lib/chart-data';
import { AxisTick } from '../axis-tick';
import { AXIS_WIDTH, pixelOf, RIGHT_GAP, type Frame } from './frame';

/** A governing value marked on the curve: a dot and its value in words. */
export interface StripMark {
  x: number;
  y: number;
  label: string;
  /** Where the words go: beside a dot at the root, before one at the tip. */
  side: 'right' | 'left';
}

/** The deflection limit at the tip: a bar across the tip with its value, or an arrow past the edge. */
export interface StripLimit {
  y: number;
  label: string;
  offScale: boolean;
  exceeded: boolean;
}

export interface DiagramStripProps {
  title: string;
  rows: ChartRow[];
  dataKey: 'V' | 'M' | 'd';
  frame: Frame;
  xTicks: number[];
  yAxis: AxisTicks;
  /** Deflection is drawn downward. */
  reversed?: boolean;
  /** The bottom strip carries the distance axis and its label. */
  xLabel?: string;
  mark: StripMark | null;
  limit?: StripLimit | null;
}

const PLOT_HEIGHT = 112;
const TOP = 22;
const X_AXIS_HEIGHT = 40;
/** Room under a strip without the distance axis, for its lowest value label. */
const BOTTOM = 10;
const TICK = <AxisTick />;
const INK = '#3d3935';
const ACCENT = '#b34d16';

function MarkLabel({
  cx,
  cy,
  label,
  side,
}: {
  cx?: number;
  cy?: number;
  label: string;
  side: 'right' | 'left';
}) {
  if (cx === undefined || cy === undefined) return null;
  return (
    <g>
      <circle cx={cx} cy={cy} r={4} fill={ACCENT} stroke="#fff" strokeWidth={1.5} />
      <text
        x={cx + (side === 'right' ? 8 : -8)}
        y={cy - 6}
        textAnchor={side === 'right' ? 'start' : 'end'}
        fontSize={11}
        fontWeight={600}
        fill={ACCENT}
      >
        {label}
      </text>
    </g>
  );
}

function LimitShape({ cx, cy, limit, down }: { cx?: number; cy?: number; limit: StripLimit; down: boolean }) {
  if (cx === undefined || cy === undefined) return null;
  const ink = limit.exceeded ? '#b3261e' : INK;
  // Off the scale: an arrow at the edge pointing the way the limit lies.
  const dir = down ? 1 : -1;
  return (
    <g data-testid="limit-marker" data-off-scale={limit.offScale ? 'yes' : 'no'}>
      <line x1={cx - 16} x2={cx + 6} y1={cy} y2={cy} stroke={ink} strokeWidth={2.5} />
      {limit.offScale ? (
        <path d={`M${cx - 5},${cy} L${cx + 5},${cy} L${cx},${cy + 7 * dir} Z`} fill={ink} />
      ) : (
        <path d={`M${cx + 6},${cy} L${cx + 13},${cy - 5} L${cx + 13},${cy + 5} Z`} fill={ink} />
      )}
      <text x={cx - 20} y={cy + (down ? -5 : 13)} textAnchor="end" fontSize={11} fill={ink}>
        {limit.label}
      </text>
    </g>
  );
}

/**
 * The line through recharts' points as one plain path. recharts' own line shape takes the path's ref,
 * and the line then measures the path (getTotalLength, a forced layout) on every render to animate
 * it, even with animation off; without the ref there is nothing to measure.
 */
function StripCurve({ points, stroke, strokeWidth, clipPath }: LineDrawShapeProps) {
  if (!points || points.length < 2) return null;
  let d = '';
  for (const p of points) if (p.x != null && p.y != null) d += `${d ? 'L' : 'M'}${p.x},${p.y}`;
  return (
    <path
      className="recharts-curve recharts-line-curve"
      d={d}
      fill="none"
      stroke={stroke}
      strokeWidth={strokeWidth}
      clipPath={clipPath}
    />
  );
}
const CURVE = (props: LineDrawShapeProps) => <StripCurve {...props} />;

/** One diagram along the member (recharts) on the elevation's shared frame; hidden from assistive tech. */
export const DiagramStrip = memo(function DiagramStrip({
  title,
  rows,
  dataKey,
  frame,
  xTicks,
  yAxis,
  reversed = false,
  xLabel,
  mark,
  limit = null,
}: DiagramStripProps) {
  const height = PLOT_HEIGHT + TOP + (xLabel ? X_AXIS_HEIGHT : BOTTOM);
  const margin = useMemo(
    () => ({ top: TOP, right: RIGHT_GAP, bottom: xLabel ? 0 : BOTTOM, left: 0 }),
    [xLabel],
  );
  const domain = useMemo(() => [frame.from, frame.to] as [number, number], [frame.from, frame.to]);
  const axisLabel = useMemo(
    () =>
      xLabel
        ? { value: xLabel, position: 'insideBottom' as const, offset: 2, fontSize: 12, fill: INK }
        : undefined,
    [xLabel],
  );
  // The marks and the zero line are drawn over the chart in its own frame (the plot area recharts
  // lays out from the same margins and axis width), not as recharts reference elements: each of
  // those re-registers in the chart's store whenever its props change, a few ms per strip per result.
  const bottom = height - (xLabel ? X_AXIS_HEIGHT : BOTTOM);
  const [lo, hi] = yAxis.domain;
  const yOf = (v: number) => {
    const t = (v - lo) / (hi - lo || 1);
    return reversed ? TOP + t * (bottom - TOP) : bottom - t * (bottom - TOP);
  };
  const xOf = (x: number) => pixelOf(frame, x);
  return (
    <div className="relative" data-testid={`strip-${dataKey}`}>
      <p
        className="absolute left-0 top-0 text-xs font-semibold text-concrete-800"
        style={{ paddingLeft: AXIS_WIDTH }}
      >
        {title}
      </p>
      <LineChart width={frame.width} height={height} data={rows} margin={margin} accessibilityLayer={false}>
        <CartesianGrid stroke="#eeece8" />
        <XAxis
          dataKey="x"
          type="number"
          domain={domain}
          allowDataOverflow
          ticks={xTicks}
          interval={0}
          niceTicks="none"
          tick={TICK}
          hide={!xLabel}
          height={xLabel ? X_AXIS_HEIGHT : 0}
          label={axisLabel}
        />
        <YAxis
          width={AXIS_WIDTH}
          interval={0}
          reversed={reversed}
          domain={yAxis.domain}
          ticks={yAxis.ticks}
          niceTicks="none"
          tick={TICK}
        />
        <Line
          type="linear"
          dataKey={dataKey}
          stroke={INK}
          strokeWidth={2}
          dot={false}
          activeDot={false}
          isAnimationActive={false}
          shape={CURVE}
        />
      </LineChart>
      <svg width={frame.width} height={height} className="pointer-events-none absolute left-0 top-0">
        {lo < 0 && hi > 0 ? (
          <line x1={xOf(0)} x2={xOf(frame.to)} y1={yOf(0)} y2={yOf(0)} stroke="#a39b8f" />
        ) : null}
        {mark ? <MarkLabel cx={xOf(mark.x)} cy={yOf(mark.y)} label={mark.label} side={mark.side} /> : null}
        {limit ? <LimitShape cx={xOf(frame.to)} cy={yOf(limit.y)} limit={limit} down={limit.y >= 0} /> : null}
      </svg>
    </div>
  );
});
