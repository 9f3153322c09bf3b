import { useEffect, useMemo, useState } from 'react';
import type { DesignResult } from '../../../../../shared/engine/types';
import { formatQuantity } from '../../../../../shared/engine/units';
import type { DesignDocument } from '../../../../../shared/schemas/design';
import { defaultSeriesKey, describeSeries, limitSeriesKey, seriesChoices } from '../../lib/chart-data';
import { elevationShape } from '../../lib/elevation-geometry';
import { noteChartsCommitted } from '../../lib/redraw-measure';
import { TipDeflectionSplit } from '../tip-deflection-split';
import { EffectWords } from './effect-words';
import { ElevationStack } from './elevation-stack';
import { SeriesPicker } from './series-picker';
import { supportWords } from './support-words';

/**
 * The member in elevation, to scale, carrying its shear, moment and deflection diagrams on the same
 * x, with one cursor across all of them; the tip deflection's split and the camber beside it.
 */
export function ElevationPanel({
  result,
  doc,
  resultId,
  liveLimit,
  totalLimit,
}: {
  result: DesignResult;
  doc: DesignDocument | null;
  resultId: number;
  liveLimit: number;
  totalLimit: number;
}) {
  const choices = useMemo(() => seriesChoices(result), [result]);
  const [picked, setPicked] = useState<string | null>(null);
  const key = choices.some((c) => c.key === picked) ? (picked as string) : defaultSeriesKey(result);
  const choice = choices.find((c) => c.key === key);
  const shape = useMemo(() => elevationShape(result, doc), [result, doc]);
  useEffect(() => noteChartsCommitted(resultId), [resultId]);

  const s = result.stations;
  if (!s || !choice || !shape)
    return <p className="text-sm text-concrete-600">No station data in this result.</p>;
  const ratio = choice.limit?.which === 'live-load' ? liveLimit : totalLimit;
  const limitLabel = choice.limit ? `limit ${formatQuantity(choice.limit)} = span/${ratio}` : null;
  const words = describeSeries(result, choice.series, choice.limit ?? null);
  const limitKey = limitSeriesKey(choices);
  const limitChoice = choices.find((c) => c.key === limitKey);
  const camber = result.member.recommendedCamber;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <EffectWords result={result} choice={choice} limitLabel={limitLabel} />
        <SeriesPicker choices={choices} value={key} onChange={setPicked} />
      </div>
      <ElevationStack stations={s} choice={choice} shape={shape} limitLabel={limitLabel} />
      {!choice.limit && limitChoice ? (
        <p className="text-xs text-concrete-700">
          The deflection limit applies under {limitChoice.series.name}, the service combination of the{' '}
          {limitChoice.limit?.which} deflection check.{' '}
          <button
            type="button"
            className="rounded text-oxide-700 underline focus-visible:ring-2 focus-visible:ring-oxide-500"
            onClick={() => setPicked(limitChoice.key)}
          >
            Show {limitChoice.series.name} with its limit
          </button>
        </p>
      ) : null}
      <p className="text-xs text-concrete-700" data-testid="elevation-support">
        {supportWords(result.member.section.label, shape, s.units.deflection, s.depth)}
      </p>
      <div className="sr-only">
        <p>{words.shear}</p>
        <p>{words.moment}</p>
        <p>{words.deflection}</p>
      </div>
      <div className="grid gap-3 border-t border-concrete-200 pt-2 md:grid-cols-[2fr_1fr]">
        <TipDeflectionSplit result={result} />
        {camber ? (
          <p className="text-xs text-concrete-700" data-testid="elevation-camber">
            Camber: set the tip{' '}
            <strong className="num">{formatQuantity({ value: camber.value, unit: camber.unit })}</strong> up
            before loading, for {camber.basis}.
          </p>
        ) : null}
      </div>
    </div>
  );
}
