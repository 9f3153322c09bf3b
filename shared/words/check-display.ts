/**
 * Checks as a person reads them. The engine reports concrete bearing under a plate with a large
 * moment as moments about the rod row (M + P f against qmax (f + N/2)^2 / 2, AISC Design Guide 1,
 * 2nd ed., 3.4); people read bearing as a stress. The capacity moment is linear in fp,max
 * (qmax = fp,max B), so the same ratio reads exactly as the bearing stress the block would need,
 * ratio x fp,max, against fp,max. The moments stay in the note; id, ratio and ok are the engine's.
 */
import type { Check, ConnectionResult } from '../engine/types';
import { formatQuantity, type Quantity } from '../engine/units';

const STRESS_UNITS = new Set(['ksi', 'psi', 'MPa']);

function isQuantity(v: unknown): v is Quantity {
  return (
    typeof v === 'object' &&
    v !== null &&
    typeof (v as Quantity).value === 'number' &&
    typeof (v as Quantity).unit === 'string'
  );
}

/** plate.bearing in stress units when the engine gave it as moments; any other check as it is. */
export function displayCheck(check: Check, connection: ConnectionResult | null | undefined): Check {
  if (check.id !== 'plate.bearing' || !check.demand || !check.capacity) return check;
  if (STRESS_UNITS.has(check.capacity.unit)) return check;
  const fpMax = connection?.availableBearingStress;
  if (!isQuantity(fpMax) || check.ratio === null || !Number.isFinite(check.ratio)) return check;
  // Concrete is read in psi in US units (f'c 4000 psi), in MPa in SI.
  const psi = fpMax.unit === 'ksi';
  const stress = (v: number): Quantity =>
    psi ? { value: v * 1000, unit: 'psi' } : { value: v, unit: fpMax.unit };
  const moments = `Large moment: moment about the rod row M + P f = ${formatQuantity(check.demand)} against the most a bearing block can hold, ${formatQuantity(check.capacity)}; shown as the bearing stress that block would need (ratio x fp,max) against fp,max.`;
  return {
    ...check,
    demand: stress(check.ratio * fpMax.value),
    capacity: stress(fpMax.value),
    note: check.note ? `${check.note} ${moments}` : moments,
  };
}

export function displayChecks(
  checks: readonly Check[],
  connection: ConnectionResult | null | undefined,
): Check[] {
  return checks.map((c) => displayCheck(c, connection));
}
