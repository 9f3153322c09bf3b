import { useEffect, useMemo, useRef, useState, type KeyboardEvent, type MouseEvent } from 'react';
import { AXIS_WORDS, axisLength, axisUnit, type AxisSpec } from '../../../../shared/study/axes';
import type { CellOutcome } from '../../../../shared/study/evaluate-cell';
import type { StudyPlan } from '../../../../shared/study/study-plan';
import { contourLines, niceLevels } from '../lib/contour-lines';
import { cellSentence } from '../lib/cell-words';
import { cellFill } from '../lib/map-colours';

const W = 560;
const H = 420;
const M = { left: 70, right: 16, top: 12, bottom: 48 };
const PW = W - M.left - M.right;
const PH = H - M.top - M.bottom;

export interface StudyMapProps {
  plan: StudyPlan;
  cells: readonly (CellOutcome | undefined)[];
  /** Contours are drawn once every point is in (a partial grid would bend them around gaps). */
  complete: boolean;
  runId: number;
  onPick: (i: number, j: number) => void;
  /** The point under the pointer or the keyboard focus, for the readout beside the map. */
  onPoint: (point: { i: number; j: number } | null) => void;
  /** Called after the canvas shows a set of points (for the first-paint and complete measures). */
  onDrawn?: (runId: number, filled: number) => void;
}

function hatch(ctx: CanvasRenderingContext2D, cross: boolean): CanvasPattern | null {
  const c = document.createElement('canvas');
  c.width = 6;
  c.height = 6;
  const p = c.getContext('2d');
  if (!p) return null;
  p.strokeStyle = 'rgba(40, 37, 31, 0.55)';
  p.lineWidth = 1;
  p.beginPath();
  p.moveTo(0, 6);
  p.lineTo(6, 0);
  if (cross) {
    p.moveTo(0, 0);
    p.lineTo(6, 6);
  }
  p.stroke();
  return ctx.createPattern(c, 'repeat');
}

function ticks(spec: AxisSpec, values: (number | string)[]): { at: number; text: string }[] {
  const n = values.length;
  const picks =
    spec.key === 'section'
      ? [0, Math.floor((n - 1) / 2), n - 1]
      : [0, 0.2, 0.4, 0.6, 0.8, 1].map((f) => Math.round(f * (n - 1)));
  return [...new Set(picks)].map((k) => ({
    at: k,
    text: typeof values[k] === 'number' ? String(Number(values[k].toPrecision(3))) : String(values[k]),
  }));
}

function path(line: [number, number][], cw: number, ch: number, ny: number): string {
  return line
    .map(([x, y], k) => `${k ? 'L' : 'M'}${(x * cw).toFixed(1)},${((ny - y) * ch).toFixed(1)}`)
    .join('');
}

