import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestEnv, PASSWORD, TEAM, type TestEnv } from '../helpers/api';

describe('sign-in', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('signs in with the right password, sets a safe session cookie and records an audit row', async () => {
    const res = await request(env.app)
      .post('/api/auth/login')
      .send({ email: TEAM.architect.email, password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      id: env.ids.architect,
      email: TEAM.architect.email,
      displayName: TEAM.architect.displayName,
      role: 'architect',
      units: 'US',
      active: true,
      mustChangePassword: false,
    });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/reachline\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const audit = await env.db('audit').where({ kind: 'sign-in', user_id: env.ids.architect });
    expect(audit).toHaveLength(1);
    expect(audit[0].subject).toBe(TEAM.architect.email);
  });

  it('answers 401 to a wrong password and records the failed attempt', async () => {
    const res = await request(env.app)
      .post('/api/auth/login')
      .send({ email: TEAM.engineer.email, password: 'not the password' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('sign_in_failed');
    expect(res.headers['set-cookie']).toBeUndefined();
    const failed = await env.db('audit').where({ kind: 'sign-in-failed', subject: TEAM.engineer.email });
    expect(failed).toHaveLength(1);
  });

  it('answers 401 to an unknown e-mail with the same message', async () => {
    const res = await request(env.app)
      .post('/api/auth/login')
      .send({ email: 'nobody@example.test', password: PASSWORD });
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe('The e-mail or the password is not right.');
  });

  it('answers 400 naming the field for a malformed request', async () => {
    const res = await request(env.app).post('/api/auth/login').send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'password']);
  });

  it('refuses a disabled account with the answer a wrong password gets (the password is not confirmed)', async () => {
    await env.db('users').where({ id: env.ids.engineer2 }).update({ active: false });
    const res = await request(env.app)
      .post('/api/auth/login')
      .send({ email: TEAM.engineer2.email, password: PASSWORD });
    const wrong = await request(env.app)
      .post('/api/auth/login')
      .send({ email: TEAM.engineer2.email, password: 'not the password' });
    expect(res.status).toBe(401);
    expect(res.body).toEqual(wrong.body);
    expect(res.body.error.message).toBe('The e-mail or the password is not right.');
    await env.db('users').where({ id: env.ids.engineer2 }).update({ active: true });
  });

  it('ends the session of an account disabled while signed in', async () => {
    const agent = await env.login('fabricator');
    await agent.get('/api/auth/me').expect(200);
    await env.db('users').where({ id: env.ids.fabricator }).update({ active: false });
    await agent.get('/api/auth/me').expect(401);
    await env.db('users').where({ id: env.ids.fabricator }).update({ active: true });
  });

  it('gives a new session id at sign-in (no session fixation)', async () => {
    const agent = await env.login('architect');
    const first = await agent
      .post('/api/auth/login')
      .send({ email: TEAM.architect.email, password: PASSWORD });
    const second = await agent
      .post('/api/auth/login')
      .send({ email: TEAM.architect.email, password: PASSWORD });
    const sid = (r: request.Response) => /reachline\.sid=([^;]+)/.exec(String(r.headers['set-cookie']))?.[1];
    expect(sid(first)).toBeTruthy();
    expect(sid(first)).not.toBe(sid(second));
  });

  it('GET /api/auth/me answers 401 when signed out and the user when signed in; logout ends the session', async () => {
    const anonymous = await request(env.app).get('/api/auth/me');
    expect(anonymous.status).toBe(401);
    expect(anonymous.body).toEqual({
      error: { code: 'unauthorized', message: 'Sign in first.', issues: [] },
    });
    const agent = await env.login('engineer');
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.email).toBe(TEAM.engineer.email);
    await agent.post('/api/auth/logout').expect(204);
    await agent.get('/api/auth/me').expect(401);
    await agent.get('/api/projects').expect(401);
  });

  it('PATCH /api/auth/me stores the units preference', async () => {
    const agent = await env.login('architect');
    const res = await agent.patch('/api/auth/me').send({ units: 'SI' }).expect(200);
    expect(res.body.units).toBe('SI');
    const row = await env.db('users').where({ id: env.ids.architect }).first();
    expect(row.units).toBe('SI');
    expect((await agent.get('/api/auth/me')).body.units).toBe('SI');
    const bad = await agent.patch('/api/auth/me').send({ units: 'imperial' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('units');
  });

  it('refuses a state-changing request sent from a page of another site', async () => {
    const res = await request(env.app)
      .post('/api/auth/login')
      .set('Origin', 'https://elsewhere.example')
      .send({ email: TEAM.architect.email, password: PASSWORD });
    expect(res.status).toBe(403);
    const host = await request(env.app).get('/api/health');
    expect(host.status).toBe(200);
  });

  it('sends security headers and no stack traces', async () => {
    const res = await request(env.app)
      .post('/api/auth/login')
      .set('content-type', 'application/json')
      .send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_json');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("worker-src 'self' blob:");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('sign-in rate limit', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv({ config: { loginRateLimit: 3 } });
  });
  afterAll(async () => env.close());

  it('answers 429 after the configured number of failures for one account, even to the right password', async () => {
    for (let i = 0; i < 3; i += 1) {
      await request(env.app)
        .post('/api/auth/login')
        .send({ email: TEAM.engineer.email, password: 'wrong' })
        .expect(401);
    }
    const limited = await request(env.app)
      .post('/api/auth/login')
      .send({ email: TEAM.engineer.email, password: PASSWORD });
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('too_many_attempts');
    // Another account from the same address is counted separately (the address limit is 3 x 3).
    await request(env.app)
      .post('/api/auth/login')
      .send({ email: TEAM.architect.email, password: PASSWORD })
      .expect(200);
  });
});

describe('the sign-in limiter counts failures only', () => {
  let env: TestEnv;
  beforeAll(async () => {
    // The production defaults: 10 failures per account, 30 per address, in the window.
    env = await createTestEnv({ config: { loginRateLimit: 10, loginRateWindowMs: 15 * 60_000 } });
  });
  afterAll(async () => env.close());

  it('lets 15 correct sign-ins in a row through and writes nothing to the failure table', async () => {
    for (let i = 0; i < 15; i += 1) {
      const res = await request(env.app)
        .post('/api/auth/login')
        .send({ email: TEAM.architect.email, password: PASSWORD });
      expect(res.status, `sign-in ${i + 1}`).toBe(200);
    }
    expect(await env.db('sign_in_failures')).toEqual([]);
    expect(await env.db('audit').where({ kind: 'sign-in', user_id: env.ids.architect })).toHaveLength(15);
  });

  it('limits failures per address across accounts, and correct sign-ins before them did not count', async () => {
    const limited = await createTestEnv({ config: { loginRateLimit: 10, loginAddressRateLimit: 4 } });
    try {
      for (let i = 0; i < 15; i += 1)
        await request(limited.app)
          .post('/api/auth/login')
          .send({ email: TEAM.engineer.email, password: PASSWORD })
          .expect(200);
      for (const person of ['architect', 'fabricator', 'engineer2', 'outsider'] as const)
        await request(limited.app)
          .post('/api/auth/login')
          .send({ email: TEAM[person].email, password: 'wrong' })
          .expect(401);
      const res = await request(limited.app)
        .post('/api/auth/login')
        .send({ email: TEAM.engineer.email, password: PASSWORD });
      expect(res.status).toBe(429);
      expect(res.body.error.code).toBe('too_many_attempts');
    } finally {
      await limited.close();
    }
  });
});
