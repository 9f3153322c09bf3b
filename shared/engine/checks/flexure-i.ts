/**
 * Flexure of doubly symmetric I-shaped members and channels bent about the major axis,
 * AISC 360-16 Chapter F: F2 (compact web and flanges), F3 (compact web, noncompact or slender
 * flanges), F4 (noncompact web), F5 (slender web), chosen by the section's own web slenderness.
 * The compression flange of a cantilever under gravity is the bottom flange. Internal units
 * kip, in, ksi; moments kip·in. Cb is passed in (1.0 for a cantilever with a free, unbraced tip).
 */
import type { SectionProps } from '../sections/section-types';
import { rtOf } from '../sections/i-section';
import { governing, type Strength } from './strength-types';

export interface IFlexureOptions {
  Fy: number;
  E: number;
  /** Unbraced length of the compression flange, in. */
  Lb: number;
  Cb: number;
  /** Rolled flanges (Table B4.1b case 10) rather than welded (case 11). */
  rolled: boolean;
  /** c of Eq. F2-8: 1 for a doubly symmetric I; (ho / 2) sqrt(Iy / Cw) for a channel. */
  c?: number;
}

/** Nominal flexural strength Mn (kip·in) and the governing limit state. */
export function iFlexure(p: SectionProps, o: IFlexureOptions): Strength {
  const { Fy, E } = o;
  const rootEF = Math.sqrt(E / Fy);
  const lambdaW = p.h / p.tw;
  if (lambdaW <= 3.76 * rootEF) return compactWeb(p, o);
  if (lambdaW <= 5.7 * rootEF) return noncompactWeb(p, o, lambdaW);
  return slenderWeb(p, o, lambdaW);
}

/** Flange slenderness limits (Table B4.1b cases 10 and 11) and kc (Table B4.1b note a). */
export function flangeLimits(p: SectionProps, o: IFlexureOptions) {
  const { Fy, E } = o;
  const kc = Math.min(0.76, Math.max(0.35, 4 / Math.sqrt(p.h / p.tw)));
  const lambda = p.bf / (2 * p.tf);
  const lambdaP = 0.38 * Math.sqrt(E / Fy);
  const lambdaR = o.rolled ? 1.0 * Math.sqrt(E / Fy) : 0.95 * Math.sqrt((kc * E) / (0.7 * Fy));
  return { kc, lambda, lambdaP, lambdaR };
}

/** F2 and F3. */
function compactWeb(p: SectionProps, o: IFlexureOptions): Strength {
  const { Fy, E, Lb, Cb } = o;
  const c = o.c ?? 1;
  const Mp = Fy * p.Zx;
  // The smallest limit state, the first one on a tie (as governing() picks from a list): this runs at
  // every station of every tapered design, so no list and no object for a limit state that does not govern.
  let best: Strength = { nominal: Mp, clause: 'F2.1', limitState: 'yielding' };
  const Lp = 1.76 * p.ry * Math.sqrt(E / Fy);
  const jc = (p.J * c) / (p.Sx * p.ho);
  const Lr =
    1.95 * p.rts * (E / (0.7 * Fy)) * Math.sqrt(jc + Math.sqrt(jc * jc + 6.76 * ((0.7 * Fy) / E) ** 2));
  if (Lb > Lp) {
    let Mn: number;
    if (Lb <= Lr) {
      Mn = Cb * (Mp - (Mp - 0.7 * Fy * p.Sx) * ((Lb - Lp) / (Lr - Lp)));
    } else {
      const s = Lb / p.rts;
      const Fcr = ((Cb * Math.PI ** 2 * E) / (s * s)) * Math.sqrt(1 + 0.078 * jc * s * s);
      Mn = Fcr * p.Sx;
    }
    const ltb = Math.min(Mn, Mp);
    if (ltb < best.nominal) best = { nominal: ltb, clause: 'F2.2', limitState: 'lateral-torsional buckling' };
  }
  const f = flangeLimits(p, o);
  if (f.lambda > f.lambdaP) {
    const Mn =
      f.lambda <= f.lambdaR
        ? Mp - (Mp - 0.7 * Fy * p.Sx) * ((f.lambda - f.lambdaP) / (f.lambdaR - f.lambdaP))
        : (0.9 * E * f.kc * p.Sx) / (f.lambda * f.lambda);
    if (Mn < best.nominal)
      best = { nominal: Mn, clause: 'F3.2', limitState: 'compression flange local buckling' };
  }
  return best;
}

