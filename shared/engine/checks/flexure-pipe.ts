/**
 * Flexure of round HSS and pipe, AISC 360-16 F8: yielding (F8.1) and local buckling (F8.2), valid
 * for D/t < 0.45 E/Fy. D is the outside diameter, t the design wall thickness. Units kip, in, ksi.
 */
import type { SectionProps } from '../sections/section-types';
import type { Strength } from './strength-types';

export function pipeFlexure(p: SectionProps, o: { Fy: number; E: number }): Strength {
  const { Fy, E } = o;
  const Dt = p.d / p.tf;
  const Mp = Fy * p.Zx;
  let s: Strength;
  if (Dt <= (0.07 * E) / Fy) s = { nominal: Mp, clause: 'F8.1', limitState: 'yielding' };
  else if (Dt <= (0.31 * E) / Fy) {
    const Mn = ((0.021 * E) / Dt + Fy) * p.Sx;
    s = { nominal: Math.min(Mn, Mp), clause: 'F8.2(b)', limitState: 'local buckling' };
  } else {
    s = { nominal: ((0.33 * E) / Dt) * p.Sx, clause: 'F8.2(c)', limitState: 'local buckling' };
  }
  if (Dt >= (0.45 * E) / Fy) {
    return { ...s, outOfScope: `D/t = ${Dt.toFixed(0)} is beyond the 0.45 E/Fy limit of F8` };
  }
  return s;
}
