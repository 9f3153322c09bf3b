import { axisLength } from '../../../../shared/study/axes';
import type { CellOutcome } from '../../../../shared/study/evaluate-cell';
import type { StudyPlan } from '../../../../shared/study/study-plan';
import { AXIS_WORDS } from '../../../../shared/study/axes';
import { axisValueText, cellNumbers, governingText, lengthOf, verdictText } from '../lib/cell-words';

/** The study's points as a table: the same numbers as the map, for screen readers and copying. */
export function StudyTable({
  plan,
  cells,
}: {
  plan: StudyPlan;
  cells: readonly (CellOutcome | undefined)[];
}) {
  const nx = axisLength(plan.x);
  const ny = axisLength(plan.y);
  const units = plan.base.units;
  const rows: { i: number; j: number; o: CellOutcome }[] = [];
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) {
      const o = cells[j * nx + i];
      if (o) rows.push({ i, j, o });
    }
  return (
    <div
      className="max-h-[32rem] overflow-auto rounded border border-concrete-300"
      role="region"
      aria-label="Study points table (scrolls)"
      tabIndex={0}
    >
      <table className="w-full border-collapse text-xs" aria-label="Study points" data-testid="study-table">
        <caption className="sr-only">
          {rows.length} of {nx * ny} points computed; one row per point.
        </caption>
        <thead className="sticky top-0 bg-concrete-100">
          <tr className="text-left text-concrete-700">
            <th className="px-2 py-1 font-medium">{AXIS_WORDS[plan.x.key]}</th>
            <th className="px-2 py-1 font-medium">{AXIS_WORDS[plan.y.key]}</th>
            <th className="px-2 py-1 font-medium">Verdict</th>
            <th className="px-2 py-1 font-medium">Governing check</th>
            <th className="px-2 py-1 text-right font-medium">Length</th>
            <th className="px-2 py-1 text-right font-medium">Tip depth</th>
            <th className="px-2 py-1 text-right font-medium">Tip deflection</th>
            <th className="px-2 py-1 text-right font-medium">Root moment</th>
            <th className="px-2 py-1 text-right font-medium">Steel weight</th>
            <th className="px-2 py-1 text-right font-medium">Rod tension</th>
            <th className="px-2 py-1 text-right font-medium">Plate needed</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ i, j, o }) => {
            const n = cellNumbers(o);
            return (
              <tr key={`${i}-${j}`} className="border-t border-concrete-200" data-point={`${i},${j}`}>
                <td className="num px-2 py-0.5">{axisValueText(plan.x, plan.xValues[i], units)}</td>
                <td className="num px-2 py-0.5">{axisValueText(plan.y, plan.yValues[j], units)}</td>
                <td className="px-2 py-0.5">{verdictText(o)}</td>
                <td className="px-2 py-0.5">{governingText(o)}</td>
                <td className="num px-2 py-0.5 text-right">{lengthOf(plan, i, j)}</td>
                <td className="num px-2 py-0.5 text-right">{n?.tipDepth ?? '—'}</td>
                <td className="num px-2 py-0.5 text-right">{n?.tipDeflection ?? '—'}</td>
                <td className="num px-2 py-0.5 text-right">{n?.rootMoment ?? '—'}</td>
                <td className="num px-2 py-0.5 text-right">{n?.steelWeight ?? '—'}</td>
                <td className="num px-2 py-0.5 text-right">{n?.rodTension ?? '—'}</td>
                <td className="num px-2 py-0.5 text-right">{n?.plateThickness ?? '—'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
