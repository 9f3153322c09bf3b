/**
 * plate.bearing: the concrete under the plate, AISC 360-16 J8 with the DG1 (2nd ed.) bearing block.
 * Small moment: pressure fp = P/(B Y) against fp,max. Large moment: the moment about the tension row
 * M + P f against the most a bearing block can hold, qmax (f + N/2)^2 / 2 (no real root beyond it).
 */
import type { CheckSpec, Evaluation } from './check-row';
import type { ComboState } from './combo-state';

export const PLATE_BEARING: CheckSpec = {
  id: 'plate.bearing',
  title: 'Concrete bearing under the plate',
  reference: 'AISC 360-16 J8; AISC Design Guide 1 (2nd ed.) 3.3-3.4',
};

const BIGGER = 'Use a longer plate (N), a wider plate (B), rods farther out (offset f) or stronger concrete.';

/** Evaluates bearing for one combination; fpMax in ksi. */
export function evaluatePlateBearing(s: ComboState, fpMax: number): Evaluation {
  const b = s.bearing;
  switch (b.case) {
    case 'small-moment':
      return { demand: b.fp, capacity: fpMax, kind: 'stress', ratio: (b.fp ?? 0) / fpMax };
    case 'overload':
      return {
        demand: b.fp,
        capacity: fpMax,
        kind: 'stress',
        ratio: (b.fp ?? 0) / fpMax,
        note: `The compression alone needs more than the whole plate can bear. ${BIGGER}`,
      };
    case 'no-bearing':
      return {
        demand: 0,
        capacity: fpMax,
        kind: 'stress',
        ratio: 0,
        note: 'The plate is pulled off the concrete: no bearing, the rods carry everything.',
      };
    case 'large-moment':
      return {
        demand: b.demandMoment,
        capacity: b.capacityMoment,
        kind: 'moment',
        ratio: b.demandMoment / b.capacityMoment,
      };
    case 'no-solution':
      return {
        demand: b.demandMoment,
        capacity: b.capacityMoment,
        kind: 'moment',
        ratio: b.demandMoment / b.capacityMoment,
        note: `No real bearing length: the plate is too small for this moment. ${BIGGER}`,
      };
  }
}