/** F4, doubly symmetric (Iyc / Iy = 0.5 > 0.23, Sxt = Sxc, hc = h). */
function noncompactWeb(p: SectionProps, o: IFlexureOptions, lambdaW: number): Strength {
  const { Fy, E, Lb, Cb } = o;
  const rootEF = Math.sqrt(E / Fy);
  const Myc = Fy * p.Sx;
  const Mp = Math.min(Fy * p.Zx, 1.6 * Fy * p.Sx);
  const lpw = 3.76 * rootEF;
  const lrw = 5.7 * rootEF;
  const Rpc = Math.min(Mp / Myc, Mp / Myc - (Mp / Myc - 1) * ((lambdaW - lpw) / (lrw - lpw)));
  const top = Rpc * Myc;
  const FL = 0.7 * Fy;
  const list: Strength[] = [{ nominal: top, clause: 'F4.1', limitState: 'compression flange yielding' }];
  const rt = rtOf(p);
  const Lp = 1.1 * rt * rootEF;
  const js = p.J / (p.Sx * p.ho);
  const Lr = 1.95 * rt * (E / FL) * Math.sqrt(js + Math.sqrt(js * js + 6.76 * (FL / E) ** 2));
  if (Lb > Lp) {
    let Mn: number;
    if (Lb <= Lr) Mn = Cb * (top - (top - FL * p.Sx) * ((Lb - Lp) / (Lr - Lp)));
    else {
      const s = Lb / rt;
      Mn = ((Cb * Math.PI ** 2 * E) / (s * s)) * Math.sqrt(1 + 0.078 * js * s * s) * p.Sx;
    }
    list.push({ nominal: Math.min(Mn, top), clause: 'F4.2', limitState: 'lateral-torsional buckling' });
  }
  const f = flangeLimits(p, o);
  if (f.lambda > f.lambdaP) {
    const Mn =
      f.lambda <= f.lambdaR
        ? top - (top - FL * p.Sx) * ((f.lambda - f.lambdaP) / (f.lambdaR - f.lambdaP))
        : (0.9 * E * f.kc * p.Sx) / (f.lambda * f.lambda);
    list.push({ nominal: Mn, clause: 'F4.3', limitState: 'compression flange local buckling' });
  }
  return governing(list);
}

/** F5, with the F13.2 limit on h/tw for a web without stiffeners. */
function slenderWeb(p: SectionProps, o: IFlexureOptions, lambdaW: number): Strength {
  const { Fy, E, Lb, Cb } = o;
  const rootEF = Math.sqrt(E / Fy);
  const aw = Math.min(10, (p.h * p.tw) / (p.bf * p.tf));
  const Rpg = Math.max(0, Math.min(1, 1 - (aw / (1200 + 300 * aw)) * (lambdaW - 5.7 * rootEF)));
  const list: Strength[] = [
    { nominal: Rpg * Fy * p.Sx, clause: 'F5.1', limitState: 'compression flange yielding' },
  ];
  const rt = rtOf(p);
  const Lp = 1.1 * rt * rootEF;
  const Lr = Math.PI * rt * Math.sqrt(E / (0.7 * Fy));
  if (Lb > Lp) {
    const Fcr =
      Lb <= Lr
        ? Math.min(Fy, Cb * (Fy - 0.3 * Fy * ((Lb - Lp) / (Lr - Lp))))
        : Math.min(Fy, (Cb * Math.PI ** 2 * E) / (Lb / rt) ** 2);
    list.push({ nominal: Rpg * Fcr * p.Sx, clause: 'F5.2', limitState: 'lateral-torsional buckling' });
  }
  const f = flangeLimits(p, o);
  if (f.lambda > f.lambdaP) {
    const Fcr =
      f.lambda <= f.lambdaR
        ? Fy - 0.3 * Fy * ((f.lambda - f.lambdaP) / (f.lambdaR - f.lambdaP))
        : (0.9 * E * f.kc) / (f.lambda * f.lambda);
    list.push({ nominal: Rpg * Fcr * p.Sx, clause: 'F5.3', limitState: 'compression flange local buckling' });
  }
  const g = governing(list);
  const limit = Math.min(260, (0.4 * E) / Fy);
  if (lambdaW > limit) {
    return {
      ...g,
      outOfScope: `web slenderness h/tw = ${lambdaW.toFixed(0)} exceeds ${limit.toFixed(0)} for a web without stiffeners (F13.2); use a thicker web`,
    };
  }
  return g;
}
