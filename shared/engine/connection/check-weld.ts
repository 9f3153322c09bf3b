/**
 * weld.strength: the fillet weld all around the member (or post) where it meets the plate
 * (connection.weld), AISC 360-16 J2.4, by the elastic method (the weld treated as a line; common
 * practice, no source). Per unit length: f_M = M / Sw (the plate moment), f_P = P / Lw (axial, a post
 * base's reaction), f_V = V / L_parallel (shear taken by the welds parallel to it: the web lines of
 * an I or C, the side walls of a box, half of a ring). The worst line combines them as a vector.
 * Strength per inch: the weld 0.60 FEXX x 0.707 w (no directional increase; phi 0.75, Omega 2.00),
 * and the base metal of the element it joins, shear rupture 0.6 Fu t shared by the welds on its two
 * faces (AISC 360-16 J4.2; phi 0.75, Omega 2.00). The plate side is not checked (a plate at least as
 * thick as the element). Size limits: the minimum of Table J2.4 for the plate thickness (the more
 * demanding reading: 360-16 bases it on the thinner part joined [mem]) and the maximum of J2.2b for the
 * thinner part (t - 1/16 in from 1/4 in up). Internal units kip, in, ksi.
 */
import type { Method } from '../types';
import type { UnitSystem } from '../units';
import type { Footprint } from './footprint';
import { formatLength } from './result-quantity';
import { safeRatio, type CheckSpec, type Evaluation } from './check-row';

export const WELD_STRENGTH: CheckSpec = {
  id: 'weld.strength',
  title: 'Weld of the section to the plate',
  reference: 'AISC 360-16 J2.4 (elastic method); J4.2 base metal',
};

export const FEXX = { E70: 70, E80: 80 } as const;

/** Minimum fillet size, AISC 360-16 Table J2.4 [mem], by thickness t (in). */
export function minimumFillet(t: number): number {
  if (t <= 0.25) return 0.125;
  if (t <= 0.5) return 0.1875;
  if (t <= 0.75) return 0.25;
  return 0.3125;
}

/** Maximum fillet size along an edge, AISC 360-16 J2.2b [mem]. */
export function maximumFillet(t: number): number {
  return t < 0.25 ? t : t - 1 / 16;
}

/** Fu of the footprint's steel by kind (REFERENCES.md material defaults [mem]), ksi. */
export function footprintFu(fp: Footprint): number {
  switch (fp.kind) {
    case 'box':
      return 62;
    case 'round':
      return 60;
    case 'C':
      return 58;
    default:
      return 65;
  }
}

export interface WeldLines {
  /** Total length, section modulus about the bending axis, lines parallel to the shear. */
  Lw: number;
  Sw: number;
  Lpar: number;
  /** Fraction of the extreme line's bending stress at the top of the shear lines. */
  parAt: number;
  /** Thickness of the element under the extreme line and under the shear lines, in. */
  tExtreme: number;
  tPar: number;
}

export function weldLines(fp: Footprint): WeldLines {
  const { d, bf, tf, tw } = fp;
  if (fp.kind === 'box') {
    const Iw = 2 * bf * (d / 2) ** 2 + (2 * d ** 3) / 12;
    return { Lw: 2 * (bf + d), Sw: Iw / (d / 2), Lpar: 2 * d, parAt: 1, tExtreme: tf, tPar: tf };
  }
  if (fp.kind === 'round') {
    return {
      Lw: Math.PI * d,
      Sw: (Math.PI * d * d) / 4,
      Lpar: (Math.PI * d) / 2,
      parAt: 1,
      tExtreme: tf,
      tPar: tf,
    };
  }
  const h = d - 2 * tf;
  const Iw = 2 * bf * (d / 2) ** 2 + 2 * (bf - tw) * (h / 2) ** 2 + (2 * h ** 3) / 12;
  return {
    Lw: 2 * bf + 2 * (bf - tw) + 2 * h,
    Sw: Iw / (d / 2),
    Lpar: 2 * h,
    parAt: h / d,
    tExtreme: tf,
    tPar: tw,
  };
}

export interface WeldInput {
  size: number;
  electrode: keyof typeof FEXX;
  plateThickness: number;
}

/** One combination: P axial (either sign), M the plate moment, V the shear in the weld's plane. */
export function evaluateWeld(
  P: number,
  M: number,
  V: number,
  fp: Footprint,
  w: WeldInput,
  method: Method,
  units: UnitSystem,
): Evaluation {
  const lines = weldLines(fp);
  const fM = Math.abs(M) / lines.Sw;
  const fP = Math.abs(P) / lines.Lw;
  const fV = Math.abs(V) / lines.Lpar;
  const extreme = fM + fP;
  const par = Math.hypot(fM * lines.parAt + fP, fV);
  const factor = (phi: number, omega: number) => (method === 'LRFD' ? phi : 1 / omega);
  const weldPerIn = factor(0.75, 2.0) * 0.6 * FEXX[w.electrode] * 0.707 * w.size;
  const Fu = footprintFu(fp);
  const base = (t: number) => factor(0.75, 2.0) * 0.3 * Fu * t;
  const capExtreme = Math.min(weldPerIn, base(lines.tExtreme));
  const capPar = Math.min(weldPerIn, base(lines.tPar));
  const rE = extreme / capExtreme;
  const rP = par / capPar;
  const useExtreme = rE >= rP;
  const demand = useExtreme ? extreme : par;
  const capacity = useExtreme ? capExtreme : capPar;
  const perInchOfSize = weldPerIn / w.size;
  const needed = demand / perInchOfSize;
  const min = minimumFillet(w.plateThickness);
  const tThin = Math.min(lines.tExtreme, lines.tPar);
  const max = maximumFillet(tThin);
  const notes = [
    `${useExtreme ? 'extreme line' : 'shear lines'}: ${demand.toFixed(2)} kip/in`,
    `strength needs a ${formatLength(needed, units)} fillet`,
    base(useExtreme ? lines.tExtreme : lines.tPar) < weldPerIn
      ? 'the base metal of the section governs over the weld'
      : 'the weld governs',
    `Table J2.4 minimum ${formatLength(min, units)} for a ${formatLength(w.plateThickness, units)} plate; J2.2b maximum ${formatLength(max, units)} for the ${formatLength(tThin, units)} part`,
  ];
  let sizeOk = true;
  if (w.size < min - 1e-9) {
    sizeOk = false;
    notes.push(`the weld is smaller than the minimum: use at least ${formatLength(min, units)}`);
  }
  if (w.size > max + 1e-9) {
    sizeOk = false;
    notes.push(`the weld is larger than the thinner part allows: at most ${formatLength(max, units)}`);
  }
  const ratio = safeRatio(demand, capacity);
  return {
    demand,
    capacity,
    kind: 'forcePerLength',
    // A size outside the limits fails whatever the strength ratio: shown as a ratio above 1.
    ratio:
      ratio === null
        ? null
        : sizeOk
          ? ratio
          : Math.max(ratio, 1 + 1e-9, w.size < min ? min / w.size : w.size / max),
    note: notes.join('; '),
  };
}
