/**
 * Pullout and side-face blowout of cast-in headed anchors in tension, ACI 318-19 17.6.3 and 17.6.4
 * (from memory). Inputs in in, in^2, ksi; strengths in kip (psi and lb inside the equations).
 */
import { rootFc, type AnchorConcrete } from './aci-factors';

/**
 * Npn = psi_c,P 8 Abrg f'c, kip (17.6.3.2.2; psi_c,P = 1.4 uncracked, 1.0 cracked), with f'c capped
 * at 10 ksi like every other ch. 17 calculation for cast-in anchors (17.3.1, from memory).
 */
export function pulloutStrength(Abrg: number, c: AnchorConcrete): number {
  const psiCP = c.cracked ? 1 : 1.4;
  return psiCP * 8 * Abrg * Math.min(c.fc, 10);
}

/** Side-face blowout applies to a headed anchor with hef > 2.5 ca1 (17.6.4.1). */
export function blowoutApplies(hef: number, ca1: number): boolean {
  return hef > 2.5 * ca1;
}

/**
 * Nsb of one headed anchor, kip (17.6.4.1): 160 ca1 sqrt(Abrg) lambda_a sqrt(f'c), times
 * (1 + ca2/ca1)/4 when ca2 < 3 ca1, with 1 <= ca2/ca1 <= 3.
 */
export function sideFaceBlowout(ca1: number, ca2: number, Abrg: number, c: AnchorConcrete): number {
  let nsb = 160 * ca1 * Math.sqrt(Abrg) * rootFc(c);
  if (ca2 < 3 * ca1) nsb *= (1 + Math.min(3, Math.max(1, ca2 / ca1))) / 4;
  return nsb / 1000;
}

/**
 * Group factor of 17.6.4.2 for n anchors along an edge with outer spacing s: 1 + s/(6 ca1) when
 * s < 6 ca1 (never more than n: beyond that the anchors act alone).
 */
export function blowoutGroupFactor(n: number, s: number, ca1: number): number {
  if (n <= 1) return 1;
  return Math.min(n, 1 + s / (6 * ca1));
}
