/**
 * Smaller limit items of engine 2.0.0: the tension-side strip from the rods' spread, channels loaded on a
 * free top flange, ASD anchors on the strength combinations, tapers steeper than 1:4, checks that rest
 * on an impossible layout, and the default vibration threshold. Hand values beside each assertion.
 */
import { describe, expect, it } from 'vitest';
import { solveBearing } from '../../../shared/engine/connection/bearing';
import { requiredThickness } from '../../../shared/engine/connection/plate-thickness';
import { strengthCombinations, allowableCombinations } from '../../../shared/engine/member/combinations';
import type { DesignDocument } from '../../../shared/schemas/design';
import { evaluateDesign } from '../../../shared/engine/design';
import { check, memberDoc, run } from '../engine/design-helpers';
import { parsedDesignSchema } from '../../../shared/schemas/parsed-design';

const w12 = { label: 'W12X26', kind: 'I' as const, d: 12.2, bf: 6.49, tf: 0.38, tw: 0.23 };

describe('tension-side strip width from the rods spread (45 degrees)', () => {
  it('end plate N 18, B 10, f 7 (REFERENCES.md [calc]: T 24.88 kip, tp 0.579 in with the full B)', () => {
    // x = 7 - 6.1 + 0.19 = 1.09 in. One rod per row: b = 2x = 2.18 in, tp = 0.579 sqrt(10 / 2.18) = 1.240 in.
    // Two rods at 6 in: b = 6 + 2.18 = 8.18 in, tp = 0.579 sqrt(10 / 8.18) = 0.640 in.
    const fpMax = 0.65 * 0.85 * 4;
    const s = solveBearing({ N: 18, B: 10, f: 7, P: 0, M: 384, fpMax });
    const full = requiredThickness(s, { N: 18, B: 10, f: 7, Fy: 36 }, w12, 'LRFD')!;
    expect(full.tensionSide).toBeCloseTo(0.579, 3);
    const one = requiredThickness(s, { N: 18, B: 10, f: 7, Fy: 36, perSide: 1, gauge: 0 }, w12, 'LRFD')!;
    expect(one.tensionWidth).toBeCloseTo(2.18, 9);
    expect(one.tensionSide / full.tensionSide).toBeCloseTo(Math.sqrt(10 / 2.18), 9);
    expect(one.tensionSide).toBeCloseTo(1.24, 2);
    const two = requiredThickness(s, { N: 18, B: 10, f: 7, Fy: 36, perSide: 2, gauge: 6 }, w12, 'LRFD')!;
    expect(two.tensionWidth).toBeCloseTo(8.18, 9);
    const wide = requiredThickness(s, { N: 18, B: 10, f: 7, Fy: 36, perSide: 3, gauge: 6 }, w12, 'LRFD')!;
    expect(wide.tensionWidth).toBe(10);
  });
});

describe('channels with load on a free top flange', () => {
  it('refused (not computed) unless the top flange is held; held by default', () => {
    const base = memberDoc({ shape: 'C10X15.3', loads: { selfWeight: true, area: [], line: [], point: [] } });
    const free = { ...base, member: { ...base.member, lateralSupport: { topFlange: 'free' as const } } };
    const f = check(run(free), 'member.flexure');
    expect(f.ratio).toBeNull();
    expect(f.ok).toBe(false);
    expect(f.note).toMatch(/shear centre/);
    expect(check(run(base), 'member.flexure').ratio).not.toBeNull();
  });
});

describe('ASD anchors on the strength combinations', () => {
  it('the old divisor 1.6 was not conservative: D = 0.3, L = S = 1 gives 2.96 / 1.80 = 1.644 > 1.6', () => {
    // Largest strength combination 1.2D + 1.6S + L = 0.36 + 1.6 + 1 = 2.96; largest allowable
    // D + 0.75L + 0.75S = 0.3 + 1.5 = 1.80 (ASCE 7-16 2.3.1 and 2.4.1 [mem]): phi Rn / 1.6 was 2.7 % short.
    const present = new Set(['D', 'L', 'S'] as const);
    const effect = (f: Partial<Record<string, number>>) => 0.3 * (f.D ?? 0) + (f.L ?? 0) + (f.S ?? 0);
    const strength = Math.max(...strengthCombinations(present).map((c) => effect(c.factors)));
    const allowable = Math.max(...allowableCombinations(present).map((c) => effect(c.factors)));
    expect(strength / allowable).toBeCloseTo(2.96 / 1.8, 12);
    expect(strength / allowable).toBeGreaterThan(1.6);
  });
  it('an ASD design names a strength combination on its anchor rows', () => {
    const d: DesignDocument = {
      ...memberDoc({
        method: 'ASD',
        loads: { selfWeight: true, area: [{ case: 'L', value: '60 psf' }], line: [], point: [] },
      }),
      connection: {
        arrangement: 'face-plate',
        plate: { N: '18 in', B: '10 in', thickness: '1 in' },
        anchors: {
          perSide: 2,
          diameter: '3/4 in',
          grade: 'F1554-36',
          offset: '7 in',
          gauge: '6 in',
          embedment: '12 in',
        },
        concrete: { fc: '4000 psi', cracked: true },
        pier: { length: '30 in', width: '24 in' },
      },
    };
    const r = run(d);
    expect(check(r, 'anchors.concreteBreakout').combination).toBe('1.2D + 1.6L');
    expect(check(r, 'plate.thickness').combination).toBe('D + L');
  });
});

describe('tapers steeper than 1:4 and impossible layouts', () => {
  it('a W12X26 cut to 6 in over 2 ft (6.2 / 24 = 0.26 > 0.25) is refused naming the field', () => {
    const d = memberDoc({
      length: '2 ft',
      section: { shape: 'W12X26', tipDepth: '6 in' },
      loads: { selfWeight: true, area: [], line: [], point: [] },
    });
    expect(() => evaluateDesign(parsedDesignSchema.parse(d))).toThrow(
      /member.section.tipDepth: makes the taper steeper than 1:4/,
    );
    const ok = memberDoc({
      length: '2.1 ft',
      section: { shape: 'W12X26', tipDepth: '6 in' },
      loads: { selfWeight: true, area: [], line: [], point: [] },
    });
    expect(() => evaluateDesign(parsedDesignSchema.parse(ok))).not.toThrow();
  });

  it('rods outside the plate: the layout fails and every check resting on it is not computed', () => {
    const d: DesignDocument = {
      ...memberDoc({
        loads: { selfWeight: true, area: [{ case: 'L', value: '60 psf' }], line: [], point: [] },
      }),
      connection: {
        arrangement: 'face-plate',
        plate: { N: '18 in', B: '10 in', thickness: '1 in' },
        anchors: {
          perSide: 2,
          diameter: '3/4 in',
          grade: 'F1554-36',
          offset: '10 in',
          gauge: '6 in',
          embedment: '12 in',
        },
        concrete: { fc: '4000 psi', cracked: true },
        pier: { length: '30 in', width: '24 in' },
      },
    };
    const r = run(d);
    expect(check(r, 'anchors.layout').ok).toBe(false);
    for (const id of [
      'plate.thickness',
      'plate.bearing',
      'anchors.concreteBreakout',
      'anchors.steelTension',
    ]) {
      const c = check(r, id);
      expect(c.ratio).toBeNull();
      expect(c.ok).toBe(false);
      expect(c.note).toMatch(/rods fall outside the plate/);
    }
    expect(r.connection).toBeNull();
  });
});
