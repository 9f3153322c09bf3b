/**
 * The nominal flexural strength of the member's section at one station, by family
 * (AISC 360-16 Chapter F). Cb = 1.0 throughout: the tip of a cantilever is free and unbraced, and
 * Eq. F1-1 (which would give 2.33 for a uniformly loaded cantilever) does not apply to it.
 */
import type { MemberSection, SectionProps } from '../sections/section-types';
import { hssFlexure } from './flexure-hss';
import { iFlexure } from './flexure-i';
import { pipeFlexure } from './flexure-pipe';
import type { Strength } from './strength-types';

/** Cb for a cantilever whose free end is not braced (AISC 360-16 F1 commentary [mem]). */
export const CANTILEVER_CB = 1.0;

export interface SteelAndBracing {
  Fy: number;
  E: number;
  /** Unbraced (effective) length of the compression flange, in. */
  Lb: number;
  /** Lateral-torsional buckling modification factor; default 1.0 (a free, unbraced tip). */
  Cb?: number;
}

/**
 * Returns the strength function for the member's family with its options fixed once, so a tapered
 * member's every station is evaluated without rebuilding them.
 */
export function flexuralStrengthOf(
  section: MemberSection,
  o: SteelAndBracing,
): (p: SectionProps) => Strength {
  const { Fy, E, Lb } = o;
  const Cb = o.Cb ?? CANTILEVER_CB;
  switch (section.family) {
    case 'HSS': {
      const opts = { Fy, E, Lb, Cb };
      return (p) => hssFlexure(p, opts);
    }
    case 'PIPE': {
      const opts = { Fy, E };
      return (p) => pipeFlexure(p, opts);
    }
    case 'C':
      // A channel bends about its major axis under F2 with c of Eq. F2-8b; its flanges are compact
      // for the usual grades (F2 user note), and F3's formula is applied by analogy if they are not.
      return (p) =>
        iFlexure(p, { Fy, E, Lb, Cb, rolled: true, c: p.Cw > 0 ? (p.ho / 2) * Math.sqrt(p.Iy / p.Cw) : 1 });
    default: {
      const opts = { Fy, E, Lb, Cb, rolled: section.rolled };
      return (p) => iFlexure(p, opts);
    }
  }
}

/** Nominal flexural strength of one section (kip·in) and the governing limit state. */
export function flexuralStrength(section: MemberSection, p: SectionProps, o: SteelAndBracing): Strength {
  return flexuralStrengthOf(section, o)(p);
}
