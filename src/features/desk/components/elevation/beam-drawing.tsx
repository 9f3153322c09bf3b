import { memo } from 'react';
import type { Box, ElevationShape } from '../../lib/elevation-geometry';
import { pixelOf, plotWidth, type Frame } from './frame';

/** Pixels above the top flange (room for the length's dimension line). */
export const DRAWING_TOP = 26;
const BOTTOM = 8;
const DIM_Y = 16;

/** Pixels per inch of the drawing on a frame whose x is in `inchesPerUnit` inches. */
export const drawingScale = (frame: Frame, inchesPerUnit: number) =>
  plotWidth(frame) / ((frame.to - frame.from) * inchesPerUnit);

const INK = '#3d3935';

/** The member and its support in elevation, to scale, on the elevation's shared frame (decorative: words elsewhere). */
export const BeamDrawing = memo(function BeamDrawing({
  shape,
  frame,
  inchesPerUnit,
  lengthText,
}: {
  shape: ElevationShape;
  frame: Frame;
  inchesPerUnit: number;
  lengthText: string;
}) {
  const s = drawingScale(frame, inchesPerUnit);
  const X = (inch: number) => pixelOf(frame, inch / inchesPerUnit);
  const Y = (inch: number) => DRAWING_TOP + inch * s;
  const height = Math.ceil(Y(shape.below) + BOTTOM);
  const rect = (b: Box) => ({ x: X(b.x0), y: Y(b.y0), width: (b.x1 - b.x0) * s, height: (b.y1 - b.y0) * s });
  const { x, depth } = shape.beam;
  const outline = [
    ...x.map((xi) => `${X(xi)},${Y(0)}`),
    ...x.map((xi, i) => `${X(xi)},${Y(depth[i])}`).reverse(),
  ].join(' ');
  const root = depth[0];
  const tipX = X(shape.length);
  return (
    <svg width={frame.width} height={height} className="block" data-testid="elevation-drawing">
      <defs>
        <pattern id="elevation-concrete" width="8" height="8" patternUnits="userSpaceOnUse">
          <rect width="8" height="8" fill="#eeece8" />
          <path d="M0,8 L8,0" stroke="#c3bdb3" strokeWidth={1} />
        </pattern>
      </defs>
      {shape.pier ? <rect {...rect(shape.pier)} fill="url(#elevation-concrete)" stroke="#746c61" /> : null}
      {shape.pierCut && shape.pier ? (
        <path
          d={`M${X(shape.pier.x0) - 3},${Y(shape.pier.y1)} l${((shape.pier.x1 - shape.pier.x0) * s) / 2},-4 l${((shape.pier.x1 - shape.pier.x0) * s) / 2 + 6},4`}
          fill="none"
          stroke="#746c61"
          strokeDasharray="4 2"
        />
      ) : null}
      {shape.arrangement === 'none' ? (
        <g stroke="#746c61">
          <line x1={X(0)} x2={X(0)} y1={Y(-2)} y2={Y(root + 2)} strokeWidth={2} />
          {Array.from({ length: Math.max(3, Math.round(((root + 4) * s) / 8)) }, (_, i) => (
            <line key={i} x1={X(0)} x2={X(0) - 7} y1={Y(-2) + i * 8} y2={Y(-2) + i * 8 + 7} />
          ))}
        </g>
      ) : null}
      {shape.rods.map((r, i) => (
        <line
          key={i}
          x1={X(r.x0)}
          x2={X(r.x1)}
          y1={Y(r.y0)}
          y2={Y(r.y1)}
          stroke={r.row === 'tension' ? '#b34d16' : INK}
          strokeWidth={Math.max(1.5, 0.75 * s)}
          strokeDasharray="5 2"
        />
      ))}
      {shape.post ? <rect {...rect(shape.post)} fill="#c3bdb3" stroke="#56504a" /> : null}
      {shape.plate ? <rect {...rect(shape.plate)} fill="#56504a" stroke={INK} /> : null}
      <polygon points={outline} fill="#fae1cf" stroke="#a94714" strokeWidth={1.5} />
      <g fontSize={11} fill={INK}>
        <g stroke={INK} strokeWidth={0.8}>
          <line x1={X(0)} x2={tipX} y1={DIM_Y} y2={DIM_Y} />
          <line x1={X(0)} x2={X(0)} y1={DIM_Y - 5} y2={DIM_Y + 5} />
          <line x1={tipX} x2={tipX} y1={DIM_Y - 5} y2={DIM_Y + 5} />
        </g>
        <text x={(X(0) + tipX) / 2} y={DIM_Y - 4} textAnchor="middle">
          {lengthText}
        </text>
      </g>
    </svg>
  );
});
