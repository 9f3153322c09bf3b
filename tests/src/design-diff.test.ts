import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import { diffDesigns, QUANTITY_TOLERANCE, sameLeaf } from '../../shared/schemas/diff';
import { switchUnits } from '../../src/features/desk/lib/switch-units';

// Unit equivalences: 1 in = 25.4 mm and 1 ft = 0.3048 m exactly (NIST SP 811, appendix B);
// 1 ksi = 6.894757 MPa (NIST SP 811, appendix B.8).
describe('two design documents compared by value', () => {
  it('counts a quantity written in other units as the same input', () => {
    expect(sameLeaf('8 in', '203.2 mm')).toBe(true);
    expect(sameLeaf('10 ft', '3.048 m')).toBe(true);
    expect(sameLeaf('1-1/2 in', '38.1 mm')).toBe(true);
    expect(sameLeaf('50 ksi', '344.7 MPa')).toBe(true); // 344.738 MPa written to 4 significant figures
  });

  it('counts a change beyond the tolerance, and a change of dimension, as a change', () => {
    expect(QUANTITY_TOLERANCE).toBe(1e-3);
    expect(sameLeaf('10 ft', '3.1 m')).toBe(false); // 1.7 % longer
    expect(sameLeaf('0.75 in', '0.751 in')).toBe(false); // 0.13 %
    expect(sameLeaf('8 in', '8 psf')).toBe(false);
    expect(sameLeaf('W12X26', 'W12X30')).toBe(false);
    expect(sameLeaf('free', 'free')).toBe(true);
  });

  it('finds no changed input between a US design and the same design switched to SI', () => {
    const { doc: si } = switchUnits(exampleDesign, 'SI');
    expect(si.units).toBe('SI');
    expect(JSON.stringify(si)).not.toEqual(JSON.stringify(exampleDesign));
    expect(diffDesigns(exampleDesign, si)).toEqual([]);
  });

  it('names the one field that changed, whatever the units of the rest', () => {
    const { doc: si } = switchUnits(exampleDesign, 'SI');
    const changed = structuredClone(si);
    changed.member.length = '3.5 m';
    expect(diffDesigns(exampleDesign, changed)).toEqual([
      { path: 'member.length', before: exampleDesign.member.length, after: '3.5 m' },
    ]);
  });
});
