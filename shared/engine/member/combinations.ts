/**
 * Load combinations of ASCE 7-16: 2.3.1 and 2.3.6 (strength, LRFD), 2.4.1 and 2.4.5 (allowable
 * stress, ASD), with the cases D, L, Lr, S, W (wind, signed: negative lifts) and, when the document
 * gives `loads.seismic`, the vertical seismic effect Ev = 0.2 SDS D (12.4.2.2) and in Seismic Design
 * Categories D to F the net upward 0.2 D of 12.4.4. The horizontal seismic effect Eh of the deck's
 * mass along the beam is out of scope (METHOD.md). Rain R is not a case here.
 * Only combinations whose variable cases are present are listed.
 *
 * The factor on L in 2.3.1 combinations 3 and 4 and in 2.3.6 combination 6 is taken as 1.0. ASCE 7-16
 * permits 0.5 where the live load is at most 100 psf and the area is not a garage or place of
 * assembly; the engine cannot know the occupancy, so it keeps the larger, conservative factor.
 */
import type { LoadCase } from '../../schemas/member';

export type Factors = Partial<Record<LoadCase, number>>;

export interface Combination {
  name: string;
  factors: Factors;
}

/** The seismic data the combinations need (loads.seismic). */
export interface SeismicData {
  SDS: number;
  category: 'A' | 'B' | 'C' | 'D' | 'E' | 'F';
}

const ROOF: readonly LoadCase[] = ['Lr', 'S'];

/** A name like "1.2D + 1.6S + L", terms in the order ASCE 7 writes them (a factor of 1 is not written). */
export function combinationName(factors: Factors): string {
  const terms: string[] = [];
  for (const [c, f] of Object.entries(factors)) terms.push(f === 1 ? c : `${f}${c}`);
  return terms.join(' + ');
}

/**
 * One term of a combination: a load case, or the vertical seismic effect Ev (a multiple of D).
 * `written` is the factor as printed (the strength combinations print "1.0W", as ASCE 7 does).
 */
type Term = [LoadCase | 'Ev', number, string?];

function make(present: ReadonlySet<LoadCase>, terms: Term[], seismic?: SeismicData): Combination {
  const factors: Factors = {};
  let name = '';
  for (const [c, f, written] of terms) {
    if (c === 'Ev') {
      if (!present.has('D') || !seismic) continue;
      factors.D = (factors.D ?? 0) + f * 0.2 * seismic.SDS;
    } else {
      if (!present.has(c)) continue;
      factors[c] = (factors[c] ?? 0) + f;
    }
    const shown = written ?? (Math.abs(f) === 1 ? '' : String(Math.abs(f)));
    const sign = f < 0 ? ' - ' : ' + ';
    name += name === '' ? (f < 0 ? '-' : '') + shown + c : sign + shown + c;
  }
  // Round-off from 1.2 + 0.2 SDS and the like is not load.
  for (const k of Object.keys(factors) as LoadCase[]) factors[k] = Number(factors[k]!.toPrecision(12));
  return { name, factors };
}

const memo = new Map<string, Combination[]>();

/** The same list for the same cases: combinations are built once per set of cases present. */
function memoised(
  kind: string,
  present: ReadonlySet<LoadCase>,
  seismic: SeismicData | undefined,
  build: () => Combination[],
): Combination[] {
  let key = kind;
  for (const c of ['D', 'L', 'Lr', 'S', 'W'] as const) if (present.has(c)) key += c;
  if (seismic) key += `|${seismic.SDS}|${seismic.category}`;
  let hit = memo.get(key);
  if (!hit) {
    hit = build();
    if (memo.size > 500) memo.clear();
    memo.set(key, hit);
  }
  return hit;
}

/** ASCE 7-16 2.3.1 combinations 1-5 and 2.3.6 combinations 6-7 (strength), plus 12.4.4. */
export function strengthCombinations(present: ReadonlySet<LoadCase>, seismic?: SeismicData): Combination[] {
  return memoised('strength', present, seismic, () => buildStrength(present, seismic));
}

/** ASCE 7-16 2.4.1 combinations 1-8 and 2.4.5 (allowable stress), plus 12.4.4. */
export function allowableCombinations(present: ReadonlySet<LoadCase>, seismic?: SeismicData): Combination[] {
  return memoised('allowable', present, seismic, () => buildAllowable(present, seismic));
}

/**
 * The service combinations for deflection: ASCE 7-16 2.4.1 combinations 1-4 (gravity: D, L, Lr, S),
 * whatever the design method. Wind and seismic are not deflection combinations here (IBC Table
 * 1604.3's floor limits are for L and D + L).
 */
