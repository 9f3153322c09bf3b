/** Cantilevers (Knex only). */
import type { Knex } from 'knex';
import type { CantileverDto, ReviewState } from '../../../shared/schemas/api';
import { nowIso, toBool, toIso, insertReturningId } from '../../db/knex';
import type { CantileverRow } from '../projects/project-access';
import { latestApprovals, latestStateColumn } from '../revisions/revisions.repository';

type Db = Knex | Knex.Transaction;

type ListedRow = CantileverRow & {
  current_number: number | null;
  current_ok: number | boolean | null;
  review_state: ReviewState | null;
};

export async function listCantilevers(
  db: Db,
  where: { projectId?: number; id?: number },
): Promise<CantileverDto[]> {
  const q = db('cantilevers as c')
    .leftJoin('revisions as r', 'r.id', 'c.current_revision_id')
    .select(
      'c.*',
      'r.number as current_number',
      'r.ok as current_ok',
      latestStateColumn(db, 'c.current_revision_id', 'review_state'),
    )
    .orderBy('c.name');
  if (where.projectId !== undefined) q.where('c.project_id', where.projectId);
  if (where.id !== undefined) q.where('c.id', where.id);
  const rows = (await q) as ListedRow[];
  const approved = await latestApprovals(
    db,
    rows.map((r) => r.id),
  );
  return rows.map((r) => ({
    id: r.id,
    projectId: r.project_id,
    name: r.name,
    description: r.description,
    currentRevisionId: r.current_revision_id,
    currentRevisionNumber: r.current_number ?? null,
    reviewState: r.current_revision_id === null ? null : (r.review_state ?? 'draft'),
    ok: r.current_ok === null || r.current_ok === undefined ? null : toBool(r.current_ok),
    updatedAt: toIso(r.updated_at),
    quantity: Number(r.quantity ?? 1),
    latestApproved: approved.get(r.id) ?? null,
  }));
}

export async function insertCantilever(
  db: Db,
  c: { projectId: number; name: string; description: string; quantity?: number },
): Promise<number> {
  const now = nowIso();
  return insertReturningId(db, 'cantilevers', {
    project_id: c.projectId,
    name: c.name,
    description: c.description,
    quantity: c.quantity ?? 1,
    current_revision_id: null,
    created_at: now,
    updated_at: now,
  });
}

export async function updateCantileverQuantity(db: Db, id: number, quantity: number): Promise<void> {
  await db('cantilevers').where({ id }).update({ quantity, updated_at: nowIso() });
}
