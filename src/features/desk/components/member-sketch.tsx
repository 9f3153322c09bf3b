import type { DesignResult } from '../../../../shared/engine/types';
import { convert, RESULT_UNITS } from '../../../../shared/engine/units';
import { plainNumber } from '../lib/quantity-text';

const W = 640;
const PAD = 40;

/** The member in elevation, to scale: depth along x from the stations, the pier face at the root. */
export function MemberSketch({ result }: { result: DesignResult }) {
  const s = result.stations;
  if (!s || s.x.length < 2) return null;
  const small = RESULT_UNITS[result.units].smallLength;
  const toSmall = convert(1, s.units.x, small);
  const xs = s.x.map((x) => x * toSmall);
  const length = xs[xs.length - 1];
  const maxDepth = Math.max(...s.depth);
  const scale = (W - 2 * PAD - 30) / length;
  const h = maxDepth * scale;
  const H = h + 70;
  const x0 = PAD + 30;
  const y0 = 20;
  const outline = [
    ...xs.map((x) => `${x0 + x * scale},${y0}`),
    ...xs.map((x, i) => `${x0 + x * scale},${y0 + s.depth[i] * scale}`).reverse(),
  ].join(' ');
  const root = s.depth[0];
  const tip = s.depth[s.depth.length - 1];
  const len = `${plainNumber(s.x[s.x.length - 1])} ${s.units.x}`;
  const rootText = `${plainNumber(root)} ${small}`;
  const tipText = `${plainNumber(tip)} ${small}`;
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className="w-full"
      role="img"
      aria-labelledby="member-sketch-title member-sketch-desc"
    >
      <title id="member-sketch-title">Member elevation, to scale</title>
      <desc id="member-sketch-desc">
        {`${result.member.section.label}: ${len} long, ${rootText} deep at the root and ${tipText} deep at the tip${root !== tip ? ' (tapered)' : ''}.`}
      </desc>
      <rect x={PAD} y={y0 - 10} width={30} height={h + 30} fill="#c3bdb3" stroke="#857d71" />
      <polygon points={outline} fill="#fae1cf" stroke="#a94714" strokeWidth={1.5} />
      <g
        stroke="#56504a"
        strokeWidth={0.8}
        fill="#56504a"
        fontSize={11}
        fontFamily="IBM Plex Mono, monospace"
      >
        <line x1={x0} y1={y0 + h + 22} x2={x0 + length * scale} y2={y0 + h + 22} />
        <line x1={x0} y1={y0 + h + 16} x2={x0} y2={y0 + h + 28} />
        <line x1={x0 + length * scale} y1={y0 + h + 16} x2={x0 + length * scale} y2={y0 + h + 28} />
        <text x={x0 + (length * scale) / 2} y={y0 + h + 40} textAnchor="middle" stroke="none">
          {len}
        </text>
        <text x={x0 + 4} y={y0 + root * scale + 14} stroke="none">{`root ${rootText}`}</text>
        <text
          x={x0 + length * scale}
          y={y0 + tip * scale + 14}
          textAnchor="end"
          stroke="none"
        >{`tip ${tipText}`}</text>
      </g>
    </svg>
  );
}
