/**
 * Plan geometry of the plate, section, rods and pier for a to-scale sketch: data only, in inches.
 * Coordinates: origin at the plate centre; x along N, positive toward the tension row (the top of a
 * face plate), so the compression edge is x = -N/2; y along B.
 */
import type { ConnectionInput } from '../../schemas/connection';
import type { ParsedConnection } from '../../schemas/parsed-design';
import type { ConnectionResult, RootFootprint } from '../types';
import type { ShapeLookup } from '../shapes/types';
import { convert, type Quantity } from '../units';
import { readGeometry } from './connection-geometry';
import type { Footprint } from './footprint';
import { rodEdgeMinimum, rodPositions, type RodPosition } from './rod-positions';

export interface Rect {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export type FootprintOutline =
  | { kind: 'I' | 'C'; label: string; rects: Rect[] }
  | { kind: 'box'; label: string; outer: Rect; inner: Rect }
  | { kind: 'round'; label: string; outerRadius: number; innerRadius: number }
  | { kind: 'unknown'; label: string };

export interface PlateLayout {
  arrangement: ConnectionInput['arrangement'];
  plate: Rect & { N: number; B: number; thickness: number };
  pier: Rect & { length: number; width: number };
  footprint: FootprintOutline;
  rods: RodPosition[];
  rodDiameter: number;
  /** DG1 Table 2.3 hole and plate washer; null for a rod size not in the table. */
  holeDiameter: number | null;
  washer: { size: number; thickness: number } | null;
  edgeDistances: {
    rodToPlateAlongN: number;
    rodToPlateAlongB: number;
    rodToPierAlongN: number;
    rodToPierAlongB: number;
    /** The least rod-to-plate-edge distance Reachline accepts for this rod (null: size not tabulated). */
    minimumToPlate: number | null;
  };
  /** x of the plate edge the bearing zone starts from. */
  compressionEdge: number;
}

function centred(a: number, b: number): Rect {
  return { x0: -a / 2, y0: -b / 2, x1: a / 2, y1: b / 2 };
}

/** Section outline in plate coordinates (flanges and web, tube walls, or a pipe's circles). */
export function footprintOutline(fp: Footprint): FootprintOutline {
  const { d, bf, tf, tw, label } = fp;
  if (fp.kind === 'round')
    return { kind: 'round', label, outerRadius: d / 2, innerRadius: Math.max(0, d / 2 - tf) };
  if (fp.kind === 'box')
    return {
      kind: 'box',
      label,
      outer: centred(d, bf),
      inner: centred(Math.max(0, d - 2 * tf), Math.max(0, bf - 2 * tf)),
    };
  const flanges: Rect[] = [
    { x0: d / 2 - tf, y0: -bf / 2, x1: d / 2, y1: bf / 2 },
    { x0: -d / 2, y0: -bf / 2, x1: -d / 2 + tf, y1: bf / 2 },
  ];
  // A channel's web is at the back of its flanges; an I-shape's at the middle.
  const webY0 = fp.kind === 'C' ? -bf / 2 : -tw / 2;
  return {
    kind: fp.kind,
    label,
    rects: [...flanges, { x0: -d / 2 + tf, y0: webY0, x1: d / 2 - tf, y1: webY0 + tw }],
  };
}

/** The plan layout of a connection, in inches. */
export function plateLayout(input: ParsedConnection, root: RootFootprint, shapes: ShapeLookup): PlateLayout {
  const geo = readGeometry(input, root, shapes);
  return {
    arrangement: geo.arrangement,
    plate: { ...centred(geo.N, geo.B), N: geo.N, B: geo.B, thickness: geo.t },
    pier: { ...centred(geo.pierLength, geo.pierWidth), length: geo.pierLength, width: geo.pierWidth },
    footprint: geo.footprint.ok
      ? footprintOutline(geo.footprint.footprint)
      : { kind: 'unknown', label: input.footprint?.shape ?? root.label },
    rods: rodPositions(geo),
    rodDiameter: geo.da,
    holeDiameter: geo.rod?.hole ?? null,
    washer: geo.rod ? { size: geo.rod.washerSize, thickness: geo.rod.washerThickness } : null,
    edgeDistances: {
      rodToPlateAlongN: geo.N / 2 - geo.f,
      rodToPlateAlongB: geo.B / 2 - geo.rowSpan / 2,
      rodToPierAlongN: geo.edgeBeyondRow,
      rodToPierAlongB: geo.edgeSide,
      minimumToPlate: geo.rod ? rodEdgeMinimum(geo.rod) : null,
    },
    compressionEdge: -geo.N / 2,
  };
}

/** The bearing zone for a bearing length Y (in) measured from the compression edge, clipped to the plate. */
export function bearingZone(layout: PlateLayout, Y: number): Rect {
  const len = Math.min(layout.plate.N, Math.max(0, Number.isFinite(Y) ? Y : 0));
  return {
    x0: layout.compressionEdge,
    y0: layout.plate.y0,
    x1: layout.compressionEdge + len,
    y1: layout.plate.y1,
  };
}

/** The bearing zone of a result (its bearing length in any length unit), or null without a result. */
export function bearingZoneFromResult(layout: PlateLayout, result: ConnectionResult | null): Rect | null {
  if (!result) return null;
  const q: Quantity = result.bearingLength;
  return bearingZone(layout, convert(q.value, q.unit, 'in'));
}
