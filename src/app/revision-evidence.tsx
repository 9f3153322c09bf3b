/**
 * The evidence of a stored revision, drawn with the desk's own components (composed here because
 * features do not import one another): every input grouped as on the desk, the diagrams, the
 * member elevation and the plate on the pier.
 */
import type { ReactNode } from 'react';
import type { RevisionDto } from '../../shared/schemas/api';
import { DesignInputsList } from '../components/design-inputs-list';
import { DeskCharts } from '../features/desk/components/desk-charts';
import { MemberSketch } from '../features/desk/components/member-sketch';
import { PlateSketch } from '../features/desk/components/plate-sketch';

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section aria-label={title} className="rounded-md border border-concrete-300 bg-white p-3">
      <h3 className="mb-2 text-sm font-semibold text-concrete-800">{title}</h3>
      {children}
    </section>
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
        <Panel title="Moment, shear and deflection along the member">
          <DeskCharts
            result={revision.result}
            resultId={revision.id}
            liveLimit={doc.deflectionLimits?.live ?? 360}
            totalLimit={doc.deflectionLimits?.total ?? 240}
          />
        </Panel>
        <Panel title="Member elevation">
          <MemberSketch result={revision.result} />
        </Panel>
        <Panel title="Plate on the pier">
          <PlateSketch doc={doc} result={revision.result} />
        </Panel>
      </div>
    </div>
  );
}
