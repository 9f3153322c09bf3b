import type { DesignResult } from '../../../../shared/engine/types';
import { convert, RESULT_UNITS } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { platePlan } from '../lib/plate-plan';

const W = 420;
const H = 360;

/** The base plate in plan on the pier, to scale: rods, holes, washers, edge distances, bearing zone. */
export function PlateSketch({ doc, result }: { doc: DesignDocument; result: DesignResult | null }) {
  const plan = platePlan(doc, result);
  if (!plan) return <p className="text-sm text-concrete-600">{doc.connection ? 'The plate cannot be drawn until its sizes are valid.' : 'No connection: only the member is checked.'}</p>;
  const unit = RESULT_UNITS[doc.units === 'SI' ? 'SI' : 'US'].smallLength;
  const t = (inches: number) => `${Number(convert(inches, 'in', unit).toPrecision(3))} ${unit}`;
  const scale = Math.min((W - 80) / Math.max(plan.pierL, plan.N), (H - 80) / Math.max(plan.pierW, plan.B));
  const cx = W / 2;
  const cy = H / 2 - 10;
  const X = (x: number) => cx + x * scale;
  const Y = (y: number) => cy - y * scale;
  const Y_ = plan.bearingLength !== null ? Math.min(plan.bearingLength, plan.N) : null;
  const fp = plan.footprint;
  const tensionRodX = plan.rods[plan.rods.length - 1]?.x ?? 0;
  const dimY = Y(-plan.pierW / 2) + 14;
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-md" role="img" aria-labelledby="plate-sketch-title plate-sketch-desc">
      <title id="plate-sketch-title">Base plate in plan on the pier, to scale</title>
      <desc id="plate-sketch-desc">
        {`Plate ${t(plan.N)} along N by ${t(plan.B)} on a pier ${t(plan.pierL)} by ${t(plan.pierW)}; ${plan.rods.length} rods of ${t(plan.diameter)} in holes of ${t(plan.hole)} with ${t(plan.washer)} washers; rod to plate edge ${t(plan.edgePlate)}, rod to pier edge ${t(plan.edgePier)}${
          Y_ !== null ? `; bearing length ${t(Y_)} on the compression side` : ''
        }.`}
      </desc>
      <rect x={X(-plan.pierL / 2)} y={Y(plan.pierW / 2)} width={plan.pierL * scale} height={plan.pierW * scale} fill="#dcd8d1" stroke="#a39b8f" />
      <rect x={X(-plan.N / 2)} y={Y(plan.B / 2)} width={plan.N * scale} height={plan.B * scale} fill="#f7f6f4" stroke="#3d3935" strokeWidth={1.5} />
      {Y_ !== null && Y_ > 0 ? (
        <rect data-testid="bearing-zone" x={X(-plan.N / 2)} y={Y(plan.B / 2)} width={Y_ * scale} height={plan.B * scale} fill="url(#bearing-hatch)" stroke="#c8571b" strokeDasharray="3 2" />
      ) : null}
      <defs>
        <pattern id="bearing-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" fill="#fae1cf" />
          <line x1="0" y1="0" x2="0" y2="6" stroke="#ef9c63" strokeWidth="2" />
        </pattern>
      </defs>
      {fp ? <rect x={X(-fp.d / 2)} y={Y(fp.bf / 2)} width={fp.d * scale} height={fp.bf * scale} fill="none" stroke="#a94714" strokeWidth={2} /> : null}
      {plan.rods.map((r, i) => (
        <g key={i}>
          <rect x={X(r.x) - (plan.washer * scale) / 2} y={Y(r.y) - (plan.washer * scale) / 2} width={plan.washer * scale} height={plan.washer * scale} fill="#eeece8" stroke="#6b645a" strokeWidth={0.8} />
          <circle cx={X(r.x)} cy={Y(r.y)} r={(plan.hole * scale) / 2} fill="#fff" stroke="#3d3935" strokeWidth={0.8} />
          <circle cx={X(r.x)} cy={Y(r.y)} r={(plan.diameter * scale) / 2} fill="#56504a" />
        </g>
      ))}
      <g stroke="#56504a" strokeWidth={0.8} fill="#28251f" fontSize={10} fontFamily="IBM Plex Mono, monospace">
        <line x1={X(tensionRodX)} y1={dimY} x2={X(plan.N / 2)} y2={dimY} />
        <text x={X(plan.N / 2)} y={dimY + 12} textAnchor="end" stroke="none">{`rod to plate edge ${t(plan.edgePlate)}`}</text>
        <line x1={X(tensionRodX)} y1={dimY + 22} x2={X(plan.pierL / 2)} y2={dimY + 22} />
        <text x={X(plan.pierL / 2)} y={dimY + 34} textAnchor="end" stroke="none">{`rod to pier edge ${t(plan.edgePier)}`}</text>
        <text x={X(-plan.N / 2)} y={Y(plan.B / 2) - 6} stroke="none">{`N ${t(plan.N)} × B ${t(plan.B)}`}</text>
        {Y_ !== null ? <text x={X(-plan.N / 2) + 2} y={Y(-plan.B / 2) - 4} fill="#a94714" stroke="none">{`Y ${t(Y_)}`}</text> : null}
        <text x={W - 8} y={14} textAnchor="end" stroke="none" fill="#857d71">tension row →</text>
      </g>
    </svg>
  );
}
