/**
 * Membership gates shared by every feature: an item that does not exist and an item in a project
 * the person is not a member of both answer 404, so existence is never revealed.
 */
import type { Knex } from 'knex';
import { HttpError, notFound } from '../../lib/http-error';
import type { ProjectRow } from './projects.repository';

type Db = Knex | Knex.Transaction;

export interface CantileverRow {
  id: number;
  project_id: number;
  name: string;
  description: string;
  current_revision_id: number | null;
  /** Identical beams this cantilever stands for (default 1). */
  quantity: number;
  created_at: string;
  updated_at: string;
}

export interface RevisionRow {
  id: number;
  cantilever_id: number;
  number: number;
  author_id: number;
  message: string;
  input_json: string;
  result_json: string;
  engine_version: string;
  base_revision_id: number | null;
  ok: number | boolean;
  /** The catalog sections the result was computed with (JSON); null before they were kept. */
  sections_json?: string | null;
  created_at: string;
}

/** Each gate is one query: the item joined with the person's membership row (none: 404). */
const memberOf = (userId: number) => (j: Knex.JoinClause) => j.andOnVal('m.user_id', userId);

export async function projectForMember(db: Db, projectId: number, userId: number): Promise<ProjectRow> {
  const project = await db('projects as p')
    .join('project_members as m', (j) => memberOf(userId)(j.on('m.project_id', 'p.id')))
    .where('p.id', projectId)
    .first<ProjectRow | undefined>('p.*');
  if (!project) throw notFound('project');
  return project;
}

export async function cantileverForMember(
  db: Db,
  cantileverId: number,
  userId: number,
): Promise<CantileverRow> {
  const row = await db('cantilevers as c')
    .join('project_members as m', (j) => memberOf(userId)(j.on('m.project_id', 'c.project_id')))
    .where('c.id', cantileverId)
    .first<CantileverRow | undefined>('c.*');
  if (!row) throw notFound('cantilever');
  return row;
}

export async function revisionForMember(
  db: Db,
  revisionId: number,
  userId: number,
): Promise<{ revision: RevisionRow; cantilever: CantileverRow }> {
  const revision = await db<RevisionRow>('revisions').where({ id: revisionId }).first();
  if (!revision) throw notFound('revision');
  const cantilever = await cantileverForMember(db, revision.cantilever_id, userId).catch((err: unknown) => {
    if (err instanceof HttpError && err.status === 404) return null;
    throw err;
  });
  if (!cantilever) throw notFound('revision');
  return { revision, cantilever };
}
