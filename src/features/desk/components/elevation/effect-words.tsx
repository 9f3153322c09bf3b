import type { DesignResult } from '../../../../../shared/engine/types';
import { formatQuantity } from '../../../../../shared/engine/units';
import type { SeriesChoice } from '../../lib/chart-data';

/** The shown series in one sentence: how far the tip moves (against its limit) and what the root carries. */
export function EffectWords({
  result,
  choice,
  limitLabel,
}: {
  result: DesignResult;
  choice: SeriesChoice;
  limitLabel: string | null;
}) {
  const s = result.stations;
  const series = choice.series;
  const tip = series.deflection[series.deflection.length - 1] ?? 0;
  const summary =
    choice.kind === 'case'
      ? result.member.cases[series.name as 'D']
      : result.member.combinations.find((c) => c.name === series.name);
  const unit = s?.units.deflection ?? 'in';
  // The station series (root rotation included) for the tip; the summary for the root.
  const rootMoment = summary?.rootMoment ?? (s ? { value: series.M[0] ?? 0, unit: s.units.M } : null);
  const rootShear = summary?.rootShear ?? (s ? { value: series.V[0] ?? 0, unit: s.units.V } : null);
  return (
    <p className="text-sm" data-testid="effect-words">
      Under <strong>{series.name}</strong> the tip moves {tip < 0 ? 'up' : 'down'}{' '}
      <strong className="num" data-testid="tip-deflection">
        {formatQuantity({ value: Math.abs(tip), unit })}
      </strong>
      {limitLabel ? <> ({limitLabel})</> : null}
      {rootMoment && rootShear ? (
        <>
          ; the root carries a moment of{' '}
          <strong className="num" data-testid="root-moment">
            {formatQuantity(rootMoment)}
          </strong>{' '}
          and a shear of <span className="num">{formatQuantity(rootShear)}</span>
        </>
      ) : null}
      .
    </p>
  );
}
