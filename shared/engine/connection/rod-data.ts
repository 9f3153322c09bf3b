/**
 * Anchor rod data: ASTM F1554 grades, the hole and plate washer sizes of AISC Design Guide 1
 * (2nd ed.) Table 2.3, the tensile stress area of UNC threads and the bearing area of a heavy hex nut.
 * Internal units: in, in^2, ksi.
 */
import type { ConnectionInput } from '../../schemas/connection';

export type RodGrade = ConnectionInput['anchors']['grade'];

/** ASTM F1554 specified minimum yield and tensile strength, ksi. */
export const F1554_GRADES: Record<RodGrade, { fy: number; fu: number }> = {
  'F1554-36': { fy: 36, fu: 58 },
  'F1554-55': { fy: 55, fu: 75 },
  'F1554-105': { fy: 105, fu: 125 },
};

export interface RodSize {
  /** Nominal rod diameter da, in. */
  diameter: number;
  /** Hole diameter in the base plate, in (DG1 Table 2.3). */
  hole: number;
  /** Square plate washer: side and thickness, in (DG1 Table 2.3). */
  washerSize: number;
  washerThickness: number;
  /** UNC threads per inch (ASME B1.1, from memory), for the tensile stress area. */
  threadsPerInch: number;
}

/**
 * DG1 Table 2.3 rows (the rod sizes Reachline accepts): hole, and minimum plate washer side and
 * thickness, as /work/shared/REFERENCES.md lists them from the published table (AISC Design Guide 1,
 * 2nd ed., Table 2.3); the values were also checked against memory of that table, not against a copy
 * of it. The table's 2-1/2 in row (hole 3-3/4 in, washer 5-1/2 x 7/8 in, from memory) is left out on
 * purpose: adding it would change which rod sizes the checks accept. The shop sketch writes these
 * sizes beside every rod.
 */
export const ROD_SIZES: readonly RodSize[] = [
  { diameter: 0.75, hole: 1 + 5 / 16, washerSize: 2, washerThickness: 0.25, threadsPerInch: 10 },
  { diameter: 0.875, hole: 1 + 9 / 16, washerSize: 2.5, washerThickness: 5 / 16, threadsPerInch: 9 },
  { diameter: 1, hole: 1 + 13 / 16, washerSize: 3, washerThickness: 0.375, threadsPerInch: 8 },
  { diameter: 1.25, hole: 2 + 1 / 16, washerSize: 3, washerThickness: 0.5, threadsPerInch: 7 },
  { diameter: 1.5, hole: 2 + 5 / 16, washerSize: 3.5, washerThickness: 0.5, threadsPerInch: 6 },
  { diameter: 1.75, hole: 2.75, washerSize: 4, washerThickness: 0.625, threadsPerInch: 5 },
  { diameter: 2, hole: 3.25, washerSize: 5, washerThickness: 0.75, threadsPerInch: 4.5 },
];

/** The Table 2.3 row for a rod diameter (in), or undefined when the size is not in the table. */
export function rodSize(diameter: number): RodSize | undefined {
  // Tight enough that a metric rod (19 mm = 0.748 in) is not taken for an inch size.
  return ROD_SIZES.find((r) => Math.abs(r.diameter - diameter) < 1e-3);
}

/** Gross area of the rod, in^2 (AISC 360-16 J3.6 uses the nominal unthreaded area Ab). */
export function grossArea(diameter: number): number {
  return (Math.PI / 4) * diameter * diameter;
}

/**
 * Tensile stress area of a UNC thread, in^2: Ase = (pi/4)(da - 0.9743/nt)^2
 * (ASME B1.1 thread geometry, from memory; gives 0.334 in^2 for 3/4 in, 0.606 in^2 for 1 in).
 */
export function tensileStressArea(diameter: number, threadsPerInch: number): number {
  const d = diameter - 0.9743 / threadsPerInch;
  return (Math.PI / 4) * d * d;
}

/**
 * Net bearing area of a heavy hex nut, in^2: hexagon across flats F = 1.5 da + 1/8 in
 * (ASME B18.2.2 heavy hex nut, from memory), area (sqrt(3)/2) F^2 less the rod's gross area.
 * 3/4 in rod: 0.911 in^2.
 */
export function heavyHexBearingArea(diameter: number): number {
  const flats = 1.5 * diameter + 0.125;
  return (Math.sqrt(3) / 2) * flats * flats - grossArea(diameter);
}
