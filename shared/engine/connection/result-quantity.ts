/**
 * Result quantities for the connection, with the display factors looked up once per unit system
 * and kind (the connection builds a few dozen quantities per call, on every keystroke).
 */
import { RESULT_UNITS, displayFactor, type Quantity, type ResultKind, type UnitSystem } from '../units';

const factors: Record<UnitSystem, Partial<Record<ResultKind, number>>> = { US: {}, SI: {} };

/** Same as units.ts quantity(), cached per (system, kind). */
export function resultQuantity(internalValue: number, kind: ResultKind, system: UnitSystem): Quantity {
  let f = factors[system][kind];
  if (f === undefined) {
    f = displayFactor(kind, system);
    factors[system][kind] = f;
  }
  return { value: internalValue * f, unit: RESULT_UNITS[system][kind] };
}

/** A length for a note, in the person's unit system: 2.25 in, or 57.2 mm. */
export function formatLength(inches: number, system: UnitSystem): string {
  const q = resultQuantity(inches, 'smallLength', system);
  return `${Number(q.value.toFixed(system === 'US' ? 3 : 1))} ${q.unit}`;
}
