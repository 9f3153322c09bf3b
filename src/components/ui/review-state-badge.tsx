import { BadgeCheck, Hourglass, MessageSquareWarning, PencilLine, type LucideIcon } from 'lucide-react';
import type { ReviewState } from '../../../shared/schemas/api';

const STATES: Record<ReviewState, { word: string; Icon: LucideIcon; tone: string }> = {
  draft: { word: 'Draft', Icon: PencilLine, tone: 'border-concrete-300 bg-concrete-50 text-concrete-700' },
  submitted: {
    word: 'Awaiting review',
    Icon: Hourglass,
    tone: 'border-oxide-300 bg-oxide-50 text-oxide-700',
  },
  approved: {
    word: 'Approved',
    Icon: BadgeCheck,
    tone: 'border-util-calm bg-white text-concrete-800 [&_svg]:text-util-calm',
  },
  'changes-requested': {
    word: 'Changes requested',
    Icon: MessageSquareWarning,
    tone: 'border-util-over bg-white text-util-over',
  },
};

/** The review state as a word and an icon, never colour alone; the same words on every screen. */
export function ReviewStateBadge({ state }: { state: ReviewState | null }) {
  if (state === null) return <span className="text-xs text-concrete-500">no revision yet</span>;
  const { word, Icon, tone } = STATES[state];
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs font-medium ${tone}`}>
      <Icon aria-hidden="true" className="h-3.5 w-3.5" />
      {word}
    </span>
  );
}
