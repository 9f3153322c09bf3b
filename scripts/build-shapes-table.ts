/**
 * Builds Reachline's own shapes table, data/shapes.json, from a copy of the AISC Shapes Database
 * v15.0 in CSV form (US customary units) that the caller supplies:
 *
 *   node --import tsx scripts/build-shapes-table.ts path/to/aisc-shapes-v15.0-US.csv
 *
 * It keeps the families a cantilever deck uses (W6 to W24, rectangular and square HSS, pipe,
 * C channels) and only the dimensions and properties the engine and the shapes browser read.
 * The published database is not shipped with the product; this script records how the table was made.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { parseCsv } from '../shared/csv/csv-reader';

const KEEP = [
  'W',
  'A',
  'd',
  'bf',
  'tf',
  'tw',
  'kdes',
  'Ht',
  'B',
  'tdes',
  'OD',
  'Ix',
  'Zx',
  'Sx',
  'rx',
  'Iy',
  'Zy',
  'Sy',
  'ry',
  'J',
  'Cw',
  'rts',
  'ho',
  'x',
  'eo',
] as const;

function wanted(type: string, label: string, od: string): string | null {
  if (type === 'W') {
    const nominal = Number(label.slice(1).split('X')[0]);
    return nominal >= 6 && nominal <= 24 ? 'W' : null;
  }
  if (type === 'HSS') return od ? null : 'HSS';
  if (type === 'PIPE') return 'PIPE';
  if (type === 'C') return 'C';
  return null;
}

/** The table object written to data/shapes.json, from the text of the published CSV. */
export function buildShapesTable(csv: string) {
  const lines = parseCsv(csv).filter((cells) => cells.some((c) => c !== ''));
  const header = lines[0];
  const col = (name: string) => header.indexOf(name);
  const rows: Record<string, string | number>[] = [];
  for (const cells of lines.slice(1)) {
    const label = cells[col('AISC_Manual_Label')];
    const family = wanted(cells[col('Type')], label, cells[col('OD')]);
    if (!family) continue;
    const row: Record<string, string | number> = { label, family };
    for (const key of KEEP) {
      const text = cells[col(key)];
      if (text !== undefined && text !== '') row[key] = Number(text);
    }
    rows.push(row);
  }
  return {
    source: 'AISC Shapes Database v15.0 (US customary units), selected families and columns',
    units: { W: 'lb/ft', length: 'in', A: 'in^2', I: 'in^4', S: 'in^3', Z: 'in^3', J: 'in^4', Cw: 'in^6' },
    caution:
      "The published database carries AISC's disclaimer: values must be checked by a licensed engineer before they are relied on.",
    shapes: rows,
  };
}

function main(): void {
  const path = process.argv[2];
  if (!path) {
    console.error('usage: build-shapes-table.ts <aisc-shapes-v15.0-US.csv>');
    process.exit(2);
  }
  const table = buildShapesTable(readFileSync(path, 'utf8'));
  writeFileSync(new URL('../data/shapes.json', import.meta.url), JSON.stringify(table, null, 0) + '\n');
  console.log(`wrote ${table.shapes.length} shapes to data/shapes.json`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) main();
