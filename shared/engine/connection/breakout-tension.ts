/**
 * Concrete breakout of cast-in headed anchors in tension, ACI 318-19 17.6.2 (from memory).
 * A rectangular group (one row is a group with spanX = 0), edges measured from the group's outer
 * anchors. Inputs in in and ksi; strengths in kip (the equations run in psi and lb inside).
 */
import { rootFc, type AnchorConcrete } from './aci-factors';

export interface TensionGroup {
  /** Number of anchors in the group. */
  n: number;
  /** Distance between the outer anchors along x and y, in. */
  spanX: number;
  spanY: number;
  /** Largest spacing between neighbouring anchors, in (for the narrow-member rule). */
  spacing: number;
  /** Edge distances from the outer anchors to each of the four pier edges, in. */
  edges: [number, number, number, number];
  hef: number;
}

export interface BreakoutTension {
  /** Effective embedment after 17.6.2.1.2 (equals hef unless three or more edges are near). */
  hefUsed: number;
  narrow: boolean;
  /** Edges within 1.5 hef of the group; three or more is a narrow member (17.6.2.1.2). */
  nearEdges: number;
  ANc: number;
  ANco: number;
  caMin: number;
  psiEd: number;
  psiC: number;
  /** Basic single-anchor strength and the group's nominal breakout strength, kip. */
  Nb: number;
  Ncbg: number;
}

/**
 * Nb, kip: 24 lambda_a sqrt(f'c) hef^1.5 (17.6.2.2.1, kc 24 cast-in). For 11 <= hef <= 25 in the code
 * also gives 16 lambda_a sqrt(f'c) hef^(5/3) (17.6.2.2.3); whether it reads as a permission or a limit,
 * the smaller of the two is safe under either reading, so Reachline takes the smaller.
 */
export function basicBreakout(hef: number, c: AnchorConcrete): number {
  const r = rootFc(c);
  const nb = 24 * r * hef ** 1.5;
  if (hef >= 11 && hef <= 25) return Math.min(nb, 16 * r * hef ** (5 / 3)) / 1000;
  return nb / 1000;
}

/**
 * Effective embedment of 17.6.2.1.2: anchors within 1.5 hef of three or more edges use
 * hef' = max(ca,max/1.5, s/3) <= hef, ca,max the largest of the edge distances within 1.5 hef.
 */
export function effectiveEmbedment(
  hef: number,
  edges: readonly number[],
  spacing: number,
): { hef: number; narrow: boolean } {
  const near = edges.filter((c) => c < 1.5 * hef);
  if (near.length < 3) return { hef, narrow: false };
  const reduced = Math.max(Math.max(...near) / 1.5, spacing / 3);
  return reduced < hef ? { hef: reduced, narrow: true } : { hef, narrow: false };
}

/** Ncbg = (ANc/ANco) psi_ec,N psi_ed,N psi_c,N psi_cp,N Nb, kip (17.6.2.1; psi_ec = psi_cp = 1). */
export function breakoutTension(group: TensionGroup, c: AnchorConcrete): BreakoutTension {
  const { hef: h, narrow } = effectiveEmbedment(group.hef, group.edges, group.spacing);
  const reach = 1.5 * h;
  const [x1, x2, y1, y2] = group.edges.map((e) => Math.min(reach, Math.max(0, e)));
  const ANco = 9 * h * h;
  const ANc = Math.min((group.spanX + x1 + x2) * (group.spanY + y1 + y2), group.n * ANco);
  const caMin = Math.min(...group.edges);
  const psiEd = caMin >= reach ? 1 : 0.7 + (0.3 * Math.max(0, caMin)) / reach;
  // Cast-in anchors in concrete not expected to crack: 1.25 (17.6.2.5.2); cracked: 1.0.
  const psiC = c.cracked ? 1 : 1.25;
  const Nb = basicBreakout(h, c);
  const nearEdges = group.edges.filter((e) => e < 1.5 * group.hef).length;
  return {
    hefUsed: h,
    narrow,
    nearEdges,
    ANc,
    ANco,
    caMin,
    psiEd,
    psiC,
    Nb,
    Ncbg: (ANc / ANco) * psiEd * psiC * Nb,
  };
}
