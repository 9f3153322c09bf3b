import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { SHAPES, SHAPES_SOURCE, findShape } from '../../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';

// The shipped table (data/shapes.json) was generated from the AISC Shapes Database v15.0. These
// tests are a regression guard against the published values, not an independent derivation.
const CSV = fileURLToPath(
  new URL('../../../../../shared/reference/aisc-shapes-v15.0-US.csv', import.meta.url),
);
const KEYS = ['A', 'Ix', 'Sx', 'Zx', 'Iy', 'ry', 'J'] as const;

describe('published values written here (REFERENCES.md, AISC Shapes Database v15.0 [pub])', () => {
  const cases: [string, Partial<Record<keyof ShapeRecord, number>>][] = [
    [
      'W12X26',
      {
        A: 7.65,
        d: 12.2,
        bf: 6.49,
        tf: 0.38,
        tw: 0.23,
        Ix: 204,
        Sx: 33.4,
        Zx: 37.2,
        Iy: 17.3,
        ry: 1.51,
        J: 0.3,
        Cw: 607,
        rts: 1.75,
        ho: 11.8,
      },
    ],
    ['W18X35', { Ix: 510, Sx: 57.6, Zx: 66.5, ry: 1.22 }],
    ['HSS8X8X1/2', { tdes: 0.465, A: 13.5, Ix: 125, Sx: 31.2, Zx: 37.5 }],
    ['HSS8X8X3/8', { tdes: 0.349, Ix: 100, Zx: 29.4 }],
  ];
  it.each(cases)('%s matches the published properties within 0.5 %%', (label, published) => {
    const s = findShape(label)!;
    expect(s).toBeDefined();
    for (const [key, value] of Object.entries(published)) {
      const shipped = s[key as keyof ShapeRecord] as number;
      expect(Math.abs(shipped / (value as number) - 1), `${label} ${key}`).toBeLessThan(0.005);
    }
  });

  it('design wall thickness of A500 HSS is 0.93 x nominal (REFERENCES.md [pub]): HSS8X8X1/2 -> 0.465 in', () => {
    expect(findShape('HSS8X8X1/2')!.tdes).toBeCloseTo(0.93 * 0.5, 3);
  });

  it('names the source and carries the four families, labels found case-insensitively', () => {
    expect(SHAPES_SOURCE).toContain('AISC Shapes Database v15.0');
    expect(new Set(SHAPES.map((s) => s.family))).toEqual(new Set(['W', 'HSS', 'PIPE', 'C']));
    expect(findShape('w12x26')!.label).toBe('W12X26');
    expect(findShape('pipe6std')!.label).toBe('Pipe6STD');
  });

  it('every shape has finite, positive section properties', () => {
    for (const s of SHAPES) {
      for (const key of KEYS) expect(s[key] > 0 && Number.isFinite(s[key]), `${s.label} ${key}`).toBe(true);
    }
  });
});

describe.runIf(existsSync(CSV))('the shipped table against the published database file', () => {
  const lines = existsSync(CSV) ? readFileSync(CSV, 'utf8').split(/\r?\n/).filter(Boolean) : [];
  const header = lines[0]?.split(',') ?? [];
  const rows = new Map<string, string[]>();
  for (const line of lines.slice(1)) {
    const cells = line.split(',');
    rows.set(cells[header.indexOf('AISC_Manual_Label')], cells);
  }

  it('every shipped shape is within 0.5 % of the published A, Ix, Sx, Zx, Iy, ry, J', () => {
    let compared = 0;
    for (const s of SHAPES) {
      const row = rows.get(s.label);
      expect(row, s.label).toBeDefined();
      for (const key of KEYS) {
        const published = Number(row![header.indexOf(key)]);
        expect(Math.abs(s[key] / published - 1), `${s.label} ${key}`).toBeLessThan(0.005);
        compared++;
      }
    }
    expect(compared).toBe(SHAPES.length * KEYS.length);
  });
});
