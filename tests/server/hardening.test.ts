/**
 * Hardening: the Host allow-list against DNS rebinding, the same-origin check against
 * the configured origin, sign-in limits that count failures per account and per address in the
 * database, the client address from configured proxies only, the Secure cookie under an https
 * origin, and when the demo and a first admin are created.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createApp } from '../../server/app';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { parseEnv } from '../../server/env';
import { startServer } from '../../server/start';
import { createTestEnv, PASSWORD, TEAM, type TestEnv } from '../helpers/api';

const REBIND = 'rebind.attacker.example:3000';

describe('Host allow-list and same-origin check', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('answers 421 to a DNS-rebinding page before any route: no sign-in, no user list, no new admin', async () => {
    const page = request.agent(env.app);
    const login = await page
      .post('/api/auth/login')
      .set('Host', REBIND)
      .set('Origin', `http://${REBIND}`)
      .send({ email: TEAM.admin.email, password: PASSWORD });
    expect(login.status).toBe(421);
    expect(login.headers['set-cookie']).toBeUndefined();
    // Even with a session cookie got from the real origin, the rebinding page's requests fail.
    const admin = await env.login('admin');
    const list = await admin.get('/api/admin/users').set('Host', REBIND);
    expect(list.status).toBe(421);
    expect(JSON.stringify(list.body)).not.toMatch(/@example\.test/);
    const create = await admin
      .post('/api/admin/users')
      .set('Host', REBIND)
      .set('Origin', `http://${REBIND}`)
      .send({
        email: 'evil@example.test',
        displayName: 'Evil',
        role: 'admin',
        password: 'sneaky new password 42',
      });
    expect(create.status).toBe(421);
    expect(await env.db('users').where({ email: 'evil@example.test' })).toHaveLength(0);
    expect((await request(env.app).get('/index.html').set('Host', 'attacker.example')).status).toBe(421);
    await request(env.app).get('/api/health').set('Host', 'localhost:3000').expect(200);
    await request(env.app).get('/api/health').set('Host', '[::1]:3000').expect(200);
  });

  it('refuses a state-changing request whose Origin is another site', async () => {
    const admin = await env.login('admin');
    const res = await admin.post('/api/admin/users').set('Origin', 'http://attacker.example').send({
      email: 'evil2@example.test',
      displayName: 'Evil',
      role: 'admin',
      password: 'sneaky new password 42',
    });
    expect(res.status).toBe(403);
  });

  it('with APP_ORIGIN: only that host is served, Origin must equal it, and the cookie is Secure', async () => {
    const origin = 'https://reachline.example.test';
    const app = createApp(
      { ...env.config, appOrigin: origin, allowedHosts: ['reachline.example.test'] },
      { db: env.db, mail: { kick: () => undefined } },
    );
    try {
      await request(app).get('/api/health').expect(421);
      const login = await request(app)
        .post('/api/auth/login')
        .set('Host', 'reachline.example.test')
        .set('Origin', origin)
        .send({ email: TEAM.engineer.email, password: PASSWORD })
        .expect(200);
      expect(String(login.headers['set-cookie'])).toMatch(/;\s*Secure/i);
      const other = await request(app)
        .post('/api/auth/login')
        .set('Host', 'reachline.example.test')
        .set('Origin', 'http://reachline.example.test')
        .send({ email: TEAM.engineer.email, password: PASSWORD });
      expect(other.status).toBe(403);
    } finally {
      app.closeApp();
    }
  });
});

describe('sign-in limits', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv({
      config: { loginRateLimit: 3, loginAddressRateLimit: 5, trustProxy: 'loopback' },
    });
  });
  afterAll(async () => env.close());

  const attempt = (app: TestEnv['app'], email: string, password: string, from?: string) => {
    const r = request(app).post('/api/auth/login');
    if (from) r.set('X-Forwarded-For', from);
    return r.send({ email, password });
  };

  it('never counts successful sign-ins', async () => {
    for (let i = 0; i < 8; i += 1)
      await attempt(env.app, TEAM.architect.email, PASSWORD, '10.9.0.1').expect(200);
  });

  it('limits one account across addresses (a behind-proxy attacker rotating addresses)', async () => {
    for (let i = 1; i <= 3; i += 1)
      await attempt(env.app, TEAM.engineer.email, 'wrong', `10.1.0.${i}`).expect(401);
    const res = await attempt(env.app, TEAM.engineer.email, PASSWORD, '10.1.0.99');
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('too_many_attempts');
  });

  it('limits one address across accounts, and holds across two app instances on one database', async () => {
    const second = createApp(env.config, { db: env.db, mail: { kick: () => undefined } });
    try {
      const emails = [
        'a@example.test',
        'b@example.test',
        'c@example.test',
        'd@example.test',
        'e@example.test',
      ];
      for (const [i, email] of emails.entries())
        await attempt(i % 2 ? second : env.app, email, 'wrong', '10.2.0.1').expect(401);
      await attempt(second, TEAM.fabricator.email, PASSWORD, '10.2.0.1').expect(429);
      await attempt(env.app, TEAM.fabricator.email, PASSWORD, '10.2.0.2').expect(200);
      const rows = await env.db('sign_in_failures').where({ key: 'address:10.2.0.1' });
      expect(rows).toHaveLength(5);
    } finally {
      second.closeApp();
    }
  });

  it('ignores X-Forwarded-For when TRUST_PROXY is not set (30 rotated tries still hit the limit)', async () => {
    const direct = createApp(
      { ...env.config, trustProxy: false, loginRateLimit: 1000, loginAddressRateLimit: 5 },
      { db: env.db, mail: { kick: () => undefined } },
    );
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 30; i += 1)
        statuses.push((await attempt(direct, `x${i}@example.test`, 'wrong', `192.0.2.${i}`)).status);
      expect(statuses.filter((s) => s === 429).length).toBe(25);
      expect(await env.db('sign_in_failures').where('key', 'like', 'address:192.0.2.%')).toHaveLength(0);
    } finally {
      direct.closeApp();
    }
  });
});

describe('demo seeding and the first admin', () => {
  it('seeds the demo outside production, unless SEED_DEMO says otherwise', () => {
    expect(parseEnv({ NODE_ENV: 'development' }).seedDemo).toBe(true);
    expect(parseEnv({ NODE_ENV: 'production' }).seedDemo).toBe(false);
    expect(parseEnv({ NODE_ENV: 'test' }).seedDemo).toBe(true);
    expect(parseEnv({ NODE_ENV: 'production', SEED_DEMO: '1' }).seedDemo).toBe(true);
    expect(parseEnv({ NODE_ENV: 'development', SEED_DEMO: '0' }).seedDemo).toBe(false);
    expect(parseEnv({ TRUST_PROXY: '2' }).trustProxy).toBe(2);
    expect(parseEnv({ TRUST_PROXY: '10.0.0.1, 10.0.0.2' }).trustProxy).toBe('10.0.0.1, 10.0.0.2');
    expect(parseEnv({}).trustProxy).toBe(false);
    expect(() => parseEnv({ TRUST_PROXY: 'everyone' })).toThrow(/TRUST_PROXY/);
    expect(parseEnv({ APP_ORIGIN: 'https://deck.example.test' }).allowedHosts).toEqual(['deck.example.test']);
  });

  it('in production: no demo on an empty database; an admin from ADMIN_EMAIL who must change the password', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'reachline-prod-'));
    const prodEnv = {
      NODE_ENV: 'production',
      ADMIN_EMAIL: 'owner@example.test',
      ADMIN_PASSWORD: 'granite ledge over water 9',
    } as const;
    const parsed = parseEnv(prodEnv);
    const server = await startServer({
      nodeEnv: 'production',
      seedDemo: parsed.seedDemo,
      firstAdmin: parsed.firstAdmin,
      port: 0,
      databaseUrl: join(dir, 'db.sqlite'),
      uploadDir: join(dir, 'uploads'),
      dataDir: dir,
      distDir: join(dir, 'dist'),
      passwordCost: 1024,
    });
    try {
      const post = (email: string, password: string) =>
        fetch(`${server.url}/api/auth/login`, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ email, password }),
        });
      expect((await post(DEMO_ACCOUNTS[0].email, DEMO_PASSWORD)).status).toBe(401);
      const owner = await post('owner@example.test', 'granite ledge over water 9');
      expect(owner.status).toBe(200);
      expect((await owner.json()).mustChangePassword).toBe(true);
    } finally {
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('warns when the demo is seeded in production on purpose', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'reachline-prod-demo-'));
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => undefined);
    const server = await startServer({
      nodeEnv: 'production',
      seedDemo: parseEnv({ NODE_ENV: 'production', SEED_DEMO: '1' }).seedDemo,
      port: 0,
      databaseUrl: join(dir, 'db.sqlite'),
      uploadDir: join(dir, 'uploads'),
      dataDir: dir,
      distDir: join(dir, 'dist'),
      passwordCost: 1024,
    });
    try {
      expect(warn.mock.calls.map((c) => String(c[0])).join('\n')).toMatch(/WARNING: SEED_DEMO.*public/);
    } finally {
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
