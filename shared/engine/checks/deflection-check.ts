/**
 * member.deflection.live and member.deflection.total: the tip deflection under service loads
 * against IBC 2018/2021 Table 1604.3 with the span of a cantilever taken as twice its length
 * (table footnote [mem]). Service loads are the ASCE 7-16 2.4.1 combinations, unfactored:
 * "total" is the worst whole combination (D + L, D + 0.75L + 0.75S ...), "live" is the worst of
 * the same combinations without D (L, S, Lr, 0.75L + 0.75S ...). The design method does not matter.
 */
import type { LoadCase } from '../../schemas/member';
import type { Check } from '../types';
import type { Combination } from '../member/combinations';
import { combinationName } from '../member/combinations';
import { quantity, type UnitSystem } from '../units';
import { clearlyGreater } from '../ties';

export interface DeflectionInputs {
  /** Unfactored tip deflection of each case present, in. */
  tipByCase: Partial<Record<LoadCase, number>>;
  service: Combination[];
  L: number;
  limits: { live: number; total: number };
  units: UnitSystem;
}

interface ServicePart {
  name: string;
  factors: Combination['factors'];
  /** The same combination without D (its variable loads) and that part's name ("" when none). */
  variable: Combination['factors'];
  variableName: string;
}

const parts = new WeakMap<readonly Combination[], ServicePart[]>();

/** The service combinations split into whole and variable parts, once per (memoised) list. */
function servicePartsOf(service: readonly Combination[]): ServicePart[] {
  let hit = parts.get(service);
  if (!hit) {
    hit = service.map((c) => {
      const variable = Object.fromEntries(Object.entries(c.factors).filter(([k]) => k !== 'D'));
      return { name: c.name, factors: c.factors, variable, variableName: combinationName(variable) };
    });
    parts.set(service, hit);
  }
  return hit;
}

/** The tip deflection of a combination: the sum of factor x case tip, in the factors' own order. */
function tipOf(factors: Combination['factors'], tipByCase: DeflectionInputs['tipByCase']): number {
  let y = 0;
  for (const c in factors) y += (factors[c as LoadCase] as number) * (tipByCase[c as LoadCase] ?? 0);
  return y;
}

export function deflectionChecks(d: DeflectionInputs): Check[] {
  let total = { y: 0, name: null as string | null };
  let live = { y: 0, name: null as string | null };
  for (const c of servicePartsOf(d.service)) {
    const yt = tipOf(c.factors, d.tipByCase);
    if (clearlyGreater(yt, total.y) || total.name === null) total = { y: yt, name: c.name };
    if (!c.variableName) continue;
    const yl = tipOf(c.variable, d.tipByCase);
    if (clearlyGreater(yl, live.y) || live.name === null) live = { y: yl, name: c.variableName };
  }
  return [
    row(
      d,
      'member.deflection.live',
      'Tip deflection under live load',
      d.limits.live,
      live,
      'live, roof live or snow',
    ),
    row(d, 'member.deflection.total', 'Tip deflection under total load', d.limits.total, total, 'service'),
  ];
}

function row(
  d: DeflectionInputs,
  id: string,
  title: string,
  ratio: number,
  y: { y: number; name: string | null },
  what: string,
): Check {
  const limit = (2 * d.L) / ratio;
  const r = y.y / limit;
  return {
    id,
    title,
    reference: 'IBC Table 1604.3 (cantilever: span = 2 x length)',
    combination: y.name,
    demand: quantity(y.y, 'smallLength', d.units),
    capacity: quantity(limit, 'smallLength', d.units),
    ratio: r,
    ok: r <= 1,
    note: y.name === null ? `no ${what} load in this design` : `limit = 2 x length / ${ratio}`,
  };
}
