import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useAwaitingReviews } from '../api/get-awaiting-reviews';

/** An engineer's queue: submitted revisions in their projects that wait for a decision. */
export function AwaitingReviewList() {
  const waiting = useAwaitingReviews(true);
  return (
    <section
      aria-labelledby="awaiting-title"
      className="mb-6 rounded-md border border-concrete-300 bg-white p-4"
    >
      <h2 id="awaiting-title" className="mb-2 text-lg font-semibold">
        Awaiting my review
      </h2>
      {waiting.isPending ? (
        <p className="text-sm text-concrete-600">Loading…</p>
      ) : waiting.isError ? (
        <p role="alert" className="text-sm text-util-over">
          The list could not be loaded.
        </p>
      ) : waiting.data.length === 0 ? (
        <p className="text-sm text-concrete-600">Nothing waits for your review.</p>
      ) : (
        <ul className="divide-y divide-concrete-200" aria-label="Revisions awaiting my review">
          {waiting.data.map((w) => (
            <li
              key={w.revisionId}
              className="flex flex-wrap items-baseline justify-between gap-2 py-2 text-sm"
            >
              <span>
                <Link to={paths.review(w.revisionId)} className="font-medium text-oxide-700 underline">
                  {w.cantileverName}, revision {w.number}
                </Link>{' '}
                <span className="text-concrete-600">
                  ({w.projectName}) by {w.authorName}: “{w.message}”
                </span>
              </span>
              <span className="num text-xs text-concrete-600">submitted {formatDateTime(w.submittedAt)}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
