/**
 * A W12X26 with its web cut to a 6 in tip, recomputed at several stations in this test from the
 * plate dimensions and AISC 360-16 F2 / G2.1 (from memory), independently of the engine's formulas
 * where an independent form exists (parallel-axis Ix, the user-note form of rts).
 */
import { describe, expect, it } from 'vitest';
import { flexuralStrength } from '../../../../shared/engine/checks/flexural-strength';
import { shearStrength } from '../../../../shared/engine/checks/shear-strength';
import { taperedRolledSection } from '../../../../shared/engine/sections/tapered-section';
import { findShape } from '../../../../shared/engine/shapes/table';
import { check, memberDoc, rel, run } from '../design-helpers';

const E = 29000;
const Fy = 50;
// W12X26 (AISC Shapes Database v15.0 [pub]): d 12.2, bf 6.49, tf 0.380, tw 0.230, kdes 0.680 in.
const bf = 6.49;
const tf = 0.38;
const tw = 0.23;
const kdes = 0.68;

/** Plate properties at depth d, by hand (no fillets, as METHOD.md states for a cut W). */
function byHand(d: number) {
  const hw = d - 2 * tf;
  const ho = d - tf;
  const A = 2 * bf * tf + hw * tw;
  // Parallel-axis theorem: two flanges about their own centroid plus A y^2, and the web.
  const Ix = 2 * ((bf * tf ** 3) / 12 + bf * tf * (ho / 2) ** 2) + (tw * hw ** 3) / 12;
  const Sx = Ix / (d / 2);
  const Zx = 2 * bf * tf * (ho / 2) + (tw * hw * hw) / 4;
  const Iy = 2 * ((tf * bf ** 3) / 12) + (hw * tw ** 3) / 12;
  const ry = Math.sqrt(Iy / A);
  const J = (2 * bf * tf ** 3 + ho * tw ** 3) / 3; // sum of b t^3/3 (open thin-walled section, from memory)
  // AISC 360-16 F2 user note [mem]: for a doubly symmetric I, rts^2 = Iy ho / (2 Sx) (with Cw = Iy ho^2/4).
  const rts = Math.sqrt((Iy * ho) / (2 * Sx));
  return { d, A, Ix, Sx, Zx, Iy, ry, J, rts, ho, h: d - 2 * kdes };
}

/** AISC 360-16 F2 (c = 1, Cb = 1.0 for a cantilever with a free tip [mem]), kip-in. */
function f2(p: ReturnType<typeof byHand>, Lb: number): number {
  const Mp = Fy * p.Zx; // F2-1
  const Lp = 1.76 * p.ry * Math.sqrt(E / Fy); // F2-5
  const jc = p.J / (p.Sx * p.ho);
  const Lr =
    1.95 * p.rts * (E / (0.7 * Fy)) * Math.sqrt(jc + Math.sqrt(jc ** 2 + 6.76 * ((0.7 * Fy) / E) ** 2)); // F2-6
  if (Lb <= Lp) return Mp;
  if (Lb <= Lr) return Math.min(Mp, Mp - (Mp - 0.7 * Fy * p.Sx) * ((Lb - Lp) / (Lr - Lp))); // F2-2
  const Fcr = ((Math.PI ** 2 * E) / (Lb / p.rts) ** 2) * Math.sqrt(1 + 0.078 * jc * (Lb / p.rts) ** 2); // F2-4
  return Math.min(Mp, Fcr * p.Sx); // F2-3
}

describe('W12X26 cut to a 6 in tip: stations recomputed from AISC 360-16 F2 and G2.1', () => {
  const section = taperedRolledSection(findShape('W12X26')!, 6);

  it('the shapes table holds the dimensions used here', () => {
    const s = findShape('W12X26')!;
    expect([s.d, s.bf, s.tf, s.tw, s.kdes]).toEqual([12.2, bf, tf, tw, kdes]);
  });

  it('stays in F2 along its length: compact flange 8.54 < 0.38 sqrt(E/Fy) = 9.15, web h/tw 47.1 < 3.76 sqrt(E/Fy) = 90.6 (Table B4.1b)', () => {
    expect(bf / (2 * tf)).toBeLessThan(0.38 * Math.sqrt(E / Fy));
    expect((12.2 - 2 * kdes) / tw).toBeLessThan(3.76 * Math.sqrt(E / Fy));
  });

  for (const u of [0, 0.25, 0.5, 0.75, 1]) {
    const d = 12.2 + (6 - 12.2) * u;
    it(`station x/L = ${u} (d = ${d.toFixed(3)} in): properties, Mn at Lb = 8 ft and 20 ft, and phi Vn`, () => {
      const hand = byHand(d);
      const p = section.at(u);
      for (const k of ['A', 'Ix', 'Sx', 'Zx', 'Iy', 'J', 'rts', 'h'] as const)
        expect(rel(p[k], hand[k])).toBeLessThan(1e-9);
      for (const Lb of [96, 240]) {
        expect(rel(flexuralStrength(section, p, { Fy, E, Lb }).nominal, f2(hand, Lb))).toBeLessThan(1e-9);
      }
      // G2.1(b) [mem]: a cut and re-welded web is not a rolled web: phi 0.90; h/tw <= 1.10 sqrt(5.34 E/Fy) = 61.2 -> Cv1 = 1.
      expect(hand.h / tw).toBeLessThan(1.1 * Math.sqrt((5.34 * E) / Fy));
      const v = shearStrength(p, section.family, section.rolled, Fy, E, 96);
      expect(v.phi).toBe(0.9);
      expect(rel(v.Vn, 0.6 * Fy * d * tw)).toBeLessThan(1e-9);
    });
  }

  it('in a design, the flexure check reports phi Mn of the root section under a uniform load', () => {
    // 0.4 kip/ft live, 8 ft: 1.6L gives Mu = 1.6 x 0.4 x 8^2/2 = 20.48 kip-ft at the root (Table 3-23 [mem]).
    const r = run(
      memberDoc({
        section: { shape: 'W12X26', tipDepth: '6 in' },
        loads: { selfWeight: false, area: [], line: [{ case: 'L', value: '0.4 kip/ft' }], point: [] },
      }),
    );
    const f = check(r, 'member.flexure');
    expect(f.at!.value).toBe(0);
    expect(rel(f.demand!.value, 20.48)).toBeLessThan(1e-9);
    expect(rel(f.capacity!.value, (0.9 * f2(byHand(12.2), 96)) / 12)).toBeLessThan(1e-9);
  });
});
