import { CircleCheck, CircleX } from 'lucide-react';

/**
 * A stored result's verdict in words: "Checks pass" only when the engine said every check passed;
 * a design with no computed result is never shown as passing.
 */
export function VerdictWord({ ok }: { ok: boolean | null }) {
  if (ok === null) return <span className="text-xs text-concrete-500">not checked</span>;
  return ok ? (
    <span className="inline-flex items-center gap-1 text-xs font-medium text-concrete-800 [&_svg]:text-util-calm">
      <CircleCheck aria-hidden="true" className="h-3.5 w-3.5" />
      Checks pass
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 text-xs font-medium text-util-over">
      <CircleX aria-hidden="true" className="h-3.5 w-3.5" />
      Checks fail
    </span>
  );
}
