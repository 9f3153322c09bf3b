import type { ReviewDto } from '../../../../shared/schemas/api';
import { formatDateTime } from '../../../lib/format';

const WORDS: Record<ReviewDto['state'], string> = {
  submitted: 'submitted for review',
  approved: 'approved',
  'changes-requested': 'requested changes',
};

/** The review events of a revision, oldest first. */
export function ReviewRecord({ reviews }: { reviews: ReviewDto[] }) {
  if (reviews.length === 0) return <p className="text-sm text-concrete-700">No review events yet.</p>;
  const ordered = [...reviews].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);
  return (
    <ol className="space-y-1 text-sm">
      {ordered.map((r) => (
        <li key={r.id}>
          <time dateTime={r.createdAt} className="text-concrete-600">
            {formatDateTime(r.createdAt)}
          </time>
          : <span className="font-medium text-concrete-900">{r.reviewerName}</span> {WORDS[r.state]}
          {r.comment && <span className="text-concrete-700"> — “{r.comment}”</span>}
        </li>
      ))}
    </ol>
  );
}
