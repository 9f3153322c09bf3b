import { useMemo } from 'react';
import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { curveAxes, unitText } from '../utils/axis-ticks';
import type { Point } from '../utils/series';

interface CurvesChartProps {
  /** What the curve is ("Moment") and under which combination or case ("1.2D + 1.6L"). */
  quantity: string;
  under: string;
  /** Words after the unit, e.g. "drawn downward". */
  note?: string;
  xUnit: string;
  yUnit: string;
  a: { label: string; points: Point[] | null };
  b: { label: string; points: Point[] | null };
  /** Deflection grows downward: draw it downward. */
  downward?: boolean;
  limit?: { value: number; label: string } | null;
}

const TICK = { fontSize: 11, fill: '#56504a' };
const MARGIN = { top: 8, right: 24, bottom: 24, left: 16 };

/** Two revisions' curves overlaid: a dashed grey line for the earlier, a solid oxide line for the later. */
export function CurvesChart({
  quantity,
  under,
  note,
  xUnit,
  yUnit,
  a,
  b,
  downward = false,
  limit = null,
}: CurvesChartProps) {
  const unit = unitText(yUnit);
  const axes = useMemo(
    () => curveAxes([a.points, b.points], limit ? [limit.value] : []),
    [a.points, b.points, limit],
  );
  return (
    <figure className="min-w-0 space-y-1">
      <figcaption className="text-sm font-medium text-concrete-800">
        {quantity} ({unit}) under {under}
        {note ? `, ${note}` : ''}
      </figcaption>
      <div className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%" initialDimension={{ width: 640, height: 256 }}>
          <LineChart margin={MARGIN} accessibilityLayer={false}>
            <CartesianGrid stroke="#dcd8d1" strokeDasharray="3 3" />
            <XAxis
              type="number"
              dataKey="x"
              domain={axes.x.domain}
              ticks={axes.x.ticks}
              interval={0}
              tick={TICK}
              allowDuplicatedCategory={false}
              label={{
                value: `Distance from the root (${unitText(xUnit)})`,
                position: 'insideBottom',
                offset: -16,
                fontSize: 12,
                fill: '#3d3935',
              }}
            />
            <YAxis
              type="number"
              dataKey="y"
              reversed={downward}
              domain={axes.y.domain}
              ticks={axes.y.ticks}
              interval={0}
              tick={TICK}
              width={56}
              label={{
                value: unit,
                angle: -90,
                position: 'insideLeft',
                offset: -8,
                fontSize: 12,
                fill: '#3d3935',
              }}
            />
            <Tooltip
              formatter={(value) =>
                typeof value === 'number' ? `${Number(value.toPrecision(3))} ${unit}` : String(value)
              }
              labelFormatter={(x) => `${Number(Number(x).toPrecision(3))} ${unitText(xUnit)} from the root`}
            />
            <Legend verticalAlign="top" height={24} />
            {a.points && (
              <Line
                data={a.points}
                dataKey="y"
                name={a.label}
                stroke="#746c61"
                strokeDasharray="6 4"
                strokeWidth={2}
                dot={false}
                isAnimationActive={false}
              />
            )}
            {b.points && (
              <Line
                data={b.points}
                dataKey="y"
                name={b.label}
                stroke="#b34d16"
                strokeWidth={2}
                dot={false}
                isAnimationActive={false}
              />
            )}
            {limit && (
              <ReferenceLine
                y={limit.value}
                stroke="#b3261e"
                strokeDasharray="2 2"
                label={{ value: limit.label, position: 'insideBottomRight', fontSize: 11, fill: '#b3261e' }}
              />
            )}
          </LineChart>
        </ResponsiveContainer>
      </div>
      {[a, b]
        .filter((s) => !s.points)
        .map((s) => (
          <p key={s.label} className="text-xs text-concrete-600">
            {s.label} has no curve for this choice.
          </p>
        ))}
    </figure>
  );
}
