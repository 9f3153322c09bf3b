import { CHECK_WORDS, checkState } from '../../../shared/words/check-words';
import { formatRatio } from '../../lib/format';
import { CHECK_TEXT } from '../../lib/verdict-style';

/** A ratio with its verdict word; colour follows the word, never replaces it. */
export function RatioCell({ ratio, ok }: { ratio: number | null; ok: boolean | null }) {
  if (ok === null) return <span className="text-concrete-600">not checked</span>;
  const state = checkState({ ratio, ok });
  return (
    <span className={`whitespace-nowrap font-mono tabular-nums ${CHECK_TEXT[state]}`}>
      {state === 'none' ? '' : `${formatRatio(ratio)} `}
      <span className="font-sans text-xs">{CHECK_WORDS[state]}</span>
    </span>
  );
}
