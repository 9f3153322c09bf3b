/**
 * Geometry checks are lists of "needs at least X, has Y" conditions. The check's ratio is the worst
 * need/have; a condition with nothing available (a rod outside the plate) cannot give a ratio and
 * fails outright. Every failed condition is named in the note with what to change.
 */
import type { UnitSystem } from '../units';
import type { Evaluation } from './check-row';
import { formatLength } from './result-quantity';

export interface Condition {
  /** What is measured, in plain words. */
  what: string;
  /** The least value needed and the value the layout has, in. */
  need: number;
  have: number;
  /** What to change when it fails. */
  fix: string;
}

export function evaluateConditions(conditions: readonly Condition[], units: UnitSystem): Evaluation {
  let worst: Condition | undefined;
  let worstRatio = -Infinity;
  let impossible = false;
  const problems: string[] = [];
  for (const c of conditions) {
    const ratio = c.have > 0 ? c.need / c.have : Infinity;
    if (!(c.have > 0)) impossible = true;
    if (ratio > 1)
      problems.push(
        `${c.what}: needs ${formatLength(c.need, units)}, has ${formatLength(c.have, units)}; ${c.fix}.`,
      );
    if (ratio > worstRatio) {
      worstRatio = ratio;
      worst = c;
    }
  }
  if (!worst) return { demand: null, capacity: null, kind: 'smallLength', ratio: 0 };
  const ev: Evaluation = {
    demand: worst.need,
    capacity: worst.have,
    kind: 'smallLength',
    ratio: impossible ? null : worstRatio,
  };
  if (problems.length) ev.note = problems.join(' ');
  return ev;
}
