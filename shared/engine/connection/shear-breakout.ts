/**
 * Concrete breakout and pryout of cast-in anchors in shear toward an edge, ACI 318-19 17.7.2 and
 * 17.7.3 (from memory). Inputs in in and ksi; strengths in kip (psi and lb inside).
 */
import { rootFc, type AnchorConcrete } from './aci-factors';

export interface ShearEdgeGroup {
  /** Anchors in the row nearest the edge (the row that takes the shear). */
  n: number;
  /** Edge distance in the direction of the shear, from that row, in. */
  ca1: number;
  /** Edge distances at the two ends of the row, perpendicular to ca1, in. */
  ca2: [number, number];
  /** Outer-to-outer length of the row along the edge, and neighbouring spacing, in. */
  span: number;
  spacing: number;
  /** Concrete thickness along the rods (ha), in; undefined = deep (psi_h,V = 1). */
  ha: number | undefined;
  da: number;
  hef: number;
}

export interface BreakoutShear {
  ca1Used: number;
  AVc: number;
  AVco: number;
  psiEd: number;
  psiC: number;
  psiH: number;
  Vb: number;
  Vcbg: number;
}

/** Narrow member rule 17.7.2.1.2: both ca2 < 1.5 ca1 and ha < 1.5 ca1. */
function effectiveCa1(g: ShearEdgeGroup): number {
  const lim = 1.5 * g.ca1;
  if (g.ha === undefined || !(g.ca2[0] < lim && g.ca2[1] < lim && g.ha < lim)) return g.ca1;
  return Math.min(g.ca1, Math.max(Math.max(...g.ca2) / 1.5, g.ha / 1.5, g.spacing / 3));
}

/**
 * Vcbg = (AVc/AVco) psi_ec,V psi_ed,V psi_c,V psi_h,V Vb, kip, with
 * Vb = min(7 (le/da)^0.2 sqrt(da) lambda_a sqrt(f'c) ca1^1.5, 9 lambda_a sqrt(f'c) ca1^1.5), le = min(hef, 8 da);
 * psi_c,V 1.4 uncracked, 1.0 cracked (no credit taken for edge bars); psi_ec,V = 1 (symmetric row).
 */
export function breakoutShear(g: ShearEdgeGroup, c: AnchorConcrete): BreakoutShear {
  const ca1 = effectiveCa1(g);
  const reach = 1.5 * ca1;
  const r = rootFc(c);
  const le = Math.min(g.hef, 8 * g.da);
  const Vb = Math.min(7 * (le / g.da) ** 0.2 * Math.sqrt(g.da) * r * ca1 ** 1.5, 9 * r * ca1 ** 1.5) / 1000;
  const AVco = 4.5 * ca1 * ca1;
  const width = g.span + Math.min(reach, Math.max(0, g.ca2[0])) + Math.min(reach, Math.max(0, g.ca2[1]));
  const height = g.ha === undefined ? reach : Math.min(reach, g.ha);
  const AVc = Math.min(width * height, g.n * AVco);
  const ca2min = Math.min(g.ca2[0], g.ca2[1]);
  const psiEd = ca2min >= reach ? 1 : 0.7 + (0.3 * Math.max(0, ca2min)) / reach;
  const psiC = c.cracked ? 1 : 1.4;
  const psiH = g.ha !== undefined && g.ha < reach ? Math.sqrt(reach / g.ha) : 1;
  return { ca1Used: ca1, AVc, AVco, psiEd, psiC, psiH, Vb, Vcbg: (AVc / AVco) * psiEd * psiC * psiH * Vb };
}

/** Pryout Vcpg = kcp Ncpg, kip (17.7.3.1): kcp = 1 for hef < 2.5 in, 2 otherwise. */
export function pryoutStrength(hef: number, Ncpg: number): number {
  return (hef < 2.5 ? 1 : 2) * Ncpg;
}