export function serviceCombinations(present: ReadonlySet<LoadCase>): Combination[] {
  return memoised('service', present, undefined, () => dedupe(gravityAllowable(present)));
}

/** 12.4.4 applies in Seismic Design Categories D, E and F. */
function netUpward(seismic: SeismicData | undefined): boolean {
  return seismic !== undefined && ['D', 'E', 'F'].includes(seismic.category);
}

export const NET_UPWARD_NAME = '0.2D upward (ASCE 7-16 12.4.4)';

function buildStrength(present: ReadonlySet<LoadCase>, seismic?: SeismicData): Combination[] {
  const out: Combination[] = [];
  const m = (terms: Term[]) => out.push(make(present, terms, seismic));
  const roofs = ROOF.filter((r) => present.has(r));
  const wind = present.has('W');
  if (present.has('D')) m([['D', 1.4]]);
  if (present.has('L')) {
    if (roofs.length === 0)
      m([
        ['D', 1.2],
        ['L', 1.6],
      ]);
    for (const r of roofs)
      m([
        ['D', 1.2],
        ['L', 1.6],
        [r, 0.5],
      ]);
  }
  for (const r of roofs) {
    m([
      ['D', 1.2],
      [r, 1.6],
      ['L', 1.0],
    ]);
    if (wind)
      m([
        ['D', 1.2],
        [r, 1.6],
        ['W', 0.5],
      ]);
  }
  if (wind) {
    if (roofs.length === 0)
      m([
        ['D', 1.2],
        ['W', 1, '1.0'],
        ['L', 1],
      ]);
    for (const r of roofs)
      m([
        ['D', 1.2],
        ['W', 1, '1.0'],
        ['L', 1],
        [r, 0.5],
      ]);
    m([
      ['D', 0.9],
      ['W', 1, '1.0'],
    ]);
  }
  if (seismic && present.has('D')) {
    m([
      ['D', 1.2],
      ['Ev', 1],
      ['L', 1],
      ['S', 0.2],
    ]);
    m([
      ['D', 0.9],
      ['Ev', -1],
    ]);
  }
  if (netUpward(seismic) && present.has('D')) out.push({ name: NET_UPWARD_NAME, factors: { D: -0.2 } });
  return dedupe(out);
}

function gravityAllowable(present: ReadonlySet<LoadCase>): Combination[] {
  const out: Combination[] = [];
  const m = (terms: Term[]) => out.push(make(present, terms));
  const roofs = ROOF.filter((r) => present.has(r));
  if (present.has('D')) m([['D', 1]]);
  if (present.has('L'))
    m([
      ['D', 1],
      ['L', 1],
    ]);
  for (const r of roofs)
    m([
      ['D', 1],
      [r, 1],
    ]);
  if (present.has('L'))
    for (const r of roofs)
      m([
        ['D', 1],
        ['L', 0.75],
        [r, 0.75],
      ]);
  return out;
}

function buildAllowable(present: ReadonlySet<LoadCase>, seismic?: SeismicData): Combination[] {
  const out = gravityAllowable(present);
  const m = (terms: Term[]) => out.push(make(present, terms, seismic));
  const roofs = ROOF.filter((r) => present.has(r));
  if (present.has('W')) {
    m([
      ['D', 1],
      ['W', 0.6],
    ]);
    // 2.4.1 combination 6a: D + 0.75L + 0.75(0.6W) + 0.75(Lr or S or R).
    if (roofs.length === 0)
      m([
        ['D', 1],
        ['L', 0.75],
        ['W', 0.45],
      ]);
    for (const r of roofs)
      m([
        ['D', 1],
        ['L', 0.75],
        ['W', 0.45],
        [r, 0.75],
      ]);
    m([
      ['D', 0.6],
      ['W', 0.6],
    ]);
  }
  if (seismic && present.has('D')) {
    // 2.4.5 combinations 5, 6 and 8 with Eh left out.
    m([
      ['D', 1],
      ['Ev', 0.7],
    ]);
    m([
      ['D', 1],
      ['Ev', 0.525],
      ['L', 0.75],
      ['S', 0.75],
    ]);
    m([
      ['D', 0.6],
      ['Ev', -0.7],
    ]);
  }
  if (netUpward(seismic) && present.has('D')) out.push({ name: NET_UPWARD_NAME, factors: { D: -0.2 } });
  return dedupe(out);
}

function dedupe(list: Combination[]): Combination[] {
  const seen = new Set<string>();
  return list.filter((c) => c.name !== '' && !seen.has(c.name) && seen.add(c.name));
}
