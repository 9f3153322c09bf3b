import { describe, expect, it } from 'vitest';
import { check, memberDoc, rel, run } from '../design-helpers';

// Closed forms: AISC Steel Construction Manual, Table 3-23, cantilever cases [mem, REFERENCES.md].
// Worked values: REFERENCES.md "Cantilever statics" [calc] for W12X26 (Ix 204 in^4, E 29000 ksi).

describe('cantilever statics against AISC Manual Table 3-23', () => {
  const doc = memberDoc({
    shape: 'W12X26',
    length: '8 ft',
    loads: {
      selfWeight: false,
      area: [],
      line: [
        { case: 'D', value: '0.30 kip/ft' },
        { case: 'L', value: '0.40 kip/ft' },
      ],
      point: [],
    },
  });
  const r = run(doc);

  it('uniform dead load: M = wL^2/2 = 9.60 kip-ft, V = wL = 2.40 kip, tip wL^4/8EI = 0.0449 in', () => {
    const D = r.member.cases.D!;
    expect(D.rootMoment.unit).toBe('kip ft');
    expect(rel(D.rootMoment.value, 9.6)).toBeLessThan(0.01);
    expect(rel(D.rootShear.value, 2.4)).toBeLessThan(0.01);
    expect(rel(D.tipDeflection.value, 0.0449)).toBeLessThan(0.01);
  });

  it('uniform live load: 12.80 kip-ft, 3.20 kip, 0.0598 in', () => {
    const L = r.member.cases.L!;
    expect(rel(L.rootMoment.value, 12.8)).toBeLessThan(0.01);
    expect(rel(L.rootShear.value, 3.2)).toBeLessThan(0.01);
    expect(rel(L.tipDeflection.value, 0.0598)).toBeLessThan(0.01);
  });

  it('LRFD 1.2D + 1.6L (ASCE 7-16 2.3.1): Mu 32.0 kip-ft, Vu 8.0 kip', () => {
    const c = r.member.combinations.find((x) => x.name === '1.2D + 1.6L')!;
    expect(rel(c.rootMoment.value, 32.0)).toBeLessThan(0.01);
    expect(rel(c.rootShear.value, 8.0)).toBeLessThan(0.01);
    expect(r.member.combinations.map((x) => x.name)).toEqual(['1.4D', '1.2D + 1.6L']);
  });

  it('deflection limits with span = 2 x length (IBC Table 1604.3): 0.533 in live, 0.800 in total', () => {
    expect(check(r, 'member.deflection.live').capacity!.value).toBeCloseTo(0.5333, 3);
    expect(check(r, 'member.deflection.total').capacity!.value).toBeCloseTo(0.8, 3);
    // Total is D + L under the ASCE 7-16 2.4.1 service combinations: 0.0449 + 0.0598 in.
    expect(rel(check(r, 'member.deflection.total').demand!.value, 0.0449 + 0.0598)).toBeLessThan(0.01);
  });

  it('point load at the tip: PL^3/3EI = 0.0498 in for 1 kip; at b = 6 ft: Pb^2(3L - b)/6EI = 0.03155 in', () => {
    const tip = run(
      memberDoc({
        loads: { selfWeight: false, area: [], line: [], point: [{ case: 'L', value: '1 kip', at: '8 ft' }] },
      }),
    );
    expect(rel(tip.member.cases.L!.tipDeflection.value, 0.0498)).toBeLessThan(0.01);
    expect(rel(tip.member.cases.L!.rootMoment.value, 8)).toBeLessThan(1e-9);
    const mid = run(
      memberDoc({
        loads: { selfWeight: false, area: [], line: [], point: [{ case: 'L', value: '1 kip', at: '6 ft' }] },
      }),
    );
    expect(rel(mid.member.cases.L!.tipDeflection.value, 0.03155)).toBeLessThan(0.01);
    expect(rel(mid.member.cases.L!.rootMoment.value, 6)).toBeLessThan(1e-9);
  });

  it('an off-grid point load sits on a station: exact for any position (closed form written here)', () => {
    const b = 37.3; // in, not a multiple of L / 40
    const P = 2.5;
    const EI = 29000 * 204;
    const rr = run(
      memberDoc({
        loads: {
          selfWeight: false,
          area: [],
          line: [],
          point: [{ case: 'L', value: `${P} kip`, at: `${b} in` }],
        },
      }),
      { stations: true },
    );
    const expected = (P * b * b * (3 * 96 - b)) / (6 * EI); // Table 3-23 [mem]
    expect(rel(rr.member.cases.L!.tipDeflection.value, expected)).toBeLessThan(1e-9);
    expect(rr.stations!.x.some((x) => Math.abs(x - b / 12) < 1e-12)).toBe(true);
  });

  it('area loads act on the tributary width: 60 psf x 4 ft = 240 lbf/ft', () => {
    const a = run(
      memberDoc({
        loads: { selfWeight: false, area: [{ case: 'L', value: '60 psf' }], line: [], point: [] },
      }),
    );
    expect(rel(a.member.cases.L!.rootShear.value, 0.24 * 8)).toBeLessThan(1e-9);
  });

  it('self-weight is the area at 490 lb/ft^3: W12X26 A 7.65 in^2 -> 26.0 lbf/ft (AISC Shapes Database v15.0 A)', () => {
    const s = run(memberDoc({ loads: { selfWeight: true, area: [], line: [], point: [] } }));
    expect(s.member.selfWeight.unit).toBe('lbf/ft');
    expect(s.member.selfWeight.value).toBeCloseTo((7.65 * 490) / 144, 6);
    expect(rel(s.member.cases.D!.rootMoment.value, (0.02603 * 64) / 2)).toBeLessThan(0.001);
  });
});

