import { useState } from 'react';
import { Link } from 'react-router-dom';
import { GitCompare } from 'lucide-react';
import { EDIT_RIGHTS, type RevisionSummaryDto, type UserDto } from '../../../../shared/schemas/api';
import { paths } from '../../../config/paths';
import { useSubmitRevision } from '../../../lib/api/revisions/submit-revision';
import { RevisionItem } from './revision-item';
import { errorText } from '../../../lib/error-text';

interface RevisionTimelineProps {
  cantileverId: number;
  /** Newest first. */
  revisions: RevisionSummaryDto[];
  user: UserDto | undefined;
}

/** A design role may change some part of the design and so may submit it for review. */
export function isDesignRole(user: UserDto | undefined): boolean {
  if (!user) return false;
  const rights = EDIT_RIGHTS[user.role];
  return rights.member || rights.connection;
}

/** The revision timeline with picking two to compare and submitting the latest draft. */
export function RevisionTimeline({ cantileverId, revisions, user }: RevisionTimelineProps) {
  const [picked, setPicked] = useState<number[]>([]);
  const [status, setStatus] = useState('');
  const submit = useSubmitRevision(cantileverId);
  const latest = revisions[0];

  function onPick(revisionId: number, on: boolean) {
    setPicked((current) =>
      on
        ? [...current.filter((id) => id !== revisionId), revisionId].slice(-2)
        : current.filter((id) => id !== revisionId),
    );
  }

  function onSubmit(revision: RevisionSummaryDto, note: string) {
    setStatus('');
    // The server says who was notified, or why nobody could be.
    submit.mutate({ revisionId: revision.id, note }, { onSuccess: (answer) => setStatus(answer.notice) });
  }

  const pair = revisions.filter((r) => picked.includes(r.id)).sort((a, b) => a.number - b.number);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3 rounded border border-concrete-200 bg-concrete-50 p-3 text-sm">
        <span id="compare-hint" aria-live="polite" className="text-concrete-700">
          {pair.length === 2
            ? `Revisions ${pair[0].number} and ${pair[1].number} picked.`
            : `Pick two revisions to compare (${pair.length} of 2 picked).`}
        </span>
        {pair.length === 2 ? (
          <Link
            to={paths.compare(cantileverId, pair[0].id, pair[1].id)}
            className="inline-flex items-center gap-1 rounded bg-concrete-800 px-3 py-1 font-medium text-white hover:bg-concrete-900"
          >
            <GitCompare aria-hidden="true" className="h-4 w-4" />
            Compare revision {pair[0].number} with {pair[1].number}
          </Link>
        ) : (
          <span
            aria-hidden="true"
            className="inline-flex items-center gap-1 rounded bg-concrete-200 px-3 py-1 text-concrete-600"
          >
            <GitCompare className="h-4 w-4" />
            Compare
          </span>
        )}
      </div>
      <p aria-live="polite" role="status" className="text-sm text-concrete-800">
        {status}
      </p>
      {submit.isError && (
        <p role="alert" className="text-sm text-util-over">
          The revision was not submitted: {errorText(submit.error)}
        </p>
      )}
      <ol className="space-y-2" aria-label="Revisions, newest first">
        {revisions.map((revision) => (
          <RevisionItem
            key={revision.id}
            revision={revision}
            picked={picked.includes(revision.id)}
            pickDisabled={false}
            onPick={onPick}
            canReview={user?.role === 'engineer'}
            canSubmit={revision === latest && revision.reviewState === 'draft' && isDesignRole(user)}
            submitting={submit.isPending && submit.variables?.revisionId === revision.id}
            onSubmit={onSubmit}
          />
        ))}
      </ol>
    </div>
  );
}
