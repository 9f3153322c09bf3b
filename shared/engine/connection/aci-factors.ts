/**
 * Strength reduction factors of ACI 318-19 Table 17.5.3 (from memory) and the way Reachline turns
 * ACI strength-design capacities into allowable capacities for ASD.
 *
 * ACI 318 has no ASD. For ASD, Reachline divides phi Nn by 1.6: the largest ratio of an ASCE 7 2.3
 * strength combination's factor to its 2.4 allowable counterpart (1.6L / 1.0L; 1.4D / 1.0D is 1.4),
 * so the allowable capacity is conservative for every combination (common practice, from memory).
 */
import type { Method } from '../types';

export const ASD_ACI_DIVISOR = 1.6;

export const PHI_ACI = {
  /** Ductile steel element (F1554 rods), tension and shear. */
  steelTension: 0.75,
  steelShear: 0.65,
  /** Concrete breakout and side-face blowout: condition A (supplementary reinforcement) / B. */
  concreteA: 0.75,
  concreteB: 0.7,
  /** Pullout and pryout: condition B always applies (Table 17.5.3 note, from memory). */
  pulloutPryout: 0.7,
} as const;

/** phi for concrete breakout and side-face blowout, by condition A or B. */
export function phiConcrete(conditionA: boolean): number {
  return conditionA ? PHI_ACI.concreteA : PHI_ACI.concreteB;
}

/** Available strength from an ACI nominal strength: phi Rn (LRFD) or phi Rn / 1.6 (ASD). */
export function availableAci(nominal: number, phi: number, method: Method): number {
  return method === 'LRFD' ? phi * nominal : (phi * nominal) / ASD_ACI_DIVISOR;
}

/** Available strength from an AISC nominal strength: phi Rn (LRFD) or Rn / Omega (ASD). */
export function availableAisc(nominal: number, phi: number, omega: number, method: Method): number {
  return method === 'LRFD' ? phi * nominal : nominal / omega;
}

/** Concrete inputs of the ACI 318 ch. 17 equations, internal units (ksi). */
export interface AnchorConcrete {
  fc: number;
  /** lambda_a = 1.0 lambda for cast-in anchors (ACI 318-19 17.2.4). */
  lambdaA: number;
  cracked: boolean;
}

/**
 * lambda_a sqrt(f'c) in psi units, the root of every ch. 17 concrete equation. f'c is capped at
 * 10,000 psi (ACI 318-19 17.3.1, from memory).
 */
export function rootFc(c: AnchorConcrete): number {
  return c.lambdaA * Math.sqrt(Math.min(c.fc * 1000, 10000));
}
