/**
 * The database keeps revisions and approvals as they were (issue 15): INSERT OR REPLACE cannot
 * rewrite a revision (not even an approved one with foreign keys off), and no review row can be
 * added after an approval. SQLite triggers from migration 20261203020000_security.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestEnv, type TestEnv } from '../helpers/api';

describe('immutable revisions and approvals', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('refuses INSERT OR REPLACE of a revision, by id and by number, even with foreign keys off', async () => {
    const before = await env.db('revisions').where({ id: env.revisionId }).first();
    const replace = (id: number | null, number: number) =>
      env.db.raw(
        `INSERT OR REPLACE INTO revisions (id, cantilever_id, number, author_id, message, input_json, result_json, engine_version, base_revision_id, ok, created_at)
         VALUES (?, ?, ?, ?, 'rewritten', '{}', '{"ok":true}', 'x', NULL, 1, '2026-01-01')`,
        [id, env.cantileverId, number, before.author_id],
      );
    await expect(replace(env.revisionId, 99)).rejects.toThrow(/revisions are immutable/);
    await expect(replace(null, before.number)).rejects.toThrow(/revisions are immutable/);
    await env.db('reviews').insert([
      {
        revision_id: env.revisionId,
        state: 'submitted',
        reviewer_id: before.author_id,
        comment: '',
        created_at: '2026-01-01',
      },
      {
        revision_id: env.revisionId,
        state: 'approved',
        reviewer_id: env.ids.engineer,
        comment: '',
        created_at: '2026-01-02',
      },
    ]);
    // One connection for the pragma and the statement (the pool may hand out another otherwise).
    await env.db.transaction(async (trx) => {
      await trx.raw('PRAGMA defer_foreign_keys = ON');
      await expect(
        trx.raw(
          `INSERT OR REPLACE INTO revisions (id, cantilever_id, number, author_id, message, input_json, result_json, engine_version, base_revision_id, ok, created_at)
           VALUES (?, ?, ?, ?, 'rewritten', '{}', '{"ok":true}', 'x', NULL, 1, '2026-01-01')`,
          [env.revisionId, env.cantileverId, before.number, before.author_id],
        ),
      ).rejects.toThrow(/revisions are immutable/);
    });
    const conn = await env.db.client.acquireConnection();
    try {
      conn.pragma('foreign_keys = OFF');
      expect(() =>
        conn
          .prepare(
            `INSERT OR REPLACE INTO revisions (id, cantilever_id, number, author_id, message, input_json, result_json, engine_version, base_revision_id, ok, created_at)
             VALUES (?, ?, ?, ?, 'rewritten', '{}', '{"ok":true}', 'x', NULL, 1, '2026-01-01')`,
          )
          .run(env.revisionId, env.cantileverId, before.number, before.author_id),
      ).toThrow(/revisions are immutable/);
      conn.pragma('foreign_keys = ON');
    } finally {
      await env.db.client.releaseConnection(conn);
    }
    expect(await env.db('revisions').where({ id: env.revisionId }).first()).toEqual(before);
  });

  it('refuses a review row inserted after an approval, and an INSERT OR REPLACE of a review', async () => {
    const reviews = await env.db('reviews').where({ revision_id: env.revisionId }).orderBy('id');
    expect(reviews.at(-1).state).toBe('approved');
    await expect(
      env.db('reviews').insert({
        revision_id: env.revisionId,
        state: 'changes-requested',
        reviewer_id: env.ids.engineer2,
        comment: 'override',
        created_at: '2026-01-03',
      }),
    ).rejects.toThrow(/approved revision takes no further review rows/);
    await expect(
      env.db.raw(
        `INSERT OR REPLACE INTO reviews (id, revision_id, state, reviewer_id, comment, created_at) VALUES (?, ?, 'submitted', ?, '', '2026-01-04')`,
        [reviews[0].id, env.revisionId, env.ids.engineer2],
      ),
    ).rejects.toThrow(/approved revision takes no further review rows/);
    expect(await env.db('reviews').where({ revision_id: env.revisionId }).orderBy('id')).toEqual(reviews);
  });
});
