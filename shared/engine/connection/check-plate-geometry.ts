/**
 * plate.geometry: the plate sits on the pier (N <= pier length, B <= pier width, as the bearing
 * area A1 of AISC 360-16 J8 must lie on the concrete) and the section fits on the plate.
 */
import type { UnitSystem } from '../units';
import { notComputed, type CheckSpec, type Evaluation } from './check-row';
import type { ConnectionGeometry } from './connection-geometry';
import { evaluateConditions, type Condition } from './geometry-conditions';

export const PLATE_GEOMETRY: CheckSpec = {
  id: 'plate.geometry',
  title: 'Plate fits the pier and the section fits the plate',
  reference: 'AISC 360-16 J8; common practice',
};

export function evaluatePlateGeometry(geo: ConnectionGeometry, units: UnitSystem): Evaluation {
  if (!geo.footprint.ok)
    return notComputed('smallLength', `${geo.footprint.message}; name a shape from the shapes table.`);
  const fp = geo.footprint.footprint;
  const conditions: Condition[] = [
    {
      what: 'Pier length under the plate (N)',
      need: geo.N,
      have: geo.pierLength,
      fix: 'use a shorter plate or a longer pier',
    },
    {
      what: 'Pier width under the plate (B)',
      need: geo.B,
      have: geo.pierWidth,
      fix: 'use a narrower plate or a wider pier',
    },
    {
      what: `Plate length for the ${fp.label} depth`,
      need: fp.d,
      have: geo.N,
      fix: 'use a longer plate (N)',
    },
    { what: `Plate width for the ${fp.label} width`, need: fp.bf, have: geo.B, fix: 'use a wider plate (B)' },
  ];
  return evaluateConditions(conditions, units);
}
