/**
 * The post of a post base (connection.post.height) and the moment the plate receives:
 * M + V x (post depth / 2) with a post section of its own. Hand calculations beside each value;
 * section properties from the AISC Shapes Database v15.0 [pub]: HSS8X8X1/2 A 13.5 in^2, Ix 125 in^4,
 * Zx 37.5 in^3, rx = ry 3.04 in, Ht = B = 8 in, tdes 0.465 in.
 */
import { describe, expect, it } from 'vitest';
import type { DesignDocument } from '../../../shared/schemas/design';
import { evaluateDesign } from '../../../shared/engine/design';
import { check, rel, run } from '../engine/design-helpers';
import { parsedDesignSchema } from '../../../shared/schemas/parsed-design';

/** W12X26, 8 ft, D 0.30 kip/ft, L 0.40 kip/ft: LRFD 1.2D + 1.6L gives Mu 32.0 kip-ft, Vu 8.0 kip (REFERENCES.md [calc]). */
function doc(connection: Partial<NonNullable<DesignDocument['connection']>> = {}): DesignDocument {
  return {
    units: 'US',
    method: 'LRFD',
    member: { length: '8 ft', spacing: '4 ft', section: { shape: 'W12X26' } },
    loads: {
      selfWeight: false,
      area: [],
      line: [
        { case: 'D', value: '0.30 kip/ft' },
        { case: 'L', value: '0.40 kip/ft' },
      ],
      point: [],
    },
    connection: {
      arrangement: 'post-base',
      footprint: { shape: 'HSS8X8X1/2' },
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
      ...connection,
    },
  };
}

describe('plate moment of a post base', () => {
  it('with a post section: M + V x d/2 = 384 + 8.0 x 4 = 416 kip-in = 34.67 kip-ft (+8.3 %)', () => {
    const r = run(doc());
    expect(r.connection!.combination).toBe('1.2D + 1.6L');
    expect(rel((r.connection!.plateMoment as { value: number }).value, 416 / 12)).toBeLessThan(1e-9);
  });

  it('without a footprint the plate gets M: 32.0 kip-ft', () => {
    const d = doc();
    delete d.connection!.footprint;
    const r = run(d);
    expect(rel((r.connection!.plateMoment as { value: number }).value, 32)).toBeLessThan(1e-9);
  });

  it('a face plate gets M', () => {
    const r = run(doc({ arrangement: 'face-plate', footprint: undefined }));
    expect(rel((r.connection!.plateMoment as { value: number }).value, 32)).toBeLessThan(1e-9);
  });
});

describe('post.combined, AISC 360-16 H1.1 with E3 and F7', () => {
  it('HSS8X8X1/2 post 12 in high: Pr/Pc = 8.0/604.5, Mr/Mc = 416/1687.5, H1-1b 0.2531', () => {
    // E3: Lc = 2.1 x 12 = 25.2 in, Lc/r = 8.29, Fe = pi^2 29000 / 8.29^2 = 4165 ksi,
    // Fcr = 0.658^(50/4165) x 50 = 49.75 ksi, phi Pn = 0.9 x 49.75 x 13.5 = 604.5 kip.
    // F7: compact walls ((8 - 3 x 0.465)/0.465 = 14.2 < 1.12 sqrt(E/Fy) = 27.0), phi Mn = 0.9 x 50 x 37.5
    // = 1687.5 kip-in (REFERENCES.md phi Mn 140.6 kip-ft). Pr/Pc = 0.0132 < 0.2: H1-1b:
    // 0.0132/2 + 416/1687.5 = 0.0066 + 0.2465 = 0.2531.
    const lr = (2.1 * 12) / 3.04;
    const Fe = (Math.PI ** 2 * 29000) / lr ** 2;
    const Pc = 0.9 * 0.658 ** (50 / Fe) * 50 * 13.5;
    const hand = 8 / Pc / 2 + 416 / 1687.5;
    const c = check(run(doc({ post: { height: '12 in' } })), 'post.combined');
    expect(c.reference).toMatch(/H1/);
    expect(rel(c.ratio!, hand)).toBeLessThan(1e-3);
    expect(hand).toBeCloseTo(0.2531, 3);
    expect(c.note).toMatch(/H1-1b/);
  });

  it('H1-1a once Pr/Pc >= 0.2: a slender tall post under a heavy reaction', () => {
    const heavy = doc({ post: { height: '120 in' }, footprint: { shape: 'HSS6X6X3/8' } });
    heavy.loads!.line = [{ case: 'D', value: '8 kip/ft' }];
    const c = check(run(heavy), 'post.combined');
    // 1.4D: Pu = 1.4 x 8 x 8 = 89.6 kip; Lc/r = 2.1 x 120 / 2.28 = 110.5 <= 4.71 sqrt(E/Fy) = 113.4 (E3-2).
    const lr = (2.1 * 120) / 2.28;
    const Fe = (Math.PI ** 2 * 29000) / lr ** 2;
    const Pc = 0.9 * 0.658 ** (50 / Fe) * 50 * 7.58;
    expect(89.6 / Pc).toBeGreaterThan(0.2);
    expect(c.note).toMatch(/H1-1a/);
  });

  it('a post on a face plate, or a post without its section, is refused naming the field', () => {
    expect(() =>
      evaluateDesign(parsedDesignSchema.parse(doc({ arrangement: 'face-plate', post: { height: '12 in' } }))),
    ).toThrow(/connection.post/);
    const d = doc({ post: { height: '12 in' } });
    delete d.connection!.footprint;
    expect(() => evaluateDesign(parsedDesignSchema.parse(d))).toThrow(/connection.footprint/);
  });
});
