import type { Check } from '../../shared/engine/types';

export type RatioTrend =
  'worse' | 'better' | 'unchanged' | 'new check' | 'no longer checked' | 'not computed';

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
    if (!ca) trend = 'new check';
    else if (!cb) trend = 'no longer checked';
    else if (!usable(ratioA) || !usable(ratioB)) trend = 'not computed';
    else {
      change = ratioB - ratioA;
      trend = Math.abs(change) < SAME ? 'unchanged' : change > 0 ? 'worse' : 'better';
    }
    return { id, title: (cb ?? ca)?.title ?? id, ratioA, ratioB, okA, okB, change, trend };
  });
}

/** One sentence for screen readers: how many checks got worse or better, and the verdicts. */
export function ratioSummary(rows: RatioRow[]): string {
  const count = (t: RatioTrend) => rows.filter((r) => r.trend === t).length;
  const failingB = rows.filter((r) => r.okB === false).length;
  const parts = [
    `${count('worse')} ${count('worse') === 1 ? 'check' : 'checks'} worse`,
    `${count('better')} better`,
    `${count('unchanged')} unchanged`,
  ];
  if (count('not computed')) parts.push(`${count('not computed')} not computed`);
  if (count('new check')) parts.push(`${count('new check')} new`);
  if (count('no longer checked')) parts.push(`${count('no longer checked')} no longer checked`);
  return `${parts.join(', ')}. ${failingB === 0 ? 'Every check of the later revision passes.' : `${failingB} ${failingB === 1 ? 'check' : 'checks'} of the later revision fail or were not computed.`}`;
}
