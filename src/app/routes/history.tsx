import { Link, useParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useTimeline } from '../../features/history/api/get-timeline';
import { useCantilever } from '../../lib/api/cantilevers/get-cantilever';
import { useMe } from '../../lib/api/me/get-me';
import { RevisionTimeline } from '../../features/history/components/revision-timeline';
import { errorText } from '../../lib/error-text';

/** History: the revision timeline of one cantilever. */
export default function HistoryRoute() {
  const cantileverId = Number(useParams().cantileverId);
  const cantilever = useCantilever(cantileverId);
  const revisions = useTimeline(cantileverId);
  const user = useMe();

  return (
    <div className="mx-auto max-w-5xl space-y-4 p-4 sm:p-6">
      <nav aria-label="Breadcrumb" className="text-sm text-concrete-600">
        {cantilever.data && (
          <>
            <Link to={paths.project(cantilever.data.projectId)} className="underline hover:text-oxide-700">
              Project
            </Link>{' '}
            /{' '}
            <Link to={paths.desk(cantileverId)} className="underline hover:text-oxide-700">
              {cantilever.data.name}
            </Link>{' '}
            / History
          </>
        )}
      </nav>
      <h1 className="text-xl font-semibold text-concrete-900">
        History{cantilever.data ? ` of ${cantilever.data.name}` : ''}
      </h1>
      {revisions.isPending && <p className="text-concrete-600">Loading revisions…</p>}
      {revisions.isError && (
        <p role="alert" className="text-util-over">
          The revisions could not be loaded: {errorText(revisions.error)}
        </p>
      )}
      {revisions.data && revisions.data.length === 0 && (
        <p className="text-concrete-700">
          No revisions yet. Save one from the{' '}
          <Link to={paths.desk(cantileverId)} className="underline">
            design desk
          </Link>
          .
        </p>
      )}
      {revisions.data && revisions.data.length > 0 && (
        <RevisionTimeline
          cantileverId={cantileverId}
          revisions={revisions.data}
          user={user.data ?? undefined}
        />
      )}
    </div>
  );
}
