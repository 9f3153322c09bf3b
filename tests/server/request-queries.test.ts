/**
 * What one signed-in request asks the database (server/auth/session-store.ts, passport.ts,
 * server/db/knex.ts): the session and its account in one query, integer LIMIT and OFFSET written
 * into the SQL text on SQLite, and the revisions list without the stored documents. The account
 * read with the session is still checked as before: a disabled account or an older session
 * version signs the session out.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDb, dialectOf } from '../../server/db/knex';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

let env: TestEnv;
beforeAll(async () => {
  env = await createTestEnv();
});
afterAll(async () => {
  await env.close();
});

async function queriesOf(run: () => Promise<unknown>): Promise<string[]> {
  const sql: string[] = [];
  const listen = (q: { sql: string }) => sql.push(q.sql);
  env.db.on('query', listen);
  try {
    await run();
  } finally {
    env.db.off('query', listen);
  }
  return sql;
}

describe('queries per signed-in request', () => {
  it('reads the session and its account in one query', async () => {
    const engineer = await env.login('engineer');
    let body: { email?: string } = {};
    const sql = await queriesOf(async () => {
      const res = await engineer.get('/api/auth/me').expect(200);
      body = res.body as { email?: string };
    });
    expect(body.email).toMatch(/engineer/);
    expect(sql).toHaveLength(1);
    expect(sql[0]).toMatch(/from sessions s\s+left join users u/);
  });

  it('still ends the session of an account disabled after sign-in, and of an older session version', async () => {
    const fabricator = await env.login('fabricator');
    await fabricator.get('/api/auth/me').expect(200);
    await env.db('users').where({ id: env.ids.fabricator }).update({ active: false });
    await fabricator.get('/api/auth/me').expect(401);
    await env.db('users').where({ id: env.ids.fabricator }).update({ active: true });

    const architect = await env.login('architect');
    await architect.get('/api/auth/me').expect(200);
    await env.db('users').where({ id: env.ids.architect }).increment('session_version', 1);
    await architect.get('/api/auth/me').expect(401);
  });

  it('lists revisions without reading their documents', async () => {
    const engineer = await env.login('engineer');
    const sql = await queriesOf(() =>
      engineer.get(`/api/cantilevers/${env.cantileverId}/revisions`).expect(200),
    );
    const list = sql.find((s) => /from [`"]?revisions[`"]? as [`"]?r/.test(s))!;
    expect(list).toBeDefined();
    expect(list).not.toMatch(/r[`"]?\.\*/);
  });
});

describe('POST /api/check', () => {
  it('reads the imported shapes only for a document that names a shape the published table lacks', async () => {
    const engineer = await env.login('engineer');
    const builtIn = await queriesOf(() =>
      engineer.post('/api/check').send({ input: baseDesign() }).expect(200),
    );
    expect(builtIn.some((s) => /from [`"]?shapes[`"]?/.test(s))).toBe(false);
    const unknown = baseDesign();
    unknown.member.section = { shape: 'W1X1' };
    let status = 0;
    const asked = await queriesOf(async () => {
      status = (await engineer.post('/api/check').send({ input: unknown })).status;
    });
    expect(status).toBe(400);
    expect(asked.some((s) => /from [`"]?shapes[`"]?/.test(s))).toBe(true);
  });
});

describe('LIMIT and OFFSET on SQLite', () => {
  it('are written into the text as integers, so one statement serves every run', async () => {
    const db = createDb(':memory:');
    try {
      expect(dialectOf(db)).toBe('sqlite');
      const first = db('users').where({ id: 7 }).first().toSQL().toNative();
      expect(first.sql).toMatch(/limit 1$/);
      expect(first.bindings).toEqual([7]);
      const page = db('users').limit(5).offset(10).toSQL().toNative();
      expect(page.sql).toMatch(/limit 5 offset 10$/);
      expect(page.bindings).toEqual([]);
      await db.schema.createTable('t', (t) => t.integer('n'));
      await db('t').insert([{ n: 1 }, { n: 2 }, { n: 3 }]);
      expect(await db('t').orderBy('n').limit(2).offset(1)).toEqual([{ n: 2 }, { n: 3 }]);
    } finally {
      await db.destroy();
    }
  });
});
