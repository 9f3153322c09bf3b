/**
 * The last line of defence: a result that holds NaN or Infinity anywhere is refused rather than
 * shown. The checks are written so this never fires for a valid document; if it does, the input
 * is outside what the engine can compute and the person is told so.
 */
import { DesignInputError, type Stations } from './types';

export function assertFinite(value: unknown): void {
  if (!allFinite(value)) notFinite();
}

/** The station arrays: every series of every case and combination, x and the depth. */
export function assertStationsFinite(stations: Stations): void {
  let ok = finiteNumbers(stations.x) && finiteNumbers(stations.depth);
  for (const list of [stations.cases, stations.combinations])
    for (const s of list)
      ok &&=
        finiteNumbers(s.V) &&
        finiteNumbers(s.M) &&
        finiteNumbers(s.deflection) &&
        (s.rotation === undefined || finiteNumbers(s.rotation));
  if (!ok) notFinite();
}

/** x * 0 is 0 for every finite x and NaN for NaN and the infinities: one tight loop, no branch. */
function finiteNumbers(values: readonly number[]): boolean {
  let zero = 0;
  for (let i = 0; i < values.length; i++) zero += values[i] * 0;
  return zero === 0;
}

function notFinite(): never {
  throw new DesignInputError([
    {
      path: '(document)',
      message: 'the design cannot be computed (a result is not a finite number); check the sizes and loads',
    },
  ]);
}

function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value === null || typeof value !== 'object') return true;
  if (Array.isArray(value)) {
    // Station arrays hold thousands of numbers: test them here, without a call each.
    for (let i = 0; i < value.length; i++) {
      const v: unknown = value[i];
      if (typeof v === 'number') {
        if (!Number.isFinite(v)) return false;
      } else if (v !== null && typeof v === 'object' && !allFinite(v)) return false;
    }
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
