import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/engine/units';
import type { CantileverDto } from '../../../../shared/schemas/api';
import { paths } from '../../../config/paths';
import type { LiveDesign } from '../hooks/use-live-design';
import { UnitSwitch } from './unit-switch';

function statusText(busy: boolean, live: LiveDesign): string {
  if (busy) return 'Recomputing…';
  if (live.failure) return 'Not recomputed: the engine stopped.';
  if (live.issues.length > 0)
    return `Not recomputed: ${live.issues.length} input${live.issues.length === 1 ? ' needs' : 's need'} attention.`;
  return live.result ? `Up to date (${live.engineMs.toFixed(0)} ms)` : 'Computing…';
}

/** Name, revision, unsaved marker, recompute status, units and the save action. */
export function DeskHeader({
  cantilever,
  base,
  dirty,
  busy,
  live,
  units,
  onUnits,
  onStudy,
  save,
}: {
  cantilever: CantileverDto;
  base: number | null;
  dirty: boolean;
  busy: boolean;
  live: LiveDesign;
  units: UnitSystem;
  onUnits: (to: UnitSystem) => void;
  /** Opens the reach study with the desk's current document. */
  onStudy: () => void;
  save: ReactNode;
}) {
  return (
    <div className="z-10 flex flex-wrap items-center gap-x-4 gap-y-1 border-b border-concrete-300 bg-concrete-100 px-2 py-2 sm:px-4 md:sticky md:top-0">
      <div>
        <p className="text-xs text-concrete-500">
          <Link to={paths.project(cantilever.projectId)} className="underline">
            Project
          </Link>{' '}
          / Design desk
        </p>
        <h1 className="flex items-center gap-2 text-lg font-semibold">
          {cantilever.name}
          <span
            className="num rounded bg-concrete-200 px-1.5 text-xs font-medium text-concrete-700"
            data-testid="base-revision"
          >
            {base ? `rev ${base}` : 'not saved yet'}
          </span>
          {dirty ? (
            <span
              className="rounded bg-oxide-100 px-1.5 text-xs font-medium text-oxide-700"
              data-testid="unsaved"
            >
              ● unsaved changes
            </span>
          ) : null}
        </h1>
      </div>
      <p
        aria-live="polite"
        role="status"
        className={`text-xs ${busy ? 'text-oxide-700' : 'text-concrete-500'}`}
        data-testid="recompute-status"
      >
        {statusText(busy, live)}
      </p>
      <div className="flex flex-wrap items-center gap-3 sm:ml-auto">
        <UnitSwitch value={units} onChange={onUnits} />
        <Link to={paths.history(cantilever.id)} className="text-sm text-oxide-700 underline">
          History
        </Link>
        <a
          href={paths.study(cantilever.id)}
          onClick={(e) => {
            e.preventDefault();
            onStudy();
          }}
          className="text-sm text-oxide-700 underline"
        >
          Reach study
        </a>
        {save}
      </div>
    </div>
  );
}
