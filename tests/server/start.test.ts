import { mkdirSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig, parseEnv } from '../../server/env';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { startServer, type RunningServer } from '../../server/start';

describe('configuration', () => {
  it('takes a PostgreSQL URL as it is and refuses other schemes with a clear message', () => {
    expect(parseEnv({ DATABASE_URL: 'postgres://u:p@db/reachline' }).databaseUrl).toBe(
      'postgres://u:p@db/reachline',
    );
    expect(() => parseEnv({ DATABASE_URL: 'mysql://u:p@db/reachline' })).toThrow(
      /DATABASE_URL: must be a plain path to an SQLite file or a postgres:\/\/ URL/,
    );
    expect(() => parseEnv({ STORAGE_URL: 'ftp://files' })).toThrow(/STORAGE_URL/);
  });

  it('names the bad variable', () => {
    expect(() => parseEnv({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => parseEnv({ SMTP_URL: 'not a url' })).toThrow(/SMTP_URL/);
  });

  it('has working defaults', () => {
    const config = parseEnv({});
    expect(config).toMatchObject({
      port: 3000,
      smtpUrl: null,
      attachmentMaxBytes: 10 * 1024 * 1024,
      sessionSecret: null,
    });
    expect(config.databaseUrl).toMatch(/data[/\\]reachline\.sqlite$/);
    expect(config.uploadDir).toMatch(/data[/\\]uploads$/);
  });

  it('generates a session secret once, kept in the data folder with mode 600', () => {
    const dir = mkdtempSync(join(tmpdir(), 'reachline-secret-'));
    try {
      const first = loadConfig({ dataDir: dir }, {});
      const second = loadConfig({ dataDir: dir }, {});
      expect(first.sessionSecret.length).toBeGreaterThanOrEqual(32);
      expect(second.sessionSecret).toBe(first.sessionSecret);
      expect(statSync(join(dir, 'session-secret')).mode & 0o777).toBe(0o600);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('startServer', () => {
  let dir: string;
  let server: RunningServer;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'reachline-start-'));
    const dist = join(dir, 'dist');
    mkdirSync(join(dist, 'assets'), { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Reachline</title><div id="root"></div>');
    writeFileSync(join(dist, 'assets', 'index-a1b2c3.js'), 'console.log(1)');
    server = await startServer({
      port: 0,
      databaseUrl: join(dir, 'db.sqlite'),
      uploadDir: join(dir, 'uploads'),
      dataDir: dir,
      distDir: dist,
      passwordCost: 1024,
      seedDemo: true,
    });
  });
  afterAll(async () => {
    await server?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('listens on a random port, seeds the demo into the empty database and signs in a demo account', async () => {
    expect(server.port).toBeGreaterThan(0);
    expect(server.fakeSmtp).not.toBeNull();
    const login = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: DEMO_ACCOUNTS[1].email, password: DEMO_PASSWORD }),
    });
    expect(login.status).toBe(200);
    const cookie = login.headers.get('set-cookie')!.split(';')[0];
    const projects = (await (await fetch(`${server.url}/api/projects`, { headers: { cookie } })).json()) as {
      name: string;
      id: number;
    }[];
    expect(projects.map((p) => p.name)).toEqual(['Harbor View Studio']);
    const detail = (await (
      await fetch(`${server.url}/api/projects/${projects[0].id}`, { headers: { cookie } })
    ).json()) as {
      members: unknown[];
      cantilevers: { name: string; currentRevisionNumber: number }[];
    };
    expect(detail.members).toHaveLength(4);
    expect(detail.cantilevers.map((c) => [c.name, c.currentRevisionNumber])).toEqual([
      ['East deck, typical beam', 1],
      ['Entry canopy', 1],
    ]);
  });

  it('serves the built client: immutable hashed assets, the page for client routes, JSON 404 for unknown API routes', async () => {
    const asset = await fetch(`${server.url}/assets/index-a1b2c3.js`);
    expect(asset.status).toBe(200);
    expect(asset.headers.get('cache-control')).toMatch(/immutable/);
    const missingAsset = await fetch(`${server.url}/assets/index-000000.js`);
    expect(missingAsset.status).toBe(404);
    const page = await fetch(`${server.url}/projects/1/cantilevers/2`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('<div id="root">');
    expect(page.headers.get('content-security-policy')).toContain("script-src 'self'");
    const api = await fetch(`${server.url}/api/nothing-here`);
    expect(api.status).toBe(401);
    expect(((await api.json()) as { error: { code: string } }).error.code).toBe('unauthorized');
    const health = await fetch(`${server.url}/api/health`);
    expect(await health.json()).toEqual({ ok: true });
  });

  it('says how to build the client when dist/ is missing, and does not seed a database that has accounts', async () => {
    const again = await startServer({
      port: 0,
      databaseUrl: join(dir, 'db.sqlite'),
      uploadDir: join(dir, 'uploads'),
      dataDir: dir,
      distDir: join(dir, 'no-dist'),
      passwordCost: 1024,
      seedDemo: true,
      smtpUrl: 'smtp://127.0.0.1:9',
    });
    try {
      const res = await fetch(`${again.url}/`);
      expect(res.status).toBe(503);
      expect(await res.text()).toMatch(/npm run build/);
      expect(again.fakeSmtp).toBeNull();
    } finally {
      await again.close();
    }
    const login = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: DEMO_ACCOUNTS[0].email, password: DEMO_PASSWORD }),
    });
    const cookie = login.headers.get('set-cookie')!.split(';')[0];
    const users = (await (
      await fetch(`${server.url}/api/admin/users`, { headers: { cookie } })
    ).json()) as unknown[];
    expect(users).toHaveLength(4);
  });
});
