import type { DrawingView, Label } from '../../lib/plate-drawing-types';
import { FONT } from '../../lib/plate-drawing-format';
import { INK, TONE, paint } from './sketch-style';

function Text({ l }: { l: Label }) {
  return (
    <text
      x={l.x}
      y={l.y}
      textAnchor={l.anchor}
      fill={TONE[l.tone]}
      fontWeight={l.tone === 'warn' ? 600 : 400}
      transform={l.vertical ? `rotate(-90 ${l.x} ${l.y})` : undefined}
    >
      {l.text}
    </text>
  );
}

/** One view of the sketch (plan, elevation or section) at its offset in the figure. */
export function DrawingViewG({
  view,
  dx,
  dy,
  ids,
}: {
  view: DrawingView;
  dx: number;
  dy: number;
  ids: { arrow: string; hatch: string; grout: string };
}) {
  return (
    <g transform={`translate(${dx} ${dy})`} data-view={view.id}>
      {view.shapes.map((s, i) => {
        const p = paint(s.role, ids.hatch, ids.grout);
        if (s.kind === 'rect')
          return (
            <rect
              key={i}
              data-role={s.role}
              x={s.box.x0}
              y={s.box.y0}
              width={Math.max(0.5, s.box.x1 - s.box.x0)}
              height={Math.max(0.5, s.box.y1 - s.box.y0)}
              {...p}
            />
          );
        if (s.kind === 'circle')
          return (
            <g key={i}>
              <circle data-role={s.role} cx={s.cx} cy={s.cy} r={s.r} {...p} />
              {s.role === 'rod-compression' ? (
                <circle
                  data-role="rod"
                  cx={s.cx}
                  cy={s.cy}
                  r={Math.max(1, s.r / 3)}
                  fill={INK}
                  stroke="none"
                />
              ) : null}
            </g>
          );
        return <path key={i} data-role={s.role} d={s.d} {...p} />;
      })}
      <g className="ink" stroke={INK} fill="none" strokeWidth={0.8}>
        {view.dims.map((d, i) => (
          <g key={i}>
            {d.ext.map(([a, b], j) => (
              <line key={j} x1={a.x} y1={a.y} x2={b.x} y2={b.y} strokeWidth={0.6} />
            ))}
            <line
              x1={d.line[0].x}
              y1={d.line[0].y}
              x2={d.line[1].x}
              y2={d.line[1].y}
              markerStart={`url(#${ids.arrow})`}
              markerEnd={`url(#${ids.arrow})`}
              stroke={d.tone === 'warn' ? TONE.warn : INK}
            />
            {d.leader ? (
              <line
                x1={d.leader[0].x}
                y1={d.leader[0].y}
                x2={d.leader[1].x}
                y2={d.leader[1].y}
                strokeWidth={0.6}
              />
            ) : null}
          </g>
        ))}
        {view.callouts.map((c, i) => (
          <g key={i}>
            <circle cx={c.from.x} cy={c.from.y} r={2} fill={INK} />
            <polyline points={`${c.from.x},${c.from.y} ${c.to.x},${c.to.y}`} strokeWidth={0.7} />
          </g>
        ))}
      </g>
      <g fontSize={FONT} fontFamily="IBM Plex Mono, ui-monospace, monospace" stroke="none">
        {view.dims.map((d) => (
          <Text key={`${d.id}-${d.label.x}-${d.label.y}`} l={d.label} />
        ))}
        {view.callouts
          .flatMap((c) => c.labels)
          .map((l, i) => (
            <Text key={`c${i}`} l={l} />
          ))}
        {view.notes.map((l, i) => (
          <Text key={`n${i}`} l={l} />
        ))}
      </g>
    </g>
  );
}
