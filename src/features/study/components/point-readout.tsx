import type { CellOutcome } from '../../../../shared/study/evaluate-cell';
import type { StudyPlan } from '../../../../shared/study/study-plan';
import { cellNumbers, governingText, lengthOf, pointLabel, verdictText } from '../lib/cell-words';

/** The numbers of the point under the pointer or the keyboard focus. */
export function PointReadout({
  plan,
  point,
  outcome,
}: {
  plan: StudyPlan;
  point: { i: number; j: number } | null;
  outcome: CellOutcome | undefined;
}) {
  if (!point)
    return (
      <p className="text-sm text-concrete-600" data-testid="point-readout">
        Point at the map (or focus it and use the arrow keys) to read a point; click or press Enter to load it
        into the desk.
      </p>
    );
  const n = outcome ? cellNumbers(outcome) : null;
  const rows: [string, string][] = n
    ? [
        ['Length', lengthOf(plan, point.i, point.j)],
        ['Tip depth', n.tipDepth],
        ['Tip deflection (total)', n.tipDeflection],
        ['Root moment', n.rootMoment],
        ['Steel weight (one beam)', n.steelWeight],
        ['Rod tension (per rod)', n.rodTension],
        ['Plate thickness needed', n.plateThickness],
      ]
    : [];
  return (
    <div className="text-sm" data-testid="point-readout">
      <p className="font-semibold">{pointLabel(plan, point.i, point.j)}</p>
      <p
        className={
          outcome?.kind === 'result' && outcome.ok
            ? 'font-medium text-concrete-800'
            : 'font-medium text-util-over'
        }
      >
        {verdictText(outcome)}
        {outcome ? `: ${governingText(outcome)}` : ''}
      </p>
      {rows.length ? (
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
          {rows.map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="text-concrete-600">{k}</dt>
              <dd className="num">{v}</dd>
            </div>
          ))}
        </dl>
      ) : null}
    </div>
  );
}
