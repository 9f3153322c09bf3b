import {
  memo,
  useCallback,
  useEffect,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
  type PointerEvent,
} from 'react';
import type { Stations } from '../../../../../shared/engine/types';
import { convert, formatQuantity } from '../../../../../shared/engine/units';
import { chartRows, peak, type SeriesChoice } from '../../lib/chart-data';
import { positionTicks, valueTicks } from '../../../../lib/chart-ticks';
import {
  isCursorKey,
  limitMarker,
  stepCursor,
  valuesAt,
  type CursorValues,
} from '../../lib/elevation-cursor';
import type { ElevationShape } from '../../lib/elevation-geometry';
import { BeamDrawing, DRAWING_TOP, drawingScale } from './beam-drawing';
import { DiagramStrip, type StripLimit, type StripMark } from './diagram-strip';
import { pixelOf, useSameAxis, useSameNumbers, useWidth, xOfPixel, type Frame } from './frame';

const q = (value: number, unit: string) => formatQuantity({ value, unit });

/** The cursor's reading in words, each part on its own for the readout. */
export function readoutParts(v: CursorValues, units: Stations['units']) {
  return {
    x: `${q(v.x, units.x)} from the root`,
    V: q(v.V, units.V),
    M: q(v.M, units.M),
    deflection: `${q(Math.abs(v.deflection), units.deflection)} ${v.deflection < 0 ? 'up' : 'down'}`,
    depth: q(v.depth, units.deflection),
  };
}

const ANNOUNCE_MS = 300;

/**
 * The drawing and the shear, moment and deflection strips on one frame, with one cursor: the
 * pointer moves it (at most once a frame), the arrow keys step it from station to station. Only
 * the cursor layer re-renders as it moves; the strips and the drawing are memoised on the result.
 */
