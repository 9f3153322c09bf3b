/**
 * Wind (case W, signed) and vertical seismic effects: the ASCE 7-16 combinations (2.3.1, 2.3.6,
 * 2.4.1, 2.4.5 and 12.4.4, combination lists from memory of the published text), the direction of
 * each combination, the top-flange check under uplift and the rows of rods under uplift.
 * Hand calculations are shown beside each value.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { designSchema } from '../../../../shared/schemas/design';
import { allowableCombinations, strengthCombinations } from '../../../../shared/engine/member/combinations';
import type { LoadCase } from '../../../../shared/schemas/member';
import { check, memberDoc, rel, run } from '../design-helpers';
import type { DesignDocument } from '../../../../shared/schemas/design';

const names = (list: { name: string }[]) => list.map((c) => c.name);
const set = (...c: LoadCase[]) => new Set<LoadCase>(c);

describe('ASCE 7-16 combinations with wind and vertical seismic', () => {
  it('2.3.1 strength with D, L, S and W: combinations 1 to 5 as the standard lists them', () => {
    // 1. 1.4D; 2. 1.2D + 1.6L + 0.5(Lr or S); 3. 1.2D + 1.6(Lr or S) + (L or 0.5W);
    // 4. 1.2D + 1.0W + L + 0.5(Lr or S); 5. 0.9D + 1.0W (ASCE 7-16 2.3.1 [mem]).
    expect(names(strengthCombinations(set('D', 'L', 'S', 'W')))).toEqual([
      '1.4D',
      '1.2D + 1.6L + 0.5S',
      '1.2D + 1.6S + L',
      '1.2D + 1.6S + 0.5W',
      '1.2D + 1.0W + L + 0.5S',
      '0.9D + 1.0W',
    ]);
  });

  it('2.3.6 with Ev = 0.2 SDS D folded into D, and 12.4.4 in category D', () => {
    // SDS = 1.0: 1.2D + Ev + L + 0.2S has 1.2 + 0.2 x 1.0 = 1.4 on D; 0.9D - Ev has 0.9 - 0.2 = 0.7.
    const list = strengthCombinations(set('D', 'L', 'S'), { SDS: 1.0, category: 'D' });
    const byName = Object.fromEntries(list.map((c) => [c.name, c.factors]));
    expect(byName['1.2D + Ev + L + 0.2S']).toEqual({ D: 1.4, L: 1, S: 0.2 });
    expect(byName['0.9D - Ev']).toEqual({ D: 0.7 });
    expect(byName['0.2D upward (ASCE 7-16 12.4.4)']).toEqual({ D: -0.2 });
  });

  it('no 12.4.4 row in category C; Ev still present', () => {
    const list = names(strengthCombinations(set('D', 'L'), { SDS: 0.4, category: 'C' }));
    expect(list).toContain('1.2D + Ev + L');
    expect(list.some((n) => n.includes('12.4.4'))).toBe(false);
  });

  it('2.4.1 and 2.4.5 allowable with W and Ev (SDS = 0.5)', () => {
    // 5. D + 0.6W and D + 0.7Ev (D: 1 + 0.7 x 0.1 = 1.07); 6. D + 0.75L + 0.75(0.6W) + 0.75S and
    // D + 0.525Ev + 0.75L + 0.75S (D: 1 + 0.525 x 0.1 = 1.0525); 7. 0.6D + 0.6W; 8. 0.6D - 0.7Ev (0.53).
    const list = allowableCombinations(set('D', 'L', 'S', 'W'), { SDS: 0.5, category: 'B' });
    const byName = Object.fromEntries(list.map((c) => [c.name, c.factors]));
    expect(byName['D + 0.6W']).toEqual({ D: 1, W: 0.6 });
    expect(byName['D + 0.75L + 0.45W + 0.75S']).toEqual({ D: 1, L: 0.75, W: 0.45, S: 0.75 });
    expect(byName['0.6D + 0.6W']).toEqual({ D: 0.6, W: 0.6 });
    expect(byName['D + 0.7Ev']).toEqual({ D: 1.07 });
    expect(byName['D + 0.525Ev + 0.75L + 0.75S']).toEqual({ D: 1.0525, L: 0.75, S: 0.75 });
    expect(byName['0.6D - 0.7Ev']).toEqual({ D: 0.53 });
  });

  it('older gravity lists are unchanged (names and order)', () => {
    expect(names(strengthCombinations(set('D', 'L', 'S')))).toEqual([
      '1.4D',
      '1.2D + 1.6L + 0.5S',
      '1.2D + 1.6S + L',
    ]);
    expect(names(allowableCombinations(set('D', 'L', 'S')))).toEqual([
      'D',
      'D + L',
      'D + S',
      'D + 0.75L + 0.75S',
    ]);
  });
});

describe('loads: only wind may be negative', () => {
  it('a negative dead load is refused with the field named', () => {
    const doc = memberDoc({
      loads: { selfWeight: false, area: [{ case: 'D', value: '-10 psf' }], line: [], point: [] },
    });
    const r = designSchema.safeParse(doc);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path.join('.')).toBe('loads.area.0.value');
    expect(r.error!.issues[0].message).toMatch(/only wind/);
  });
  it('a negative wind load is accepted', () => {
    const doc = memberDoc({
      loads: { selfWeight: false, area: [{ case: 'W', value: '-30 psf' }], line: [], point: [] },
    });
    expect(designSchema.safeParse(doc).success).toBe(true);
  });
});

/** W12X26, 8 ft, D = 0.30 kip/ft, W = -0.60 kip/ft (line loads, self-weight off). */
function upliftDoc(extra: Partial<DesignDocument['member']> = {}): DesignDocument {
  const d = memberDoc({
    loads: {
      selfWeight: false,
      area: [],
      line: [
        { case: 'D', value: '0.30 kip/ft' },
        { case: 'W', value: '-0.60 kip/ft' },
      ],
      point: [],
    },
  });
  return { ...d, member: { ...d.member, ...extra } };
}

