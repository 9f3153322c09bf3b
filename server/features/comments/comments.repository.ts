/** Comments on revisions (Knex only). */
import type { Knex } from 'knex';
import type { CommentDto } from '../../../shared/schemas/api';
import { insertReturningId, nowIso, toIso } from '../../db/knex';

interface CommentRow {
  id: number;
  revision_id: number;
  author_id: number;
  author_name: string;
  body: string;
  created_at: string;
}

export async function listComments(db: Knex, revisionId: number): Promise<CommentDto[]> {
  const rows = await db('comments as c')
    .join('users as u', 'u.id', 'c.author_id')
    .where('c.revision_id', revisionId)
    .orderBy('c.id')
    .select<CommentRow[]>('c.*', 'u.display_name as author_name');
  return rows.map((r) => ({
    id: r.id,
    revisionId: r.revision_id,
    authorId: r.author_id,
    authorName: r.author_name,
    body: r.body,
    createdAt: toIso(r.created_at),
  }));
}

export async function insertComment(
  db: Knex | Knex.Transaction,
  c: { revisionId: number; authorId: number; body: string },
): Promise<number> {
  return insertReturningId(db, 'comments', {
    revision_id: c.revisionId,
    author_id: c.authorId,
    body: c.body,
    created_at: nowIso(),
  });
}
