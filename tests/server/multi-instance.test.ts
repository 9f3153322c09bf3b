/**
 * Two app processes on one PostgreSQL database and one storage folder, as behind a
 * load balancer: a session made on A works on B; concurrent saves on A and B give one 201 and one
 * 409; a file uploaded through A downloads identically from B; a submitted revision's e-mail
 * leaves once although both instances run a mail worker; failed sign-ins count across both; killing A (SIGKILL) during saves loses
 * no revision it answered 201 for, and B keeps serving. Runs in the PostgreSQL run only
 * (TEST_PG=1); each process is the real server entry (server/index.ts) started with tsx.
 */
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshServerBundle } from '../../scripts/lib/server-build';
import { startServerProcess, type ServerProcess } from '../../scripts/lib/server-process';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { baseDesign, createTestEnv, PASSWORD, TEAM, type TestEnv } from '../helpers/api';
import { ON_POSTGRES } from '../helpers/test-db';

type Instance = ServerProcess;

function startInstance(env: TestEnv, smtpUrl: string, name: string): Promise<Instance> {
  return startServerProcess(
    {
      NODE_ENV: 'test',
      PORT: '0',
      HOST: '127.0.0.1',
      DATABASE_URL: env.config.databaseUrl,
      UPLOAD_DIR: env.config.uploadDir,
      DATA_DIR: `${env.dirs.root}/${name}`,
      SESSION_SECRET: env.config.sessionSecret,
      SMTP_URL: smtpUrl,
      SEED_DEMO: '0',
      LOG_LEVEL: 'warn',
      // Three failed sign-ins per account, counted in the database across both instances.
      LOGIN_RATE_LIMIT: '3',
    },
    name,
    45_000,
    freshServerBundle(process.cwd()),
  );
}

/** fetch with one cookie jar (the session cookie) that can be sent to either instance. */
class Client {
  cookie = '';
  async call(base: string, method: string, path: string, body?: unknown): Promise<Response> {
    const res = await fetch(base + path, {
      method,
      headers: {
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...(body !== undefined && !(body instanceof FormData) ? { 'content-type': 'application/json' } : {}),
      },
      body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
    });
    const set = res.headers.getSetCookie().find((c) => c.startsWith('reachline.sid='));
    if (set) this.cookie = set.split(';')[0];
    return res;
  }
}

