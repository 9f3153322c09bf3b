import { useId, useState } from 'react';
import type { Check, Stations } from '../../../../shared/engine/types';
import { curvePoints, deflectionLimit, governingName, seriesNames } from '../utils/series';
import { CurvesChart } from './curves-chart';
import { curveSummary } from '../utils/curve-summary';

interface CompareCurvesProps {
  labelA: string;
  labelB: string;
  stationsA: Stations | undefined;
  stationsB: Stations | undefined;
  checksB: Check[];
}

/** The moment and deflection curves of both revisions, for one chosen combination or case. */
export function CompareCurves({ labelA, labelB, stationsA, stationsB, checksB }: CompareCurvesProps) {
  const selectId = useId();
  const names = seriesNames(stationsB, stationsA);
  const [chosen, setChosen] = useState<string | undefined>(undefined);
  const name = chosen && names.includes(chosen) ? chosen : governingName(checksB, names);
  const target = stationsB ?? stationsA;
  if (!target || !name) {
    return <p className="text-sm text-concrete-700">The station values of these revisions are not available, so the curves cannot be drawn.</p>;
  }
  const pointsA = stationsA ? curvePoints(stationsA, name, 'M', target.units) : null;
  const pointsB = stationsB ? curvePoints(stationsB, name, 'M', target.units) : null;
  const defA = stationsA ? curvePoints(stationsA, name, 'deflection', target.units) : null;
  const defB = stationsB ? curvePoints(stationsB, name, 'deflection', target.units) : null;
  const limit = deflectionLimit(checksB, target.units.deflection);
  const missing = [!pointsA && labelA, !pointsB && labelB].filter(Boolean);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <label htmlFor={selectId} className="font-medium text-concrete-800">
          Combination or load case
        </label>
        <select
          id={selectId}
          value={name}
          onChange={(e) => setChosen(e.target.value)}
          className="rounded border border-concrete-300 bg-white px-2 py-1 focus-visible:ring-2 focus-visible:ring-oxide-500"
        >
          {names.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </div>
      {missing.length > 0 && <p className="text-sm text-concrete-700">{missing.join(' and ')} has no curve for {name}.</p>}
      <div className="grid gap-4 lg:grid-cols-2">
        <CurvesChart
          title={`Moment, ${name}`}
          xUnit={target.units.x}
          yUnit={target.units.M}
          a={{ label: labelA, points: pointsA }}
          b={{ label: labelB, points: pointsB }}
        />
        <CurvesChart
          title={`Deflection (downward), ${name}`}
          xUnit={target.units.x}
          yUnit={target.units.deflection}
          a={{ label: labelA, points: defA }}
          b={{ label: labelB, points: defB }}
          downward
          limit={limit === null ? null : { value: limit, label: `${labelB} service total-load limit ${limit.toPrecision(3)} ${target.units.deflection}` }}
        />
      </div>
      <p className="text-sm text-concrete-700" aria-live="polite">
        {curveSummary(labelA, labelB, stationsA, stationsB, name)}
      </p>
    </div>
  );
}
