import type { ReactNode } from 'react';
import { ApiError } from '../../lib/api-client';

/** A quiet loading line (announced politely to screen readers). */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="p-4 text-sm text-concrete-600">
      {label}
    </p>
  );
}

/** A plain-words error box for a failed request. */
export function ErrorNote({ error, children }: { error?: unknown; children?: ReactNode }) {
  const text = error instanceof ApiError ? error.message : error instanceof Error ? error.message : null;
  return (
    <div role="alert" className="rounded border border-util-over/40 bg-oxide-50 p-3 text-sm text-util-over">
      {children}
      {text ? <span> {text}</span> : null}
    </div>
  );
}
