import { describe, expect, it } from 'vitest';
import { flexuralStrength } from '../../../../shared/engine/checks/flexural-strength';
import { builtUpSection } from '../../../../shared/engine/sections/tapered-section';
import { check, memberDoc, rel, run } from '../design-helpers';

const E = 29000;
const Fy = 50;

describe('tapered members are checked at every station with the local section', () => {
  it('web slenderness changes along x: a 40 in root web (h/tw 156) is slender (F5), the 12 in tip compact (F2/F3)', () => {
    // AISC 360-16 Table B4.1b case 15: lambda_p = 3.76 sqrt(E/Fy) = 90.6, lambda_r = 5.70 sqrt(E/Fy) = 137.3 [mem].
    const s = builtUpSection({
      rootDepth: 40,
      tipDepth: 12,
      flangeWidth: 10,
      flangeThickness: 0.5,
      webThickness: 0.25,
    });
    expect(s.root.h / s.root.tw).toBeCloseTo(156, 6);
    expect(flexuralStrength(s, s.root, { Fy, E, Lb: 60 }).clause).toMatch(/^F5/);
    const mid = s.at(0.5); // 26 in deep: h/tw = 100, noncompact
    expect(flexuralStrength(s, mid, { Fy, E, Lb: 60 }).clause).toMatch(/^F4/);
    expect(flexuralStrength(s, s.tip, { Fy, E, Lb: 60 }).clause).toMatch(/^F[23]/);
  });

  it('F5 compression flange yielding recomputed here: Mn = Rpg Fy Sx with Eq. F5-6 (compact 10 x 1 in flanges)', () => {
    const s = builtUpSection({
      rootDepth: 40,
      tipDepth: 12,
      flangeWidth: 10,
      flangeThickness: 1,
      webThickness: 0.25,
    });
    const p = s.root;
    const aw = (p.h * p.tw) / (p.bf * p.tf);
    const Rpg = 1 - (aw / (1200 + 300 * aw)) * (p.h / p.tw - 5.7 * Math.sqrt(E / Fy));
    const braced = flexuralStrength(s, p, { Fy, E, Lb: 1 }); // Lb < Lp: no LTB
    expect(rel(braced.nominal, Rpg * Fy * p.Sx)).toBeLessThan(1e-9);
  });

  it('shear under a tip load governs at the shallow tip, where the web is smallest (G2.1(b), phi 0.90)', () => {
    const r = run(
      memberDoc({
        section: { shape: 'W12X26', tipDepth: '5 in' },
        loads: { selfWeight: false, area: [], line: [], point: [{ case: 'L', value: '10 kip', at: '8 ft' }] },
      }),
    );
    const v = check(r, 'member.shear');
    expect(v.at!.value).toBeCloseTo(8, 9);
    // phi Vn = 0.9 x 0.6 Fy d tw Cv1 with d = 5 in, tw = 0.23 in (W12X26), Cv1 = 1 (h/tw small).
    expect(rel(v.capacity!.value, 0.9 * 0.6 * 50 * 5 * 0.23)).toBeLessThan(1e-9);
    expect(v.demand!.value).toBeCloseTo(16, 9); // 1.6L
  });

  it('flexure under uniform load governs at the deep root and reports its position', () => {
    const r = run(
      memberDoc({
        section: { shape: 'W12X26', tipDepth: '6 in' },
        loads: { selfWeight: true, area: [{ case: 'L', value: '60 psf' }], line: [], point: [] },
      }),
    );
    const f = check(r, 'member.flexure');
    expect(f.at).toEqual({ value: 0, unit: 'ft' });
    expect(f.title).toContain('tapered');
  });

  it('a tapered member deflects more than the full prismatic shape and less than one as shallow as its tip', () => {
    const loads = { selfWeight: false, area: [{ case: 'L' as const, value: '60 psf' }], line: [], point: [] };
    const tapered = run(memberDoc({ section: { shape: 'W12X26', tipDepth: '6 in' }, loads })).member.cases.L!
      .tipDeflection.value;
    const full = run(
      memberDoc({
        section: {
          plates: {
            rootDepth: '12.2 in',
            tipDepth: '12.2 in',
            flangeWidth: '6.49 in',
            flangeThickness: '0.38 in',
            webThickness: '0.23 in',
          },
        },
        loads,
      }),
    ).member.cases.L!.tipDeflection.value;
    const shallow = run(
      memberDoc({
        section: {
          plates: {
            rootDepth: '6 in',
            tipDepth: '6 in',
            flangeWidth: '6.49 in',
            flangeThickness: '0.38 in',
            webThickness: '0.23 in',
          },
        },
        loads,
      }),
    ).member.cases.L!.tipDeflection.value;
    expect(tapered).toBeGreaterThan(full);
    expect(tapered).toBeLessThan(shallow);
  });
});
