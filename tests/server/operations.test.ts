/**
 * Operations: /api/health reports the database and the storage (503 naming what is
 * unreachable); JSON request logs carry a request id, echoed in X-Request-Id; shutdown finishes a
 * request in flight and the mail worker's send in hand; `reachline db backup` writes a consistent
 * copy (SQLite backup API; pg_dump on PostgreSQL; a clear message without pg_dump).
 */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { connect } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import type { CliIo } from '../../server/cli/check-command';
import { dbBackupCommand } from '../../server/cli/db-backup-command';
import { createDb } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { MailWorker } from '../../server/mail/mail-worker';
import { queueMail } from '../../server/mail/outbox.repository';
import { startServer } from '../../server/start';
import { createTestEnv, type TestEnv } from '../helpers/api';
import { startFakeS3 } from '../helpers/fake-s3';
import { ON_POSTGRES } from '../helpers/test-db';

function io() {
  const captured = { out: '', err: '' };
  const cli: CliIo = {
    out: (t) => void (captured.out += t),
    err: (t) => void (captured.err += t),
    readStdin: async () => '',
  };
  return { cli, captured };
}

describe('health and request logs', () => {
  let env: TestEnv;
  const lines: Record<string, unknown>[] = [];
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('reports the database and the storage', async () => {
    const res = await request(env.app).get('/api/health').expect(200);
    expect(res.body).toMatchObject({ ok: true, database: 'ok', storage: 'ok' });
  });

  it('logs each request as one JSON line with the request id it answers in X-Request-Id', async () => {
    const sink = new Writable({
      write(chunk: Buffer, _enc, done) {
        for (const line of chunk.toString().split('\n').filter(Boolean))
          lines.push(JSON.parse(line) as Record<string, unknown>);
        done();
      },
    });
    const app = createApp(env.config, {
      db: env.db,
      mail: { kick() {} },
      logger: pino({ level: 'info' }, sink),
    });
    try {
      const given = await request(app).get('/api/auth/me').set('X-Request-Id', 'probe-42').expect(401);
      expect(given.headers['x-request-id']).toBe('probe-42');
      const fresh = await request(app).get('/api/projects').expect(401);
      expect(fresh.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
      const evil = await request(app).get('/api/projects').set('X-Request-Id', 'a b').expect(401);
      expect(evil.headers['x-request-id']).not.toContain(' ');
      await new Promise((r) => setTimeout(r, 20));
      const logged = lines.filter((l) => (l.req as { id?: string } | undefined)?.id === 'probe-42');
      expect(logged).toHaveLength(1);
      expect(logged[0]).toMatchObject({ level: 30, res: { statusCode: 401 }, req: { method: 'GET' } });
      expect(JSON.stringify(lines)).not.toMatch(/reachline\.sid=/);
    } finally {
      app.closeApp();
    }
  });

  it('answers 503 naming the storage when the bucket is unreachable', async () => {
    const fake = await startFakeS3(['another-bucket']);
    const saved = [process.env.AWS_ACCESS_KEY_ID, process.env.AWS_SECRET_ACCESS_KEY];
    process.env.AWS_ACCESS_KEY_ID = 'k';
    process.env.AWS_SECRET_ACCESS_KEY = 's';
    const app = createApp(
      {
        ...env.config,
        storageUrl: 's3://missing-bucket',
        s3: { endpoint: fake.url, region: 'us-east-1', forcePathStyle: true },
      },
      { db: env.db, mail: { kick() {} } },
    );
    try {
      const res = await request(app).get('/api/health').expect(503);
      expect(res.body).toMatchObject({
        ok: false,
        database: 'ok',
        storage: expect.stringMatching(/^unreachable/),
      });
    } finally {
      app.closeApp();
      await fake.close();
      [process.env.AWS_ACCESS_KEY_ID, process.env.AWS_SECRET_ACCESS_KEY] = saved;
      if (saved[0] === undefined) delete process.env.AWS_ACCESS_KEY_ID;
      if (saved[1] === undefined) delete process.env.AWS_SECRET_ACCESS_KEY;
    }
  });

  it('answers 503 naming the database when it is gone', async () => {
    const db = createDb(env.config.databaseUrl);
    const app = createApp(env.config, { db, mail: { kick() {} } });
    await db.destroy();
    try {
      const res = await request(app).get('/api/health').expect(503);
      expect(res.body).toMatchObject({
        ok: false,
        database: expect.stringMatching(/^unreachable/),
        storage: 'ok',
      });
    } finally {
      app.closeApp();
    }
  });
});

describe('graceful shutdown', () => {
  it('finishes a request in flight before closing', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'reachline-shutdown-'));
    const server = await startServer({
      port: 0,
      databaseUrl: join(dir, 'db.sqlite'),
      uploadDir: join(dir, 'uploads'),
      dataDir: dir,
      distDir: join(dir, 'dist'),
      seedDemo: false,
      logLevel: 'silent',
    });
    try {
      const body = JSON.stringify({ email: 'nobody@example.test', password: 'not this one' });
      const socket = connect(server.port, '127.0.0.1');
      const answer = new Promise<string>((resolve) => {
        let text = '';
        socket.on('data', (c: Buffer) => (text += c.toString()));
        socket.on('close', () => resolve(text));
      });
      await new Promise<void>((resolve) => socket.once('connect', () => resolve()));
      // Headers and half the body now; the rest after shutdown has begun.
      socket.write(
        `POST /api/auth/login HTTP/1.1\r\nHost: 127.0.0.1:${server.port}\r\nContent-Type: application/json\r\nContent-Length: ${body.length}\r\nConnection: close\r\n\r\n${body.slice(0, 10)}`,
      );
      await new Promise((r) => setTimeout(r, 100));
      const closed = server.close();
      await new Promise((r) => setTimeout(r, 100));
      socket.write(body.slice(10));
      const text = await answer;
      await closed;
      expect(text).toMatch(/^HTTP\/1\.1 401 /);
    } finally {
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('stopping the mail worker lets it finish the send in hand', async () => {
    const env = await createTestEnv();
    const smtp = await startFakeSmtp(env.db);
    const worker = new MailWorker(env.db, {
      smtpUrl: smtp.url,
      from: 'x@example.test',
      retryBaseMs: 1,
      maxAttempts: 3,
      pollMs: 60_000,
    });
    try {
      await queueMail(env.db, { to: ['one@example.test'], subject: 'in hand', text: 'x' });
      const run = worker.runOnce();
      const deadline = Date.now() + 5_000;
      while (!(await env.db('outbox').whereNotNull('claim_token').first()) && Date.now() < deadline)
        await new Promise((r) => setTimeout(r, 2));
      await worker.stop();
      await run;
      expect(await env.db('outbox').first()).toMatchObject({ status: 'sent', attempts: 1 });
      expect(smtp.received.map((m) => m.subject)).toEqual(['in hand']);
    } finally {
      await smtp.close();
      await env.close();
    }
  });
});

describe('reachline db backup', () => {
  const dir = mkdtempSync(join(tmpdir(), 'reachline-backup-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('copies an SQLite database through the backup API and never overwrites a file', async () => {
    const source = join(dir, 'live.sqlite');
    const db = createDb(source);
    await migrateLatest(db);
    await db.destroy();
    const { cli, captured } = io();
    const target = join(dir, 'copy.sqlite');
    expect(await dbBackupCommand(target, cli, { DATABASE_URL: source })).toBe(0);
    expect(captured.out).toMatch(/Wrote .*copy\.sqlite .*SQLite/);
    const copy = createDb(target);
    try {
      const names = (await copy('knex_migrations').pluck('name')) as string[];
      expect(names).toContain('20261203030000_outbox_claim');
    } finally {
      await copy.destroy();
    }
    const again = io();
    expect(await dbBackupCommand(target, again.cli, { DATABASE_URL: source })).toBe(2);
    expect(again.captured.err).toMatch(/exists/);
  });

  it('says what to install when pg_dump is missing', async () => {
    const { cli, captured } = io();
    const env = { DATABASE_URL: 'postgres://u@127.0.0.1:1/x', PG_DUMP: join(dir, 'no-pg-dump') };
    expect(await dbBackupCommand(join(dir, 'x.dump'), cli, env)).toBe(2);
    expect(captured.err).toMatch(/pg_dump was not found: install the PostgreSQL client tools/);
  });

  it.runIf(ON_POSTGRES)('dumps a PostgreSQL database with pg_dump', async () => {
    const env = await createTestEnv();
    try {
      const { cli, captured } = io();
      const target = join(dir, 'pg.dump');
      expect(await dbBackupCommand(target, cli, { DATABASE_URL: env.config.databaseUrl })).toBe(0);
      expect(existsSync(target)).toBe(true);
      expect(readFileSync(target).subarray(0, 5).toString()).toBe('PGDMP');
      expect(captured.out).toMatch(/pg_restore/);
    } finally {
      await env.close();
    }
  });
});
