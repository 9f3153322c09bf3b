/**
 * What one combination does to the plate: the forces on it, the DG1 bearing block, the plate
 * thickness it needs and the tension in the rods. Internal units: kip, in, ksi, kip·in.
 */
import type { Method, RootDemand } from '../types';
import { solveBearing, type BearingSolution } from './bearing';
import type { ConnectionGeometry } from './connection-geometry';
import type { Footprint } from './footprint';
import { requiredThickness, type ThicknessParts } from './plate-thickness';

export interface ComboState {
  combination: string;
  /** The sense of the root moment: under "up" the other row of rods is the tension row. */
  direction: 'down' | 'up';
  /** Compression on the plate (negative: a pull), moment, and shear on the plate, kip and kip·in. */
  P: number;
  M: number;
  shear: number;
  bearing: BearingSolution;
  thickness: ThicknessParts | null;
  /** Largest tension in one rod, and the total tension the rods pull on the concrete, kip. */
  rodTension: number | null;
  groupTension: number | null;
}

/**
 * Post-base: P = the vertical reaction (compression; negative = uplift), shear = the horizontal force.
 * Face plate: the vertical reaction is shear on the rods; the horizontal (axial) force, a magnitude
 * with no sign, is taken as a pull on the plate, the side that loads the rods.
 */
export function analyseCombination(
  d: RootDemand,
  geo: ConnectionGeometry,
  footprint: Footprint | null,
  fpMax: number,
  method: Method,
  /** Post base with its own post section: the support face to the post's centreline, in (M + V x offset). */
  offset = 0,
): ComboState {
  const postBase = geo.arrangement === 'post-base';
  // Forces below a millionth of a kip are round-off, not load; they would only make M/P overflow.
  // A negative vertical reaction on a post-base plate is uplift: kept as a pull, never dropped.
  const raw = postBase ? d.V : -Math.abs(d.H);
  const P = Math.abs(raw) < 1e-6 ? 0 : raw;
  // The plate receives the root moment plus the reaction's moment about the post's centreline.
  const M = Math.abs(d.M + d.V * offset);
  const shear = Math.abs(postBase ? d.H : d.V);
  const bearing = solveBearing({ N: geo.N, B: geo.B, f: geo.f, P, M, fpMax });
  const thickness = footprint
    ? requiredThickness(
        bearing,
        { N: geo.N, B: geo.B, f: geo.f, Fy: geo.Fy, perSide: geo.perSide, gauge: geo.g },
        footprint,
        method,
      )
    : null;
  const solved = bearing.T !== null;
  const T = bearing.T ?? 0;
  return {
    combination: d.combination,
    direction: d.direction ?? (d.M < 0 ? 'up' : 'down'),
    P,
    M,
    shear,
    bearing,
    thickness,
    rodTension: solved ? Math.max(T, bearing.Tother) / geo.perSide : null,
    // Conservative: all tension (both rows when there is no bearing) is set against the tension row's cone.
    groupTension: solved ? T + bearing.Tother : null,
  };
}
