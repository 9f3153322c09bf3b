import { CircleCheck, CircleHelp, CircleX } from 'lucide-react';
import { DESIGN_WORDS, type DesignState } from '../../../shared/words/check-words';
import { DESIGN_TEXT } from '../../lib/verdict-style';

const ICONS = { pass: CircleCheck, fail: CircleX, none: CircleHelp } as const;

/**
 * A stored result's verdict in the product's words (shared/words/check-words.ts): "Passes" only
 * when the engine said every check passed; a design with no computed result is never shown as passing.
 */
export function VerdictWord({ ok }: { ok: boolean | null }) {
  const state: DesignState = ok === null ? 'none' : ok ? 'pass' : 'fail';
  const Icon = ICONS[state];
  return (
    <span className={`inline-flex items-center gap-1 text-xs font-medium ${DESIGN_TEXT[state]}`}>
      <Icon aria-hidden="true" className="h-3.5 w-3.5" />
      {DESIGN_WORDS[state]}
    </span>
  );
}
