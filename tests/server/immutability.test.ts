/**
 * The database keeps revisions and approvals as they were: INSERT OR REPLACE cannot
 * rewrite a revision (not even an approved one with foreign keys off), and no review row can be
 * added after an approval. SQLite triggers from migration 20261203020000_security; on PostgreSQL
 * (TEST_PG=1) their plpgsql twins, against INSERT … ON CONFLICT DO UPDATE, UPDATE, DELETE and
 * TRUNCATE.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestEnv, type TestEnv } from '../helpers/api';
import { ON_POSTGRES } from '../helpers/test-db';

describe.runIf(ON_POSTGRES)('immutable revisions and approvals (PostgreSQL triggers)', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  const upsert = (env: TestEnv, id: number | null, number: number, authorId: number, target: string) =>
    env.db.raw(
      `INSERT INTO revisions (${id === null ? '' : 'id, '}cantilever_id, number, author_id, message, input_json, result_json, engine_version, base_revision_id, ok, created_at)
       VALUES (${id === null ? '' : `${id}, `}?, ?, ?, 'rewritten', '{}', '{"ok":true}', 'x', NULL, true, '2026-01-01')
       ON CONFLICT (${target}) DO UPDATE SET message = EXCLUDED.message, result_json = EXCLUDED.result_json`,
      [env.cantileverId, number, authorId],
    );

  it('refuses an upsert, an UPDATE, a TRUNCATE of revisions, and the DELETE of an approved one', async () => {
    const before = await env.db('revisions').where({ id: env.revisionId }).first();
    await expect(upsert(env, env.revisionId, 99, before.author_id, 'id')).rejects.toThrow(
      /revisions are immutable/,
    );
    await expect(upsert(env, null, before.number, before.author_id, 'cantilever_id, number')).rejects.toThrow(
      /revisions are immutable/,
    );
    await expect(env.db('revisions').where({ id: env.revisionId }).update({ message: 'x' })).rejects.toThrow(
      /revisions are immutable: save a new revision instead/,
    );
    await expect(env.db.raw('TRUNCATE revisions CASCADE')).rejects.toThrow(/cannot be truncated/);
    await env.db('reviews').insert([
      {
        revision_id: env.revisionId,
        state: 'submitted',
        reviewer_id: before.author_id,
        created_at: '2026-01-01',
      },
      {
        revision_id: env.revisionId,
        state: 'approved',
        reviewer_id: env.ids.engineer,
        created_at: '2026-01-02',
      },
    ]);
    await expect(env.db('revisions').where({ id: env.revisionId }).delete()).rejects.toThrow(
      /an approved revision cannot be deleted/,
    );
    await expect(env.db('cantilevers').where({ id: env.cantileverId }).delete()).rejects.toThrow(
      /an approved revision cannot be deleted/,
    );
    expect(await env.db('revisions').where({ id: env.revisionId }).first()).toEqual(before);
  });

  it('refuses a review row after an approval, an upsert, UPDATE or DELETE of a review', async () => {
    const reviews = await env.db('reviews').where({ revision_id: env.revisionId }).orderBy('id');
    expect(reviews.at(-1).state).toBe('approved');
    await expect(
      env.db('reviews').insert({
        revision_id: env.revisionId,
        state: 'changes-requested',
        reviewer_id: env.ids.engineer2,
        created_at: '2026-01-03',
      }),
    ).rejects.toThrow(/approved revision takes no further review rows/);
    await expect(
      env.db.raw(
        `INSERT INTO reviews (id, revision_id, state, reviewer_id, comment, created_at) VALUES (?, ?, 'submitted', ?, '', '2026-01-04')
         ON CONFLICT (id) DO UPDATE SET state = EXCLUDED.state`,
        [reviews[0].id, env.revisionId, env.ids.engineer2],
      ),
    ).rejects.toThrow(/approved revision takes no further review rows/);
    await expect(
      env.db('reviews').where({ id: reviews[1].id }).update({ state: 'submitted' }),
    ).rejects.toThrow(/reviews are immutable/);
    await expect(env.db('reviews').where({ id: reviews[1].id }).delete()).rejects.toThrow(
      /an approval cannot be deleted/,
    );
    expect(await env.db('reviews').where({ revision_id: env.revisionId }).orderBy('id')).toEqual(reviews);
  });
});

describe.skipIf(ON_POSTGRES)('immutable revisions and approvals', () => {
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
