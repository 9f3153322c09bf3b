/**
 * member.flexure and member.flexure.uplift: the governing flexural limit state (AISC 360-16 Chapter F)
 * against the moment of each combination, with the compression flange's unbraced segments
 * (lateral-support.ts). Hogging moment (gravity, "down") puts the bottom flange in compression:
 * member.flexure. Sagging moment (net uplift, "up") puts the top flange in compression:
 * member.flexure.uplift, present only when some combination lifts the member somewhere.
 * A tapered member is checked at every station with the local section; a prismatic one at every
 * station with the one section's strength per segment (with signed loads the largest moment of a
 * sign need not be at the root).
 */
import type { Check } from '../types';
import { formatQuantity, quantity } from '../units';
import type { CheckContext } from './check-context';
import { clearlyGreater } from '../ties';
import { flexuralStrengthOf } from './flexural-strength';
import {
  bottomFlangeSegments,
  cbF11,
  topFlangeSegment,
  unbracedSegment,
  type Segment,
} from './lateral-support';
import { available, type Strength } from './strength-types';
import { notComputedRow } from './not-computed';
import { momentOfCombination } from '../member/analysis';

const PHI_B = 0.9;
const OMEGA_B = 1.67;

interface SideWorst {
  ratio: number;
  combo: number;
  node: number;
  segment: Segment;
  Cb: number;
  strength: Strength;
  capacity: number;
  /** A station with no positive strength, with its strength (or null). */
  noCapacity: { node: number; strength: Strength } | null;
  /** The first station outside the clauses (e.g. a web beyond F13.2), or -1. */
  outside: number;
  /** Some combination loads this flange at some station. */
  loaded: boolean;
}

/** The nominal strength at each station for one unbraced length and Cb, computed when first asked. */
class StationStrengths {
  private readonly list: Strength[] = [];
  private fn: ReturnType<typeof flexuralStrengthOf> | null = null;

  constructor(
    private readonly ctx: CheckContext,
    private readonly Le: number,
    private readonly Cb: number,
  ) {}

  at(node: number): Strength {
    const { section, model, Fy, E } = this.ctx;
    const i = section.prismatic ? 0 : node;
    let hit = this.list[i];
    if (!hit) {
      this.fn ??= flexuralStrengthOf(section, { Fy, E, Lb: this.Le, Cb: this.Cb });
      hit = this.fn(model.props[i]);
      this.list[i] = hit;
    }
    return hit;
  }
}

/**
 * Nominal strength at each station for a segment and Cb, never below the same station with no
 * braces (`floor`). One table per (Le, Cb), kept and handed out again: the same pair is asked for by
 * every combination (numbers as Map keys, no key text to build per call). Classes rather than
 * closures: these are made for every design of a study.
 */
class StrengthFinder {
  private readonly tables = new Map<number, Map<number, StationStrengths>>();

  constructor(
    private readonly ctx: CheckContext,
    private readonly floor: Segment | null,
  ) {}

  table(Le: number, Cb: number): StationStrengths {
    let byCb = this.tables.get(Le);
    if (!byCb) {
      byCb = new Map();
      this.tables.set(Le, byCb);
    }
    let found = byCb.get(Cb);
    if (!found) {
      found = new StationStrengths(this.ctx, Le, Cb);
      byCb.set(Cb, found);
    }
    return found;
  }

  /** The floor's table for `segment`, or null when the segment is its own floor. */
  floorOf(segment: Segment): StationStrengths | null {
    return !this.floor || this.floor === segment ? null : this.table(this.floor.Le, 1);
  }
}

function strengthAt(own: StationStrengths, floor: StationStrengths | null, node: number): Strength {
  const a = own.at(node);
  if (!floor) return a;
  const b = floor.at(node);
  return b.nominal > a.nominal ? b : a;
}

