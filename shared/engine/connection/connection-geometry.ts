/**
 * Reads a validated connection input once into internal numbers (in, ksi) and derives the
 * distances every check uses. Coordinates: origin at the plate centre, x along N toward the
 * tension row (for a face plate: up), y along B. Plate and pier are centred on each other.
 */
import type { ConnectionInput } from '../../schemas/connection';
import type { ParsedConnection } from '../../schemas/parsed-design';
import type { RootFootprint } from '../types';
import type { ShapeLookup } from '../shapes/types';
import { resolveFootprint, type FootprintResolution } from './footprint';
import { F1554_GRADES, heavyHexBearingArea, rodSize, tensileStressArea, type RodSize } from './rod-data';

export interface ConnectionGeometry {
  arrangement: ConnectionInput['arrangement'];
  N: number;
  B: number;
  t: number;
  Fy: number;
  /** Rods in each row, rod diameter da, row offset f, gauge g, embedment hef (in). */
  perSide: number;
  da: number;
  f: number;
  g: number;
  hef: number;
  grade: ConnectionInput['anchors']['grade'];
  fya: number;
  futa: number;
  rod: RodSize | undefined;
  /** Tensile stress area and nut bearing area, in^2 (null when the rod size is not tabulated). */
  Ase: number | null;
  Abrg: number | null;
  fc: number;
  cracked: boolean;
  lambda: number;
  conditionA: boolean;
  torqued: boolean;
  pierLength: number;
  pierWidth: number;
  pierDepth: number | undefined;
  footprint: FootprintResolution;
  /** Length of a row of rods along B: (perSide - 1) g. */
  rowSpan: number;
  /** Rod centre to pier edge: beyond the tension row, beyond the compression row (both = Lp/2 - f), along B. */
  edgeBeyondRow: number;
  edgeAcrossRow: number;
  edgeSide: number;
}

/** Reads the parsed connection into the numbers and distances the checks use. */
export function readGeometry(
  input: ParsedConnection,
  root: RootFootprint,
  shapes: ShapeLookup,
): ConnectionGeometry {
  const a = input.anchors;
  const da = a.diameter.value;
  const rod = rodSize(da);
  const perSide = a.perSide;
  const f = a.offset.value;
  const g = perSide > 1 ? a.gauge.value : 0;
  const pierLength = input.pier.length.value;
  const pierWidth = input.pier.width.value;
  const rowSpan = (perSide - 1) * g;
  const steel = F1554_GRADES[a.grade];
  return {
    arrangement: input.arrangement,
    N: input.plate.N.value,
    B: input.plate.B.value,
    t: input.plate.thickness.value,
    Fy: input.plate.Fy.value,
    perSide,
    da,
    f,
    g,
    hef: a.embedment.value,
    grade: a.grade,
    fya: steel.fy,
    // ACI 318-19 17.6.1.2: futa <= min(1.9 fya, 125 ksi).
    futa: Math.min(steel.fu, 1.9 * steel.fy, 125),
    rod,
    Ase: rod ? tensileStressArea(rod.diameter, rod.threadsPerInch) : null,
    Abrg: rod ? heavyHexBearingArea(rod.diameter) : null,
    fc: input.concrete.fc.value,
    cracked: input.concrete.cracked ?? true,
    lambda: input.concrete.lambda ?? 1,
    conditionA: a.supplementaryReinforcement ?? false,
    torqued: a.torqued ?? false,
    pierLength,
    pierWidth,
    pierDepth: input.pier.depth ? input.pier.depth.value : undefined,
    footprint: resolveFootprint(input.footprint?.shape, root, shapes),
    rowSpan,
    edgeBeyondRow: pierLength / 2 - f,
    edgeAcrossRow: pierLength / 2 + f,
    edgeSide: pierWidth / 2 - rowSpan / 2,
  };
}
