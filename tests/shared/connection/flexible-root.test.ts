/**
 * connection.flexibleRoot: the root rotates with the connection (rods stretching over their stretch
 * length, the plate bending, concrete bearing, the post bending), by the component method of
 * EN 1993-1-8:2005 6.3 [mem]; the deflection checks and the frequency include it.
 * Hand calculations are shown beside each value.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rootStiffness } from '../../../shared/engine/connection/root-stiffness';
import { connectionSchema } from '../../../shared/schemas/connection';
import { parseConnection } from '../../../shared/schemas/parsed-design';
import { findShape } from '../../../shared/engine/shapes/table';
import { analyseMember } from '../../../shared/engine/member/analysis';
import { firstFrequency } from '../../../shared/engine/member/frequency';
import { catalogSection } from '../../../shared/engine/sections/catalog-section';
import type { DesignDocument } from '../../../shared/schemas/design';
import { check, rel, run } from '../engine/design-helpers';
import { W12X26_ROOT } from './connection-fixtures';

const conn = (over: Record<string, unknown> = {}) =>
  connectionSchema.parse({
    arrangement: 'post-base',
    plate: { N: '18 in', B: '14 in', thickness: '1.25 in', Fy: '36 ksi' },
    anchors: {
      perSide: 2,
      diameter: '3/4 in',
      grade: 'F1554-36',
      offset: '7 in',
      gauge: '9 in',
      embedment: '12 in',
    },
    concrete: { fc: '4000 psi', cracked: true },
    pier: { length: '30 in', width: '24 in' },
    ...over,
  });

describe('root stiffness by components', () => {
  it('rod stretch: 2 rods of 3/4 in (As 0.334 in^2), Ls = 8 x 0.75 + 1.5 + 1.25 + 0.25 + 0.375 = 9.375 in', () => {
    // Stretch length: 8 da + grout (1.5 in, common practice, no source) + plate + washer (1/4 in,
    // DG1 Table 2.3 [pub]) + half a nut (da/2). k = n E As / Ls = 2 x 29000 x 0.334 / 9.375 = 2066.3 kip/in.
    const s = rootStiffness(parseConnection(conn()), W12X26_ROOT, findShape);
    if (!s.ok) throw new Error(s.reason);
    expect(s.stretchLength).toBeCloseTo(9.375, 12);
    expect(rel(s.kRods, (2 * 29000 * 0.334) / 9.375)).toBeLessThan(2e-3);
  });

  it('the joint: S = z^2 / (1/k_rods + 1/k_plate + 1/k_concrete), each by its EN 1993-1-8 Table 6.11 formula', () => {
    // W12X26 footprint d 12.2, bf 6.49, tf 0.38 (Shapes Database v15.0). m = 7 - 6.1 = 0.9 in;
    // leff = min(14, 2 x 2 pi x 0.9 = 11.31) = 11.31 in; k_plate = 0.425 x 29000 x 11.31 x 1.25^3 / 0.9^3.
    // Concrete: Ec = 57 sqrt(4000) = 3605 ksi (ACI 318-19 19.2.2.1), beff = 0.38 + 3.125, leff = 6.49 + 3.125,
    // k_c = Ec sqrt(beff leff) / 1.275. z = 7 + 6.1 - 0.19 = 12.91 in.
    const s = rootStiffness(parseConnection(conn()), W12X26_ROOT, findShape);
    if (!s.ok) throw new Error(s.reason);
    const kr = (2 * 29000 * 0.334) / 9.375;
    const kp = (0.425 * 29000 * Math.min(14, 4 * Math.PI * 0.9) * 1.25 ** 3) / 0.9 ** 3;
    const kc = (57 * Math.sqrt(4000) * Math.sqrt((0.38 + 3.125) * (6.49 + 3.125))) / 1.275;
    const z = 7 + 6.1 - 0.19;
    expect(rel(s.kPlate, kp)).toBeLessThan(1e-9);
    expect(rel(s.kConcrete, kc)).toBeLessThan(1e-9);
    expect(rel(s.S, (z * z) / (1 / kr + 1 / kp + 1 / kc))).toBeLessThan(2e-3);
    expect(s.postFlexibility).toBe(0);
  });

  it('a post adds h / (E I): HSS8X8X1/2 (Ix 125 in^4), 12 in: 12 / (29000 x 125) = 3.31e-6 rad per kip-in', () => {
    const s = rootStiffness(
      parseConnection(conn({ footprint: { shape: 'HSS8X8X1/2' }, post: { height: '12 in' } })),
      W12X26_ROOT,
      findShape,
    );
    if (!s.ok) throw new Error(s.reason);
    expect(rel(s.postFlexibility, 12 / (29000 * 125))).toBeLessThan(1e-12);
    expect(s.offset).toBe(4);
  });
});

/** W12X26, 8 ft, D 0.30 and L 0.40 kip/ft (REFERENCES.md: deflection D 0.0449, L 0.0598 in, rigid root). */
function doc(flexibleRoot?: boolean, over: Record<string, unknown> = {}): DesignDocument {
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
      ...conn(over),
      ...(flexibleRoot === undefined ? {} : { flexibleRoot }),
    } as DesignDocument['connection'],
  };
}