function worstOfSide(ctx: CheckContext, sign: 1 | -1, segments: Segment[], floor: Segment | null): SideWorst {
  const { model, method } = ctx;
  const x = model.grid.x;
  const last = x.length - 1; // the tip carries no moment
  const finder = new StrengthFinder(ctx, floor);
  const first = strengthAt(finder.table(segments[0].Le, 1), finder.floorOf(segments[0]), 0);
  const w: SideWorst = {
    ratio: 0,
    combo: 0,
    node: 0,
    segment: segments[0],
    Cb: 1,
    strength: first,
    capacity: available(first.nominal, method, PHI_B, OMEGA_B),
    noCapacity: null,
    outside: -1,
    loaded: false,
  };
  const tol = model.L * 1e-9;
  const lrfd = method === 'LRFD';
  for (const seg of segments) {
    let i0 = 0;
    while (i0 < last && x[i0] < seg.from - tol) i0++;
    let i1 = i0;
    while (i1 < last && x[i1] <= seg.to + tol) i1++;
    const floorTable = finder.floorOf(seg);
    if (sign === 1 && w.outside < 0 && !ctx.section.prismatic) {
      // A station outside the clauses fails the check whatever its moment (web slenderness alone).
      const any = finder.table(seg.Le, 1);
      for (let i = i0; i < i1 && w.outside < 0; i++)
        if (strengthAt(any, floorTable, i).outOfScope !== undefined) w.outside = i;
    }
    for (let c = 0; c < ctx.combos.length; c++) {
      const M = ctx.combos[c].response.M;
      let Cb = 1;
      if (seg.cbF11) {
        let Mmax = 0;
        for (let i = i0; i < i1; i++) Mmax = Math.max(Mmax, Math.abs(M[i]));
        const len = seg.to - seg.from;
        const factors = ctx.combos[c].factors;
        Cb = cbF11(
          Mmax,
          momentOfCombination(model, factors, seg.from + 0.25 * len),
          momentOfCombination(model, factors, seg.from + 0.5 * len),
          momentOfCombination(model, factors, seg.from + 0.75 * len),
        );
      }
      const own = finder.table(seg.Le, Cb);
      for (let i = i0; i < i1; i++) {
        const demand = sign * M[i];
        if (!(demand > 0)) continue;
        w.loaded = true;
        const s = strengthAt(own, floorTable, i);
        if (s.outOfScope !== undefined && w.outside < 0) w.outside = i;
        // available() written out: this runs for every station of every combination.
        const cap = lrfd ? PHI_B * s.nominal : s.nominal / OMEGA_B;
        if (!(cap > 0)) {
          if (!w.noCapacity) w.noCapacity = { node: i, strength: s };
          continue;
        }
        const ratio = demand / cap;
        if (clearlyGreater(ratio, w.ratio)) {
          w.ratio = ratio;
          w.combo = c;
          w.node = i;
          w.segment = seg;
          w.Cb = Cb;
          w.strength = s;
          w.capacity = cap;
        }
      }
    }
  }
  return w;
}

/** member.flexure (bottom flange in compression), always; member.flexure.uplift when uplift occurs. */
export function flexureChecks(ctx: CheckContext): Check[] {
  const { lateral, model, Lb } = ctx;
  if (ctx.section.family === 'C' && lateral.topFlange === 'free' && lateral.loadAt === 'top-flange') {
    // A channel loaded on a top flange that nothing holds twists (the load is off its shear centre).
    return [
      notComputedRow(
        ctx,
        'member.flexure',
        'Bending',
        'AISC 360-16 F2',
        'not computed: a channel loaded on its top flange twists because the load is off its shear centre; hold the top flange (lateralSupport.topFlange "braced", the deck fastened to it) or check the torsion separately (AISC Design Guide 9)',
        0,
      ),
    ];
  }
  const segments = bottomFlangeSegments(lateral, model.L, Lb);
  const floor = segments.length > 1 ? unbracedSegment(lateral, model.L, Lb) : null;
  const down = worstOfSide(ctx, 1, segments, floor);
  const out = [rowOf(ctx, 'member.flexure', down, segments.length > 1 || lateral.given)];
  const top = topFlangeSegment(lateral, model.L);
  const up = worstOfSide(ctx, -1, [top], null);
  if (up.loaded) out.push(rowOf(ctx, 'member.flexure.uplift', up, true));
  return out;
}

/** The older single-row entry point (member.flexure only). */
export function flexureCheck(ctx: CheckContext): Check {
  return flexureChecks(ctx)[0];
}

