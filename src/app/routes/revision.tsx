import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { PackageLink } from '../../components/ui/package-link';
import { ReviewStateBadge } from '../../components/ui/review-state-badge';
import { ErrorNote, Loading } from '../../components/ui/status';
import { paths } from '../../config/paths';
import { formatDateTime } from '../../lib/format';
import { revisionQueryOptions } from '../../lib/api/revisions/get-revision';
import { useRevisions } from '../../lib/api/revisions/get-revisions';
import { DesignInputsList } from '../../components/design-inputs-list';
import { RevisionResults } from '../revision-evidence';

/** Any stored revision, read-only, in the desk's layout: inputs on the left, results on the right. */
export default function RevisionRoute() {
  const revisionId = Number(useParams().revisionId);
  const valid = Number.isInteger(revisionId) && revisionId > 0;
  const revision = useQuery({
    ...revisionQueryOptions(valid ? revisionId : 0),
    enabled: valid,
    staleTime: 0,
  });
  const list = useRevisions(revision.data?.cantileverId ?? 0);
  if (!valid)
    return (
      <p role="alert" className="p-6 text-util-over">
        This address does not name a revision.
      </p>
    );
  if (revision.isError)
    return (
      <div className="p-6">
        <ErrorNote error={revision.error}>This revision could not be loaded.</ErrorNote>
      </div>
    );
  if (!revision.data) return <Loading label="Opening the revision…" />;
  const r = revision.data;
  const latest = list.data?.[0] ?? null;
  const total = list.data?.length ?? null;
  return (
    <div className="flex flex-col">
      <header className="space-y-1 border-b border-concrete-200 bg-white px-4 py-3">
        <nav aria-label="Breadcrumb" className="text-sm text-concrete-600">
          <Link to={paths.history(r.cantileverId)} className="underline hover:text-oxide-700">
            History
          </Link>
          {' · '}
          <Link to={paths.desk(r.cantileverId)} className="underline hover:text-oxide-700">
            Design desk (latest)
          </Link>
        </nav>
        <h1 className="flex flex-wrap items-center gap-3 text-xl font-semibold text-concrete-900">
          Revision {r.number} <span className="text-sm font-normal text-concrete-600">read-only</span>
          <ReviewStateBadge state={r.reviewState} />
        </h1>
        <p className="text-sm" data-testid="revision-of">
          {total === null ? (
            `This is revision ${r.number}.`
          ) : (
            <>
              This is revision {r.number} of {total}.{' '}
              {latest && latest.id !== r.id ? (
                <Link to={paths.revision(latest.id)} className="font-medium text-oxide-700 underline">
                  Open the latest, revision {latest.number}
                </Link>
              ) : (
                'It is the latest.'
              )}
            </>
          )}
        </p>
        <p className="text-sm text-concrete-800">“{r.message}”</p>
        <p className="text-xs text-concrete-600">
          {r.authorName} · {formatDateTime(r.createdAt)} · engine {r.engineVersion}
        </p>
        <div className="flex flex-wrap gap-2 pt-1">
          <PackageLink revisionId={r.id} number={r.number} />
          {r.reviewState !== 'draft' && (
            <Link
              to={paths.review(r.id)}
              className="rounded border border-oxide-600 px-3 py-1 text-sm font-medium text-oxide-700 hover:bg-oxide-50"
            >
              {r.reviewState === 'submitted' ? `Open review of revision ${r.number}` : 'Review record'}
            </Link>
          )}
        </div>
      </header>
      <div className="grid gap-4 p-4 lg:grid-cols-[26rem_1fr]">
        <div className="flex flex-col gap-2">
          <h2 className="text-sm font-semibold text-concrete-800">Inputs</h2>
          <DesignInputsList doc={r.input} />
        </div>
        <RevisionResults revision={r} />
      </div>
    </div>
  );
}
