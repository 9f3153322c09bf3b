/**
 * Reachline's one vocabulary for results: the words a person reads for a check, for a whole design
 * and for a change between two revisions. The desk, Review, Compare, History, the CLI and the
 * calculation package all take their words from here; the client's colour classes are keyed by the
 * same states (src/lib/verdict-style.ts). Only words change here: the JSON keys and status values of
 * the engine contract (`ok`, `ratio`, check ids) are untouched.
 *
 * A check with ratio null was not computed: it is never a pass, and it sorts with the worst.
 */
import type { Check } from '../engine/types';

/** A check's state: passes, passes near its limit (ratio 0.9 or more), does not pass, not computed. */
export type VerdictState = 'pass' | 'near' | 'fail' | 'none';

/** Ratios from this value up to 1.0 pass "near limit" (common practice, no source: a 10 % margin). */
export const NEAR_LIMIT = 0.9;

export const CHECK_WORDS = {
  pass: 'passes',
  near: 'passes, near limit',
  fail: 'does not pass',
  none: 'not computed',
} as const satisfies Record<VerdictState, string>;

export type CheckWord = (typeof CHECK_WORDS)[VerdictState];

/** A mark that goes with the word (never instead of it). */
export const CHECK_MARKS: Record<VerdictState, string> = { pass: '✓', near: '!', fail: '✕', none: '?' };

/** A whole design: every check passes, some do not, or nothing was computed. */
export type DesignState = 'pass' | 'fail' | 'none';
export const DESIGN_WORDS = {
  pass: 'Passes',
  fail: 'Does not pass',
  none: 'Not computed',
} as const satisfies Record<DesignState, string>;

/** How a check's ratio moved from an earlier revision to a later one. */
export type TrendState = 'up' | 'down' | 'same' | 'new' | 'gone' | 'none';
export const TREND_WORDS = {
  up: 'ratio up',
  down: 'ratio down',
  same: 'same ratio',
  new: 'new check',
  gone: 'no longer checked',
  none: 'not computed',
} as const satisfies Record<TrendState, string>;

/** The word with a capital first letter, for the start of a table cell or a sentence. */
export function capitalised(word: string): string {
  return word.charAt(0).toUpperCase() + word.slice(1);
}

function computed(ratio: number | null): ratio is number {
  return ratio !== null && Number.isFinite(ratio);
}

/** A check passes only when it was computed, is within capacity and the engine says ok. */
export function passes(check: Pick<Check, 'ratio' | 'ok'>): boolean {
  return check.ok && computed(check.ratio) && check.ratio <= 1;
}

export function checkState(check: Pick<Check, 'ratio' | 'ok'>): VerdictState {
  if (!computed(check.ratio)) return 'none';
  if (!passes(check)) return 'fail';
  return check.ratio >= NEAR_LIMIT ? 'near' : 'pass';
}

export function checkWord(check: Pick<Check, 'ratio' | 'ok'>): CheckWord {
  return CHECK_WORDS[checkState(check)];
}

/** The state a word stands for (the check board keys its colours by state). */
export type Tone = VerdictState;
export function checkTone(word: CheckWord): Tone {
  const found = (Object.keys(CHECK_WORDS) as VerdictState[]).find((s) => CHECK_WORDS[s] === word);
  return found ?? 'none';
}

function severity(check: Check): number {
  if (!computed(check.ratio)) return Number.POSITIVE_INFINITY;
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
  state: DesignState;
  /** DESIGN_WORDS[state]. */
  word: string;
  pass: boolean;
  failing: number;
  notComputed: number;
  total: number;
  sentence: string;
}

/** The design's verdict; `engineOk` false (the result's own `ok`) never reads as a pass. */
export function verdictOf(checks: readonly Check[], engineOk = true): Verdict {
  const total = checks.length;
  const notComputed = checks.filter((c) => checkState(c) === 'none').length;
  const failing = checks.filter((c) => !passes(c)).length;
  const make = (state: DesignState, sentence: string): Verdict => ({
    state,
    word: DESIGN_WORDS[state],
    pass: state === 'pass',
    failing,
    notComputed,
    total,
    sentence,
  });
  if (total === 0) return make('none', 'No checks were computed.');
  if (failing === 0 && engineOk) return make('pass', `All ${total} checks pass.`);
  if (failing === 0)
    return make('fail', `The engine did not accept the design although its ${total} checks pass.`);
  const parts = [`${failing} of ${total} checks do not pass`];
  if (notComputed > 0) parts.push(`${notComputed} of them could not be computed`);
  return make('fail', `${parts.join('; ')}.`);
}
