import { describe, expect, it } from 'vitest';
import {
  availableBearingStress,
  confinementFactor,
  solveBearing,
} from '../../../shared/engine/connection/bearing';
import {
  nextStandardThickness,
  plateCantilevers,
  requiredThickness,
} from '../../../shared/engine/connection/plate-thickness';
import { resolveFootprint } from '../../../shared/engine/connection/footprint';
import { findShape } from '../../../shared/engine/shapes/table';
import { W12X26_ROOT, expectWithin } from './connection-fixtures';

function footprint(label: string) {
  const r = resolveFootprint(label, W12X26_ROOT, findShape);
  if (!r.ok) throw new Error(r.message);
  return r.footprint;
}

describe('AISC Design Guide 1 (2nd ed.) bearing with moment, small moment', () => {
  // REFERENCES.md, "Worked [calc, DG1 method, inputs mem-M]": W12X96, Pu 376 kip, Mu 940 kip-in,
  // N = B = 19 in, f'c 4 ksi, A2/A1 = 1, Fy 36 ksi.
  const fpMax = availableBearingStress(4, 1, 'LRFD');
  const s = solveBearing({ N: 19, B: 19, f: 7, P: 376, M: 940, fpMax });
  const fp = footprint('W12X96');

  it('reproduces e, fp,max, qmax, e_crit, Y and fp', () => {
    expectWithin(s.e, 2.5); // [calc] REFERENCES.md: e 2.50
    expectWithin(fpMax, 2.21); // [calc] AISC 360-16 J8: 0.65 x 0.85 x 4 = 2.21 ksi
    expectWithin(s.qMax, 42.0); // [calc] qmax 42.0 kip/in
    expectWithin(s.eCrit, 5.02); // [calc] e_crit 5.02 in
    expect(s.case).toBe('small-moment');
    expectWithin(s.Y, 14.0); // [calc] Y 14.0 in
    expectWithin(s.fp, 1.41); // [calc] fp 1.41 ksi
    expect(s.T).toBe(0);
  });

  it('reproduces m, n and tp = 1.37 in with n governing', () => {
    const { m, n } = plateCantilevers(19, 19, fp);
    expectWithin(m, 3.47); // [calc] m 3.47 in
    expectWithin(n, 4.62); // [calc] n 4.62 in
    const t = requiredThickness(s, { N: 19, B: 19, f: 7, Fy: 36 }, fp, 'LRFD');
    expectWithin(t?.required, 1.37); // [calc] tp 1.37 in (n governs)
    expectWithin(t?.bearingSide, 1.5 * n * Math.sqrt((s.fp as number) / 36), 1e-9);
  });

  it('uses the ASD coefficient 1.83 in place of 1.5 (DG1 [mem])', () => {
    const lrfd = requiredThickness(s, { N: 19, B: 19, f: 7, Fy: 36 }, fp, 'LRFD');
    const asd = requiredThickness(s, { N: 19, B: 19, f: 7, Fy: 36 }, fp, 'ASD');
    expectWithin(asd?.required, ((lrfd?.required as number) * 1.83) / 1.5, 1e-9);
    // AISC 360-16 J8 ASD: 0.85 f'c / 2.31 [mem]
    expectWithin(availableBearingStress(4, 1, 'ASD'), (0.85 * 4) / 2.31, 1e-12);
  });
});

