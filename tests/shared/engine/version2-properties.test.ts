/**
 * Properties over documents that use the Version 2 keys (wind, seismic, lateral support, post, welds,
 * flexible root): no NaN or Infinity, no uncomputed pass, ok = every check ok, parts add up.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { DesignDocument } from '../../../shared/schemas/design';
import { check, run } from './design-helpers';

function numbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => numbers(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => numbers(v, out));
  return out;
}

const doc = fc
  .record({
    shape: fc.constantFrom('W8X18', 'W12X26', 'W14X22', 'HSS8X8X1/2', 'C10X15.3', 'PIPE6STD'),
    length: fc.integer({ min: 3, max: 20 }),
    method: fc.constantFrom('LRFD' as const, 'ASD' as const),
    units: fc.constantFrom('US' as const, 'SI' as const),
    D: fc.integer({ min: 0, max: 40 }),
    L: fc.integer({ min: 0, max: 100 }),
    W: fc.integer({ min: -80, max: 40 }),
    sds: fc.option(
      fc.record({
        SDS: fc.double({ min: 0, max: 2, noNaN: true }),
        category: fc.constantFrom('A', 'C', 'D', 'F'),
      }),
    ),
    topFlange: fc.constantFrom('braced' as const, 'free' as const),
    root: fc.constantFrom('fixed' as const, 'twist-only' as const),
    tip: fc.constantFrom('free' as const, 'braced' as const),
    brace: fc.option(fc.double({ min: 0.1, max: 0.9, noNaN: true })),
    arrangement: fc.constantFrom('post-base' as const, 'face-plate' as const),
    post: fc.option(fc.integer({ min: 1, max: 48 })),
    weld: fc.option(fc.constantFrom('3/16 in', '1/4 in', '5/16 in')),
    flexibleRoot: fc.option(fc.boolean()),
    offset: fc.constantFrom('6 in', '7 in', '8 in', '10 in'),
  })
  .map((d): DesignDocument => ({
    units: d.units,
    method: d.method,
    member: {
      length: `${d.length} ft`,
      spacing: '4 ft',
      section: { shape: d.shape },
      lateralSupport: {
        topFlange: d.topFlange,
        root: d.root,
        tip: d.tip,
        ...(d.brace === null ? {} : { braces: [`${(d.brace * d.length).toFixed(2)} ft`] }),
      },
    },
    loads: {
      selfWeight: true,
      area: [
        { case: 'D', value: `${d.D} psf` },
        { case: 'L', value: `${d.L} psf` },
        { case: 'W', value: `${d.W} psf` },
      ],
      line: [],
      point: [],
      ...(d.sds === null ? {} : { seismic: d.sds as { SDS: number; category: 'A' | 'C' | 'D' | 'F' } }),
    },
    connection: {
      arrangement: d.arrangement,
      ...(d.arrangement === 'post-base' ? { footprint: { shape: 'HSS8X8X1/2' } } : {}),
      plate: { N: '20 in', B: '14 in', thickness: '1.25 in' },
      anchors: {
        perSide: 2,
        diameter: '1 in',
        grade: 'F1554-36',
        offset: d.offset,
        gauge: '8 in',
        embedment: '12 in',
      },
      concrete: { fc: '4000 psi', cracked: true },
      pier: { length: '30 in', width: '24 in' },
      ...(d.arrangement === 'post-base' && d.post !== null ? { post: { height: `${d.post} in` } } : {}),
      ...(d.weld === null ? {} : { weld: { size: d.weld, electrode: 'E70' as const } }),
      ...(d.flexibleRoot === null ? {} : { flexibleRoot: d.flexibleRoot }),
    },
  }));

describe('Version 2 documents', () => {
  it('no NaN or Infinity, an uncomputed check never passes, ok = every check ok, deflection parts add up', () => {
    fc.assert(
      fc.property(doc, (d) => {
        const r = run(d, { stations: true });
        expect(numbers(r).every(Number.isFinite)).toBe(true);
        for (const c of r.checks) if (c.ratio === null) expect(c.ok).toBe(false);
        expect(r.ok).toBe(r.checks.every((c) => c.ok));
        for (const c of r.member.combinations) expect(['down', 'up']).toContain(c.direction);
        const parts = r.member.tipDeflectionParts;
        const total = check(r, 'member.deflection.total');
        if (parts && total.demand) {
          expect(parts.member.value + parts.connection.value).toBeCloseTo(total.demand.value, 9);
        }
      }),
      { numRuns: 200 },
    );
  });
});
