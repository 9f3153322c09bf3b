/**
 * A scenario of our own for the connection tests: a W12X26 cantilever on a concrete pier, with
 * helpers to vary it. Not a test file (no assertions); the tests import it.
 */
import { expect } from 'vitest';
import type { ConnectionInput } from '../../../shared/schemas/connection';
import { parsedConnectionSchema, type ParsedConnection } from '../../../shared/schemas/parsed-design';
import type { ConnectionContext } from '../../../shared/engine/connection/check-connection';
import { findShape } from '../../../shared/engine/shapes/table';
import type { RootDemand, RootFootprint } from '../../../shared/engine/types';

/** W12X26 at the root: d 12.2, bf 6.49, tf 0.380 in (AISC Shapes Database v15.0 [pub]). */
export const W12X26_ROOT: RootFootprint = { label: 'W12X26', family: 'W', d: 12.2, bf: 6.49, tf: 0.38 };

export const LRFD_US: ConnectionContext = { units: 'US', method: 'LRFD', shapes: findShape };
export const ASD_US: ConnectionContext = { units: 'US', method: 'ASD', shapes: findShape };

type DeepPartial<T> = { [K in keyof T]?: T[K] extends object ? DeepPartial<T[K]> : T[K] };

/** A post-base connection that passes under modest demands (parsed); `over` replaces parts of it. */
export function connection(over: DeepPartial<ConnectionInput> = {}): ParsedConnection {
  const base = {
    arrangement: 'post-base',
    plate: { N: '20 in', B: '16 in', thickness: '1.5 in', Fy: '36 ksi' },
    anchors: {
      perSide: 2,
      diameter: '1 in',
      grade: 'F1554-36',
      offset: '8 in',
      gauge: '10 in',
      embedment: '12 in',
    },
    concrete: { fc: '4000 psi', cracked: true },
    pier: { length: '36 in', width: '36 in' },
  };
  const merged = {
    ...base,
    ...over,
    plate: { ...base.plate, ...over.plate },
    anchors: { ...base.anchors, ...over.anchors },
    concrete: { ...base.concrete, ...over.concrete },
    pier: { ...base.pier, ...over.pier },
  };
  return parsedConnectionSchema.parse(merged);
}

/** Two combinations of our scenario: dead alone, and dead plus live (kip, kip·in). */
export const DEMANDS: RootDemand[] = [
  { combination: '1.4D', M: 110, V: 2.2, H: 0 },
  { combination: '1.2D + 1.6L', M: 330, V: 6.9, H: 0.8 },
];

/** |actual - expected| <= tol x |expected| (tol 1 % by default). */
export function expectWithin(actual: number | null | undefined, expected: number, tol = 0.01): void {
  expect(actual).not.toBeNull();
  expect(actual).toBeDefined();
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(tol * Math.abs(expected));
}

/** Every number anywhere in a value, for the no-NaN checks. */
export function numbersIn(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => numbersIn(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => numbersIn(v, out));
  return out;
}
