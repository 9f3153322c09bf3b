/**
 * The last line of defence: a result that holds NaN or Infinity anywhere is refused rather than
 * shown. The checks are written so this never fires for a valid document; if it does, the input
 * is outside what the engine can compute and the person is told so.
 */
import { DesignInputError } from './types';

export function assertFinite(value: unknown): void {
  if (!allFinite(value)) {
    throw new DesignInputError([
      {
        path: '(document)',
        message: 'the design cannot be computed (a result is not a finite number); check the sizes and loads',
      },
    ]);
  }
}

function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value === null || typeof value !== 'object') return true;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (!allFinite(value[i])) return false;
    return true;
  }
  const record = value as Record<string, unknown>;
  // Numbers and strings are tested here, without a call each (a result holds hundreds of them).
  for (const key in record) {
    const v = record[key];
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) return false;
    } else if (v !== null && typeof v === 'object' && !allFinite(v)) return false;
  }
  return true;
}
