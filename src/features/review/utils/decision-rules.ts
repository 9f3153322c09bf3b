import type { ReviewDto, RevisionSummaryDto, UserDto } from '../../../../shared/schemas/api';

export type DecisionAccess = { allowed: true } | { allowed: false; reason: string };

/**
 * Who may decide on a revision (DESIGN.md): only an engineer, never on their own revision, and only
 * while the revision waits for review. The server enforces the same; this explains it in words.
 */
export function decisionAccess(
  user: UserDto | null | undefined,
  revision: RevisionSummaryDto,
): DecisionAccess {
  if (!user) return { allowed: false, reason: 'Sign in as an engineer to review this revision.' };
  if (revision.reviewState === 'draft') {
    return {
      allowed: false,
      reason: 'This revision has not been submitted for review yet, so there is nothing to decide.',
    };
  }
  if (revision.reviewState === 'approved') {
    return {
      allowed: false,
      reason: 'This revision is approved. An approval is final; save a new revision to change the design.',
    };
  }
  if (revision.reviewState === 'changes-requested') {
    return {
      allowed: false,
      reason: 'Changes were requested on this revision. The next decision is on the revised design.',
    };
  }
  if (user.role !== 'engineer') {
    return {
      allowed: false,
      reason: `Only an engineer may approve or request changes; you are signed in as ${/^[aeiou]/.test(user.role) ? 'an' : 'a'} ${user.role}. You may still comment.`,
    };
  }
  if (user.id === revision.authorId) {
    return {
      allowed: false,
      reason:
        'You wrote this revision. An engineer never approves their own work: another engineer of the project must review it. You may still comment.',
    };
  }
  return { allowed: true };
}

/** The latest decision (approval or request for changes) among a revision's reviews. */
export function latestDecision(reviews: ReviewDto[]): ReviewDto | undefined {
  return [...reviews]
    .filter((r) => r.state !== 'submitted')
    .sort((x, y) => y.createdAt.localeCompare(x.createdAt) || y.id - x.id)[0];
}
