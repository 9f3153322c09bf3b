import { memo } from 'react';
import type { FootprintOutline, Rect } from '../../../../shared/engine/connection/plate-layout';
import type { DesignResult } from '../../../../shared/engine/types';
import { convert, RESULT_UNITS } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { platePlan } from '../lib/plate-plan';

const W = 420;
const H = 360;

function Footprint({
  fp,
  R,
  X,
  Y,
  scale,
}: {
  fp: FootprintOutline;
  R: (r: Rect) => { x: number; y: number; width: number; height: number };
  X: (x: number) => number;
  Y: (y: number) => number;
  scale: number;
}) {
  const style = { fill: '#fae1cf', stroke: '#a94714', strokeWidth: 1.2 };
  if (fp.kind === 'I' || fp.kind === 'C')
    return (
      <g>
        {fp.rects.map((r, i) => (
          <rect key={i} {...R(r)} {...style} />
        ))}
      </g>
    );
  if (fp.kind === 'box')
    return (
      <g>
        <rect {...R(fp.outer)} {...style} />
        <rect {...R(fp.inner)} fill="#f7f6f4" stroke="#a94714" strokeWidth={0.8} />
      </g>
    );
  if (fp.kind === 'round')
    return (
      <g>
        <circle cx={X(0)} cy={Y(0)} r={fp.outerRadius * scale} {...style} />
        <circle
          cx={X(0)}
          cy={Y(0)}
          r={fp.innerRadius * scale}
          fill="#f7f6f4"
          stroke="#a94714"
          strokeWidth={0.8}
        />
      </g>
    );
  return null;
}

/** The base plate in plan on the pier, to scale: footprint, rods, holes, washers, edge distances, bearing zone. */
export const PlateSketch = memo(function PlateSketch({
  doc,
  result,
}: {
  doc: DesignDocument;
  result: DesignResult | null;
}) {
  const plan = platePlan(doc, result);
  if (!plan)
    return (
      <p className="text-sm text-concrete-600">
        {doc.connection
          ? 'The plate cannot be drawn until its sizes and the section are valid.'
          : 'No connection: only the member is checked.'}
      </p>
    );
  const { layout: L, bearing } = plan;
  const unit = RESULT_UNITS[doc.units === 'SI' ? 'SI' : 'US'].smallLength;
  const t = (inches: number) => `${Number(convert(inches, 'in', unit).toPrecision(3))} ${unit}`;
  const scale = Math.min(
    (W - 80) / Math.max(L.pier.length, L.plate.N),
    (H - 100) / Math.max(L.pier.width, L.plate.B),
  );
  const X = (x: number) => W / 2 + x * scale;
  const Y = (y: number) => (H - 40) / 2 - y * scale;
  const R = (r: Rect) => ({
    x: X(r.x0),
    y: Y(r.y1),
    width: (r.x1 - r.x0) * scale,
    height: (r.y1 - r.y0) * scale,
  });
  const tensionX = Math.max(...L.rods.map((r) => r.x));
  const e = L.edgeDistances;
  const dimY = Y(L.pier.y0) + 14;
  const Yb = bearing ? bearing.x1 - bearing.x0 : null;
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className="w-full max-w-md"
      role="img"
      aria-labelledby="plate-sketch-title plate-sketch-desc"
    >
      <title id="plate-sketch-title">Base plate in plan on the pier, to scale</title>
      <desc id="plate-sketch-desc">
        {`Plate ${t(L.plate.N)} along N by ${t(L.plate.B)}, ${t(L.plate.thickness)} thick, on a pier ${t(L.pier.length)} by ${t(L.pier.width)}; footprint ${L.footprint.label}; ${L.rods.length} rods of ${t(L.rodDiameter)}${L.holeDiameter ? ` in holes of ${t(L.holeDiameter)}` : ''}${L.washer ? ` with ${t(L.washer.size)} washers` : ''}; rod to plate edge ${t(e.rodToPlateAlongN)} along N and ${t(e.rodToPlateAlongB)} along B; rod to pier edge ${t(e.rodToPierAlongN)} along N and ${t(e.rodToPierAlongB)} along B${Yb !== null ? `; bearing length ${t(Yb)} on the compression side` : ''}.`}
      </desc>
      <defs>
        <pattern
          id="bearing-hatch"
          width="6"
          height="6"
          patternUnits="userSpaceOnUse"
          patternTransform="rotate(45)"
        >
          <rect width="6" height="6" fill="#fdf3ec" />
          <line x1="0" y1="0" x2="0" y2="6" stroke="#ef9c63" strokeWidth="2" />
        </pattern>
      </defs>
      <rect {...R(L.pier)} fill="#dcd8d1" stroke="#a39b8f" />
      <rect {...R(L.plate)} fill="#f7f6f4" stroke="#3d3935" strokeWidth={1.5} />
      {bearing && Yb !== null && Yb > 0 ? (
        <rect
          data-testid="bearing-zone"
          {...R(bearing)}
          fill="url(#bearing-hatch)"
          stroke="#c8571b"
          strokeDasharray="3 2"
        />
      ) : null}
      <Footprint fp={L.footprint} R={R} X={X} Y={Y} scale={scale} />
      {L.rods.map((r, i) => (
        <g key={i}>
          {L.washer ? (
            <rect
              x={X(r.x) - (L.washer.size * scale) / 2}
              y={Y(r.y) - (L.washer.size * scale) / 2}
              width={L.washer.size * scale}
              height={L.washer.size * scale}
              fill="#eeece8"
              stroke="#6b645a"
              strokeWidth={0.8}
            />
          ) : null}
          {L.holeDiameter ? (
            <circle
              cx={X(r.x)}
              cy={Y(r.y)}
              r={(L.holeDiameter * scale) / 2}
              fill="#fff"
              stroke="#3d3935"
              strokeWidth={0.8}
            />
          ) : null}
          <circle
            cx={X(r.x)}
            cy={Y(r.y)}
            r={(L.rodDiameter * scale) / 2}
            fill={r.row === 'tension' ? '#873811' : '#56504a'}
          />
        </g>
      ))}
      <g
        stroke="#56504a"
        strokeWidth={0.8}
        fill="#28251f"
        fontSize={10}
        fontFamily="IBM Plex Mono, monospace"
      >
        <line x1={X(tensionX)} y1={dimY} x2={X(L.plate.x1)} y2={dimY} />
        <text
          x={X(L.plate.x1)}
          y={dimY + 12}
          textAnchor="end"
          stroke="none"
        >{`rod to plate edge ${t(e.rodToPlateAlongN)}`}</text>
        <line x1={X(tensionX)} y1={dimY + 22} x2={X(L.pier.x1)} y2={dimY + 22} />
        <text
          x={X(L.pier.x1)}
          y={dimY + 34}
          textAnchor="end"
          stroke="none"
        >{`rod to pier edge ${t(e.rodToPierAlongN)}`}</text>
        <text
          x={X(L.plate.x0)}
          y={Y(L.plate.y1) - 6}
          stroke="none"
        >{`N ${t(L.plate.N)} × B ${t(L.plate.B)} × ${t(L.plate.thickness)}`}</text>
        {Yb !== null ? (
          <text
            x={X(L.plate.x0) + 2}
            y={Y(L.plate.y0) + 12}
            fill="#a94714"
            stroke="none"
          >{`bearing Y ${t(Yb)}`}</text>
        ) : null}
        <text x={W - 8} y={14} textAnchor="end" stroke="none" fill="#746c61">
          tension row →
        </text>
      </g>
    </svg>
  );
});
