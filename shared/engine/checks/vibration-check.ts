/**
 * member.vibration: the first natural frequency against a threshold. The design may state its own
 * (frequencyMin); without one the engine uses 5 Hz: EN 1990:2002/A1:2005 Annex A2, A2.4.3.2(2)
 * asks for a check of pedestrian comfort when the fundamental vertical frequency of a footbridge
 * deck is below 5 Hz (from memory). Passing it means the walking-vibration assessment is not
 * required by that rule; failing it means one is needed (or a stiffer member). No published
 * minimum specific to decks was found (REFERENCES.md); the frequency itself is always in the result.
 */
import type { Check } from '../types';
import { quantity, type UnitSystem } from '../units';

/** Default threshold, Hz, and its source. */
export const DEFAULT_FREQUENCY_MIN = 5;
export const DEFAULT_FREQUENCY_SOURCE =
  'EN 1990 Annex A2, A2.4.3.2: comfort check below 5 Hz (default threshold; set frequencyMin to change it)';

/** @param f first frequency, Hz; @param fMin required minimum, Hz (undefined: the 5 Hz default). */
export function vibrationCheck(f: number, fMin: number | undefined, units: UnitSystem): Check {
  const stated = fMin !== undefined;
  const min = fMin ?? DEFAULT_FREQUENCY_MIN;
  const ratio = min / f;
  return {
    id: 'member.vibration',
    title: 'First natural frequency',
    reference: stated
      ? 'Serviceability: threshold stated in the design (frequencyMin)'
      : DEFAULT_FREQUENCY_SOURCE,
    combination: 'steel weight + D',
    demand: quantity(min, 'frequency', units),
    capacity: quantity(f, 'frequency', units),
    ratio,
    ok: ratio <= 1,
    note:
      ratio <= 1
        ? 'required minimum / computed frequency; occupants add mass and lower it a little'
        : stated
          ? 'the member is too lively for the stated threshold: a stiffer (deeper) section or a shorter reach raises the frequency'
          : 'below 5 Hz a walking-vibration (comfort) assessment is needed: a stiffer (deeper) section, a stiffer root or a shorter reach raises the frequency',
  };
}
