/**
 * weld.strength (fillet weld all around the section at the plate, AISC 360-16 J2.4 by the elastic
 * method) and weld.flangeToWeb (shear flow V Q / I of a built-up or cut tapered I). Hand calculations
 * beside each value; properties from the AISC Shapes Database v15.0 [pub].
 */
import { describe, expect, it } from 'vitest';
import {
  evaluateWeld,
  maximumFillet,
  minimumFillet,
  weldLines,
} from '../../../shared/engine/connection/check-weld';
import type { DesignDocument } from '../../../shared/schemas/design';
import { check, rel, run } from '../engine/design-helpers';

describe('fillet size limits', () => {
  it('Table J2.4 minimum and J2.2b maximum [mem]', () => {
    expect(minimumFillet(0.25)).toBe(1 / 8);
    expect(minimumFillet(0.5)).toBe(3 / 16);
    expect(minimumFillet(0.75)).toBe(1 / 4);
    expect(minimumFillet(1.5)).toBe(5 / 16);
    expect(maximumFillet(0.2)).toBe(0.2);
    expect(maximumFillet(0.465)).toBeCloseTo(0.465 - 0.0625, 12);
  });
});

describe('weld of an HSS8X8X1/2 post to its plate', () => {
  // Box weld line: B = H = 8 in: Lw = 32 in; Iw = 2 x 8 x 4^2 + 2 x 8^3/12 = 256 + 85.33 = 341.33 in^3;
  // Sw = 341.33 / 4 = 85.33 in^2 (elastic method, the weld as a line).
  const fp = { label: 'HSS8X8X1/2', kind: 'box' as const, d: 8, bf: 8, tf: 0.465, tw: 0.465 };
  it('line properties', () => {
    const l = weldLines(fp);
    expect(l.Lw).toBe(32);
    expect(l.Sw).toBeCloseTo(341.3333 / 4, 3);
  });
  it('M 416 kip-in, P 8 kip: f = 416/85.33 + 8/32 = 4.875 + 0.25 = 5.125 kip/in against 0.75 x 0.6 x 70 x 0.707 x 5/16 = 6.96', () => {
    // Base metal: 0.75 x 0.3 x 62 x 0.465 = 6.49 kip/in (A500 Gr C Fu 62 [mem], J4.2, two faces share it): governs.
    const ev = evaluateWeld(
      8,
      416,
      0,
      fp,
      { size: 5 / 16, electrode: 'E70', plateThickness: 1.5 },
      'LRFD',
      'US',
    );
    expect(ev.demand).toBeCloseTo(416 / (341.3333 / 4) + 0.25, 3);
    expect(ev.capacity).toBeCloseTo(0.75 * 0.3 * 62 * 0.465, 9);
    expect(ev.note).toMatch(/base metal/);
    expect(ev.ratio!).toBeLessThan(1);
  });
  it('a weld below the Table J2.4 minimum for a 1.5 in plate (5/16 in) fails, whatever its strength', () => {
    const ev = evaluateWeld(
      1,
      10,
      0,
      fp,
      { size: 1 / 4, electrode: 'E70', plateThickness: 1.5 },
      'LRFD',
      'US',
    );
    expect(ev.ratio!).toBeGreaterThan(1);
    expect(ev.note).toMatch(/at least 0.313 in/);
  });
});

function builtUp(weld?: boolean): DesignDocument {
  return {
    units: 'US',
    method: 'LRFD',
    member: {
      length: '10 ft',
      spacing: '4 ft',
      section: {
        plates: {
          rootDepth: '16 in',
          tipDepth: '8 in',
          flangeWidth: '6 in',
          flangeThickness: '0.5 in',
          webThickness: '0.25 in',
        },
      },
    },
    loads: { selfWeight: false, area: [], line: [{ case: 'D', value: '1 kip/ft' }], point: [] },
    connection: {
      arrangement: 'face-plate',
      plate: { N: '24 in', B: '12 in', thickness: '1.25 in' },
      anchors: {
        perSide: 2,
        diameter: '1 in',
        grade: 'F1554-36',
        offset: '10 in',
        gauge: '8 in',
        embedment: '12 in',
      },
      concrete: { fc: '4000 psi', cracked: true },
      pier: { length: '36 in', width: '24 in' },
      ...(weld ? { weld: { size: '5/16 in', electrode: 'E70' } } : {}),
    },
  };
}

describe('flange-to-web welds of a built-up tapered I', () => {
  it('q = V Q / I at the root: 1.4D, V = 14 kip; Q = 6 x 0.5 x 7.75 = 23.25 in^3; I from the plates', () => {
    // Root 16 in deep: I = 6 x 16^3/12 - 5.75 x 15^3/12 = 2048 - 1617.2 = 430.8 in^4; q = 14 x 23.25 / 430.8 = 0.756 kip/in.
    const r = run(builtUp(true));
    const c = check(r, 'weld.flangeToWeb');
    const I = (6 * 16 ** 3) / 12 - (5.75 * 15 ** 3) / 12;
    expect(c.combination).toBe('1.4D');
    expect(rel(c.demand!.value, (14 * 23.25) / I)).toBeLessThan(1e-9);
    // Two 1/8 in fillets (Table J2.4 for a 1/4 in web): 2 x 0.75 x 0.6 x 70 x 0.707 x 0.125 = 5.57 kip/in,
    // below the web base metal 0.75 x 0.6 x 65 x 0.25 = 7.31 kip/in.
    expect(rel(c.capacity!.value, 2 * 0.75 * 0.6 * 70 * 0.707 * 0.125)).toBeLessThan(1e-9);
    // Size the strength needs: 0.756 / (2 x 0.75 x 0.6 x 70 x 0.707) = 0.017 in each.
    expect(c.note).toMatch(/need 0.017 in each/);
    expect(check(r, 'weld.strength').reference).toMatch(/J2.4/);
  });
  it('without connection.weld an older document keeps its list of checks', () => {
    expect(run(builtUp(false)).checks.some((c) => c.id.startsWith('weld.'))).toBe(false);
  });
});
