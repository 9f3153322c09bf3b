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
import type { Point } from '../utils/series';

interface CurvesChartProps {
  title: string;
  xUnit: string;
  yUnit: string;
  a: { label: string; points: Point[] | null };
  b: { label: string; points: Point[] | null };
  /** Deflection grows downward: draw it downward. */
  downward?: boolean;
  limit?: { value: number; label: string } | null;
}

/** Two revisions' curves overlaid: a dashed grey line for the earlier, a solid oxide line for the later. */
export function CurvesChart({ title, xUnit, yUnit, a, b, downward = false, limit = null }: CurvesChartProps) {
  return (
    <figure className="space-y-1">
      <figcaption className="text-sm font-medium text-concrete-800">
        {title} ({yUnit}) along the reach ({xUnit})
      </figcaption>
      <div className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%" initialDimension={{ width: 640, height: 256 }}>
          <LineChart margin={{ top: 8, right: 24, bottom: 16, left: 8 }}>
            <CartesianGrid stroke="#dcd8d1" strokeDasharray="3 3" />
            <XAxis
              type="number"
              dataKey="x"
              domain={[0, 'dataMax']}
              unit={` ${xUnit}`}
              tick={{ fontSize: 11 }}
              allowDuplicatedCategory={false}
            />
            <YAxis
              type="number"
              dataKey="y"
              reversed={downward}
              unit={` ${yUnit}`}
              tick={{ fontSize: 11 }}
              width={80}
            />
            <Tooltip
              formatter={(value) => (typeof value === 'number' ? value.toPrecision(3) : String(value))}
              labelFormatter={(x) => `x = ${Number(x).toFixed(2)} ${xUnit}`}
            />
            <Legend />
            {a.points && (
              <Line
                data={a.points}
                dataKey="y"
                name={a.label}
                stroke="#857d71"
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
                stroke="#c8571b"
                strokeWidth={2}
                dot={false}
                isAnimationActive={false}
              />
            )}
            {limit && (
              <ReferenceLine
                y={limit.value}
                ifOverflow="extendDomain"
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
