/**
 * The evidence of a stored revision, drawn with the desk's own components (composed here because
 * features do not import one another): every input grouped as on the desk, the member elevation
 * with its diagrams and the plate on the pier.
 */
import type { ReactNode } from 'react';
import type { RevisionDto } from '../../shared/schemas/api';
import { DesignInputsList } from '../components/design-inputs-list';
import { CheckBoard } from '../features/desk/components/check-board';
import { ElevationPanel } from '../features/desk/components/elevation/elevation-panel';
import { PlateSketch } from '../features/desk/components/plate-sketch';
import { Verdict } from '../features/desk/components/verdict';
import { displayChecks } from '../../shared/words/check-display';

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section aria-label={title} className="rounded-md border border-concrete-300 bg-white p-3">
      <h3 className="mb-2 text-sm font-semibold text-concrete-800">{title}</h3>
      {children}
    </section>
  );
}

/** The diagrams and sketches of a stored revision (no inputs; nothing to edit). */
function DrawnResults({ revision }: { revision: RevisionDto }) {
  const doc = revision.input;
  return (
    <>
      <Panel title="Member elevation and diagrams">
        <ElevationPanel
          result={revision.result}
          doc={doc}
          resultId={revision.id}
          liveLimit={doc.deflectionLimits?.live ?? 360}
          totalLimit={doc.deflectionLimits?.total ?? 240}
        />
      </Panel>
      <Panel title="Plate on the pier">
        <PlateSketch doc={doc} result={revision.result} />
      </Panel>
    </>
  );
}

/** The desk's right side for a stored revision, read-only: verdict, diagrams, check board, sketches. */
export function RevisionResults({ revision }: { revision: RevisionDto }) {
  return (
    <div className="flex min-w-0 flex-col gap-3">
      <Verdict checks={revision.result.checks} stale={false} />
      <Panel title="Check board">
        <CheckBoard
          checks={displayChecks(revision.result.checks, revision.result.connection)}
          directions={Object.fromEntries(
            revision.result.member.combinations.map((c) => [c.name, c.direction]),
          )}
        />
      </Panel>
      <DrawnResults revision={revision} />
    </div>
  );
}

export function RevisionEvidence({ revision }: { revision: RevisionDto }) {
  const doc = revision.input;
  return (
    <div className="grid gap-3 lg:grid-cols-[22rem_1fr]">
      <div>
        <h3 className="mb-2 text-sm font-semibold text-concrete-800">
          Every input of revision {revision.number}
        </h3>
        <DesignInputsList doc={doc} />
      </div>
      <div className="flex min-w-0 flex-col gap-3">
        <DrawnResults revision={revision} />
      </div>
    </div>
  );
}
