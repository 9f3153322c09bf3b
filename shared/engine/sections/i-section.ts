/**
 * Properties of a doubly symmetric I-section computed from its plates (no fillets, no welds):
 * the engine's source for tapered and built-up members and the test oracle for the table.
 * Internal units: in.
 */
import type { SectionProps } from './section-types';

/**
 * Section properties of an I made of two equal flanges (bf x tf) and a web (tw) of overall depth d.
 * @param h clear web height for slenderness; defaults to d - 2 tf (a welded I without fillets).
 * J uses the thin-plate sum (b t^3 / 3, flanges and web between flange centroids); Cw = Iy ho^2 / 4.
 */
// Powers are written as products: this runs at every station of every tapered design.
export function iSectionProps(d: number, bf: number, tf: number, tw: number, h = d - 2 * tf): SectionProps {
  const hw = d - 2 * tf;
  const ho = d - tf;
  const A = 2 * bf * tf + hw * tw;
  const Ix = (bf * d * d * d - (bf - tw) * hw * hw * hw) / 12;
  const Sx = (2 * Ix) / d;
  const Zx = bf * tf * ho + (tw * hw * hw) / 4;
  const Iy = (2 * tf * bf * bf * bf + hw * tw * tw * tw) / 12;
  const ry = Math.sqrt(Iy / A);
  const J = (2 * bf * tf * tf * tf + ho * tw * tw * tw) / 3;
  const Cw = (Iy * ho * ho) / 4;
  const rts = Math.sqrt(Math.sqrt(Iy * Cw) / Sx);
  return { d, A, Ix, Sx, Zx, Iy, ry, J, Cw, rts, ho, bf, tf, tw, h };
}

/** Ix of the same I (in^4), without building the whole set of properties. */
export function iSectionIx(d: number, bf: number, tf: number, tw: number): number {
  const hw = d - 2 * tf;
  return (bf * d * d * d - (bf - tw) * hw * hw * hw) / 12;
}

/**
 * Radius of gyration of the compression flange plus one third of the compression web,
 * rt of AISC 360-16 F4.2 (Eq. F4-11), for a doubly symmetric I (hc = h).
 */
export function rtOf(p: SectionProps): number {
  const aw = (p.h * p.tw) / (p.bf * p.tf);
  return p.bf / Math.sqrt(12 * (1 + aw / 6));
}
