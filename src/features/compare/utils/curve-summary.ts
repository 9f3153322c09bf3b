import type { Stations } from '../../../../shared/engine/types';
import { curvePoints } from './series';

function ends(
  stations: Stations | undefined,
  momentName: string,
  deflectionName: string,
  target: Stations['units'],
) {
  if (!stations) return null;
  const m = curvePoints(stations, momentName, 'M', target);
  const d = curvePoints(stations, deflectionName, 'deflection', target);
  if (!m || !d || m.length === 0) return null;
  return { rootMoment: m[0].y, tipDeflection: d[d.length - 1].y, reach: m[m.length - 1].x };
}

/** The curves in words: reach, root moment and tip deflection of both revisions. */
export function curveSummary(
  labelA: string,
  labelB: string,
  a: Stations | undefined,
  b: Stations | undefined,
  momentName: string,
  deflectionName: string,
): string {
  const target = (b ?? a)?.units;
  if (!target) return 'No curves are available.';
  const ea = ends(a, momentName, deflectionName, target);
  const eb = ends(b, momentName, deflectionName, target);
  const one = (label: string, e: ReturnType<typeof ends>) =>
    e
      ? `${label}: reach ${e.reach.toPrecision(3)} ${target.x}, root moment ${e.rootMoment.toPrecision(3)} ${target.M.replace(/ /g, '·')}, tip deflection ${e.tipDeflection.toPrecision(3)} ${target.deflection}`
      : `${label}: no curve`;
  return `Moment under ${momentName}, deflection under ${deflectionName}. ${one(labelA, ea)}. ${one(labelB, eb)}.`;
}