function rowOf(ctx: CheckContext, id: string, w: SideWorst, namedSegments: boolean): Check {
  const { model, section, units } = ctx;
  const uplift = id === 'member.flexure.uplift';
  const title = uplift
    ? 'Bending under uplift (top flange in compression)'
    : section.prismatic
      ? 'Bending at the root'
      : 'Bending along the tapered member';
  if (w.noCapacity) {
    const s = w.noCapacity.strength;
    const note = `no flexural strength could be computed for this section (${s.outOfScope ?? s.limitState}); use a stockier web or flange`;
    return notComputedRow(
      ctx,
      id,
      uplift ? 'Bending under uplift' : 'Bending',
      `AISC 360-16 ${s.clause}`,
      note,
      w.noCapacity.node,
    );
  }
  const s = w.strength;
  const combo = ctx.combos[w.combo];
  const ltb = s.limitState === 'lateral-torsional buckling';
  const notes: string[] = [];
  if (!namedSegments) {
    // The older unbraced-length rule (no member.lateralSupport): the note reads as it always has.
    notes.push(
      ltb
        ? `${s.limitState} governs (Cb = ${w.Cb.toFixed(1)}, unbraced bottom flange ${(w.segment.Le / 12).toFixed(2)} ft)`
        : `${s.limitState} governs`,
    );
    if (w.segment.Le < model.L * (1 - 1e-9)) {
      notes.push(
        'unbracedLength is applied to the whole member; to check each segment between braces give member.lateralSupport.braces',
      );
    }
  } else {
    const seg = w.segment.label;
    notes.push(
      ltb
        ? `${s.limitState} governs over ${seg} (Cb = ${w.Cb.toFixed(2)}, K = ${w.segment.K.toFixed(2)}, effective length ${(w.segment.Le / 12).toFixed(2)} ft)`
        : `${s.limitState} governs (${seg})`,
    );
  }
  if (section.family === 'C')
    notes.push(
      'torsion from load on the top flange taken as restrained by the deck (lateralSupport.topFlange "braced")',
    );
  // A station outside the clauses fails the check even when another station has the worst ratio.
  const outside = s.outOfScope ? w.node : w.outside;
  if (outside >= 0) {
    const text = s.outOfScope ?? strengthOfNode(ctx, w, outside);
    const where = section.prismatic
      ? ''
      : ` (at ${formatQuantity(quantity(model.grid.x[outside], 'length', units))} from the root)`;
    notes.push(`${text}${where}`);
  }
  if (w.ratio > 1) {
    notes.push(
      ltb
        ? uplift
          ? 'over capacity: hold the top flange (deck fastened to it, or braces of the top flange), or use a wider flange or a heavier section'
          : 'over capacity: for a cantilever, a restraint at the tip that stops it twisting (an edge member or a tip brace), a brace of the bottom flange near the tip, or a wider flange helps most; a heavier section also helps'
        : 'over capacity: a deeper or heavier section would help',
    );
  }
  const check: Check = {
    id,
    title,
    reference: `AISC 360-16 ${s.clause}`,
    combination: combo?.name ?? null,
    demand: quantity(combo ? Math.max(0, (uplift ? -1 : 1) * combo.response.M[w.node]) : 0, 'moment', units),
    capacity: quantity(w.capacity, 'moment', units),
    ratio: w.ratio,
    ok: w.ratio <= 1 && outside < 0,
    note: notes.join('; '),
  };
  if (!section.prismatic || w.node !== 0) check.at = quantity(model.grid.x[w.node], 'length', units);
  if (namedSegments || uplift) check.effectiveLength = quantity(w.segment.Le, 'length', units);
  return check;
}

/** The out-of-scope note of a station (re-evaluated only on this rare path). */
function strengthOfNode(ctx: CheckContext, w: SideWorst, node: number): string {
  const fn = flexuralStrengthOf(ctx.section, { Fy: ctx.Fy, E: ctx.E, Lb: w.segment.Le, Cb: 1 });
  return fn(ctx.model.props[ctx.section.prismatic ? 0 : node]).outOfScope ?? '';
}
