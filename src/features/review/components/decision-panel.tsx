import { useState } from 'react';
import { BadgeCheck, Lock, MessageSquareWarning } from 'lucide-react';
import type { RevisionDto, UserDto } from '../../../../shared/schemas/api';
import { formatDate } from '../../../lib/format';
import { decisionAccess, latestDecision } from '../utils/decision-rules';
import { DecisionForm } from './decision-form';

/** The outcome so far, and the decision form for the engineers who may decide. */
export function DecisionPanel({
  revision,
  user,
  newerNumber = null,
}: {
  revision: RevisionDto;
  user: UserDto | null | undefined;
  /** The latest revision's number when a newer one than this exists. */
  newerNumber?: number | null;
}) {
  const [status, setStatus] = useState('');
  const access = decisionAccess(user, revision);
  const decision = latestDecision(revision.reviews);

  return (
    <div className="space-y-3">
      <p role="status" aria-live="polite" className="text-sm font-medium text-concrete-900">
        {status}
      </p>
      {revision.reviewState === 'approved' && decision && (
        <p className="flex items-center gap-2 text-base font-medium text-concrete-800 [&_svg]:text-util-calm">
          <BadgeCheck aria-hidden="true" className="h-5 w-5" />
          Approved by {decision.reviewerName} on {formatDate(decision.createdAt)}
        </p>
      )}
      {revision.reviewState === 'changes-requested' && decision && (
        <div className="text-sm">
          <p className="flex items-center gap-2 text-base font-medium text-util-over">
            <MessageSquareWarning aria-hidden="true" className="h-5 w-5" />
            Changes requested by {decision.reviewerName} on {formatDate(decision.createdAt)}
          </p>
          {decision.comment && (
            <blockquote className="mt-1 border-l-2 border-concrete-300 pl-2 whitespace-pre-wrap text-concrete-800">
              {decision.comment}
            </blockquote>
          )}
        </div>
      )}
      {access.allowed ? (
        <DecisionForm
          revisionId={revision.id}
          revisionNumber={revision.number}
          cantileverId={revision.cantileverId}
          newerNumber={newerNumber}
          onDecided={setStatus}
        />
      ) : (
        <p className="flex items-start gap-2 text-sm text-concrete-700" data-testid="decision-unavailable">
          <Lock aria-hidden="true" className="mt-0.5 h-4 w-4 shrink-0" />
          {access.reason}
        </p>
      )}
    </div>
  );
}
