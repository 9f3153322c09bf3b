/**
 * anchors.layout: holes, washers, spacing and edge distances of the rods.
 * - Holes and plate washers: AISC Design Guide 1 (2nd ed.) Table 2.3.
 * - Rod centre to plate edge >= max(1.5 da, hole/2 + 1/2 in, washer/2) (common practice, no source).
 * - Rod centre clear of the section by washer/2 + 1/4 in, room for the washer beside the weld (common practice, no source).
 * - Spacing >= 4 da (6 da torqued) and >= the washer size; rod centre to pier edge >= 2 in cover + da/2
 *   (6 da torqued): ACI 318-19 17.9.2 with the 20.5.1.3 cover for concrete exposed to weather (from memory).
 * - Embedment hef <= 25 in (the top of the range the ch. 17 breakout equations address), and
 *   hef + 2 in cover <= the pier depth when given.
 */
import type { UnitSystem } from '../units';
import type { ConnectionGeometry } from './connection-geometry';
import { notComputed, type CheckSpec, type Evaluation } from './check-row';
import { rodProblem } from './capacity';
import { evaluateConditions, type Condition } from './geometry-conditions';
import type { Footprint } from './footprint';
import { rodEdgeMinimum, rodPositions } from './rod-positions';

export const ANCHOR_LAYOUT: CheckSpec = {
  id: 'anchors.layout',
  title: 'Rod layout: holes, spacing and edge distances',
  reference: 'AISC Design Guide 1 (2nd ed.) Table 2.3; ACI 318-19 17.9; common practice',
};

export const MAX_EMBEDMENT = 25;

/** Clear distance from a rod centre (x, y) to the section outline, in (0 inside it). */
export function clearanceToFootprint(x: number, y: number, fp: Footprint): number {
  if (fp.kind === 'round') return Math.max(0, Math.hypot(x, y) - fp.d / 2);
  const dx = Math.max(0, Math.abs(x) - fp.d / 2);
  const dy = Math.max(0, Math.abs(y) - fp.bf / 2);
  return Math.hypot(dx, dy);
}

/**
 * The least rod centre to pier edge, in: 6 da for torqued rods, else 2 in cover + da/2 (ACI 318-19
 * 17.9.2 with the 20.5.1.3 cover, from memory). The plate sketch marks rods nearer than this.
 */
export function pierEdgeMinimum(da: number, torqued: boolean): number {
  return torqued ? 6 * da : 2 + da / 2;
}

export function evaluateAnchorLayout(geo: ConnectionGeometry, units: UnitSystem): Evaluation {
  const problem = rodProblem(geo);
  if (problem || !geo.rod) return notComputed('smallLength', problem ?? 'unknown rod size');
  const { rod, da } = geo;
  const eMin = rodEdgeMinimum(rod);
  const spacing = Math.max(geo.torqued ? 6 * da : 4 * da, rod.washerSize);
  const pierEdge = pierEdgeMinimum(da, geo.torqued);
  const c: Condition[] = [
    {
      what: 'Rod centre to plate edge along N',
      need: eMin,
      have: geo.N / 2 - geo.f,
      fix: 'use a longer plate or bring the rods in (smaller offset)',
    },
    {
      what: 'Rod centre to plate edge along B',
      need: eMin,
      have: geo.B / 2 - geo.rowSpan / 2,
      fix: 'use a wider plate or a smaller gauge',
    },
    {
      what: 'Distance between the two rows',
      need: spacing,
      have: 2 * geo.f,
      fix: 'move the rows apart (larger offset)',
    },
    {
      what: 'Rod centre to pier edge along N',
      need: pierEdge,
      have: geo.edgeBeyondRow,
      fix: 'use a longer pier or bring the rods in',
    },
    {
      what: 'Rod centre to pier edge along B',
      need: pierEdge,
      have: geo.edgeSide,
      fix: 'use a wider pier or a smaller gauge',
    },
    {
      what: 'Embedment within the modelled range',
      need: geo.hef,
      have: MAX_EMBEDMENT,
      fix: 'use a shorter embedment (25 in at most)',
    },
  ];
  if (geo.perSide > 1)
    c.push({
      what: 'Rod spacing in a row',
      need: spacing,
      have: geo.g,
      fix: 'use a larger gauge or fewer, larger rods',
    });
  if (geo.pierDepth !== undefined) {
    c.push({
      what: 'Pier depth for the embedment and 2 in cover',
      need: geo.hef + 2,
      have: geo.pierDepth,
      fix: 'use shorter rods or a deeper pier',
    });
  }
  if (geo.footprint.ok) {
    const fp = geo.footprint.footprint;
    const clear = Math.min(...rodPositions(geo).map((r) => clearanceToFootprint(r.x, r.y, fp)));
    c.push({
      what: `Rod clear of the ${fp.label}`,
      need: rod.washerSize / 2 + 0.25,
      have: clear,
      fix: 'move the rods out (larger offset or gauge) or use a longer plate',
    });
  }
  return evaluateConditions(c, units);
}
