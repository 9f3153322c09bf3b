/**
 * The shapes browser (built-in plus imported) and the CSV import. An import lands in one project
 * (a member with a design role) or in the organisation (an admin); a label already seen in that
 * scope is refused and the person is asked for a new name, so a shape a design was computed with
 * never changes under it.
 */
import type { ShapeImportDto, ShapesDto, ShapesQuery } from '../../../shared/schemas/api';
import { SHAPES, SHAPES_SOURCE, normalizeLabel } from '../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import type { AppContext } from '../../context';
import { HttpError, badRequest, forbidden } from '../../lib/http-error';
import { projectForMember } from '../projects/project-access';
import { insertShapes, listShapesInScope, takenLabels, type ShapeScope } from './shapes.repository';
import { ShapeCsvError, readShapesCsv } from './shape-csv';

const DESIGN_ROLES = new Set(['architect', 'fabricator', 'engineer']);

function depthOf(s: ShapeRecord): number | undefined {
  return s.d ?? s.Ht ?? s.OD;
}

export async function searchShapes(
  ctx: AppContext,
  user: Express.User,
  query: ShapesQuery,
): Promise<ShapesDto> {
  if (query.projectId !== undefined) await projectForMember(ctx.db, query.projectId, user.id);
  const custom = await listShapesInScope(ctx.db, query.projectId ?? null);
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

/** The scope an import lands in, from the multipart field `projectId` (absent: the organisation). */
async function importScope(ctx: AppContext, user: Express.User, projectIdText: unknown): Promise<ShapeScope> {
  if (projectIdText === undefined || projectIdText === '') {
    if (user.role !== 'admin')
      throw forbidden('Choose the project the shapes are for; only an admin imports organisation shapes.', [
        { path: 'projectId', message: 'is required' },
      ]);
    return { projectId: null };
  }
  const projectId = Number(projectIdText);
  if (typeof projectIdText !== 'string' || !/^[1-9][0-9]{0,9}$/.test(projectIdText))
    throw badRequest('The project is not valid.', [{ path: 'projectId', message: 'must be a project id' }]);
  await projectForMember(ctx.db, projectId, user.id);
  if (!DESIGN_ROLES.has(user.role))
    throw forbidden(`Your role (${user.role}) may not import shapes into a project.`);
  return { projectId };
}

function decode(file: { buffer: Buffer } | undefined): string {
  if (!file) throw badRequest('Choose a CSV file to import.', [{ path: 'file', message: 'is required' }]);
  if (file.buffer.includes(0))
    throw badRequest('The file is not a text CSV file.', [
      { path: 'file', message: 'is not a text CSV file' },
    ]);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
  } catch {
    throw badRequest('The file is not UTF-8 text.', [{ path: 'file', message: 'is not UTF-8 text' }]);
  }
}

function labelTaken(scope: ShapeScope, rows: { row: number; label: string }[]): HttpError {
  const where = scope.projectId === null ? 'the organisation' : 'this project';
  if (rows.length === 0)
    return new HttpError(
      409,
      'label_taken',
      `A label in the file was just imported into ${where}; import again.`,
      [{ path: 'file', message: 'a label was imported meanwhile; import again' }],
    );
  return new HttpError(
    409,
    'label_taken',
    `${rows.length === 1 ? `The label ${rows[0].label} is` : `${rows.length} labels are`} already used in ${where}; give ${rows.length === 1 ? 'the shape' : 'each shape'} a new name and import again.`,
    rows.map((r) => ({
      path: 'file',
      message: `row ${r.row}: ${r.label} is already used in ${where}; give the shape a new name`,
    })),
  );
}

export async function importShapes(
  ctx: AppContext,
  user: Express.User,
  file: { buffer: Buffer } | undefined,
  fields: Record<string, unknown>,
): Promise<ShapeImportDto> {
  const scope = await importScope(ctx, user, fields.projectId);
  const text = decode(file);
  let parsed: ReturnType<typeof readShapesCsv>;
  try {
    parsed = readShapesCsv(text);
  } catch (err) {
    if (err instanceof ShapeCsvError)
      throw badRequest(`The shapes file cannot be read: ${err.message}.`, [
        { path: 'file', message: err.message },
      ]);
    throw err;
  }
  const taken = await takenLabels(
    ctx.db,
    scope,
    parsed.shapes.map((s) => s.label),
  );
  if (taken.size > 0) {
    throw labelTaken(
      scope,
      parsed.shapes
        .map((s, i) => ({ row: parsed.rows[i], label: s.label }))
        .filter((r) => taken.has(r.label)),
    );
  }
  try {
    const imported = await insertShapes(ctx.db, scope, parsed.shapes, user.id);
    return { imported, rejected: parsed.rejected };
  } catch (err) {
    // Two imports of one label at once: the unique index refuses the second.
    if (/UNIQUE|unique/.test(String((err as Error).message))) {
      throw labelTaken(scope, []);
    }
    throw err;
  }
}
