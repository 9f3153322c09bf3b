import { describe, expect, it } from 'vitest';
import { PHI_ACI } from '../../../shared/engine/connection/aci-factors';
import {
  basicBreakout,
  breakoutTension,
  effectiveEmbedment,
} from '../../../shared/engine/connection/breakout-tension';
import { aciRodTension, aiscRodTension } from '../../../shared/engine/connection/check-steel-tension';
import {
  blowoutApplies,
  blowoutGroupFactor,
  pulloutStrength,
  sideFaceBlowout,
} from '../../../shared/engine/connection/pullout-blowout';
import {
  F1554_GRADES,
  heavyHexBearingArea,
  rodSize,
  tensileStressArea,
} from '../../../shared/engine/connection/rod-data';
import { expectWithin } from './connection-fixtures';

const cracked = { fc: 4, lambdaA: 1, cracked: true };
const FAR = 100; // an edge far beyond 1.5 hef

describe("ACI 318-19 17.6.2 concrete breakout in tension (REFERENCES.md [calc], f'c 4000 psi, cracked)", () => {
  it('single anchor, hef 6 in, no edge: Nb 22,308 lb and phi Ncb 15,616 lb', () => {
    expectWithin(basicBreakout(6, cracked) * 1000, 22308, 0.001);
    const r = breakoutTension(
      { n: 1, spanX: 0, spanY: 0, spacing: 0, edges: [FAR, FAR, FAR, FAR], hef: 6 },
      cracked,
    );
    expectWithin(PHI_ACI.concreteB * r.Ncbg * 1000, 15616, 0.001);
  });

  it('single anchor with ca,min 4 in: Ncb 13,426 lb', () => {
    const r = breakoutTension(
      { n: 1, spanX: 0, spanY: 0, spacing: 0, edges: [4, FAR, FAR, FAR], hef: 6 },
      cracked,
    );
    expectWithin(r.psiEd, 0.7 + (0.3 * 4) / 9, 1e-12); // 17.6.2.5.1(b)
    expectWithin(r.Ncbg * 1000, 13426, 0.001);
  });

  it('2 x 2 group at 6 in, no edge: Ncbg 39,659 lb', () => {
    const r = breakoutTension(
      { n: 4, spanX: 6, spanY: 6, spacing: 6, edges: [FAR, FAR, FAR, FAR], hef: 6 },
      cracked,
    );
    expectWithin(r.Ncbg * 1000, 39659, 0.001);
  });

  it('uncracked concrete multiplies by psi_c,N = 1.25 (17.6.2.5.2, cast-in [mem])', () => {
    const g = {
      n: 1,
      spanX: 0,
      spanY: 0,
      spacing: 0,
      edges: [FAR, FAR, FAR, FAR] as [number, number, number, number],
      hef: 6,
    };
    expectWithin(
      breakoutTension(g, { ...cracked, cracked: false }).Ncbg,
      1.25 * breakoutTension(g, cracked).Ncbg,
      1e-12,
    );
  });

  it("narrow pier: three edges within 1.5 hef use hef' = max(ca,max/1.5, s/3) (17.6.2.1.2), by hand", () => {
    // A row of two rods at s = 4 in, hef 12 in, in a 12 in wide pier: 4 in to the edge beyond the row,
    // 4 in to each side, 20 in to the far edge. Edges < 1.5 x 12 = 18 in: 4, 4, 4 -> three -> narrow.
    // hef' = max(4/1.5, 4/3) = 2.667 in. 1.5 hef' = 4 in.
    // ANco = 9 x 2.667^2 = 64.0 in^2; ANc = (4 + 4) x (4 + 4 + 4) = 96 in^2; ca,min 4 = 1.5 hef' -> psi_ed 1.0.
    // Nb = 24 x sqrt(4000) x 2.667^1.5 = 24 x 63.246 x 4.3546 = 6,610 lb; Ncbg = 96/64 x 6,610 = 9,915 lb.
    const hefP = 4 / 1.5;
    const nbHand = 24 * Math.sqrt(4000) * hefP ** 1.5;
    const r = breakoutTension(
      { n: 2, spanX: 0, spanY: 4, spacing: 4, edges: [4, 20, 4, 4], hef: 12 },
      cracked,
    );
    expect(r.narrow).toBe(true);
    expectWithin(r.hefUsed, 2.6667, 0.001);
    expectWithin(r.ANc, 96, 1e-9);
    expectWithin(r.ANco, 64, 1e-9);
    expect(r.psiEd).toBe(1);
    expectWithin(r.Ncbg * 1000, 1.5 * nbHand, 1e-9);
    expectWithin(r.Ncbg * 1000, 9915, 0.001);
  });

  it('does not reduce hef with only two near edges', () => {
    expect(effectiveEmbedment(12, [4, 20, 4, 30], 4)).toEqual({ hef: 12, narrow: false });
  });

  it('for 11 <= hef <= 25 in takes the smaller of 24 hef^1.5 and 16 hef^(5/3) (17.6.2.2.1 and .3 [mem])', () => {
    const r = Math.sqrt(4000);
    for (const h of [11, 11.2, 15, 25]) {
      expectWithin(
        basicBreakout(h, cracked) * 1000,
        Math.min(24 * r * h ** 1.5, 16 * r * h ** (5 / 3)),
        1e-12,
      );
    }
    expectWithin(basicBreakout(10.9, cracked) * 1000, 24 * r * 10.9 ** 1.5, 1e-12);
    expectWithin(basicBreakout(26, cracked) * 1000, 24 * r * 26 ** 1.5, 1e-12);
    // At hef = 15 in the 1.5-power form is the smaller: 88,180 lb [calc].
    expectWithin(basicBreakout(15, cracked) * 1000, 88180, 0.001);
  });
});

