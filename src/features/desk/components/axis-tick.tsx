type VerticalAnchor = 'start' | 'middle' | 'end';

export interface AxisTickProps {
  x?: number | string;
  y?: number | string;
  textAnchor?: 'start' | 'middle' | 'end' | 'inherit';
  verticalAnchor?: VerticalAnchor;
  payload?: { value: unknown };
}

// The baseline offsets the chart library's own text uses for one line.
const DY: Record<VerticalAnchor, string> = { start: '0.71em', middle: '0.355em', end: '0' };

export const tickLabel = (v: number) => `${Number(v.toPrecision(3))}`;

/**
 * One axis label as a plain SVG text. The library's text component measures and wraps words for
 * every tick on every redraw; these labels are short numbers that never wrap.
 */
export function AxisTick({ x, y, textAnchor = 'middle', verticalAnchor = 'end', payload }: AxisTickProps) {
  return (
    <text
      x={x}
      y={y}
      dy={DY[verticalAnchor]}
      textAnchor={textAnchor}
      fontSize={10}
      fill="#666"
      className="recharts-cartesian-axis-tick-value"
    >
      {tickLabel(Number(payload?.value))}
    </text>
  );
}
