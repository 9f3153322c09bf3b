import { describe, expect, it } from 'vitest';
import { evaluateInteraction } from '../../../shared/engine/connection/check-interaction';
import { frictionCapacity } from '../../../shared/engine/connection/check-anchor-shear';
import { breakoutShear, pryoutStrength } from '../../../shared/engine/connection/shear-breakout';
import { expectWithin } from './connection-fixtures';

const cracked = { fc: 4, lambdaA: 1, cracked: true };

describe('shear breakout toward an edge, ACI 318-19 17.7.2 [mem], by hand', () => {
  it('single 3/4 in rod, hef 6 in, ca1 4 in, no side edges, deep member', () => {
    // le = min(hef, 8 da) = 6 in. 7 (6/0.75)^0.2 sqrt(0.75) x 63.246 x 4^1.5 = 4,649 lb;
    // 9 x 63.246 x 4^1.5 = 4,554 lb -> Vb = 4,554 lb. AVc = AVco = 4.5 ca1^2 = 72 in^2.
    const r = breakoutShear(
      { n: 1, ca1: 4, ca2: [100, 100], span: 0, spacing: 0, ha: undefined, da: 0.75, hef: 6 },
      cracked,
    );
    expectWithin(r.Vb * 1000, 4554, 0.001);
    expectWithin(r.AVc, 72, 1e-12);
    expectWithin(r.Vcbg * 1000, 4554, 0.001);
  });

  it('row of two at 6 in, ca1 5 in, one side edge at 4 in, pier depth 6 in', () => {
    // 1.5 ca1 = 7.5: width = 4 + 6 + 7.5 = 17.5; height = min(7.5, 6) = 6 -> AVc 105; AVco = 112.5.
    // psi_ed = 0.7 + 0.3 x 4/7.5 = 0.86; psi_h = sqrt(7.5/6) = 1.1180.
    // Vb = min(7 (8)^0.2 sqrt(0.75) r 5^1.5, 9 r 5^1.5) with r = 63.246: 9 x 63.246 x 11.180 = 6,364 lb.
    const r = breakoutShear(
      { n: 2, ca1: 5, ca2: [4, 100], span: 6, spacing: 6, ha: 6, da: 0.75, hef: 6 },
      cracked,
    );
    expectWithin(r.AVc, 105, 1e-12);
    expectWithin(r.psiEd, 0.86, 1e-12);
    expectWithin(r.psiH, Math.sqrt(7.5 / 6), 1e-12);
    expectWithin(r.Vb * 1000, 6364, 0.001);
    expectWithin(r.Vcbg * 1000, (105 / 112.5) * 0.86 * Math.sqrt(7.5 / 6) * 6364, 0.001);
  });

  it('uncracked concrete: psi_c,V = 1.4', () => {
    const g = {
      n: 1,
      ca1: 4,
      ca2: [100, 100] as [number, number],
      span: 0,
      spacing: 0,
      ha: undefined,
      da: 0.75,
      hef: 6,
    };
    expectWithin(
      breakoutShear(g, { ...cracked, cracked: false }).Vcbg,
      1.4 * breakoutShear(g, cracked).Vcbg,
      1e-12,
    );
  });

  it('pryout: kcp 2 for hef >= 2.5 in, 1 below (17.7.3.1)', () => {
    expect(pryoutStrength(6, 10)).toBe(20);
    expect(pryoutStrength(2, 10)).toBe(10);
  });
});

describe('friction on grout, AISC Design Guide 1 (2nd ed.) 4.1: mu 0.55, phi 0.75 / Omega 2.00 (from memory)', () => {
  it('gives 0.4125 P (LRFD) and 0.275 P (ASD), nothing under no compression', () => {
    expectWithin(frictionCapacity(10, 'LRFD'), 4.125, 1e-12);
    expectWithin(frictionCapacity(10, 'ASD'), 2.75, 1e-12);
    expect(frictionCapacity(-5, 'LRFD')).toBe(0);
  });
});

describe('tension-shear interaction, ACI 318-19 17.8 [mem]', () => {
  it('adds the ratios against 1.2 when both exceed 0.2', () => {
    const ev = evaluateInteraction([0.6, 0.3], 0.7);
    expectWithin(ev.ratio, 1.3 / 1.2, 1e-12);
  });

  it('allows the full strength of one when the other is at most 0.2', () => {
    expectWithin(evaluateInteraction([0.9], 0.15).ratio, 0.9, 1e-12);
    expectWithin(evaluateInteraction([0.15], 0.95).ratio, 0.95, 1e-12);
  });

  it('is not computed when a part is not', () => {
    const ev = evaluateInteraction([null, 0.5], 0.5);
    expect(ev.ratio).toBeNull();
    expect(ev.note).toMatch(/could not be computed/);
  });
});
