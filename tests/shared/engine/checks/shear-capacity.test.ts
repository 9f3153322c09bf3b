import { describe, expect, it } from 'vitest';
import { shearStrength } from '../../../../shared/engine/checks/shear-strength';
import { catalogSection } from '../../../../shared/engine/sections/catalog-section';
import { findShape } from '../../../../shared/engine/shapes/table';
import { check, memberDoc, rel, run } from '../design-helpers';

const E = 29000;
const vn = (label: string, Fy = 50) => {
  const s = catalogSection(findShape(label)!);
  return shearStrength(s.root, s.family, s.rolled, Fy, E, 96);
};

describe('shear, AISC 360-16 Chapter G', () => {
  it('W18X35: G2.1(a), phi 1.00, phi Vn = 0.6 Fy d tw = 159.3 kip (REFERENCES.md [calc])', () => {
    const v = vn('W18X35');
    expect(v.clause).toBe('G2.1(a)');
    expect(v.phi).toBe(1);
    expect(rel(v.Vn, 159.3)).toBeLessThan(0.002);
  });

  it('W24X62: phi Vn = 306 kip, Vn/Omega = 204 kip (AISC Design Examples v15.0, G.1A [mem])', () => {
    const lrfd = run(
      memberDoc({ shape: 'W24X62', loads: { selfWeight: true, area: [], line: [], point: [] } }),
    );
    expect(rel(check(lrfd, 'member.shear').capacity!.value, 306)).toBeLessThan(0.005);
    const asd = run(
      memberDoc({
        shape: 'W24X62',
        method: 'ASD',
        loads: { selfWeight: true, area: [], line: [], point: [] },
      }),
    );
    expect(rel(check(asd, 'member.shear').capacity!.value, 204)).toBeLessThan(0.005);
  });

  it('HSS8X8X1/2: G4 with h = H - 3t, phi Vn = 165.9 kip (REFERENCES.md [calc])', () => {
    const v = vn('HSS8X8X1/2');
    expect(v.clause).toBe('G4');
    expect(rel(0.9 * v.Vn, 165.9)).toBeLessThan(0.002);
  });

  it('a channel is not a rolled I: G2.1(b), phi 0.90 (C10X15.3, Cv1 = 1.0 recomputed here)', () => {
    // Published C10X15.3: d 10.0, tw 0.240 (AISC Shapes Database v15.0); A36 default Fy 36.
    const v = vn('C10X15.3', 36);
    expect(v.clause).toBe('G2.1(b)');
    expect(v.phi).toBe(0.9);
    expect(rel(v.Vn, 0.6 * 36 * 10 * 0.24)).toBeLessThan(0.002);
  });
});