/** The study as a map: one cell per point, feasible region outlined, contours, keyboard focus. */
export function StudyMap({ plan, cells, complete, runId, onPick, onPoint, onDrawn }: StudyMapProps) {
  const nx = axisLength(plan.x);
  const ny = axisLength(plan.y);
  const cw = PW / nx;
  const ch = PH / ny;
  const canvas = useRef<HTMLCanvasElement>(null);
  const [focus, setFocus] = useState<{ i: number; j: number } | null>(null);
  const [said, setSaid] = useState('');
  const units = plan.base.units;

  useEffect(() => {
    const el = canvas.current;
    const ctx = el?.getContext('2d');
    let filled = 0;
    for (const c of cells) if (c) filled += 1;
    if (el && ctx) {
      const dpr = window.devicePixelRatio || 1;
      el.width = Math.round(PW * dpr);
      el.height = Math.round(PH * dpr);
      ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
      const fail = hatch(ctx, false);
      const invalid = hatch(ctx, true);
      for (let j = 0; j < ny; j++)
        for (let i = 0; i < nx; i++) {
          const o = cells[j * nx + i];
          const x = i * cw;
          const y = (ny - 1 - j) * ch;
          ctx.fillStyle = cellFill(o);
          ctx.fillRect(x, y, cw + 0.5, ch + 0.5);
          const pattern = o?.kind === 'invalid' ? invalid : o && !o.ok ? fail : null;
          if (pattern) {
            ctx.fillStyle = pattern;
            ctx.fillRect(x, y, cw + 0.5, ch + 0.5);
          }
        }
    }
    onDrawn?.(runId, filled);
  }, [cells, nx, ny, cw, ch, runId, onDrawn]);

  // Edges between a passing point and one that is not (inside the grid): the feasible region's outline.
  const outline = useMemo(() => {
    const pass = (i: number, j: number) => {
      const o = cells[j * nx + i];
      return o?.kind === 'result' && o.ok;
    };
    const known = (i: number, j: number) => cells[j * nx + i] !== undefined;
    let d = '';
    for (let j = 0; j < ny; j++)
      for (let i = 0; i < nx; i++) {
        if (!known(i, j)) continue;
        if (i + 1 < nx && known(i + 1, j) && pass(i, j) !== pass(i + 1, j))
          d += `M${((i + 1) * cw).toFixed(1)},${((ny - 1 - j) * ch).toFixed(1)}v${ch.toFixed(1)}`;
        if (j + 1 < ny && known(i, j + 1) && pass(i, j) !== pass(i, j + 1))
          d += `M${(i * cw).toFixed(1)},${((ny - 1 - j) * ch).toFixed(1)}h${cw.toFixed(1)}`;
      }
    return d;
  }, [cells, nx, ny, cw, ch]);

  const contoursOf = useMemo(() => {
    if (!complete) return [];
    type Computed = Extract<CellOutcome, { kind: 'result' }>;
    const field = (pick: (o: Computed) => number | null) =>
      cells.map((o) => (o?.kind === 'result' ? (pick(o) ?? NaN) : NaN));
    const deflection = field((o) => o.tipDeflection?.value ?? null);
    const weight = field((o) => o.steelWeight.value);
    const first = cells.find((o) => o?.kind === 'result');
    const unitOf = (k: 'tipDeflection' | 'steelWeight') =>
      first?.kind === 'result' ? (first[k]?.unit ?? '') : '';
    return [
      {
        key: 'deflection',
        unit: unitOf('tipDeflection'),
        sets: contourLines(deflection, nx, ny, niceLevels(deflection, 5)),
      },
      {
        key: 'weight',
        unit: unitOf('steelWeight'),
        sets: contourLines(weight, nx, ny, niceLevels(weight, 5)),
      },
    ];
  }, [cells, complete, nx, ny]);

  function cellAt(e: MouseEvent<HTMLDivElement>): { i: number; j: number } | null {
    const box = e.currentTarget.getBoundingClientRect();
    const x = ((e.clientX - box.left) / box.width) * W - M.left;
    const y = ((e.clientY - box.top) / box.height) * H - M.top;
    if (x < 0 || y < 0 || x >= PW || y >= PH) return null;
    return { i: Math.floor(x / cw), j: ny - 1 - Math.floor(y / ch) };
  }

  function move(next: { i: number; j: number }) {
    setFocus(next);
    onPoint(next);
    setSaid(cellSentence(plan, next.i, next.j, cells[next.j * nx + next.i]));
  }

  function onKey(e: KeyboardEvent<HTMLDivElement>) {
    const f = focus ?? { i: 0, j: 0 };
    const steps: Record<string, [number, number]> = {
      ArrowLeft: [-1, 0],
      ArrowRight: [1, 0],
      ArrowUp: [0, 1],
      ArrowDown: [0, -1],
    };
    if (e.key in steps) {
      e.preventDefault();
      const [di, dj] = steps[e.key];
      move({ i: Math.min(nx - 1, Math.max(0, f.i + di)), j: Math.min(ny - 1, Math.max(0, f.j + dj)) });
    } else if (e.key === 'Home') {
      e.preventDefault();
      move({ i: 0, j: f.j });
    } else if (e.key === 'End') {
      e.preventDefault();
      move({ i: nx - 1, j: f.j });
    } else if ((e.key === 'Enter' || e.key === ' ') && focus) {
      e.preventDefault();
      onPick(focus.i, focus.j);
    }
  }

  const xTitle = `${AXIS_WORDS[plan.x.key]}${axisUnit(plan.x.key, units) ? ` (${axisUnit(plan.x.key, units)})` : ''}`;
  const yTitle = `${AXIS_WORDS[plan.y.key]}${axisUnit(plan.y.key, units) ? ` (${axisUnit(plan.y.key, units)})` : ''}`;
  return (
    <div className="flex flex-col gap-1">
      <div
        className="relative w-full max-w-[560px] cursor-crosshair select-none"
        style={{ aspectRatio: `${W} / ${H}` }}
        role="application"
        aria-roledescription="study map"
        aria-label={`Study map, ${nx} by ${ny} points: ${xTitle} across, ${yTitle} up. Arrow keys move between points, Enter loads the point into the desk.`}
        tabIndex={0}
        data-testid="study-map"
        onKeyDown={onKey}
        onFocus={() => {
          if (!focus) move({ i: 0, j: 0 });
        }}
        onMouseMove={(e) => onPoint(cellAt(e))}
        onMouseLeave={() => onPoint(focus)}
        onClick={(e) => {
          const c = cellAt(e);
          if (c) {
            setFocus(c);
            onPick(c.i, c.j);
          }
        }}
      >
        <canvas
          ref={canvas}
          aria-hidden="true"
          className="absolute"
          style={{
            left: `${(M.left / W) * 100}%`,
            top: `${(M.top / H) * 100}%`,
            width: `${(PW / W) * 100}%`,
            height: `${(PH / H) * 100}%`,
          }}
        />
        <svg viewBox={`0 0 ${W} ${H}`} className="absolute inset-0 h-full w-full" aria-hidden="true">
          <g transform={`translate(${M.left},${M.top})`}>
            <rect width={PW} height={PH} fill="none" stroke="#857d71" />
            {contoursOf.map((c) =>
              c.sets.map((s) =>
                s.lines.map((line, k) => (
                  <path
                    key={`${c.key}-${s.level}-${k}`}
                    d={path(line, cw, ch, ny)}
                    fill="none"
                    stroke={c.key === 'deflection' ? '#28251f' : '#1f4e79'}
                    strokeWidth={1}
                    strokeDasharray={c.key === 'deflection' ? undefined : '4 3'}
                    data-contour={c.key}
                  />
                )),
              ),
            )}
            {contoursOf.map((c) =>
              c.sets.map((s) => {
                const line = s.lines.reduce<[number, number][]>((a, b) => (b.length > a.length ? b : a), []);
                if (line.length < 2) return null;
                const [x, y] = line[Math.floor(line.length / 2)];
                return (
                  <text
                    key={`${c.key}-label-${s.level}`}
                    x={x * cw}
                    y={(ny - y) * ch}
                    fontSize={10}
                    fill={c.key === 'deflection' ? '#28251f' : '#1f4e79'}
                    stroke="#ffffff"
                    strokeWidth={3}
                    paintOrder="stroke"
                    textAnchor="middle"
                  >
                    {`${Number(s.level.toPrecision(3))} ${c.unit}`}
                  </text>
                );
              }),
            )}
            <path d={outline} fill="none" stroke="#28251f" strokeWidth={2.5} data-testid="feasible-outline" />
            {focus ? (
              <rect
                x={focus.i * cw}
                y={(ny - 1 - focus.j) * ch}
                width={cw}
                height={ch}
                fill="none"
                stroke="#c8571b"
                strokeWidth={2}
                data-testid="focus-cell"
              />
            ) : null}
          </g>
          {ticks(plan.x, plan.xValues).map((t) => (
            <text
              key={`x${t.at}`}
              x={M.left + (t.at + 0.5) * cw}
              y={H - M.bottom + 16}
              fontSize={11}
              textAnchor="middle"
              fill="#56504a"
            >
              {t.text}
            </text>
          ))}
          {ticks(plan.y, plan.yValues).map((t) => (
            <text
              key={`y${t.at}`}
              x={M.left - 6}
              y={M.top + (ny - 0.5 - t.at) * ch + 4}
              fontSize={11}
              textAnchor="end"
              fill="#56504a"
            >
              {t.text}
            </text>
          ))}
          <text x={M.left + PW / 2} y={H - 8} fontSize={12} textAnchor="middle" fill="#28251f">
            {xTitle}
          </text>
          <text
            x={14}
            y={M.top + PH / 2}
            fontSize={12}
            textAnchor="middle"
            fill="#28251f"
            transform={`rotate(-90 14 ${M.top + PH / 2})`}
          >
            {yTitle}
          </text>
        </svg>
      </div>
      <p className="sr-only" aria-live="polite" data-testid="map-announcement">
        {said}
      </p>
    </div>
  );
}
