import type { Check } from '../../shared/engine/types';
import { TREND_WORDS, capitalised, type TrendState } from '../../shared/words/check-words';

/** How the ratio moved; its words are TREND_WORDS of the shared vocabulary. */
export type RatioTrend = TrendState;

export interface RatioRow {
  id: string;
  title: string;
  ratioA: number | null;
  ratioB: number | null;
  okA: boolean | null;
  okB: boolean | null;
  /** ratioB - ratioA, when both were computed. */
  change: number | null;
  trend: RatioTrend;
}

/** Ratios closer than this are the same to the two decimals the screen shows. */
const SAME = 0.005;

function usable(ratio: number | null | undefined): ratio is number {
  return typeof ratio === 'number' && Number.isFinite(ratio);
}

/**
 * Every check id of either revision with its ratio before (a) and after (b). A ratio of null was not
 * computed and counts as failing; it is never shown as a pass.
 */
export function ratioRows(a: Check[], b: Check[]): RatioRow[] {
  const byIdA = new Map(a.map((c) => [c.id, c]));
  const byIdB = new Map(b.map((c) => [c.id, c]));
  const ids = [...new Set([...a.map((c) => c.id), ...b.map((c) => c.id)])];
  return ids.map((id) => {
    const ca = byIdA.get(id);
    const cb = byIdB.get(id);
    const ratioA = ca ? ca.ratio : null;
    const ratioB = cb ? cb.ratio : null;
    const okA = ca ? ca.ok && usable(ca.ratio) : null;
    const okB = cb ? cb.ok && usable(cb.ratio) : null;
    let trend: RatioTrend;
    let change: number | null = null;
    if (!ca) trend = 'new';
    else if (!cb) trend = 'gone';
    else if (!usable(ratioA) || !usable(ratioB)) trend = 'none';
    else {
      change = ratioB - ratioA;
      trend = Math.abs(change) < SAME ? 'same' : change > 0 ? 'up' : 'down';
    }
    return { id, title: (cb ?? ca)?.title ?? id, ratioA, ratioB, okA, okB, change, trend };
  });
}

/** One sentence for screen readers: how many ratios went up or down, and the verdicts. */
export function ratioSummary(rows: RatioRow[]): string {
  const count = (t: RatioTrend) => rows.filter((r) => r.trend === t).length;
  const failingB = rows.filter((r) => r.okB === false).length;
  const checks = (n: number) => `${n} ${n === 1 ? 'check' : 'checks'}`;
  const parts = [
    `${TREND_WORDS.up} on ${checks(count('up'))}`,
    `${TREND_WORDS.down} on ${count('down')}`,
    `${TREND_WORDS.same} on ${count('same')}`,
  ];
  if (count('none')) parts.push(`${TREND_WORDS.none}: ${count('none')}`);
  if (count('new')) parts.push(`${TREND_WORDS.new}: ${count('new')}`);
  if (count('gone')) parts.push(`${TREND_WORDS.gone}: ${count('gone')}`);
  const later =
    failingB === 0
      ? 'Every check of the later revision passes.'
      : `${checks(failingB)} of the later revision ${failingB === 1 ? 'does' : 'do'} not pass or ${failingB === 1 ? 'was' : 'were'} not computed.`;
  return `${capitalised(parts.join(', '))}. ${later}`;
}
