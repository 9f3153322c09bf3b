import { memo, type ReactNode } from 'react';
import type { DesignDocument } from '../../../../shared/schemas/design';
import type { LiveDesign } from '../hooks/use-live-design';
import { CheckBoard } from './check-board';
import { ElevationPanel } from './elevation/elevation-panel';
import { PlateSketch } from './plate-sketch';
import { SteelSummary } from './steel-summary';
import { Verdict } from './verdict';
import { displayChecks } from '../../../../shared/words/check-display';

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section
      aria-label={title}
      className="rounded-md border border-concrete-300 bg-white p-3 [contain:layout_paint]"
    >
      <h2 className="mb-2 text-sm font-semibold text-concrete-800">{title}</h2>
      {children}
    </section>
  );
}

/** The right side of the desk: verdict and caution, diagrams, check board, sketches. */
export const DeskResults = memo(function DeskResults({
  live,
  doc,
  schedule,
  beams,
}: {
  live: LiveDesign;
  doc: DesignDocument | null;
  schedule?: ReactNode;
  /** The cantilever's number of identical beams, for the steel per deck. */
  beams?: number;
}) {
  const result = live.result;
  const liveLimit = doc?.deflectionLimits?.live ?? 360;
  const totalLimit = doc?.deflectionLimits?.total ?? 240;
  return (
    <div className={`flex flex-col gap-3 transition-opacity ${live.stale && result ? 'opacity-80' : ''}`}>
      <Verdict checks={result ? result.checks : null} stale={live.stale} />
      {result ? (
        <>
          <SteelSummary result={result} beams={beams} />
          <Panel title="Member elevation and diagrams">
            <ElevationPanel
              result={result}
              doc={doc}
              resultId={live.resultId}
              liveLimit={liveLimit}
              totalLimit={totalLimit}
            />
          </Panel>
          <Panel title="Check board">
            <CheckBoard
              checks={displayChecks(result.checks, result.connection)}
              directions={Object.fromEntries(result.member.combinations.map((c) => [c.name, c.direction]))}
            />
          </Panel>
          <div className="grid gap-3 2xl:grid-cols-2">
            <Panel title="Plate on the pier">
              {doc ? <PlateSketch doc={doc} result={result} /> : null}
              {schedule}
            </Panel>
          </div>
        </>
      ) : null}
    </div>
  );
});