describe('first frequency against Roark (uniform cantilever, 3.516 / 2 pi sqrt(E I g / (w L^4)))', () => {
  // Roark's Formulas for Stress and Strain [pub, REFERENCES.md]; W12X26, 8 ft: 62.3 Hz with
  // self-weight only, 17.6 Hz with 300 lb/ft more [calc, REFERENCES.md].
  it('self-weight only: 62.3 Hz', () => {
    const r = run(memberDoc({ loads: { selfWeight: true, area: [], line: [], point: [] } }));
    expect(r.member.frequency.unit).toBe('Hz');
    expect(rel(r.member.frequency.value, 62.3)).toBeLessThan(0.005);
  });

  it('with 300 lbf/ft of dead load: 17.6 Hz; live load adds no mass (METHOD.md)', () => {
    const loads = {
      selfWeight: true,
      area: [],
      line: [
        { case: 'D' as const, value: '300 lbf/ft' },
        { case: 'L' as const, value: '500 lbf/ft' },
      ],
      point: [],
    };
    const r = run(memberDoc({ loads }));
    expect(rel(r.member.frequency.value, 17.6)).toBeLessThan(0.005);
  });

  it('the steel vibrates even when its weight is left out of the load cases', () => {
    const r = run(
      memberDoc({
        loads: { selfWeight: false, area: [], line: [{ case: 'L', value: '100 lbf/ft' }], point: [] },
      }),
    );
    expect(rel(r.member.frequency.value, 62.3)).toBeLessThan(0.005);
  });

  it.each([0.5, 5, 50])(
    'a %s kip dead point mass at the tip: f = (1/2 pi) sqrt(3 E I g / ((P + 33/140 w L) L^3)) within 0.1 %%',
    (P) => {
      // Single-degree cantilever with Rayleigh's effective beam mass 33/140 of the beam (textbook
      // result, from memory); near exact when the tip mass dominates.
      const r = run(
        memberDoc({
          loads: {
            selfWeight: true,
            area: [],
            line: [],
            point: [{ case: 'D', value: `${P} kip`, at: '8 ft' }],
          },
        }),
      );
      const w = (7.65 * 0.49) / 1728; // W12X26 A 7.65 in^2 at 490 lb/ft^3, kip/in
      const f =
        Math.sqrt((3 * 29000 * 204 * 386.0886) / ((P + (33 / 140) * w * 96) * 96 ** 3)) / (2 * Math.PI);
      expect(rel(r.member.frequency.value, f)).toBeLessThan(0.001);
    },
  );
});