describe('pullout and steel (REFERENCES.md [calc]; ASTM F1554 [pub])', () => {
  it('heavy hex nut Abrg 0.911 in^2 for a 3/4 in rod (ASME B18.2.2 across flats 1.5 d + 1/8, from memory)', () => {
    expectWithin(heavyHexBearingArea(0.75), 0.911, 0.001);
  });

  it("Np = 8 Abrg f'c = 29,152 lb with Abrg 0.911; psi_c,P 1.4 uncracked", () => {
    expectWithin(pulloutStrength(0.911, cracked) * 1000, 29152, 1e-9);
    expectWithin(pulloutStrength(0.911, { ...cracked, cracked: false }) * 1000, 1.4 * 29152, 1e-9);
  });

  it('Ase 0.334 in^2 for 3/4 in, 0.462 for 7/8, 0.606 for 1 in, and Nsa 19,372 lb for 3/4 in Gr 36', () => {
    const ase = (d: number) => tensileStressArea(d, rodSize(d)?.threadsPerInch ?? NaN);
    expectWithin(ase(0.75), 0.334, 0.002);
    expectWithin(ase(0.875), 0.462, 0.002);
    expectWithin(ase(1), 0.606, 0.002);
    expectWithin(0.334 * F1554_GRADES['F1554-36'].fu * 1000, 19372, 1e-9);
    expectWithin(aciRodTension(0.334, 58, 'LRFD'), 0.75 * 19.372, 1e-9);
  });

  it('F1554 grades: 36/58, 55/75, 105/125 ksi [pub]', () => {
    expect(F1554_GRADES).toEqual({
      'F1554-36': { fy: 36, fu: 58 },
      'F1554-55': { fy: 55, fu: 75 },
      'F1554-105': { fy: 105, fu: 125 },
    });
  });

  it('AISC 360-16 J3.6: 3/4 in Gr 36 phi Rn 14.41 kip, Rn/Omega 9.61 kip', () => {
    expectWithin(aiscRodTension(0.75, 58, 'LRFD'), 14.41, 0.001);
    expectWithin(aiscRodTension(0.75, 58, 'ASD'), 9.61, 0.001);
  });
});

describe('side-face blowout, ACI 318-19 17.6.4 [mem], computed by hand', () => {
  it('applies only when hef > 2.5 ca1', () => {
    expect(blowoutApplies(12, 4)).toBe(true);
    expect(blowoutApplies(10, 4)).toBe(false);
  });

  it('1 in rod, ca1 3 in, ca2 6 in, two rods 6 in apart along the edge', () => {
    // Abrg (1 in heavy hex) = 0.866 x 1.625^2 - 0.7854 = 1.5014 in^2.
    // Nsb = 160 x 3 x sqrt(1.5014) x 63.246 = 37,198 lb; ca2/ca1 = 2 < 3 -> x (1 + 2)/4 = 0.75 -> 27,899 lb.
    // Group (17.6.4.2): s = 6 < 6 ca1 = 18 -> x (1 + 6/18) = 1.333 -> 37,198 lb.
    const abrg = heavyHexBearingArea(1);
    expectWithin(abrg, 1.5014, 0.001);
    const nsb = sideFaceBlowout(3, 6, abrg, cracked) * 1000;
    expectWithin(nsb, 160 * 3 * Math.sqrt(abrg) * Math.sqrt(4000) * 0.75, 1e-12);
    expectWithin(nsb, 27899, 0.001);
    expectWithin(blowoutGroupFactor(2, 6, 3), 4 / 3, 1e-12);
    expect(sideFaceBlowout(3, 20, abrg, cracked)).toBeGreaterThan(sideFaceBlowout(3, 6, abrg, cracked));
  });
});
