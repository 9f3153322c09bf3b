import type { ReviewState } from '../../../../shared/schemas/api';

const REVIEW_WORDS: Record<ReviewState, string> = {
  draft: 'draft',
  submitted: 'in review',
  approved: 'approved',
  'changes-requested': 'changes requested',
};

export function reviewWord(state: ReviewState | null): string {
  return state ? REVIEW_WORDS[state] : 'no revision yet';
}

/** The review state in words, on a quiet chip. */
export function ReviewBadge({ state }: { state: ReviewState | null }) {
  const tone = state === 'approved' ? 'border-util-calm text-util-calm' : state === 'changes-requested' ? 'border-oxide-500 text-oxide-700' : 'border-concrete-300 text-concrete-600';
  return <span className={`rounded border px-1.5 py-0.5 text-xs ${tone}`}>{reviewWord(state)}</span>;
}

/** Pass/fail in a word; a design with no computed result is never shown as passing. */
export function VerdictWord({ ok }: { ok: boolean | null }) {
  if (ok === null) return <span className="text-xs text-concrete-500">not checked</span>;
  return ok ? (
    <span className="text-xs font-medium text-util-calm">✓ all checks pass</span>
  ) : (
    <span className="text-xs font-medium text-util-over">✕ checks fail</span>
  );
}
