import { CircleCheck, CircleX } from 'lucide-react';

/** The stored result's verdict: "Checks pass" only when the engine said every check passed. */
export function VerdictWord({ ok }: { ok: boolean }) {
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
