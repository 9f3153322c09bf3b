/**
 * The unbraced segments of the compression flange (member.lateralSupport; METHOD.md "Lateral support").
 *
 * Gravity (moment "down", bottom flange in compression): the bottom-flange braces split the member
 * into segments. A segment braced at both ends takes K = 1.0 and Cb from AISC 360-16 Eq. F1-1; the
 * segment that ends at a free tip takes Cb = 1.0 and K = 1.0 when the deck holds the top flange
 * (topFlange "braced": no credit for the deck beyond that), or the published cantilever factor when the
 * top flange is free (cantilever-effective-length.ts), or the document's effectiveLengthFactor.
 * Uplift (moment "up", top flange in compression): braced by the deck unless topFlange is "free";
 * then the whole length is one cantilever segment with the factor for a load at the shear centre
 * (an upward load on the compression flange is not destabilising), and bottom-flange braces are not
 * credited (they hold the tension flange).
 *
 * A brace can only raise the buckling moment (adding a restraint never lowers an eigenvalue), so each
 * station's strength is never taken below its strength with the braces removed (`unbraced`).
 */
import type { ParsedMember } from '../../schemas/parsed-design';
import {
  cantileverK,
  type LoadHeight,
  type RootRestraint,
  type TipRestraint,
} from './cantilever-effective-length';

export interface Segment {
  /** From and to, in from the root. */
  from: number;
  to: number;
  /** Effective length K x (to - from), in (0 when the flange is held continuously). */
  Le: number;
  /** Cb from Eq. F1-1 (computed per combination) or 1.0. */
  cbF11: boolean;
  /** Plain words for the note: "root to brace at 4 ft". */
  label: string;
  K: number;
}

export interface LateralSupport {
  topFlange: 'braced' | 'free';
  loadAt: 'top-flange' | 'shear-centre';
  root: RootRestraint;
  tip: TipRestraint;
  braces: number[];
  factor: number | undefined;
  /** True when the document gave member.lateralSupport (otherwise the older unbracedLength rule). */
  given: boolean;
}

export function readLateralSupport(member: ParsedMember): LateralSupport {
  const ls = member.lateralSupport;
  return {
    topFlange: ls?.topFlange ?? 'braced',
    loadAt: ls?.loadAt ?? 'top-flange',
    root: ls?.root ?? 'fixed',
    tip: ls?.tip ?? 'free',
    braces: (ls?.braces ?? []).map((b) => b.value).sort((a, b) => a - b),
    factor: ls?.effectiveLengthFactor,
    given: ls !== undefined,
  };
}

const ft = (inches: number) => `${Number((inches / 12).toFixed(2))} ft`;

/** The free-tip (or tip-braced cantilever) factor for a top flange that nothing holds. */
function freeTopK(ls: LateralSupport, root: RootRestraint, load: LoadHeight): number {
  return ls.factor ?? cantileverK(root, ls.tip, load);
}

/**
 * Segments of the bottom flange under gravity.
 * @param legacyLb the older `unbracedLength` (whole member, K = 1, Cb = 1) when lateralSupport is absent.
 */
export function bottomFlangeSegments(ls: LateralSupport, L: number, legacyLb: number): Segment[] {
  if (!ls.given)
    return [{ from: 0, to: L, Le: legacyLb, cbF11: false, label: 'root to tip', K: legacyLb / L }];
  const cuts = [0, ...ls.braces.filter((b) => b > 0 && b < L), L];
  const load: LoadHeight = ls.loadAt === 'top-flange' ? 'destabilising' : 'normal';
  const out: Segment[] = [];
  for (let k = 0; k < cuts.length - 1; k++) {
    const from = cuts[k];
    const to = cuts[k + 1];
    const len = to - from;
    const start = k === 0 ? 'root' : `brace at ${ft(from)}`;
    const end = k === cuts.length - 2 ? 'tip' : `brace at ${ft(to)}`;
    const atTip = k === cuts.length - 2;
    let K = 1;
    let cbF11 = true;
    if (atTip && ls.topFlange === 'free') {
      // The segment's root is the member's root or a brace (taken as stopping twist: row (c)).
      K = freeTopK(ls, k === 0 ? ls.root : 'twist-only', load);
      cbF11 = false;
    } else if (atTip && ls.tip === 'free') {
      K = ls.factor ?? 1;
      cbF11 = false;
    }
    out.push({ from, to, Le: K * len, cbF11, label: `${start} to ${end}`, K });
  }
  return out;
}

/** The same member with no braces: the floor under every station's strength. */
export function unbracedSegment(ls: LateralSupport, L: number, legacyLb: number): Segment {
  return bottomFlangeSegments({ ...ls, braces: [] }, L, legacyLb)[0];
}

/** The top flange under uplift: held by the deck, or one cantilever segment when it is free. */
export function topFlangeSegment(ls: LateralSupport, L: number): Segment {
  if (ls.topFlange === 'braced') {
    return { from: 0, to: L, Le: 0, cbF11: false, label: 'top flange held by the deck', K: 0 };
  }
  const K = freeTopK(ls, ls.root, 'normal');
  return { from: 0, to: L, Le: K * L, cbF11: false, label: 'root to tip (top flange free)', K };
}

/**
 * AISC 360-16 Eq. F1-1 (Rm = 1, doubly symmetric): Cb = 12.5 Mmax / (2.5 Mmax + 3 MA + 4 MB + 3 MC),
 * absolute moments over the segment (quarter, centre and three-quarter points).
 */
export function cbF11(Mmax: number, MA: number, MB: number, MC: number): number {
  const den = 2.5 * Mmax + 3 * Math.abs(MA) + 4 * Math.abs(MB) + 3 * Math.abs(MC);
  return den > 0 ? (12.5 * Mmax) / den : 1;
}
