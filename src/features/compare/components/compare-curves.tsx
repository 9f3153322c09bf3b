import { useState } from 'react';
import type { Check, Stations } from '../../../../shared/engine/types';
import { curvePoints, deflectionLimit, governingName, seriesNames, serviceName } from '../utils/series';
import { curveSummary } from '../utils/curve-summary';
import { CurvesChart } from './curves-chart';
import { SeriesSelect } from './series-select';

interface CompareCurvesProps {
  labelA: string;
  labelB: string;
  stationsA: Stations | undefined;
  stationsB: Stations | undefined;
  checksB: Check[];
}

/**
 * The moment, shear and deflection curves of both revisions. Moment and shear default to the
 * combination that governs bending; deflection to the service combination of the total-load check,
 * the one its limit line is for.
 */
export function CompareCurves({ labelA, labelB, stationsA, stationsB, checksB }: CompareCurvesProps) {
  const names = seriesNames(stationsB, stationsA);
  const service = serviceName(checksB);
  const deflectionNames = service && !names.includes(service) ? [service, ...names] : names;
  const [momentChoice, setMomentChoice] = useState<string | undefined>(undefined);
  const [deflectionChoice, setDeflectionChoice] = useState<string | undefined>(undefined);
  const momentName =
    momentChoice && names.includes(momentChoice) ? momentChoice : governingName(checksB, names);
  const deflectionName =
    deflectionChoice && deflectionNames.includes(deflectionChoice)
      ? deflectionChoice
      : (service ?? momentName);
  const target = stationsB ?? stationsA;
  if (!target || !momentName || !deflectionName) {
    return (
      <p className="text-sm text-concrete-700">
        The station values of these revisions are not available, so the curves cannot be drawn.
      </p>
    );
  }
  const points = (s: Stations | undefined, name: string, curve: 'V' | 'M' | 'deflection') =>
    s ? curvePoints(s, name, curve, target.units) : null;
  const limit = deflectionName === service ? deflectionLimit(checksB, target.units.deflection) : null;

  return (
    <div className="space-y-3">
      <div className="grid min-w-0 gap-4 lg:grid-cols-2">
        <div className="space-y-2 text-sm">
          <SeriesSelect
            label="Moment and shear under"
            value={momentName}
            names={names}
            onChange={setMomentChoice}
          />
          <CurvesChart
            quantity="Moment"
            under={momentName}
            xUnit={target.units.x}
            yUnit={target.units.M}
            a={{ label: labelA, points: points(stationsA, momentName, 'M') }}
            b={{ label: labelB, points: points(stationsB, momentName, 'M') }}
          />
          <CurvesChart
            quantity="Shear"
            under={momentName}
            xUnit={target.units.x}
            yUnit={target.units.V}
            a={{ label: labelA, points: points(stationsA, momentName, 'V') }}
            b={{ label: labelB, points: points(stationsB, momentName, 'V') }}
          />
        </div>
        <div className="space-y-2 text-sm">
          <SeriesSelect
            label="Deflection under"
            value={deflectionName}
            names={deflectionNames}
            onChange={setDeflectionChoice}
          />
          <CurvesChart
            quantity="Deflection"
            under={deflectionName}
            note="drawn downward"
            xUnit={target.units.x}
            yUnit={target.units.deflection}
            a={{ label: labelA, points: points(stationsA, deflectionName, 'deflection') }}
            b={{ label: labelB, points: points(stationsB, deflectionName, 'deflection') }}
            downward
            limit={
              limit === null
                ? null
                : {
                    value: limit,
                    label: `${labelB} total-load limit ${Number(limit.toPrecision(3))} ${target.units.deflection}`,
                  }
            }
          />
          {limit === null && service && (
            <p className="text-xs text-concrete-600">
              The limit line shows under {service}, the service combination of the total-load deflection
              check.
            </p>
          )}
        </div>
      </div>
      <p className="text-sm text-concrete-700" aria-live="polite">
        {curveSummary(labelA, labelB, stationsA, stationsB, momentName, deflectionName)}
      </p>
    </div>
  );
}
