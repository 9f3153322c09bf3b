/**
 * member.vibration: the first natural frequency against the threshold the design states
 * (frequencyMin). No published minimum for decks was found (REFERENCES.md), so the engine sets no
 * default: without a threshold there is no check row (a pass that was not computed is never
 * reported); the frequency itself is always in the result (member.frequency).
 */
import type { Check } from '../types';
import { quantity, type UnitSystem } from '../units';

/** @param f first frequency, Hz; @param fMin required minimum, Hz (undefined: no check). */
export function vibrationCheck(f: number, fMin: number | undefined, units: UnitSystem): Check | null {
  if (fMin === undefined) return null;
  const ratio = fMin / f;
  return {
    id: 'member.vibration',
    title: 'First natural frequency',
    reference: 'Serviceability: threshold stated in the design (frequencyMin)',
    combination: 'steel weight + D',
    demand: quantity(fMin, 'frequency', units),
    capacity: quantity(f, 'frequency', units),
    ratio,
    ok: ratio <= 1,
    note:
      ratio <= 1
        ? 'required minimum / computed frequency; occupants add mass and lower it a little'
        : 'the member is too lively for the stated threshold: a stiffer (deeper) section or a shorter reach raises the frequency',
  };
}
