import { describe, expect, it } from 'vitest';
import { checkConnection } from '../../../shared/engine/connection/check-connection';
import { inchFraction } from '../../../shared/engine/connection/inch-fraction';
import {
  bearingZone,
  bearingZoneFromResult,
  plateLayout,
} from '../../../shared/engine/connection/plate-layout';
import { plateScheduleCsv, plateScheduleRow } from '../../../shared/engine/connection/plate-schedule';
import { csvField } from '../../../shared/csv/csv-writer';
import { ROD_SIZES, rodSize } from '../../../shared/engine/connection/rod-data';
import { rodEdgeMinimum } from '../../../shared/engine/connection/rod-positions';
import { findShape } from '../../../shared/engine/shapes/table';
import { DEMANDS, LRFD_US, W12X26_ROOT, connection, expectWithin } from './connection-fixtures';

describe('AISC Design Guide 1 (2nd ed.) Table 2.3 holes and plate washers [pub, via REFERENCES.md]', () => {
  it('lists each rod size with its hole and washer', () => {
    const rows = ROD_SIZES.map((r) => [
      inchFraction(r.diameter),
      inchFraction(r.hole),
      `${inchFraction(r.washerSize)} x ${inchFraction(r.washerThickness)}`,
    ]);
    expect(rows).toEqual([
      ['3/4', '1-5/16', '2 x 1/4'],
      ['7/8', '1-9/16', '2-1/2 x 5/16'],
      ['1', '1-13/16', '3 x 3/8'],
      ['1-1/4', '2-1/16', '3 x 1/2'],
      ['1-1/2', '2-5/16', '3-1/2 x 1/2'],
      ['1-3/4', '2-3/4', '4 x 5/8'],
      ['2', '3-1/4', '5 x 3/4'],
    ]);
    expect(rodSize(1.125)).toBeUndefined();
  });

  it('sets the least rod edge distance to max(1.5 da, hole/2 + 1/2 in, washer/2) (common practice, no source)', () => {
    expectWithin(rodEdgeMinimum(rodSize(0.75)!), 1.15625, 1e-12);
    expectWithin(rodEdgeMinimum(rodSize(2)!), 3, 1e-12);
  });
});

describe('plateLayout', () => {
  const layout = plateLayout(connection(), W12X26_ROOT, findShape);

  it('places two rows of rods at +-f along N and the gauge along B', () => {
    expect(layout.rods.map((r) => [r.x, r.y, r.row])).toEqual([
      [8, -5, 'tension'],
      [8, 5, 'tension'],
      [-8, -5, 'compression'],
      [-8, 5, 'compression'],
    ]);
    expect(layout.plate).toMatchObject({ x0: -10, x1: 10, y0: -8, y1: 8, N: 20, B: 16 });
    expectWithin(layout.pier.length, 36, 1e-12);
    expect(layout.holeDiameter).toBe(1 + 13 / 16);
    expect(layout.washer).toEqual({ size: 3, thickness: 0.375 });
  });

  it('reports the edge distances of the rods to the plate and pier', () => {
    expectWithin(layout.edgeDistances.rodToPlateAlongN, 2, 1e-12);
    expectWithin(layout.edgeDistances.rodToPlateAlongB, 3, 1e-12);
    expectWithin(layout.edgeDistances.rodToPierAlongN, 10, 1e-12);
    expectWithin(layout.edgeDistances.rodToPierAlongB, 13, 1e-12);
  });

  it('draws a W as two flanges and a web at the section depth', () => {
    if (layout.footprint.kind !== 'I') throw new Error('expected an I footprint');
    const [top, bottom, web] = layout.footprint.rects;
    expectWithin(top.x1, 6.1, 1e-12);
    expectWithin(bottom.x0, -6.1, 1e-12);
    expectWithin(top.y1 - top.y0, 6.49, 1e-12);
    expectWithin(web.x1 - web.x0, 12.2 - 2 * 0.38, 1e-12);
  });

  it('draws an HSS as a tube and a pipe as two circles', () => {
    const hss = plateLayout(
      connection({ footprint: { shape: 'HSS8X8X1/2' } }),
      W12X26_ROOT,
      findShape,
    ).footprint;
    expect(hss.kind).toBe('box');
    if (hss.kind === 'box') expectWithin(hss.inner.x1, 4 - 0.465, 1e-12);
    const pipe = plateLayout(
      connection({ footprint: { shape: 'Pipe6STD' } }),
      W12X26_ROOT,
      findShape,
    ).footprint;
    expect(pipe).toMatchObject({ kind: 'round', outerRadius: 6.625 / 2 });
  });

  it('draws the bearing zone from the compression edge, also from an SI result', () => {
    expect(bearingZone(layout, 3)).toEqual({ x0: -10, y0: -8, x1: -7, y1: 8 });
    expect(bearingZone(layout, 50).x1).toBe(10);
    const si = checkConnection(connection(), DEMANDS, W12X26_ROOT, { ...LRFD_US, units: 'SI' }).result;
    const us = checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US).result;
    expectWithin(bearingZoneFromResult(layout, si)?.x1, -10 + (us?.bearingLength.value as number), 1e-9);
    expect(bearingZoneFromResult(layout, null)).toBeNull();
  });
});

describe('plate schedule CSV (RFC 4180)', () => {
  const input = connection();
  const result = checkConnection(input, DEMANDS, W12X26_ROOT, LRFD_US).result;

  it('writes the plate, rods, holes, washer and the next stock thickness', () => {
    const row = plateScheduleRow('BP-1', input, result);
    expect(row.plate).toBe('20 x 16 x 1-1/2');
    expect(row.rods).toBe('4 x 1');
    expect(row.rodGrade).toBe('ASTM F1554 Gr 36');
    expect(row.holeDiameter).toBe('1-13/16');
    expect(row.washer).toBe('3 x 3 x 3/8');
    expect(Number(row.requiredThickness)).toBeCloseTo(result?.requiredThickness.value as number, 3);
    expect(row.nextStandardThickness).not.toBe('');
  });

  it('quotes fields with commas, quotes and line breaks, and ends lines with CRLF', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    const csv = plateScheduleCsv([
      plateScheduleRow('North, "typ."', input, result),
      plateScheduleRow('BP-2', input, null),
    ]);
    const lines = csv.split('\r\n');
    expect(lines).toHaveLength(4); // header, two rows, and the empty string after the final CRLF
    expect(lines[3]).toBe('');
    expect(lines[1].startsWith('"North, ""typ."""')).toBe(true);
    expect(lines[0].split(',').length).toBeGreaterThan(10);
    expect(lines[2]).toMatch(/^BP-2,post-base,/);
  });

  it('neutralises cells a spreadsheet would run as a formula (= + - @, tab, CR) [OWASP CSV injection advice]', () => {
    for (const start of ['=', '+', '-', '@', '\t', '\r']) {
      const cell = csvField(`${start}SUM(A1:A9)`);
      expect(cell.replace(/^"/, '').startsWith(`'${start}`)).toBe(true);
    }
    expect(csvField('=1+2')).toBe("'=1+2");
    expect(csvField('-3,4')).toBe(`"'-3,4"`);
    expect(csvField('a=b')).toBe('a=b');
    const csv = plateScheduleCsv([plateScheduleRow('=HYPERLINK("x")', input, result)]);
    expect(csv.split('\r\n')[1].startsWith(`"'=HYPERLINK(""x"")"`)).toBe(true);
  });
});
