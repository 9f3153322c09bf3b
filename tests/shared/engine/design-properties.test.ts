import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { DesignDocument } from '../../../shared/schemas/design';
import type { DesignResult } from '../../../shared/engine/types';
import { run } from './design-helpers';

// Property tests (fast-check): for any valid input the result holds only finite numbers and is
// internally consistent, and the physics moves the right way.

const SHAPES = [
  'W6X15',
  'W8X18',
  'W10X19',
  'W12X26',
  'W18X35',
  'W24X62',
  'HSS8X8X1/2',
  'HSS8X8X1/4',
  'HSS10X4X1/8',
  'Pipe6STD',
  'C10X15.3',
  'C6X8.2',
];

const load = (unit: string, max: number) =>
  fc.double({ min: 0, max, noNaN: true }).map((v) => `${v.toFixed(3)} ${unit}`);
const cases = fc.constantFrom('D' as const, 'L' as const, 'Lr' as const, 'S' as const);

const section = fc.oneof(
  fc.constantFrom(...SHAPES).map((shape) => ({ shape })),
  fc
    .double({ min: 0.1, max: 0.95, noNaN: true })
    .map((f) => ({ shape: 'W12X26', tipDepth: `${(1.61 + f * (12.2 - 1.61)).toFixed(3)} in` })),
  fc
    .record({
      root: fc.double({ min: 6, max: 40, noNaN: true }),
      tipFraction: fc.double({ min: 0.2, max: 1, noNaN: true }),
      bf: fc.double({ min: 3, max: 14, noNaN: true }),
      tf: fc.double({ min: 0.25, max: 1.25, noNaN: true }),
      tw: fc.double({ min: 0.1875, max: 0.75, noNaN: true }),
    })
    .map((p) => ({
      plates: {
        rootDepth: `${p.root.toFixed(3)} in`,
        tipDepth: `${Math.max(p.root * p.tipFraction, 2 * p.tf + 0.3).toFixed(3)} in`,
        flangeWidth: `${p.bf.toFixed(3)} in`,
        flangeThickness: `${p.tf.toFixed(3)} in`,
        webThickness: `${p.tw.toFixed(3)} in`,
      },
    })),
);

const document = fc
  .record({
    length: fc.double({ min: 1, max: 40, noNaN: true }),
    section,
    method: fc.constantFrom('LRFD' as const, 'ASD' as const),
    units: fc.constantFrom('US' as const, 'SI' as const),
    area: fc.array(fc.record({ case: cases, value: load('psf', 150) }), { maxLength: 3 }),
    line: fc.array(fc.record({ case: cases, value: load('lbf/ft', 500) }), { maxLength: 2 }),
    point: fc.array(
      fc.record({ case: cases, value: load('lbf', 3000), at: fc.double({ min: 0, max: 1, noNaN: true }) }),
      { maxLength: 3 },
    ),
    braced: fc.double({ min: 0.05, max: 1, noNaN: true }),
    frequencyMin: fc.option(fc.double({ min: 1, max: 30, noNaN: true })),
  })
  .map((d) => ({ ...d, length: Math.max(d.length, taperMinimumFt(d.section)) }))
  .map((d): DesignDocument => ({
    units: d.units,
    method: d.method,
    member: {
      length: `${d.length.toFixed(3)} ft`,
      spacing: '4 ft',
      section: d.section,
      unbracedLength: `${(d.length * d.braced).toFixed(3)} ft`,
    },
    loads: {
      selfWeight: true,
      area: d.area,
      line: d.line,
      point: d.point.map((p) => ({ case: p.case, value: p.value, at: `${(d.length * p.at).toFixed(3)} ft` })),
    },
    ...(d.frequencyMin === null ? {} : { frequencyMin: `${d.frequencyMin.toFixed(2)} Hz` }),
  }));

/** The shortest member that keeps a taper within 1:4 (steeper tapers are refused since engine 2.0.0). */
function taperMinimumFt(s: {
  shape?: string;
  tipDepth?: string;
  plates?: { rootDepth: string; tipDepth: string };
}): number {
  const drop = s.plates
    ? parseFloat(s.plates.rootDepth) - parseFloat(s.plates.tipDepth)
    : s.tipDepth
      ? 12.2 - parseFloat(s.tipDepth) // W12X26 d = 12.2 in (AISC Shapes Database v15.0)
      : 0;
  return (drop / 0.25 / 12) * 1.001;
}

function numbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => numbers(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => numbers(v, out));
  return out;
}

function tip(r: DesignResult): number {
  return r.member.combinations[r.member.combinations.length - 1].tipDeflection.value;
}

describe('properties', () => {
  it('no NaN or Infinity anywhere, every ratio computed, ok = every check ok', () => {
    fc.assert(
      fc.property(document, (doc) => {
        const r = run(doc, { stations: true });
        expect(numbers(r).every(Number.isFinite)).toBe(true);
        expect(r.checks.every((c) => c.ratio !== null && c.ratio >= 0)).toBe(true);
        expect(r.ok).toBe(r.checks.every((c) => c.ok));
        expect(r.member.frequency.value).toBeGreaterThan(0);
      }),
      { numRuns: 150 },
    );
  });

  it('tip deflection grows with length and with load', () => {
    const base = (length: number, w: number): DesignDocument => ({
      member: { length: `${length} ft`, spacing: '4 ft', section: { shape: 'W10X19', tipDepth: '5 in' } },
      loads: { selfWeight: true, area: [{ case: 'L', value: `${w} psf` }], line: [], point: [] },
    });
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 30, noNaN: true }),
        fc.double({ min: 1.01, max: 2, noNaN: true }),
        fc.double({ min: 5, max: 150, noNaN: true }),
        (L, k, w) => {
          const a = run(base(L, w));
          expect(tip(run(base(L * k, w)))).toBeGreaterThan(tip(a));
          expect(tip(run(base(L, w * k)))).toBeGreaterThan(tip(a));
        },
      ),
      { numRuns: 60 },
    );
  });

  it('a deeper tip never deflects more (same root, same loads)', () => {
    const doc = (tipDepth: number): DesignDocument => ({
      member: { length: '10 ft', spacing: '4 ft', section: { shape: 'W12X26', tipDepth: `${tipDepth} in` } },
      loads: {
        selfWeight: true,
        area: [
          { case: 'D', value: '15 psf' },
          { case: 'L', value: '60 psf' },
        ],
        line: [],
        point: [{ case: 'D', value: '150 lbf', at: '10 ft' }],
      },
    });
    fc.assert(
      fc.property(
        fc.double({ min: 1.7, max: 12.1, noNaN: true }),
        fc.double({ min: 1.7, max: 12.1, noNaN: true }),
        (a, b) => {
          fc.pre(Math.abs(a - b) > 1e-6);
          const [shallow, deep] = a < b ? [a, b] : [b, a];
          expect(tip(run(doc(deep)))).toBeLessThanOrEqual(tip(run(doc(shallow))));
        },
      ),
      { numRuns: 60 },
    );
  });
});