describe('uplift: direction and the top flange in compression', () => {
  it('0.9D + 1.0W lifts the tip: root moment 10.56 kip-ft "up" (hand: 0.33 kip/ft x 8^2 / 2)', () => {
    const r = run(upliftDoc());
    const c = r.member.combinations.find((x) => x.name === '0.9D + 1.0W')!;
    // 0.9 x 0.30 - 0.60 = -0.33 kip/ft; M = 0.33 x 64 / 2 = 10.56 kip-ft; V = 0.33 x 8 = 2.64 kip.
    expect(c.direction).toBe('up');
    expect(rel(c.rootMoment.value, 10.56)).toBeLessThan(1e-9);
    expect(rel(c.rootShear.value, 2.64)).toBeLessThan(1e-9);
    expect(c.tipDeflection.value).toBeLessThan(0);
    expect(r.member.combinations.find((x) => x.name === '1.4D')!.direction).toBe('down');
  });

  it('member.flexure.uplift, top flange held by the deck: phi Mp = 0.9 x 50 x 37.2 / 12 = 139.5 kip-ft', () => {
    // W12X26 Zx 37.2 in^3 (AISC Shapes Database v15.0); compact flange bf/2tf = 8.54 < 9.15.
    const u = check(run(upliftDoc()), 'member.flexure.uplift');
    expect(u.combination).toBe('0.9D + 1.0W');
    expect(rel(u.capacity!.value, 139.5)).toBeLessThan(1e-3);
    expect(rel(u.demand!.value, 10.56)).toBeLessThan(1e-9);
    expect(u.reference).toBe('AISC 360-16 F2.1');
  });

  it('top flange free, fixed root: Le = 0.8 x 8 ft = 6.4 ft (IS 800:2007 Table 16 (d)(i), normal load), F2-2 by hand', () => {
    // W12X26: Sx 33.4, Zx 37.2 (Shapes Database v15.0); Lp 5.33 ft, Lr 14.88 ft (REFERENCES.md [calc]).
    // Mn = 1860 - (1860 - 0.7 x 50 x 33.4)(6.4 - 5.33)/(14.88 - 5.33) = 1860 - 691 x 0.1120 = 1782.6 kip-in.
    const u = check(run(upliftDoc({ lateralSupport: { topFlange: 'free' } })), 'member.flexure.uplift');
    const Mp = 50 * 37.2;
    const Mn = Mp - (Mp - 0.7 * 50 * 33.4) * ((6.4 - 5.33) / (14.88 - 5.33));
    expect(rel(u.capacity!.value, (0.9 * Mn) / 12)).toBeLessThan(2e-3);
    expect(rel(u.effectiveLength!.value, 6.4)).toBeLessThan(1e-9);
  });

  it('no uplift row when nothing lifts', () => {
    const r = run(memberDoc({ loads: { selfWeight: true, area: [], line: [], point: [] } }));
    expect(r.checks.some((c) => c.id === 'member.flexure.uplift')).toBe(false);
  });

  it('12.4.4 in category D: 0.2D upward gives an up row of 0.2 x the dead moment', () => {
    const d = memberDoc({
      loads: {
        selfWeight: false,
        area: [],
        line: [{ case: 'D', value: '0.30 kip/ft' }],
        point: [],
        seismic: { SDS: 1.0, category: 'D' },
      },
    });
    const r = run(d);
    const up = r.member.combinations.find((c) => c.name === '0.2D upward (ASCE 7-16 12.4.4)')!;
    // D moment 0.30 x 64 / 2 = 9.60 kip-ft (REFERENCES.md [calc]); 0.2 x 9.60 = 1.92 kip-ft.
    expect(up.direction).toBe('up');
    expect(rel(up.rootMoment.value, 1.92)).toBeLessThan(1e-9);
    expect(rel(check(r, 'member.flexure.uplift').demand!.value, 1.92)).toBeLessThan(1e-9);
  });
});

