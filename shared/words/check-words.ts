/**
 * How the check board words and orders checks. A check with ratio null was not computed: it is
 * never shown as a pass, and it sorts with the worst.
 */
import type { Check } from '../engine/types';

export type CheckWord = 'ample' | 'adequate' | 'near limit' | 'exceeds' | 'not computed' | 'fails';
export type Tone = 'calm' | 'steady' | 'near' | 'over';

export function checkWord(check: Pick<Check, 'ratio' | 'ok'>): CheckWord {
  if (check.ratio === null || !Number.isFinite(check.ratio)) return 'not computed';
  if (check.ratio > 1) return 'exceeds';
  if (!check.ok) return 'fails';
  if (check.ratio >= 0.9) return 'near limit';
  if (check.ratio >= 0.6) return 'adequate';
  return 'ample';
}

export function checkTone(word: CheckWord): Tone {
  switch (word) {
    case 'ample':
      return 'calm';
    case 'adequate':
      return 'steady';
    case 'near limit':
      return 'near';
    default:
      return 'over';
  }
}

/** A check passes only when it was computed, is within capacity and the engine says ok. */
export function passes(check: Pick<Check, 'ratio' | 'ok'>): boolean {
  return check.ok && check.ratio !== null && Number.isFinite(check.ratio) && check.ratio <= 1;
}

function severity(check: Check): number {
  if (check.ratio === null || !Number.isFinite(check.ratio)) return Number.POSITIVE_INFINITY;
  return passes(check) ? check.ratio : Math.max(check.ratio, 1) + 1e6;
}

/** Worst first: not computed, then failing by ratio, then passing by ratio; ties keep the engine's order. */
export function sortWorstFirst(checks: readonly Check[]): Check[] {
  return checks
    .map((check, index) => ({ check, index }))
    .sort((a, b) => severity(b.check) - severity(a.check) || a.index - b.index)
    .map((x) => x.check);
}

export interface Verdict {
  pass: boolean;
  failing: number;
  notComputed: number;
  total: number;
  sentence: string;
}

export function verdictOf(checks: readonly Check[]): Verdict {
  const total = checks.length;
  const notComputed = checks.filter((c) => checkWord(c) === 'not computed').length;
  const failing = checks.filter((c) => !passes(c)).length;
  if (total === 0)
    return { pass: false, failing: 0, notComputed: 0, total, sentence: 'No checks were computed.' };
  if (failing === 0)
    return { pass: true, failing, notComputed, total, sentence: `All ${total} checks pass.` };
  const parts = [`${failing} of ${total} checks do not pass`];
  if (notComputed > 0) parts.push(`${notComputed} of them could not be computed`);
  return { pass: false, failing, notComputed, total, sentence: `${parts.join('; ')}.` };
}
