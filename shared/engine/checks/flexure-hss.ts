/**
 * Flexure of rectangular and square HSS about the major axis, AISC 360-16 F7: yielding (F7.1),
 * flange local buckling (F7.2), web local buckling (F7.3) and lateral-torsional buckling (F7.4).
 * b = B - 3t and h = H - 3t with t the design wall thickness (B4.1b(d)). Internal units kip, in, ksi.
 */
import type { SectionProps } from '../sections/section-types';
import { governing, type Strength } from './strength-types';

export function hssFlexure(p: SectionProps, o: { Fy: number; E: number; Lb: number; Cb: number }): Strength {
  const { Fy, E, Lb, Cb } = o;
  const t = p.tf;
  const rootEF = Math.sqrt(E / Fy);
  const Mp = Fy * p.Zx;
  const list: Strength[] = [{ nominal: Mp, clause: 'F7.1', limitState: 'yielding' }];
  const b = p.bf - 3 * t;
  const bt = b / t;
  if (bt > 1.12 * rootEF) {
    if (bt <= 1.4 * rootEF) {
      const Mn = Mp - (Mp - Fy * p.Sx) * (3.57 * bt * Math.sqrt(Fy / E) - 4.0);
      list.push({ nominal: Math.min(Mn, Mp), clause: 'F7.2(b)', limitState: 'flange local buckling' });
    } else {
      const be = Math.min(b, 1.92 * t * rootEF * (1 - (0.38 / bt) * rootEF));
      list.push({
        nominal: Fy * effectiveModulus(p, (b - be) * t),
        clause: 'F7.2(c)',
        limitState: 'flange local buckling',
      });
    }
  }
  const ht = p.h / t;
  if (ht > 2.42 * rootEF) {
    if (ht <= 5.7 * rootEF) {
      const Mn = Mp - (Mp - Fy * p.Sx) * (0.305 * ht * Math.sqrt(Fy / E) - 0.738);
      list.push({ nominal: Math.min(Mn, Mp), clause: 'F7.3(b)', limitState: 'web local buckling' });
    } else {
      // Slender web (F7.3(c)): compression flange yielding reduced by Rpg of F5 with aw = 2 h t / (b t), from memory.
      const aw = Math.min(10, (2 * p.h * t) / (b * t));
      const Rpg = Math.max(0, Math.min(1, 1 - (aw / (1200 + 300 * aw)) * (ht - 5.7 * rootEF)));
      list.push({ nominal: Rpg * Fy * p.Sx, clause: 'F7.3(c)', limitState: 'web local buckling' });
    }
  }
  const root = Math.sqrt(p.J * p.A);
  const Lp = (0.13 * E * p.ry * root) / Mp;
  const Lr = (2 * E * p.ry * root) / (0.7 * Fy * p.Sx);
  if (Lb > Lp) {
    const Mn =
      Lb <= Lr
        ? Cb * (Mp - (Mp - 0.7 * Fy * p.Sx) * ((Lb - Lp) / (Lr - Lp)))
        : (2 * E * Cb * root) / (Lb / p.ry);
    list.push({ nominal: Math.min(Mn, Mp), clause: 'F7.4', limitState: 'lateral-torsional buckling' });
  }
  return governing(list);
}

/**
 * Elastic section modulus with `removed` in^2 taken out of the compression flange (effective
 * width, F7.2(c)): the neutral axis moves toward the tension flange; the modulus is taken to the
 * compression face, the farther one.
 */
function effectiveModulus(p: SectionProps, removed: number): number {
  const arm = (p.d - p.tf) / 2;
  const A = p.A - removed;
  const shift = (removed * arm) / A;
  const I = p.Ix - removed * arm * arm - A * shift * shift;
  return I / (p.d / 2 + shift);
}
