import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { ErrorNote, Loading } from '../../../components/ui/status';
import { ReviewStateBadge } from '../../../components/ui/review-state-badge';
import { useRevisions } from '../../../lib/api/revisions/get-revisions';

/** The cantilever's revisions on the desk: number, author, message, date, review state. */
export function RevisionList({ cantileverId, current }: { cantileverId: number; current: number | null }) {
  const revisions = useRevisions(cantileverId);
  if (revisions.isPending) return <Loading label="Loading revisions…" />;
  if (revisions.isError) return <ErrorNote error={revisions.error}>Revisions could not be loaded.</ErrorNote>;
  const list = [...revisions.data].sort((a, b) => b.number - a.number);
  return (
    <div>
      {list.length === 0 ? (
        <p className="text-sm text-concrete-600">Not saved yet: the first save makes revision 1.</p>
      ) : (
        <ol
          className="flex flex-col divide-y divide-concrete-200 text-sm"
          aria-label="Revisions"
          data-testid="revision-list"
        >
          {list.map((r) => (
            // The message gets a line of its own: squeezed beside the other items in a narrow
            // panel it wrapped one word per line.
            <li key={r.id} className="py-1.5">
              <div className="flex flex-wrap items-baseline gap-x-2 gap-y-0.5">
                <span className="num font-mono font-semibold">
                  rev {r.number}
                  {r.number === current ? ' (on the desk)' : ''}
                </span>
                <span className="text-xs text-concrete-600">{r.authorName}</span>
                <time className="num text-xs text-concrete-600" dateTime={r.createdAt}>
                  {new Date(r.createdAt).toLocaleString()}
                </time>
                <ReviewStateBadge state={r.reviewState} />
              </div>
              <p className="mt-0.5 whitespace-pre-wrap break-words text-concrete-900">{r.message}</p>
            </li>
          ))}
        </ol>
      )}
      <Link to={paths.history(cantileverId)} className="mt-2 inline-block text-sm text-oxide-700 underline">
        Open the history
      </Link>
    </div>
  );
}
