/**
 * Reads a shapes CSV: either the published shapes database layout (AISC_Manual_Label, Type, W, A,
 * d, bf, … with "–" for not applicable) or our own layout (label, family, W, A, Ix, Zx, Sx, Iy, ry,
 * J and the dimensions the family needs). Every row is validated; a bad row is reported with its
 * row number (1 = the header) and the reason, and the good rows are still imported.
 */
import { z } from 'zod';
import { parseCsv } from '../../../shared/csv/csv-reader';
import { findShape, normalizeLabel } from '../../../shared/engine/shapes/table';
import type { ShapeFamily, ShapeRecord } from '../../../shared/engine/shapes/types';

export interface ParsedShapes {
  shapes: ShapeRecord[];
  /** The file row (1 = the header) of each accepted shape, parallel to `shapes`. */
  rows: number[];
  rejected: { row: number; label: string | null; reason: string }[];
}

const NUMERIC = [
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
const DIMENSIONS: Record<ShapeFamily, readonly (typeof NUMERIC)[number][]> = {
  W: ['d', 'bf', 'tf', 'tw'],
  C: ['d', 'bf', 'tf', 'tw'],
  HSS: ['Ht', 'B', 'tdes'],
  PIPE: ['OD', 'tdes'],
};
const DEPTH: Record<ShapeFamily, 'd' | 'Ht' | 'OD'> = { W: 'd', C: 'd', HSS: 'Ht', PIPE: 'OD' };
/** Sx and Ix/(depth/2) agree to within this fraction (published values are rounded to 3 figures). */
export const SECTION_MODULUS_TOLERANCE = 0.05;

const positive = z
  .number({ error: 'must be a number' })
  .finite('must be finite')
  .positive('must be positive');
const rowSchema = z.object({
  label: z
    .string()
    .trim()
    .min(1, 'is required')
    .max(40, 'is longer than 40 characters')
    .regex(/^[A-Za-z0-9][A-Za-z0-9 ./-]*$/, 'may use letters, digits, "x", ".", "/" and "-" only'),
  family: z.enum(['W', 'HSS', 'PIPE', 'C'], { error: 'must be W, HSS, PIPE or C' }),
  W: positive,
  A: positive,
  Ix: positive,
  Zx: positive,
  Sx: positive,
  Iy: positive,
  ry: positive,
  J: positive,
  ...Object.fromEntries(
    NUMERIC.filter((k) => !['W', 'A', 'Ix', 'Zx', 'Sx', 'Iy', 'ry', 'J'].includes(k)).map((k) => [
      k,
      positive.optional(),
    ]),
  ),
});

function cellNumber(text: string | undefined): number | undefined {
  const t = (text ?? '').trim();
  if (t === '' || t === '–' || t === '—' || t === '-') return undefined;
  return Number(t);
}

export class ShapeCsvError extends Error {}

export function readShapesCsv(text: string): ParsedShapes {
  const rows = parseCsv(text);
  if (rows.length === 0) throw new ShapeCsvError('the file is empty');
  const header = rows[0].map((h) => h.trim());
  const col = (name: string) => header.findIndex((h) => h.toLowerCase() === name.toLowerCase());
  const published = col('AISC_Manual_Label') >= 0 && col('Type') >= 0;
  const labelCol = published ? col('AISC_Manual_Label') : col('label');
  const familyCol = published ? col('Type') : col('family');
  if (labelCol < 0 || familyCol < 0) {
    throw new ShapeCsvError(
      'the header needs AISC_Manual_Label and Type (published layout) or label and family (custom layout)',
    );
  }
  const missing = ['W', 'A', 'Ix', 'Zx', 'Sx', 'Iy', 'ry', 'J'].filter((k) => col(k) < 0);
  if (missing.length > 0)
    throw new ShapeCsvError(`the header is missing the column(s) ${missing.join(', ')}`);

  const result: ParsedShapes = { shapes: [], rows: [], rejected: [] };
  const seen = new Set<string>();
  rows.slice(1).forEach((cells, i) => {
    const rowNumber = i + 2;
    if (cells.every((c) => c.trim() === '')) return;
    const label = (cells[labelCol] ?? '').trim() || null;
    const reject = (reason: string) => result.rejected.push({ row: rowNumber, label, reason });
    const family = (cells[familyCol] ?? '').trim().toUpperCase();
    const raw: Record<string, unknown> = { label: label ?? '', family };
    for (const key of NUMERIC) {
      const c = col(key);
      if (c >= 0) raw[key] = cellNumber(cells[c]);
    }
    if (family === 'HSS' && raw.OD !== undefined)
      return reject('round HSS is not a family Reachline designs with (use PIPE)');
    const parsed = rowSchema.safeParse(raw);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      return reject(`${issue.path.join('.') || 'row'}: ${issue.message}`);
    }
    const shape = parsed.data as unknown as ShapeRecord;
    const absent = DIMENSIONS[shape.family].filter((k) => shape[k] === undefined);
    if (absent.length > 0) return reject(`a ${shape.family} shape needs ${absent.join(', ')}`);
    const depth = shape[DEPTH[shape.family]] as number;
    const expected = shape.Ix / (depth / 2);
    if (Math.abs(shape.Sx - expected) / expected > SECTION_MODULUS_TOLERANCE) {
      return reject(
        `Sx = ${shape.Sx} does not agree with Ix/(${DEPTH[shape.family]}/2) = ${expected.toFixed(3)} (more than ${SECTION_MODULUS_TOLERANCE * 100}% apart)`,
      );
    }
    if (shape.Zx < shape.Sx * 0.99)
      return reject(`Zx = ${shape.Zx} is smaller than Sx = ${shape.Sx}, which no real section has`);
    const key = normalizeLabel(shape.label);
    if (findShape(shape.label))
      return reject('this label is in the built-in shapes table already; built-in shapes cannot be replaced');
    if (seen.has(key)) return reject('this label appears twice in the file');
    seen.add(key);
    result.shapes.push({ ...shape, label: shape.label.toUpperCase().replace(/\s+/g, ''), custom: true });
    result.rows.push(rowNumber);
  });
  return result;
}