export const ElevationStack = memo(function ElevationStack({
  stations: s,
  choice,
  shape,
  limitLabel,
}: {
  stations: Stations;
  choice: SeriesChoice;
  shape: ElevationShape;
  /** The words beside the limit marker, e.g. "limit 0.9 in = span/240". */
  limitLabel: string | null;
}) {
  const { ref, width } = useWidth<HTMLDivElement>();
  const series = choice.series;
  const length = s.x[s.x.length - 1];
  const inchesPerUnit = useMemo(() => convert(1, s.units.x, 'in'), [s.units.x]);
  const depthToInches = useMemo(() => convert(1, s.units.deflection, 'in'), [s.units.deflection]);
  const frame: Frame = useMemo(
    () => ({ width, from: -shape.behind / inchesPerUnit, to: length }),
    [width, shape.behind, inchesPerUnit, length],
  );
  const rows = useMemo(() => chartRows(s.x, series), [s.x, series]);
  const xTicks = useSameNumbers(useMemo(() => positionTicks(length).ticks, [length]));
  const strips = useMemo(() => {
    const v = peak(series.V, s.x);
    const m = peak(series.M, s.x);
    const tip = series.deflection[series.deflection.length - 1] ?? 0;
    const side = (at: number): 'right' | 'left' => (at < length / 2 ? 'right' : 'left');
    const marker = choice.limit ? limitMarker(series.deflection, choice.limit.value) : null;
    const yD = valueTicks(marker ? marker.axisValues : series.deflection);
    let limit: StripLimit | null = null;
    if (marker && choice.limit) {
      const edge = marker.y >= 0 ? yD.domain[1] : yD.domain[0];
      limit = {
        y: marker.offScale ? edge : marker.y,
        label: `${limitLabel ?? `limit ${q(choice.limit.value, choice.limit.unit)}`}${marker.offScale ? ', beyond the scale' : ''}`,
        offScale: marker.offScale,
        exceeded: Math.abs(tip) > choice.limit.value,
      };
    }
    const markV: StripMark = {
      x: v.at,
      y: v.value,
      label: `max ${q(Math.abs(v.value), s.units.V)}`,
      side: side(v.at),
    };
    const markM: StripMark = {
      x: m.at,
      y: m.value,
      label: `max ${q(Math.abs(m.value), s.units.M)}`,
      side: side(m.at),
    };
    const markD: StripMark = {
      x: length,
      y: tip,
      label: `tip ${q(Math.abs(tip), s.units.deflection)}`,
      side: 'left',
    };
    return { yV: valueTicks(series.V), yM: valueTicks(series.M), yD, markV, markM, markD, limit };
  }, [series, s.x, s.units, length, choice.limit, limitLabel]);

  const yV = useSameAxis(strips.yV);
  const yM = useSameAxis(strips.yM);
  const yD = useSameAxis(strips.yD);

  const [cursor, setCursor] = useState<number | null>(null);
  const [announced, setAnnounced] = useState('');
  const pending = useRef<number | null>(null);
  const frameRef = useRef(0);
  const announceTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(
    () => () => {
      cancelAnimationFrame(frameRef.current);
      if (announceTimer.current) clearTimeout(announceTimer.current);
    },
    [],
  );
  const at = cursor === null ? null : Math.min(Math.max(cursor, 0), length);
  const values = useMemo(
    () => (at === null ? null : valuesAt(s.x, s.depth, series, at)),
    [at, s.x, s.depth, series],
  );
  const parts = values ? readoutParts(values, s.units) : null;

  const onPointer = useCallback(
    (e: PointerEvent<HTMLDivElement>) => {
      const box = e.currentTarget.getBoundingClientRect();
      pending.current = xOfPixel(frame, e.clientX - box.left);
      if (frameRef.current) return;
      frameRef.current = requestAnimationFrame(() => {
        frameRef.current = 0;
        const x = pending.current;
        if (x !== null) setCursor(Math.min(Math.max(x, 0), length));
      });
    },
    [frame, length],
  );
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    if (!isCursorKey(e.key)) return;
    e.preventDefault();
    const next = stepCursor(s.x, at, e.key);
    setCursor(next);
    const v = readoutParts(valuesAt(s.x, s.depth, series, next), s.units);
    if (announceTimer.current) clearTimeout(announceTimer.current);
    announceTimer.current = setTimeout(
      () =>
        setAnnounced(`At ${v.x}: shear ${v.V}, moment ${v.M}, deflection ${v.deflection}, depth ${v.depth}.`),
      ANNOUNCE_MS,
    );
  };
  const scale = drawingScale(frame, inchesPerUnit);
  const lengthText = q(length, s.units.x);
  const depthInches = values ? values.depth * depthToInches : 0;

  return (
    <div className="flex flex-col gap-1">
      <p className="min-h-10 text-sm text-concrete-800" data-testid="elevation-readout">
        {parts ? (
          <>
            At{' '}
            <strong className="num" data-testid="readout-x">
              {parts.x}
            </strong>
            : shear{' '}
            <strong className="num" data-testid="readout-V">
              {parts.V}
            </strong>
            , moment{' '}
            <strong className="num" data-testid="readout-M">
              {parts.M}
            </strong>
            , deflection{' '}
            <strong className="num" data-testid="readout-d">
              {parts.deflection}
            </strong>
            , section depth{' '}
            <strong className="num" data-testid="readout-depth">
              {parts.depth}
            </strong>
          </>
        ) : (
          <span className="text-concrete-600">
            Point along the member, or focus the elevation and use the arrow keys (Home: root, End: tip), to
            read the values at a place.
          </span>
        )}
      </p>
      <p className="sr-only" aria-live="polite" data-testid="elevation-announce">
        {announced}
      </p>
      <div
        ref={ref}
        role="slider"
        tabIndex={0}
        aria-label={`Cursor along the member under ${series.name}`}
        aria-valuemin={0}
        aria-valuemax={Number(length.toPrecision(6))}
        aria-valuenow={Number((at ?? 0).toPrecision(6))}
        aria-valuetext={parts ? parts.x : 'at the root'}
        aria-orientation="horizontal"
        onKeyDown={onKey}
        onFocus={() => setCursor((c) => c ?? 0)}
        onPointerMove={onPointer}
        onPointerDown={onPointer}
        className="relative touch-pan-y select-none rounded outline-none focus-visible:ring-2 focus-visible:ring-oxide-500"
        data-testid="elevation"
      >
        <div aria-hidden="true">
          <BeamDrawing shape={shape} frame={frame} inchesPerUnit={inchesPerUnit} lengthText={lengthText} />
          <DiagramStrip
            title={`Shear (${s.units.V.replace(/ /g, '·')})`}
            rows={rows}
            dataKey="V"
            frame={frame}
            xTicks={xTicks}
            yAxis={yV}
            mark={strips.markV}
          />
          <DiagramStrip
            title={`Moment (${s.units.M.replace(/ /g, '·')})`}
            rows={rows}
            dataKey="M"
            frame={frame}
            xTicks={xTicks}
            yAxis={yM}
            mark={strips.markM}
          />
          <DiagramStrip
            title={`Deflection (${s.units.deflection}), drawn downward`}
            rows={rows}
            dataKey="d"
            frame={frame}
            xTicks={xTicks}
            yAxis={yD}
            reversed
            xLabel={`Distance from the root (${s.units.x})`}
            mark={strips.markD}
            limit={strips.limit}
          />
          {at !== null ? (
            <div className="pointer-events-none absolute inset-y-0" style={{ left: pixelOf(frame, at) - 1 }}>
              <div className="absolute inset-y-0 w-0.5 bg-oxide-600" data-testid="elevation-cursor" />
              <div
                className="absolute -left-1 w-2.5 rounded-sm border border-oxide-700 bg-oxide-300/70"
                style={{ top: DRAWING_TOP, height: Math.max(2, depthInches * scale) }}
              />
            </div>
          ) : null}
        </div>
      </div>
    </div>
  );
});
