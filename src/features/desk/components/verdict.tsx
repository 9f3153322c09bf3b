import { AlertTriangle, CheckCircle2, XCircle } from 'lucide-react';
import { CAUTION, type Check } from '../../../../shared/engine/types';
import { verdictOf } from '../../../../shared/words/check-words';
import { DESIGN_TEXT } from '../../../lib/verdict-style';

/** The overall verdict in words (announced when it changes), and the caution under it, always. */
export function Verdict({ checks, stale }: { checks: readonly Check[] | null; stale: boolean }) {
  const v = checks ? verdictOf(checks) : null;
  return (
    <div className="rounded-md border border-concrete-300 bg-white p-3">
      <p
        aria-live="polite"
        data-testid="verdict"
        className={`flex items-center gap-2 font-semibold ${DESIGN_TEXT[v?.state ?? 'none']}`}
      >
        {v === null ? (
          <span className="text-concrete-600">No result yet.</span>
        ) : (
          <>
            {v.pass ? (
              <CheckCircle2 size={18} aria-hidden="true" />
            ) : (
              <XCircle size={18} aria-hidden="true" />
            )}
            <span>
              {`${v.word}. `}
              {v.sentence}
            </span>
          </>
        )}
        {stale && v ? (
          <span className="text-xs font-normal text-concrete-500">(for the last inputs that computed)</span>
        ) : null}
      </p>
      <p
        className="mt-1 flex items-start gap-1.5 text-xs text-concrete-700"
        data-testid="caution"
        data-caution
      >
        <AlertTriangle size={14} className="mt-px shrink-0 text-oxide-500" aria-hidden="true" />
        {CAUTION}
      </p>
    </div>
  );
}
