/** The shapes browser (built-in plus imported) and the CSV import. */
import type { ShapeImportDto, ShapesDto, ShapesQuery } from '../../../shared/schemas/api';
import { SHAPES, SHAPES_SOURCE, normalizeLabel } from '../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import type { AppContext } from '../../context';
import { badRequest } from '../../lib/http-error';
import { listCustomShapes, upsertCustomShapes } from './shapes.repository';
import { ShapeCsvError, readShapesCsv } from './shape-csv';

function depthOf(s: ShapeRecord): number | undefined {
  return s.d ?? s.Ht ?? s.OD;
}

export async function searchShapes(ctx: AppContext, query: ShapesQuery): Promise<ShapesDto> {
  const custom = await listCustomShapes(ctx.db);
  const needle = query.q ? normalizeLabel(query.q) : '';
  const shapes = [...custom, ...SHAPES].filter((s) => {
    if (query.family && s.family !== query.family) return false;
    if (needle && !normalizeLabel(s.label).includes(needle)) return false;
    const depth = depthOf(s);
    if (query.minDepth !== undefined && (depth === undefined || depth < query.minDepth)) return false;
    if (query.maxDepth !== undefined && (depth === undefined || depth > query.maxDepth)) return false;
    return true;
  });
  const source =
    custom.length > 0
      ? `${SHAPES_SOURCE}; plus ${custom.length} imported shape(s) marked custom`
      : SHAPES_SOURCE;
  return { source, shapes };
}

export async function importShapes(
  ctx: AppContext,
  user: Express.User,
  file: { buffer: Buffer } | undefined,
): Promise<ShapeImportDto> {
  if (!file) throw badRequest('Choose a CSV file to import.', [{ path: 'file', message: 'is required' }]);
  if (file.buffer.includes(0))
    throw badRequest('The file is not a text CSV file.', [
      { path: 'file', message: 'is not a text CSV file' },
    ]);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
  } catch {
    throw badRequest('The file is not UTF-8 text.', [{ path: 'file', message: 'is not UTF-8 text' }]);
  }
  try {
    const parsed = readShapesCsv(text);
    const imported = await upsertCustomShapes(ctx.db, parsed.shapes, user.id);
    return { imported, rejected: parsed.rejected };
  } catch (err) {
    if (err instanceof ShapeCsvError)
      throw badRequest(`The shapes file cannot be read: ${err.message}.`, [
        { path: 'file', message: err.message },
      ]);
    throw err;
  }
}
