/**
 * The plate in plan on the pier, from the design document (internal inches): plate, pier, footprint,
 * rod centres with holes and washers (AISC Design Guide 1 Table 2.3 sizes), edge distances, bearing zone.
 * x runs along N toward the tension row, y along B; the origin is the plate centre.
 */
import { ROD_SIZES, rodSize } from '../../../../shared/engine/connection/rod-data';
import { findShape } from '../../../../shared/engine/shapes/table';
import type { DesignResult } from '../../../../shared/engine/types';
import { convert, parseQuantity } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';

export interface PlatePlan {
  N: number;
  B: number;
  pierL: number;
  pierW: number;
  footprint: { d: number; bf: number; label: string } | null;
  rods: { x: number; y: number }[];
  hole: number;
  washer: number;
  diameter: number;
  /** Rod centre to plate edge and to pier edge, along N. */
  edgePlate: number;
  edgePier: number;
  bearingLength: number | null;
}

function len(text: string | undefined): number | null {
  if (!text) return null;
  const r = parseQuantity(text, 'length');
  return r.ok && r.value > 0 ? r.value : null;
}

function footprintOf(doc: DesignDocument): PlatePlan['footprint'] {
  const label = doc.connection?.footprint?.shape ?? doc.member.section.shape;
  if (label) {
    const shape = findShape(label);
    const d = shape?.d ?? shape?.Ht ?? shape?.OD;
    const bf = shape?.bf ?? shape?.B ?? shape?.OD;
    return shape && d && bf ? { d, bf, label: shape.label } : null;
  }
  const p = doc.member.section.plates;
  const d = len(p?.rootDepth);
  const bf = len(p?.flangeWidth);
  return d && bf ? { d, bf, label: 'built-up I' } : null;
}

export function platePlan(doc: DesignDocument, result: DesignResult | null): PlatePlan | null {
  const c = doc.connection;
  if (!c) return null;
  const [N, B, pierL, pierW, da, f] = [c.plate.N, c.plate.B, c.pier.length, c.pier.width, c.anchors.diameter, c.anchors.offset].map(len);
  if (!N || !B || !pierL || !pierW || !da || f === null) return null;
  const perSide = Number.isInteger(c.anchors.perSide) && c.anchors.perSide > 0 ? Math.min(c.anchors.perSide, 8) : 1;
  const gauge = perSide > 1 ? (parseQuantity(c.anchors.gauge, 'length').ok ? len(c.anchors.gauge) ?? 0 : 0) : 0;
  const rods: { x: number; y: number }[] = [];
  for (const x of [-f, f]) for (let k = 0; k < perSide; k += 1) rods.push({ x, y: -((perSide - 1) * gauge) / 2 + k * gauge });
  const size = rodSize(da) ?? ROD_SIZES.find((r) => r.diameter >= da) ?? ROD_SIZES[ROD_SIZES.length - 1];
  const bl = result?.connection?.bearingLength;
  return {
    N,
    B,
    pierL,
    pierW,
    footprint: footprintOf(doc),
    rods,
    hole: size.hole,
    washer: size.washerSize,
    diameter: da,
    edgePlate: N / 2 - f,
    edgePier: pierL / 2 - f,
    bearingLength: bl && Number.isFinite(bl.value) ? convert(bl.value, bl.unit, 'in') : null,
  };
}
