/**
 * Gathers the document's loads by case into one distributed load q(x) = q0 + q1 x and point loads,
 * in internal units (kip/in, kip, in). Area loads act on the tributary width (the spacing); the
 * self-weight of a tapered member varies linearly with x because its area does.
 */
import type { LoadCase } from '../../schemas/member';
import type { ParsedLoads } from '../../schemas/parsed-design';
import { LOAD_CASES } from '../../schemas/member';
import type { MemberSection } from '../sections/section-types';
import { STEEL_DENSITY } from '../sections/steel-grades';

export interface PointLoad {
  P: number;
  /** Distance from the root, in. */
  a: number;
}

export interface CaseLoads {
  case: LoadCase;
  /** Distributed load at the root, kip/in. */
  q0: number;
  /** Change of distributed load per inch along x, kip/in^2. */
  q1: number;
  points: PointLoad[];
}

/** Steel self-weight along x: q(x) = q0 + q1 x, kip/in. */
export function selfWeightLine(section: MemberSection, L: number): { q0: number; q1: number } {
  const q0 = STEEL_DENSITY * section.root.A;
  const q1 = (STEEL_DENSITY * (section.tip.A - section.root.A)) / L;
  return { q0, q1 };
}

function entryOf(byCase: Map<LoadCase, CaseLoads>, c: LoadCase): CaseLoads {
  let entry = byCase.get(c);
  if (!entry) {
    entry = { case: c, q0: 0, q1: 0, points: [] };
    byCase.set(c, entry);
  }
  return entry;
}

/** Loads of each case present (a case is present when it carries a non-zero load). */
export function gatherCaseLoads(
  loads: ParsedLoads,
  section: MemberSection,
  L: number,
  spacing: number,
): CaseLoads[] {
  const byCase = new Map<LoadCase, CaseLoads>();
  if (loads.selfWeight) {
    const sw = selfWeightLine(section, L);
    const d = entryOf(byCase, 'D');
    d.q0 += sw.q0;
    d.q1 += sw.q1;
  }
  for (const a of loads.area) {
    const v = a.value.value * spacing;
    if (v !== 0) entryOf(byCase, a.case).q0 += v;
  }
  for (const l of loads.line) {
    const v = l.value.value;
    if (v !== 0) entryOf(byCase, l.case).q0 += v;
  }
  for (const p of loads.point) {
    const P = p.value.value;
    if (P !== 0) entryOf(byCase, p.case).points.push({ P, a: p.at.value });
  }
  const present: CaseLoads[] = [];
  for (const c of LOAD_CASES) {
    const entry = byCase.get(c);
    if (entry) present.push(entry);
  }
  return present;
}
