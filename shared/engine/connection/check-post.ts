/**
 * post.combined: the post of a post base (connection.post.height, the section named in
 * connection.footprint) as a cantilever column fixed at the plate and free at the beam, under the
 * axial force P (the vertical reaction; a pull under uplift) and the moment it carries to the plate,
 * M + V x (post depth / 2) (no horizontal force is modelled, so the moment is the same over the
 * post's height). AISC 360-16 H1.1 (Eq. H1-1a/b) with Pc from E3 (compression; K = 2.1, the
 * recommended design value for a fixed-free column, AISC 360-16 Commentary Table C-A-7.1 [mem]) or
 * D2 (tension yielding, for a pull; H1.2) and Mc from Chapter F with Lb = the post height and
 * Cb = 1.0. Sections with slender elements for compression (Table B4.1a) are not covered (E7): the
 * check is then not computed. Internal units kip, in, ksi.
 */
import type { Method } from '../types';
import type { ShapeRecord } from '../shapes/types';
import { catalogSection } from '../sections/catalog-section';
import { flexuralStrengthOf } from '../checks/flexural-strength';
import { available } from '../checks/strength-types';
import { notComputed, safeRatio, type CheckSpec, type Evaluation } from './check-row';

export const POST_COMBINED: CheckSpec = {
  id: 'post.combined',
  title: 'Post: axial load and bending',
  reference: 'AISC 360-16 H1.1 (E3, F)',
};

/** Effective-length factor of a fixed-free column, recommended design value [mem]. */
export const POST_K = 2.1;

export interface PostStrength {
  ok: true;
  /** Available compression (E3), tension (D2) and flexure (F), kip and kip·in. */
  Pc: number;
  Pt: number;
  Mc: number;
  Fy: number;
  E: number;
  A: number;
  /** Flexural stiffness E I about the axis bent by the cantilever moment, kip·in². */
  EI: number;
  slenderness: number;
}

export function postStrength(
  shape: ShapeRecord,
  height: number,
  method: Method,
  E = 29000,
): PostStrength | { ok: false; reason: string } {
  const section = catalogSection(shape);
  const p = section.root;
  const Fy = section.defaultFy;
  const rootEF = Math.sqrt(E / Fy);
  const slender = slenderElement(shape, p, rootEF, E / Fy);
  if (slender)
    return {
      ok: false,
      reason: `${slender}: slender elements in compression (AISC 360-16 E7) are not covered; use a stockier post`,
    };
  const rx = shape.rx ?? Math.sqrt(shape.Ix / shape.A);
  const r = Math.min(rx, shape.ry);
  const Lc = POST_K * height;
  const lr = Lc / r;
  const Fe = (Math.PI ** 2 * E) / (lr * lr);
  const Fcr = lr <= 4.71 * rootEF ? 0.658 ** (Fy / Fe) * Fy : 0.877 * Fe;
  const Pc = available(Fcr * shape.A, method, 0.9, 1.67);
  const Pt = available(Fy * shape.A, method, 0.9, 1.67);
  const Mn = flexuralStrengthOf(section, { Fy, E, Lb: height, Cb: 1 })(p).nominal;
  const Mc = available(Mn, method, 0.9, 1.67);
  return { ok: true, Pc, Pt, Mc, Fy, E, A: shape.A, EI: E * shape.Ix, slenderness: lr };
}

function slenderElement(
  shape: ShapeRecord,
  p: { bf: number; tf: number; h: number; tw: number; d: number },
  rootEF: number,
  EFy: number,
): string | null {
  if (shape.family === 'HSS') {
    const t = p.tf;
    const worst = Math.max((p.bf - 3 * t) / t, (p.d - 3 * t) / t);
    return worst > 1.4 * rootEF ? `wall b/t = ${worst.toFixed(1)} > 1.40 sqrt(E/Fy)` : null;
  }
  if (shape.family === 'PIPE') {
    const Dt = p.d / p.tf;
    return Dt > 0.11 * EFy ? `D/t = ${Dt.toFixed(1)} > 0.11 E/Fy` : null;
  }
  const flange = shape.family === 'C' ? p.bf / p.tf : p.bf / (2 * p.tf);
  if (flange > 0.56 * rootEF) return `flange b/t = ${flange.toFixed(1)} > 0.56 sqrt(E/Fy)`;
  if (p.h / p.tw > 1.49 * rootEF) return `web h/tw = ${(p.h / p.tw).toFixed(1)} > 1.49 sqrt(E/Fy)`;
  return null;
}

/** H1-1a/b for one combination: P > 0 compression, P < 0 a pull; M the moment at the plate. */
export function evaluatePost(
  P: number,
  M: number,
  s: PostStrength | { ok: false; reason: string },
): Evaluation {
  if (!s.ok) return notComputed('moment', s.reason);
  const Pc = P >= 0 ? s.Pc : s.Pt;
  const pr = Math.abs(P) / Pc;
  const mr = Math.abs(M) / s.Mc;
  const a = pr >= 0.2;
  const ratio = a ? pr + (8 / 9) * mr : pr / 2 + mr;
  // Shown as the moment against the flexural strength left beside the axial force:
  // H1-1a: (9/8) Mc (1 - Pr/Pc); H1-1b: Mc (1 - Pr/(2 Pc)); their ratio is the H1 left side.
  const left = a ? (9 / 8) * s.Mc * (1 - pr) : s.Mc * (1 - pr / 2);
  const note = `${P >= 0 ? 'compression' : 'tension (H1.2)'} Pr/Pc = ${pr.toFixed(3)}, Mr/Mc = ${mr.toFixed(3)}, Eq. ${a ? 'H1-1a' : 'H1-1b'}; KL/r = ${s.slenderness.toFixed(0)} with K = ${POST_K}`;
  if (!(left > 0))
    return {
      demand: null,
      capacity: null,
      kind: 'moment',
      ratio: safeRatio(ratio, 1),
      note: `${note}; the axial force alone exceeds the post`,
    };
  return { demand: Math.abs(M), capacity: left, kind: 'moment', ratio: safeRatio(ratio, 1), note };
}
