import { memo, useId, useMemo, useRef } from 'react';
import type { DesignResult } from '../../../../shared/engine/types';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { plateDrawing } from '../lib/plate-drawing';
import { DimensionTable } from './plate-sketch/dimension-table';
import { DrawingViewG } from './plate-sketch/drawing-view';
import { SketchLegend } from './plate-sketch/sketch-legend';
import { INK } from './plate-sketch/sketch-style';
import './plate-sketch/plate-sketch-print.css';
import { useWide } from './plate-sketch/use-wide';

/** Below this width the section goes under the plan instead of beside it. */
const SIDE_BY_SIDE = 860;

/**
 * The shop sketch of the connection, to scale: the plate in plan (post base) or in elevation (face
 * plate) with every dimension, a section with the embedment, a legend and the same numbers as a table.
 */
export const PlateSketch = memo(function PlateSketch({
  doc,
  result,
}: {
  doc: DesignDocument;
  result: DesignResult | null;
}) {
  const drawing = useMemo(() => plateDrawing(doc, result), [doc, result]);
  const box = useRef<HTMLDivElement>(null);
  const wide = useWide(box, SIDE_BY_SIDE);
  const id = useId().replace(/:/g, '');
  const ids = { arrow: `${id}-arrow`, hatch: `${id}-hatch`, grout: `${id}-grout` };
  if (!drawing)
    return (
      <p className="text-sm text-concrete-600">
        {doc.connection
          ? 'The plate cannot be drawn until its sizes and the section are valid.'
          : 'No connection: only the member is checked.'}
      </p>
    );
  const [first, second] = drawing.views;
  const width = wide ? first.width + second.width : first.width;
  const height = wide ? Math.max(first.height, second.height) : first.height + second.height;
  const at = wide
    ? [
        { dx: 0, dy: 0 },
        { dx: first.width, dy: 0 },
      ]
    : [
        { dx: 0, dy: 0 },
        { dx: (first.width - second.width) / 2, dy: first.height },
      ];
  return (
    <div ref={box} className="plate-sketch flex flex-col gap-3" data-testid="plate-sketch">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        className="plate-sketch-svg h-auto w-full"
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        data-arrangement={drawing.arrangement}
      >
        <title id={`${id}-title`}>{drawing.title}</title>
        <desc id={`${id}-desc`}>{drawing.desc}</desc>
        <defs>
          <marker
            id={ids.arrow}
            viewBox="0 0 10 10"
            refX="10"
            refY="5"
            markerWidth="9"
            markerHeight="9"
            markerUnits="userSpaceOnUse"
            orient="auto-start-reverse"
          >
            <path d="M0,1.5 L10,5 L0,8.5 z" fill={INK} />
          </marker>
          <pattern
            id={ids.hatch}
            width="7"
            height="7"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width="7" height="7" fill="#fdf3ec" />
            <line className="hatch-line" x1="0" y1="0" x2="0" y2="7" stroke="#c8571b" strokeWidth="1.6" />
          </pattern>
          <pattern id={ids.grout} width="6" height="6" patternUnits="userSpaceOnUse">
            <rect width="6" height="6" fill="#f3f1ed" />
            <circle className="hatch-line" cx="3" cy="3" r="0.9" fill="#8a8175" />
          </pattern>
        </defs>
        <rect width={width} height={height} fill="#ffffff" />
        {drawing.views.map((v, i) => (
          <DrawingViewG key={v.id} view={v} dx={at[i].dx} dy={at[i].dy} ids={ids} />
        ))}
      </svg>
      <SketchLegend items={drawing.legend} hatch={ids.hatch} />
      <DimensionTable
        rows={drawing.rows}
        caption="Dimensions for the shop (the same numbers as the sketch)"
      />
    </div>
  );
});
