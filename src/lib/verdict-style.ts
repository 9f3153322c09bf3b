/**
 * The colours of the result vocabulary (shared/words/check-words.ts), keyed by the same states, so
 * that every screen paints a word the same way. Colour always goes with the word, never alone.
 */
import type { DesignState, TrendState, VerdictState } from '../../shared/words/check-words';

/** Text of a check's word (the near-limit amber is too light for text: the mark and bar carry it). */
export const CHECK_TEXT: Record<VerdictState, string> = {
  pass: 'text-util-calm',
  near: 'text-concrete-800',
  fail: 'font-semibold text-util-over',
  none: 'font-semibold text-util-over',
};

/** Fill of a check's utilisation bar. */
export const CHECK_BAR: Record<VerdictState, string> = {
  pass: 'bg-util-calm',
  near: 'bg-util-near',
  fail: 'bg-util-over',
  none: 'bg-util-over',
};

export const DESIGN_TEXT: Record<DesignState, string> = {
  pass: 'text-util-calm',
  fail: 'text-util-over',
  none: 'text-concrete-600',
};

export const TREND_TEXT: Record<TrendState, string> = {
  up: 'text-util-over',
  down: 'text-concrete-800 [&_svg]:text-util-calm',
  same: 'text-concrete-600',
  new: 'text-concrete-700',
  gone: 'text-concrete-700',
  none: 'text-util-over',
};
