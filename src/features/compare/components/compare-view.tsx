import type { RevisionDto } from '../../../../shared/schemas/api';
import { diffDesigns } from '../../../../shared/schemas/diff';
import { CautionNote } from '../../../components/ui/caution-note';
import { verdictOf } from '../../../../shared/words/check-words';
import { VerdictWord } from '../../../components/ui/verdict-word';
import { useStations } from '../hooks/use-stations';
import { ratioRows, ratioSummary } from '../../../lib/ratio-rows';
import { ChangedInputsTable } from '../../../components/diff/changed-inputs-table';
import { RatioTable } from '../../../components/diff/ratio-table';
import { CompareCurves } from './compare-curves';

/** Passes only when the engine said so and every check passes with a computed ratio; no checks is no verdict. */
function designOk(revision: RevisionDto): boolean | null {
  const v = verdictOf(revision.result.checks, revision.result.ok);
  return v.state === 'none' ? null : v.pass;
}

/** Two stored revisions side by side: changed inputs, check ratios and overlaid curves. */
export function CompareView({ a, b }: { a: RevisionDto; b: RevisionDto }) {
  const labelA = `Revision ${a.number}`;
  const labelB = `Revision ${b.number}`;
  const changes = diffDesigns(a.input, b.input);
  const rows = ratioRows(a.result.checks, b.result.checks);
  const stationsA = useStations(a);
  const stationsB = useStations(b);

  return (
    <div className="space-y-6">
      <CautionNote />
      <section aria-labelledby="compare-summary" className="rounded border border-concrete-200 bg-white p-4">
        <h2 id="compare-summary" className="text-lg font-semibold text-concrete-900">
          Summary
        </h2>
        <p className="text-sm text-concrete-800" aria-live="polite">
          {labelA} by {a.authorName}, “{a.message}”, compared with {labelB} by {b.authorName}, “{b.message}”.{' '}
          {changes.length === 1 ? '1 input changed' : `${changes.length} inputs changed`}.{' '}
          {ratioSummary(rows)}
        </p>
        <p className="mt-1 flex flex-wrap gap-4 text-sm">
          <span>
            {labelA}: <VerdictWord ok={designOk(a)} />
          </span>
          <span>
            {labelB}: <VerdictWord ok={designOk(b)} />
          </span>
        </p>
      </section>
      <section aria-labelledby="compare-inputs" className="rounded border border-concrete-200 bg-white p-4">
        <h2 id="compare-inputs" className="mb-2 text-lg font-semibold text-concrete-900">
          Changed inputs
        </h2>
        <ChangedInputsTable changes={changes} labelA={labelA} labelB={labelB} />
      </section>
      <section aria-labelledby="compare-ratios" className="rounded border border-concrete-200 bg-white p-4">
        <h2 id="compare-ratios" className="mb-2 text-lg font-semibold text-concrete-900">
          Check ratios
        </h2>
        <RatioTable rows={rows} labelA={labelA} labelB={labelB} />
      </section>
      <section aria-labelledby="compare-curves" className="rounded border border-concrete-200 bg-white p-4">
        <h2 id="compare-curves" className="mb-2 text-lg font-semibold text-concrete-900">
          Moment, shear and deflection curves
        </h2>
        <CompareCurves
          labelA={labelA}
          labelB={labelB}
          stationsA={stationsA.stations}
          stationsB={stationsB.stations}
          checksB={b.result.checks}
        />
      </section>
    </div>
  );
}
