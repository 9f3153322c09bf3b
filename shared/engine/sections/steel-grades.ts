/**
 * Default steels by family (REFERENCES.md, material defaults [mem]) and the elastic modulus.
 * A person can override Fy and E in the design document (member.steel).
 */
import type { SectionFamily } from './section-types';

export const E_STEEL = 29000; // ksi, AISC 360-16 Symbols list [mem]

export const DEFAULT_STEEL: Record<SectionFamily, { Fy: number; grade: string }> = {
  W: { Fy: 50, grade: 'ASTM A992' },
  HSS: { Fy: 50, grade: 'ASTM A500 Gr C' },
  PIPE: { Fy: 35, grade: 'ASTM A53 Gr B' },
  C: { Fy: 36, grade: 'ASTM A36' },
  // Plates for a built-up I: A572 Gr 50 is the usual choice (common practice, no source).
  I: { Fy: 50, grade: 'ASTM A572 Gr 50 plate' },
};

/** Unit weight of steel, kip/in^3 (490 lb/ft^3). */
export const STEEL_DENSITY = 0.49 / 1728;
