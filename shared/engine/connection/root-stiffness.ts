/**
 * The rotational stiffness of the root (connection.flexibleRoot), by the component method of
 * EN 1993-1-8:2005 6.3 (from memory): springs of the tension side (anchor rods in tension, the base
 * plate in bending) and of the compression side (concrete in bearing under a T-stub) in series,
 * about a lever arm z; S = z^2 / sum(1/k) (6.3.1 with mu = 1, service moments below 2/3 of the
 * resistance; the axial force is left out, which errs toward more rotation for a post base under
 * gravity). A post adds the bending of a cantilever column under a constant moment, M h / (E I).
 * Internal units kip, in, ksi; stiffness kip/in and kip·in/rad.
 *
 * Components, each with its source:
 * - rods: E As / Ls for the rods of one row (plain axial stretch; a hand calculation), with the
 *   stretch length Ls = 8 da + grout + plate + washer + half the nut (EN 1993-1-8 6.2.6.12 and
 *   Table 6.11 note, [mem]: the part of a cast-in rod that stretches);
 * - plate in bending: 0.425 leff tp^3 / m^3 (EN 1993-1-8 Table 6.11 k15 without prying, the case of
 *   base plates on long anchor rods [mem]) with m = rod row to the face of the footprint and
 *   leff = min(B, perSide x 2 pi m) (circular yield pattern of Table 6.6 [mem]);
 * - concrete: Ec sqrt(beff leff) / 1.275 (EN 1993-1-8 Table 6.11 k13 [mem]) under the compression
 *   flange, beff = tf + 2.5 tp, leff = bf + 2.5 tp, Ec = 57 sqrt(f'c psi) ksi (ACI 318-19 19.2.2.1).
 * Grout under a post base is not an input: taken as 1.5 in (common practice, no source; a longer
 * stretch length errs toward more rotation); none under a face plate.
 */
import type { ParsedConnection } from '../../schemas/parsed-design';
import type { ShapeLookup } from '../shapes/types';
import type { RootFootprint } from '../types';
import { readGeometry } from './connection-geometry';

export const POST_BASE_GROUT = 1.5;

export interface RootStiffness {
  ok: true;
  /** Rotation per unit plate moment, rad per kip·in: 1/S of the joint plus h/(E I) of the post. */
  flexibility: number;
  /** Support face to the post's centreline, in (the plate gets M + V x offset). */
  offset: number;
  /** Joint stiffness S, kip·in/rad, and its parts (kip/in). */
  S: number;
  z: number;
  kRods: number;
  kPlate: number;
  kConcrete: number;
  stretchLength: number;
  /** The post's part of the flexibility, rad per kip·in (0 without a post). */
  postFlexibility: number;
}

export type RootStiffnessResult = RootStiffness | { ok: false; reason: string };

export function rootStiffness(
  input: ParsedConnection,
  root: RootFootprint,
  shapes: ShapeLookup,
  E = 29000,
): RootStiffnessResult {
  const geo = readGeometry(input, root, shapes);
  if (!geo.footprint.ok) return { ok: false, reason: geo.footprint.message };
  if (!geo.rod || geo.Ase === null) return { ok: false, reason: 'the rod size is not one of DG1 Table 2.3' };
  const fp = geo.footprint.footprint;
  const m = geo.f - fp.d / 2;
  if (!(m > 0)) {
    return {
      ok: false,
      reason: 'the rods are not beyond the face of the section, so the plate bending cannot be modelled',
    };
  }
  if (geo.f >= geo.N / 2) return { ok: false, reason: 'the rods are outside the plate' };
  const postBase = geo.arrangement === 'post-base';
  const grout = postBase ? POST_BASE_GROUT : 0;
  const Ls = 8 * geo.da + grout + geo.t + geo.rod.washerThickness + geo.da / 2;
  const kRods = (geo.perSide * E * geo.Ase) / Ls;
  const leff = Math.min(geo.B, geo.perSide * 2 * Math.PI * m);
  const kPlate = (0.425 * E * leff * geo.t ** 3) / m ** 3;
  const Ec = 57 * Math.sqrt(geo.fc * 1000);
  const kConcrete = (Ec * Math.sqrt((fp.tf + 2.5 * geo.t) * (fp.bf + 2.5 * geo.t))) / 1.275;
  const z = geo.f + fp.d / 2 - fp.tf / 2;
  const S = (z * z) / (1 / kRods + 1 / kPlate + 1 / kConcrete);
  let postFlexibility = 0;
  let offset = 0;
  if (postBase && input.footprint) offset = fp.d / 2;
  if (postBase && input.post && input.footprint) {
    const shape = shapes(input.footprint.shape);
    if (!shape)
      return { ok: false, reason: `the post section "${input.footprint.shape}" is not in the shapes table` };
    postFlexibility = input.post.height.value / (E * shape.Ix);
  }
  return {
    ok: true,
    flexibility: 1 / S + postFlexibility,
    offset,
    S,
    z,
    kRods,
    kPlate,
    kConcrete,
    stretchLength: Ls,
    postFlexibility,
  };
}