describe('AISC Design Guide 1 (2nd ed.) end plate with P = 0 (large moment)', () => {
  // REFERENCES.md, "Worked [calc]": Pu 0, Mu 384 kip-in, N 18, B 10, f 7, f'c 4 ksi, A2/A1 1, Fy 36, W12X26.
  const fpMax = availableBearingStress(4, 1, 'LRFD');
  const s = solveBearing({ N: 18, B: 10, f: 7, P: 0, M: 384, fpMax });
  const t = requiredThickness(s, { N: 18, B: 10, f: 7, Fy: 36 }, footprint('W12X26'), 'LRFD');

  it('reproduces qmax, Y and T', () => {
    expect(s.case).toBe('large-moment');
    expectWithin(s.qMax, 22.1); // [calc] qmax 22.10 kip/in
    expectWithin(s.Y, 1.126); // [calc] Y 1.126 in
    expectWithin(s.T, 24.88); // [calc] T 24.88 kip for the row
  });

  it('reproduces tp 0.902 in on the bearing side and 0.579 in on the tension side', () => {
    expectWithin(t?.bearingSide, 0.902); // [calc]
    expectWithin(t?.tensionSide, 0.579); // [calc]
    expectWithin(t?.required, 0.902);
  });

  it('finds no real bearing length when the moment is too large, and says so by the numbers', () => {
    const big = solveBearing({ N: 18, B: 10, f: 7, P: 0, M: 3000, fpMax });
    expect(big.case).toBe('no-solution');
    expect(big.Y).toBeNull();
    // Largest moment a bearing block can hold about the rods: qmax (f + N/2)^2 / 2 (vertex of the DG1 quadratic).
    expectWithin(big.capacityMoment, (22.1 * 16 * 16) / 2);
    expect(big.demandMoment / big.capacityMoment).toBeGreaterThan(1);
    expect(requiredThickness(big, { N: 18, B: 10, f: 7, Fy: 36 }, footprint('W12X26'), 'LRFD')).toBeNull();
  });
});

describe('bearing cases at their boundaries', () => {
  const fpMax = 2.21;
  it('is continuous at e = e_crit: the large-moment solution there has T = 0 and the same Y', () => {
    const P = 100;
    const eCrit = 19 / 2 - P / (2 * fpMax * 19);
    const small = solveBearing({ N: 19, B: 19, f: 7, P, M: P * eCrit * (1 - 1e-9), fpMax });
    const large = solveBearing({ N: 19, B: 19, f: 7, P, M: P * eCrit * (1 + 1e-9), fpMax });
    expect(small.case).toBe('small-moment');
    expect(large.case).toBe('large-moment');
    expectWithin(large.Y, small.Y as number, 1e-6);
    expect(large.T).toBeLessThan(1e-4);
  });

  it('reports an overload when the compression alone exceeds qmax N', () => {
    const s = solveBearing({ N: 10, B: 10, f: 3, P: 300, M: 0, fpMax });
    expect(s.case).toBe('overload');
    expectWithin(s.fp, 300 / 100, 1e-12);
  });

  it('puts both rows in tension when a pull outweighs the moment (statics, common practice, no source)', () => {
    const s = solveBearing({ N: 18, B: 10, f: 7, P: -20, M: 70, fpMax });
    expect(s.case).toBe('no-bearing');
    expectWithin(s.T, 10 + 70 / 14, 1e-12);
    expectWithin(s.Tother, 10 - 70 / 14, 1e-12);
  });
});

describe('confinement sqrt(A2/A1), AISC 360-16 J8 [mem]', () => {
  it('is the scale of the largest similar area on the pier, between 1 and 2', () => {
    expectWithin(confinementFactor(19, 19, 30, 30), 30 / 19, 1e-12);
    expect(confinementFactor(19, 19, 50, 50)).toBe(2);
    expectWithin(confinementFactor(20, 14, 30, 24), 1.5, 1e-12);
    expect(confinementFactor(20, 14, 18, 14)).toBe(1);
  });
});

describe('next stock plate thickness (common practice, no source: 1/8 in to 1-1/4 in, then 1/4 in)', () => {
  it('rounds up to the stock grid', () => {
    expect(nextStandardThickness(1.37)).toBe(1.5);
    expect(nextStandardThickness(1.1)).toBe(1.125);
    expect(nextStandardThickness(0.902)).toBe(1);
    expect(nextStandardThickness(1.25)).toBe(1.25);
    expect(nextStandardThickness(1.26)).toBe(1.5);
    expect(nextStandardThickness(2.005)).toBe(2.25);
    expect(nextStandardThickness(0)).toBe(0.25);
  });
});