const connection = (arrangement: 'post-base' | 'face-plate') => ({
  arrangement,
  plate: { N: '18 in', B: '10 in', thickness: '1 in' },
  anchors: {
    perSide: 2,
    diameter: '3/4 in',
    grade: 'F1554-36' as const,
    offset: '7 in',
    gauge: '6 in',
    embedment: '12 in',
  },
  concrete: { fc: '4000 psi', cracked: true },
  pier: { length: '30 in', width: '24 in' },
});

describe('the connection under uplift', () => {
  const windDoc = (w: string, arrangement: 'post-base' | 'face-plate'): DesignDocument => ({
    ...memberDoc({ loads: { selfWeight: false, area: [], line: [{ case: 'W', value: w }], point: [] } }),
    connection: connection(arrangement),
  });

  it('face plate, mirror symmetry: wind of the same size up or down loads the other row exactly as much', () => {
    // The plate is centred on the face with symmetric rows, so with the moment and the shear both
    // reversed the bottom row takes what the top row took (hand: the DG1 equations see |M|, P = 0).
    const down = run(windDoc('0.5 kip/ft', 'face-plate'));
    const up = run(windDoc('-0.5 kip/ft', 'face-plate'));
    expect(up.member.combinations[0].direction).toBe('up');
    for (const id of [
      'anchors.steelTension',
      'plate.thickness',
      'anchors.shear',
      'anchors.concreteBreakout',
    ]) {
      expect(check(up, id).ratio).toBeCloseTo(check(down, id).ratio!, 12);
    }
    expect(down.connection!.tensionRow).toBe('top row');
    expect(up.connection!.tensionRow).toBe('bottom row');
  });

  it('post base: uplift pulls on the plate as well, so the rods on the tip side carry more than under the same load downward', () => {
    // Down: P = +4 kip compression, M = 192 kip-in; up: P = -4 kip (a pull), same M. DG1 with M + P f:
    // 192 + 4 x 7 = 220 against 192 - 28 = 164 kip-in about the rods, but T = qmax Y - P adds the pull.
    const down = run(windDoc('0.5 kip/ft', 'post-base'));
    const up = run(windDoc('-0.5 kip/ft', 'post-base'));
    expect(check(up, 'anchors.steelTension').demand!.value).toBeGreaterThan(
      check(down, 'anchors.steelTension').demand!.value,
    );
    expect(up.connection!.tensionRow).toBe('row on the tip side');
    expect(up.connection!.directionsChecked).toEqual(['up']);
  });

  it('property: uplift never makes a rod tension negative and every computed check is finite', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 5, max: 60 }),
        fc.integer({ min: -80, max: 40 }),
        fc.constantFrom('face-plate', 'post-base'),
        (d, w, arr) => {
          const doc: DesignDocument = {
            ...memberDoc({
              loads: {
                selfWeight: true,
                area: [
                  { case: 'D', value: `${d} psf` },
                  { case: 'W', value: `${w} psf` },
                ],
                line: [],
                point: [],
              },
            }),
            connection: connection(arr as 'face-plate' | 'post-base'),
          };
          const r = run(doc);
          const t = check(r, 'anchors.steelTension');
          if (t.demand) expect(t.demand.value).toBeGreaterThanOrEqual(0);
          if (r.connection)
            expect((r.connection.anchorTensionPerRod as { value: number }).value).toBeGreaterThanOrEqual(0);
          for (const c of r.checks) if (c.ratio === null) expect(c.ok).toBe(false);
        },
      ),
      { numRuns: 60 },
    );
  });
});
