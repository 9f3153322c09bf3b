import { useState } from 'react';
import { Link } from 'react-router-dom';
import { MessageSquare, Send } from 'lucide-react';
import type { RevisionSummaryDto } from '../../../../shared/schemas/api';
import { paths } from '../../../config/paths';
import { ReviewStateBadge } from '../../../components/ui/review-state-badge';
import { VerdictWord } from '../../../components/ui/verdict-word';
import { CommentsThread } from '../../../components/comments-thread';
import { PackageLink } from '../../../components/ui/package-link';
import { formatDateTime } from '../../../lib/format';

interface RevisionItemProps {
  revision: RevisionSummaryDto;
  picked: boolean;
  pickDisabled: boolean;
  onPick: (revisionId: number, picked: boolean) => void;
  canReview: boolean;
  canSubmit: boolean;
  submitting: boolean;
  onSubmit: (revision: RevisionSummaryDto, note: string) => void;
}

/** One revision in the timeline: who, why, when, its review state, verdict and actions. */
export function RevisionItem({
  revision,
  picked,
  pickDisabled,
  onPick,
  canReview,
  canSubmit,
  submitting,
  onSubmit,
}: RevisionItemProps) {
  const [showComments, setShowComments] = useState(false);
  const [note, setNote] = useState('');
  const pickId = `pick-${revision.id}`;
  const commentsId = `comments-${revision.id}`;
  return (
    <li
      className="rounded border border-concrete-200 bg-white p-3 shadow-sm"
      aria-labelledby={`rev-${revision.id}-title`}
    >
      <div className="flex flex-wrap items-start gap-3">
        <input
          id={pickId}
          type="checkbox"
          aria-label={`Pick revision ${revision.number} for compare`}
          checked={picked}
          disabled={pickDisabled && !picked}
          onChange={(e) => onPick(revision.id, e.target.checked)}
          className="mt-1 h-4 w-4 accent-oxide-600"
        />
        <div className="min-w-0 flex-1 space-y-1">
          <h2
            id={`rev-${revision.id}-title`}
            className="flex flex-wrap items-center gap-2 text-base font-semibold text-concrete-900"
          >
            <label htmlFor={pickId} className="cursor-pointer">
              Revision {revision.number}
            </label>
            <ReviewStateBadge state={revision.reviewState} />
            <VerdictWord ok={revision.ok} />
          </h2>
          <p className="whitespace-pre-wrap text-sm text-concrete-900">{revision.message}</p>
          <p className="text-xs text-concrete-600">
            {revision.authorName} ·{' '}
            <time dateTime={revision.createdAt}>{formatDateTime(revision.createdAt)}</time> ·{' '}
            {revision.baseRevisionNumber === null
              ? 'first revision'
              : `based on revision ${revision.baseRevisionNumber}`}{' '}
            · engine {revision.engineVersion}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          {canSubmit && (
            <textarea
              aria-label={`Note to the reviewer (optional), revision ${revision.number}`}
              placeholder="Note to the reviewer (optional)"
              rows={1}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              className="w-56 rounded border border-concrete-300 p-1 text-sm"
            />
          )}
          {canSubmit && (
            <button
              type="button"
              onClick={() => onSubmit(revision, note.trim())}
              disabled={submitting}
              className="inline-flex items-center gap-1 rounded bg-oxide-600 px-3 py-1 text-sm font-medium text-white hover:bg-oxide-700 disabled:opacity-60"
            >
              <Send aria-hidden="true" className="h-4 w-4" />
              {submitting ? 'Submitting…' : 'Submit for review'}
            </button>
          )}
          {revision.reviewState === 'submitted' && canReview && (
            <Link
              to={paths.review(revision.id)}
              className="rounded border border-oxide-600 px-3 py-1 text-sm font-medium text-oxide-700 hover:bg-oxide-50"
            >
              Open review of revision {revision.number}
            </Link>
          )}
          {(revision.reviewState === 'approved' || revision.reviewState === 'changes-requested') && (
            <Link
              to={paths.review(revision.id)}
              className="rounded border border-concrete-300 px-3 py-1 text-sm text-concrete-800 hover:bg-concrete-50"
            >
              Review record
            </Link>
          )}
          <Link
            to={paths.revision(revision.id)}
            className="rounded border border-concrete-300 px-3 py-1 text-sm text-concrete-800 hover:bg-concrete-50"
          >
            Open revision {revision.number}
          </Link>
          <PackageLink revisionId={revision.id} number={revision.number} />
          <button
            type="button"
            aria-expanded={showComments}
            aria-controls={commentsId}
            aria-label={`${showComments ? 'Hide comments' : 'Comments'} on revision ${revision.number}`}
            onClick={() => setShowComments((v) => !v)}
            className="inline-flex items-center gap-1 rounded border border-concrete-300 px-3 py-1 text-sm text-concrete-800 hover:bg-concrete-50"
          >
            <MessageSquare aria-hidden="true" className="h-4 w-4" />
            {showComments ? 'Hide comments' : 'Comments'}
          </button>
        </div>
      </div>
      {showComments && (
        <div id={commentsId} className="mt-3 border-t border-concrete-100 pt-3">
          <CommentsThread revisionId={revision.id} />
        </div>
      )}
    </li>
  );
}