describe('deflection and frequency with the root rotation', () => {
  it('tip = member + theta L with theta = (M + V offset) / S: D + L (M 22.4 kip-ft = 268.8 kip-in)', () => {
    const r = run(doc());
    const s = rootStiffness(parseConnection(conn()), W12X26_ROOT, findShape);
    if (!s.ok) throw new Error(s.reason);
    const theta = 268.8 * s.flexibility;
    const total = check(r, 'member.deflection.total');
    expect(total.combination).toBe('D + L');
    expect(rel((r.connection!.rootRotation as { value: number }).value, theta)).toBeLessThan(1e-9);
    const parts = r.member.tipDeflectionParts!;
    // Rigid-root part: 0.0449 + 0.0598 = 0.1047 in (REFERENCES.md [calc]).
    expect(rel(parts.member.value, 0.1047)).toBeLessThan(2e-3);
    expect(rel(parts.connection.value, theta * 96)).toBeLessThan(1e-9);
    expect(rel(total.demand!.value, parts.member.value + parts.connection.value)).toBeLessThan(1e-12);
    // Dead-load camber (common practice, no source: 100 % D): 0.0449 in + (M_D = 0.30 x 8^2 / 2 = 9.6 kip-ft
    // = 115.2 kip-in) x c x 96 in.
    expect(
      rel(
        r.member.recommendedCamber!.value,
        r.member.cases.D!.tipDeflection.value + 115.2 * s.flexibility * 96,
      ),
    ).toBeLessThan(1e-9);
    // The cases stay the member's own bending (contract).
    expect(rel(r.member.cases.D!.tipDeflection.value, 0.0449)).toBeLessThan(3e-3);
  });

  it('flexibleRoot false gives the rigid root of the older engine', () => {
    const r = run(doc(false));
    expect(r.member.tipDeflectionParts).toBeUndefined();
    expect(rel(check(r, 'member.deflection.total').demand!.value, 0.1047)).toBeLessThan(2e-3);
    expect(run(doc()).member.frequency.value).toBeLessThan(r.member.frequency.value);
  });

  it('frequency of a rigid bar on a root spring: f = (1/2 pi) sqrt(3 g / (w L^3 c)) (hand: rigid-body rotation)', () => {
    // A member 1e6 times stiffer than steel bends negligibly; the mode is the bar turning about the
    // root: k_theta = 1/c against the rotary inertia w L^3 / (3 g).
    const section = catalogSection(findShape('W12X26')!);
    const L = 96;
    const w = 0.3 / 12;
    const loads = [{ case: 'D' as const, q0: w, q1: 0, points: [] }];
    const model = analyseMember(section, L, 29000e6, loads);
    const c = 1e-6;
    const f = firstFrequency(model, loads[0], { flexibility: c, offset: 0 });
    const hand = Math.sqrt((3 * 386.0886) / (w * L ** 3 * c)) / (2 * Math.PI);
    expect(rel(f, hand)).toBeLessThan(1e-3);
  });

  it('property: a stiffer root never increases the tip deflection (and a shorter post is always stiffer)', () => {
    // "Stiffer" is the joint's own measure (rotation per unit moment): a thicker plate is not always
    // stiffer, because the rods then stretch over a longer length (the plate is part of it).
    const variant = fc.record({
      t: fc.constantFrom('1 in', '1.25 in', '1.5 in', '2 in', '2.5 in'),
      h: fc.integer({ min: 0, max: 36 }),
      da: fc.constantFrom('3/4 in', '1 in', '1-1/4 in'),
      f: fc.constantFrom('6 in', '7 in', '8 in'),
    });
    fc.assert(
      fc.property(variant, variant, (a, b) => {
        const over = (v: typeof a) => ({
          plate: { N: '18 in', B: '14 in', thickness: v.t },
          anchors: {
            perSide: 2,
            diameter: v.da,
            grade: 'F1554-36',
            offset: v.f,
            gauge: '9 in',
            embedment: '12 in',
          },
          footprint: { shape: 'HSS8X8X1/2' },
          ...(v.h > 0 ? { post: { height: `${v.h} in` } } : {}),
        });
        const flex = (v: typeof a) => {
          const s = rootStiffness(parseConnection(conn(over(v))), W12X26_ROOT, findShape);
          if (!s.ok) throw new Error(s.reason);
          return s.flexibility;
        };
        const y = (v: typeof a) => check(run(doc(true, over(v))), 'member.deflection.total').demand!.value;
        const [stiff, soft] = flex(a) <= flex(b) ? [a, b] : [b, a];
        expect(y(stiff)).toBeLessThanOrEqual(y(soft) * (1 + 1e-12));
        const shorter = { ...a, h: Math.max(0, a.h - 6) };
        expect(flex(shorter)).toBeLessThanOrEqual(flex(a));
      }),
      { numRuns: 60 },
    );
  });

  it('an impossible layout: the serviceability rows are not computed, never passed', () => {
    const r = run(
      doc(true, {
        anchors: {
          perSide: 2,
          diameter: '3/4 in',
          grade: 'F1554-36',
          offset: '5 in',
          gauge: '9 in',
          embedment: '12 in',
        },
      }),
    );
    const t = check(r, 'member.deflection.total');
    expect(t.ratio).toBeNull();
    expect(t.ok).toBe(false);
    expect(t.note).toMatch(/not computed/);
  });
});
