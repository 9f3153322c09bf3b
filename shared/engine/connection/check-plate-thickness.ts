/**
 * plate.thickness: required thickness (bearing side on m and n, tension side on the rod lever x)
 * against the plate provided, AISC Design Guide 1 (2nd ed.) 3.3-3.4 (plate yielding).
 */
import type { CheckSpec, Evaluation } from './check-row';
import { notComputed } from './check-row';
import type { ComboState } from './combo-state';
import { nextStandardThickness } from './plate-thickness';
import type { UnitSystem } from '../units';
import { formatLength } from './result-quantity';

export const PLATE_THICKNESS: CheckSpec = {
  id: 'plate.thickness',
  title: 'Plate thickness',
  reference: 'AISC Design Guide 1 (2nd ed.) 3.3-3.4',
};

/** Evaluates the thickness for one combination; t = the plate provided, in. */
export function evaluatePlateThickness(
  s: ComboState,
  t: number,
  footprintKnown: boolean,
  units: UnitSystem,
): Evaluation {
  if (!footprintKnown)
    return notComputed(
      'smallLength',
      'The section on the plate is unknown, so the plate cantilevers cannot be found.',
    );
  if (!s.thickness) {
    return notComputed(
      'smallLength',
      'No real bearing length, so the plate thickness could not be found. Enlarge the plate first.',
    );
  }
  if (!s.thickness.tensionModelled) {
    return notComputed(
      'smallLength',
      'The rods in tension are not beyond the tension flange (f <= d/2 - tf/2), so the Design Guide 1 tension-side plate strip does not apply and the plate thickness is not computed. Move the rows out beyond the section (larger offset f) or design the plate by a yield-line analysis.',
    );
  }
  const req = s.thickness.required;
  const ev: Evaluation = { demand: req, capacity: t, kind: 'smallLength', ratio: req / t };
  if (req > t) {
    const side = s.thickness.tensionSide > s.thickness.bearingSide ? 'tension (rod) side' : 'bearing side';
    ev.note = `The ${side} needs ${formatLength(req, units)}; the next stock plate is ${formatLength(nextStandardThickness(req), units)}.`;
  }
  return ev;
}