describe.runIf(ON_POSTGRES)('two instances on one PostgreSQL and one storage', () => {
  let env: TestEnv;
  let smtp: FakeSmtp;
  let a: Instance;
  let b: Instance;
  const architect = new Client();
  const engineer = new Client();

  beforeAll(async () => {
    env = await createTestEnv();
    smtp = await startFakeSmtp(env.db);
    [a, b] = await Promise.all([startInstance(env, smtp.url, 'a'), startInstance(env, smtp.url, 'b')]);
  }, 60_000);
  afterAll(async () => {
    for (const i of [a, b]) if (i && i.child.exitCode === null) i.child.kill('SIGKILL');
    await smtp?.close();
    await env?.close();
  });

  const revisionsPath = () => `/api/cantilevers/${env.cantileverId}/revisions`;
  const save = (client: Client, on: Instance, base: number, length: string) => {
    const input = baseDesign();
    input.member.length = length;
    return client.call(on.url, 'POST', revisionsPath(), {
      baseRevision: base,
      message: `L ${length}`,
      input,
    });
  };

  it('a session made on A works on B, and signing out on B ends it on A', async () => {
    const login = await architect.call(a.url, 'POST', '/api/auth/login', {
      email: TEAM.architect.email,
      password: PASSWORD,
    });
    expect(login.status).toBe(200);
    const me = await architect.call(b.url, 'GET', '/api/auth/me');
    expect(me.status).toBe(200);
    expect(((await me.json()) as { email: string }).email).toBe(TEAM.architect.email);
    const other = new Client();
    await other.call(b.url, 'POST', '/api/auth/login', { email: TEAM.engineer.email, password: PASSWORD });
    expect((await other.call(a.url, 'GET', '/api/auth/me')).status).toBe(200);
    await other.call(b.url, 'POST', '/api/auth/logout');
    expect((await other.call(a.url, 'GET', '/api/auth/me')).status).toBe(401);
    await engineer.call(b.url, 'POST', '/api/auth/login', { email: TEAM.engineer.email, password: PASSWORD });
  });

  it('failed sign-ins are counted across instances: two on A and one on B lock the account on both', async () => {
    const intruder = new Client();
    const attempt = (on: Instance, password: string) =>
      intruder.call(on.url, 'POST', '/api/auth/login', { email: TEAM.outsider.email, password });
    expect((await attempt(a, 'wrong one')).status).toBe(401);
    expect((await attempt(a, 'wrong two')).status).toBe(401);
    expect((await attempt(b, 'wrong three')).status).toBe(401);
    expect((await attempt(a, PASSWORD)).status).toBe(429);
    expect((await attempt(b, PASSWORD)).status).toBe(429);
  });

  it('concurrent saves on A and B from one base: one 201 and one 409, one revision 2', async () => {
    const [ra, rb] = await Promise.all([save(architect, a, 1, '7.25 ft'), save(engineer, b, 1, '7.75 ft')]);
    expect([ra.status, rb.status].sort()).toEqual([201, 409]);
    const numbers = await env.db('revisions').where({ cantilever_id: env.cantileverId }).pluck('number');
    expect(numbers.sort()).toEqual([1, 2]);
  });

  it('a file uploaded through A downloads identically from B', async () => {
    const bytes = Buffer.from('mark,plate,thickness\nB1,24x16,1.5\nB2,24x16,1.5\n'.repeat(50));
    const form = new FormData();
    form.append('file', new Blob([bytes], { type: 'text/csv' }), 'schedule.csv');
    const up = await architect.call(a.url, 'POST', `/api/cantilevers/${env.cantileverId}/attachments`, form);
    expect(up.status).toBe(201);
    const { id } = (await up.json()) as { id: number };
    const down = await engineer.call(b.url, 'GET', `/api/attachments/${id}`);
    expect(down.status).toBe(200);
    const got = Buffer.from(await down.arrayBuffer());
    expect(createHash('sha256').update(got).digest('hex')).toBe(
      createHash('sha256').update(bytes).digest('hex'),
    );
  });

  it("a submitted revision's e-mail is sent once, though both instances run a mail worker", async () => {
    const latest = (
      await env.db('revisions').where({ cantilever_id: env.cantileverId }).max({ n: 'number' })
    )[0].n as number;
    const rev = await env.db('revisions').where({ cantilever_id: env.cantileverId, number: latest }).first();
    const submit = await architect.call(a.url, 'POST', `/api/revisions/${rev.id}/submit`);
    expect(submit.status).toBe(200);
    const row = await env.db('outbox').orderBy('id', 'desc').first();
    const deadline = Date.now() + 10_000;
    while (!smtp.received.some((m) => m.outboxId === row.id) && Date.now() < deadline)
      await new Promise((r) => setTimeout(r, 100));
    // Both workers poll every 2 s: give each at least one more round.
    await new Promise((r) => setTimeout(r, 2_500));
    expect(smtp.received.filter((m) => m.outboxId === row.id)).toHaveLength(1);
    expect(await env.db('outbox').where({ id: row.id }).first()).toMatchObject({
      status: 'sent',
      attempts: 1,
    });
  });

  it('kill -9 of A during saves loses no revision it answered 201 for; B keeps serving', async () => {
    const committed: number[] = [];
    let base = (
      (await env.db('revisions').where({ cantilever_id: env.cantileverId }).max({ n: 'number' })) as {
        n: number;
      }[]
    )[0].n;
    const refused: number[] = [];
    const saving = (async () => {
      for (let i = 0; i < 60; i += 1) {
        try {
          const res = await save(architect, a, base, `${(7 + (i % 8) * 0.1).toFixed(1)} ft`);
          if (res.status !== 201) {
            refused.push(res.status);
            break;
          }
          const body = (await res.json()) as { id: number; number: number };
          committed.push(body.id);
          base = body.number;
        } catch {
          break; // the connection died with the process
        }
      }
    })();
    // Killed while a save is in flight (the next one starts as soon as the last answered).
    const deadline = Date.now() + 20_000;
    while (committed.length < 3 && refused.length === 0 && Date.now() < deadline)
      await new Promise((r) => setTimeout(r, 20));
    await new Promise((r) => setTimeout(r, 30));
    a.child.kill('SIGKILL');
    await saving;
    expect(refused).toEqual([]);
    expect(committed.length).toBeGreaterThan(0);
    const stored = await env.db('revisions').whereIn('id', committed).pluck('id');
    expect(stored.sort()).toEqual([...committed].sort());
    // B serves the latest, and takes the next save on top of whatever A last committed.
    const list = await architect.call(b.url, 'GET', revisionsPath());
    expect(list.status).toBe(200);
    const latest = ((await list.json()) as { number: number }[])[0].number;
    expect((await save(architect, b, latest, '8.1 ft')).status).toBe(201);
    expect(b.child.exitCode).toBeNull();
  });
});
