import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { buildShapesTable } from '../../scripts/build-shapes-table';

const CSV = fileURLToPath(new URL('../../../shared/reference/aisc-shapes-v15.0-US.csv', import.meta.url));
const SHIPPED = fileURLToPath(new URL('../../data/shapes.json', import.meta.url));

describe('scripts/build-shapes-table.ts', () => {
  it('keeps W6 to W24, rectangular HSS (not round), pipe and channels, with the columns that apply', () => {
    const csv = [
      'AISC_Manual_Label,Type,W,A,d,bf,tf,tw,kdes,Ht,B,tdes,OD,Ix,Zx,Sx,rx,Iy,Zy,Sy,ry,J,Cw,rts,ho,x,eo',
      'W12X26,W,26,7.65,12.2,6.49,0.38,0.23,0.68,,,,,204,37.2,33.4,5.17,17.3,8.17,5.34,1.51,0.3,607,1.75,11.8,,',
      'W27X84,W,84,24.8,26.7,10,0.64,0.46,1.24,,,,,2850,244,213,10.7,106,33.2,21.2,2.07,2.81,17900,2.49,26.1,,',
      'HSS6.000X0.500,HSS,29.4,8.09,,,,,,,,0.465,6,,,,,,,,,,,,,,',
      'W4X13,W,13,3.83,4.16,4.06,0.345,0.28,0.595,,,,,11.3,6.28,5.46,1.72,3.86,2.92,1.9,1,0.151,14,1.1,3.82,,',
    ].join('\n');
    // Rows in the published column layout: W12X26 as published (REFERENCES.md); the other rows are
    // there for their labels and types only (their numbers are placeholders from memory).
    const t = buildShapesTable(csv);
    expect(t.shapes.map((s) => s.label)).toEqual(['W12X26']);
    expect(t.shapes[0]).toMatchObject({ family: 'W', A: 7.65, Ix: 204, Cw: 607 });
    expect(t.shapes[0]).not.toHaveProperty('OD');
  });

  it.runIf(existsSync(CSV))(
    'regenerates the shipped data/shapes.json exactly from the published file',
    () => {
      const built = buildShapesTable(readFileSync(CSV, 'utf8'));
      expect(built).toEqual(JSON.parse(readFileSync(SHIPPED, 'utf8')));
    },
  );
});
