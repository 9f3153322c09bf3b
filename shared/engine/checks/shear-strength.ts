/**
 * Shear strength, AISC 360-16 Chapter G, with its resistance factors.
 * G2.1 I-shapes and channels (web, Aw = d tw, no stiffeners: kv = 5.34); G4 rectangular HSS
 * (Aw = 2 h t, kv = 5); G5 round HSS and pipe. Units kip, in, ksi.
 */
import type { SectionProps } from '../sections/section-types';
import type { SectionFamily } from '../sections/section-types';

export interface ShearStrength {
  Vn: number;
  phi: number;
  omega: number;
  clause: string;
}

/**
 * @param rolled a hot-rolled I (G2.1(a): phi 1.00 / Omega 1.50 when h/tw <= 2.24 sqrt(E/Fy)).
 * @param Lv for pipe: distance from maximum to zero shear (the whole length of a cantilever), in.
 */
export function shearStrength(
  p: SectionProps,
  family: SectionFamily,
  rolled: boolean,
  Fy: number,
  E: number,
  Lv: number,
): ShearStrength {
  if (family === 'HSS') {
    const t = p.tw;
    const ht = p.h / t;
    return { Vn: 0.6 * Fy * (2 * p.h * t) * cv2(ht, 5, Fy, E), phi: 0.9, omega: 1.67, clause: 'G4' };
  }
  if (family === 'PIPE') {
    const Dt = p.d / p.tf;
    const Fcr = Math.min(
      0.6 * Fy,
      Math.max((1.6 * E) / (Math.sqrt(Lv / p.d) * Dt ** 1.25), (0.78 * E) / Dt ** 1.5),
    );
    return { Vn: (Fcr * p.A) / 2, phi: 0.9, omega: 1.67, clause: 'G5' };
  }
  const htw = p.h / p.tw;
  const Aw = p.d * p.tw;
  if (rolled && family === 'W' && htw <= 2.24 * Math.sqrt(E / Fy)) {
    return { Vn: 0.6 * Fy * Aw, phi: 1.0, omega: 1.5, clause: 'G2.1(a)' };
  }
  const kv = 5.34;
  const limit = 1.1 * Math.sqrt((kv * E) / Fy);
  const Cv1 = htw <= limit ? 1 : limit / htw;
  return { Vn: 0.6 * Fy * Aw * Cv1, phi: 0.9, omega: 1.67, clause: 'G2.1(b)' };
}

/** Cv2 of AISC 360-16 G2.2. */
export function cv2(ht: number, kv: number, Fy: number, E: number): number {
  const r = Math.sqrt((kv * E) / Fy);
  if (ht <= 1.1 * r) return 1;
  if (ht <= 1.37 * r) return (1.1 * r) / ht;
  return (1.51 * kv * E) / (ht * ht * Fy);
}
