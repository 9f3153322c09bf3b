/**
 * The connection part of the result document: the combination that governs the plate and what the
 * plate, bearing and rods look like under it, as quantities in the chosen unit system.
 */
import type { ConnectionResult } from '../types';
import type { UnitSystem } from '../units';
import { resultQuantity as quantity } from './result-quantity';
import type { ComboState } from './combo-state';
import type { ConnectionGeometry } from './connection-geometry';
import { nextStandardThickness } from './plate-thickness';
import { rodEdgeMinimum } from './rod-positions';
import { clearlyGreater } from '../ties';

/** The combination with the largest plate utilisation (thickness or bearing) among those with a modelled solution. */
function plateGoverning(states: readonly ComboState[], t: number, fpMax: number): ComboState | undefined {
  let best: ComboState | undefined;
  let bestScore = -Infinity;
  for (const s of states) {
    const b = s.bearing;
    // A plate whose tension side is outside the DG1 model has no requirement to describe (or schedule).
    if (!s.thickness || !s.thickness.tensionModelled || b.fp === null) continue;
    const bearing = b.case === 'large-moment' ? b.demandMoment / b.capacityMoment : b.fp / fpMax;
    const score = Math.max(s.thickness.required / t, bearing);
    if (bestScore === -Infinity || clearlyGreater(score, bestScore)) {
      bestScore = score;
      best = s;
    }
  }
  return best;
}

/** Removes any extra quantity that is not a finite number (a guard: the contract keys are checked by tests). */
function dropNonFinite(result: ConnectionResult): void {
  for (const key in result) {
    const v = result[key];
    if (v && typeof v === 'object' && 'value' in v && !Number.isFinite(v.value)) delete result[key];
  }
}

/**
 * Which row of rods the moment pulls. Hogging (gravity) lifts the back of a post-base plate and the
 * top of a face plate; uplift reverses both. Plate and rows are symmetric about the plate centre, so
 * the same equations hold with the rows' roles swapped.
 */
export function tensionRowWords(
  arrangement: ConnectionGeometry['arrangement'],
  direction: 'down' | 'up',
): string {
  if (arrangement === 'face-plate') return direction === 'up' ? 'bottom row' : 'top row';
  return direction === 'up' ? 'row on the tip side' : 'row away from the tip';
}

export function buildConnectionResult(
  states: readonly ComboState[],
  geo: ConnectionGeometry,
  fpMax: number,
  sqrtA2A1: number,
  units: UnitSystem,
  impossible: string | null = null,
): ConnectionResult | null {
  if (impossible) return null;
  const s = plateGoverning(states, geo.t, fpMax);
  if (!s || !s.thickness || s.bearing.Y === null || s.bearing.fp === null || s.rodTension === null)
    return null;
  const len = (v: number) => quantity(v, 'smallLength', units);
  const b = s.bearing;
  const result: ConnectionResult = {
    arrangement: geo.arrangement,
    combination: s.combination,
    direction: s.direction,
    tensionRow: tensionRowWords(geo.arrangement, s.direction),
    directionsChecked: [...new Set(states.map((x) => x.direction))],
    plateMoment: quantity(s.M, 'moment', units),
    bearingLength: len(b.Y ?? 0),
    bearingPressure: quantity(b.fp ?? 0, 'stress', units),
    anchorTensionPerRod: quantity(s.rodTension, 'force', units),
    requiredThickness: len(s.thickness.required),
    case: b.case,
    qmax: quantity(b.qMax, 'forcePerLength', units),
    availableBearingStress: quantity(fpMax, 'stress', units),
    confinementFactor: sqrtA2A1,
    rowTension: quantity(s.groupTension ?? 0, 'force', units),
    bearingSideThickness: len(s.thickness.bearingSide),
    tensionSideThickness: len(s.thickness.tensionSide),
    m: len(s.thickness.m),
    n: len(s.thickness.n),
    tensionLever: len(s.thickness.x),
    tensionWidth: len(s.thickness.tensionWidth),
    nextStandardThickness: len(nextStandardThickness(s.thickness.required)),
    unsolvedCombinations: states.filter((x) => x.bearing.Y === null).map((x) => x.combination),
  };
  if (b.e !== null) result.eccentricity = len(b.e);
  if (b.eCrit !== null) result.criticalEccentricity = len(b.eCrit);
  dropNonFinite(result);
  if (geo.rod) {
    result.holeDiameter = len(geo.rod.hole);
    result.washer = { size: len(geo.rod.washerSize), thickness: len(geo.rod.washerThickness) };
    result.minEdgeDistance = len(rodEdgeMinimum(geo.rod));
  }
  return result;
}
