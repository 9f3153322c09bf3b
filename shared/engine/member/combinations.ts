/**
 * Load combinations of ASCE 7-16: 2.3.1 (strength, LRFD) and 2.4.1 (allowable stress, ASD),
 * gravity cases only (D, L, Lr, S; no wind, rain or earthquake in this engine).
 * Only combinations whose variable cases are present are listed.
 *
 * The factor on L in 2.3.1 combination 3 is taken as 1.0. ASCE 7-16 2.3.1 exception 1 permits 0.5
 * where the live load is at most 100 psf and the area is not a garage or place of assembly; the
 * engine cannot know the occupancy, so it keeps the larger, conservative factor.
 */
import type { LoadCase } from '../../schemas/member';

export type Factors = Partial<Record<LoadCase, number>>;

export interface Combination {
  name: string;
  factors: Factors;
}

const ROOF: readonly LoadCase[] = ['Lr', 'S'];

/** A name like "1.2D + 1.6S + L", terms in the order ASCE 7 writes them (a factor of 1 is not written). */
export function combinationName(factors: Factors): string {
  const terms: string[] = [];
  for (const [c, f] of Object.entries(factors)) terms.push(f === 1 ? c : `${f}${c}`);
  return terms.join(' + ');
}

function make(present: ReadonlySet<LoadCase>, factors: Factors): Combination {
  const kept: Factors = {};
  for (const [c, f] of Object.entries(factors) as [LoadCase, number][]) if (present.has(c)) kept[c] = f;
  return { name: combinationName(kept), factors: kept };
}

const memo = new Map<string, Combination[]>();

/** The same list for the same cases: combinations are built once per set of cases present. */
function memoised(kind: string, present: ReadonlySet<LoadCase>, build: () => Combination[]): Combination[] {
  let key = kind;
  for (const c of ['D', 'L', 'Lr', 'S'] as const) if (present.has(c)) key += c;
  let hit = memo.get(key);
  if (!hit) {
    hit = build();
    memo.set(key, hit);
  }
  return hit;
}

/** ASCE 7-16 2.3.1 combinations 1-3 (strength). */
export function strengthCombinations(present: ReadonlySet<LoadCase>): Combination[] {
  return memoised('strength', present, () => buildStrength(present));
}

/** ASCE 7-16 2.4.1 combinations 1-4 (allowable stress, and the service combinations for deflection). */
export function allowableCombinations(present: ReadonlySet<LoadCase>): Combination[] {
  return memoised('allowable', present, () => buildAllowable(present));
}

function buildStrength(present: ReadonlySet<LoadCase>): Combination[] {
  const out: Combination[] = [];
  const roofs = ROOF.filter((r) => present.has(r));
  if (present.has('D')) out.push(make(present, { D: 1.4 }));
  if (present.has('L')) {
    if (roofs.length === 0) out.push(make(present, { D: 1.2, L: 1.6 }));
    for (const r of roofs) out.push(make(present, { D: 1.2, L: 1.6, [r]: 0.5 }));
  }
  for (const r of roofs) out.push(make(present, { D: 1.2, [r]: 1.6, L: 1.0 }));
  return dedupe(out);
}

function buildAllowable(present: ReadonlySet<LoadCase>): Combination[] {
  const out: Combination[] = [];
  const roofs = ROOF.filter((r) => present.has(r));
  if (present.has('D')) out.push(make(present, { D: 1 }));
  if (present.has('L')) out.push(make(present, { D: 1, L: 1 }));
  for (const r of roofs) out.push(make(present, { D: 1, [r]: 1 }));
  if (present.has('L')) for (const r of roofs) out.push(make(present, { D: 1, L: 0.75, [r]: 0.75 }));
  return dedupe(out);
}

function dedupe(list: Combination[]): Combination[] {
  const seen = new Set<string>();
  return list.filter((c) => c.name !== '' && !seen.has(c.name) && seen.add(c.name));
}
