/**
 * New accounts: an admin's new account gets one welcome e-mail through the outbox (the sign-in
 * address and the e-mail, never the password) and must choose its own password at the first
 * sign-in; until then the API answers 403 `password_change_required` to everything but reading who
 * is signed in, changing the password and signing out.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestEnv, type TestEnv } from '../helpers/api';

const FIRST = 'granite ladder under 9 gulls';
const OWN = 'copper kettle on the north pier';
const NEW = {
  email: 'New.Welder@Example.test',
  displayName: 'Nia Welder',
  role: 'fabricator',
  password: FIRST,
};

describe('a new account', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv({ config: { appOrigin: 'http://decks.example.test' } });
  });
  afterAll(async () => env.close());

  const welcomes = async (address: string) =>
    (await env.db('outbox').where({ subject: 'Your Reachline account' })).filter((m) =>
      (JSON.parse(m.to_json) as string[]).includes(address),
    );

  it('is created with the first-password flag and gets one welcome e-mail without the password', async () => {
    const admin = await env.login('admin');
    const kicks = env.kicks;
    const created = await admin.post('/api/admin/users').send(NEW).expect(201);
    expect(created.body).toMatchObject({ email: 'new.welder@example.test', mustChangePassword: true });
    const mails = await welcomes('new.welder@example.test');
    expect(mails).toHaveLength(1);
    expect(mails[0].status).toBe('pending');
    expect(mails[0].text).toContain('Hello Nia Welder,');
    expect(mails[0].text).toContain('Test Admin made a Reachline account for you, as a fabricator');
    expect(mails[0].text).toContain(
      'Sign in at http://decks.example.test/sign-in with the e-mail address new.welder@example.test.',
    );
    expect(mails[0].text).toContain('choose a new password');
    expect(mails[0].text).not.toContain(FIRST);
    expect(env.kicks).toBe(kicks + 1);
    expect(await env.db('audit').where({ kind: 'account-created', subject: NEW.email })).toHaveLength(1);
  });

  it('queues no second welcome for a refused duplicate, a reset or an edit; none for a refused weak password', async () => {
    const admin = await env.login('admin');
    const dup = await admin.post('/api/admin/users').send({ ...NEW, displayName: 'Again' });
    expect(dup.status).toBe(409);
    const weak = await admin
      .post('/api/admin/users')
      .send({ ...NEW, email: 'weak@example.test', password: 'aaaaaaaaaa' });
    expect(weak.status).toBe(400);
    const id = (await env.db('users').where({ email: 'new.welder@example.test' }).first()).id as number;
    await admin.patch(`/api/admin/users/${id}`).send({ displayName: 'Nia R. Welder' }).expect(200);
    expect(await welcomes('new.welder@example.test')).toHaveLength(1);
    expect(await welcomes('weak@example.test')).toHaveLength(0);
    expect(await env.db('users').where({ email: 'weak@example.test' })).toHaveLength(0);
  });

  it('must change the first password before anything else; the change clears the flag', async () => {
    const agent = request.agent(env.app);
    const login = await agent.post('/api/auth/login').send({ email: NEW.email, password: FIRST }).expect(200);
    expect(login.body.mustChangePassword).toBe(true);
    for (const [method, path] of [
      ['get', '/api/projects'],
      ['get', '/api/shapes?family=W'],
      ['patch', '/api/auth/me'],
      ['get', '/api/reviews/awaiting'],
    ] as const) {
      const res = await agent[method](path).send(method === 'patch' ? { units: 'SI' } : undefined);
      expect(res.status, path).toBe(403);
      expect(res.body.error.code, path).toBe('password_change_required');
      expect(res.body.error.message, path).toMatch(/set by an admin/);
    }
    expect((await agent.get('/api/auth/me').expect(200)).body.mustChangePassword).toBe(true);
    // Sign-out works while the flag is set.
    const other = request.agent(env.app);
    await other.post('/api/auth/login').send({ email: NEW.email, password: FIRST }).expect(200);
    await other.post('/api/auth/logout').expect(204);
    await other.get('/api/auth/me').expect(401);

    const same = await agent.post('/api/auth/password').send({ currentPassword: FIRST, newPassword: FIRST });
    expect(same.status).toBe(400);
    const changed = await agent
      .post('/api/auth/password')
      .send({ currentPassword: FIRST, newPassword: OWN })
      .expect(200);
    expect(changed.body.mustChangePassword).toBe(false);
    await agent.get('/api/projects').expect(200);
    const row = await env.db('users').where({ email: 'new.welder@example.test' }).first();
    expect(Boolean(row.must_change_password)).toBe(false);
    // Signing in again later: no flag, no gate.
    const later = request.agent(env.app);
    const again = await later.post('/api/auth/login').send({ email: NEW.email, password: OWN }).expect(200);
    expect(again.body.mustChangePassword).toBe(false);
    await later.get('/api/projects').expect(200);
  });

  it('is asked again after an admin resets the password, without a second welcome', async () => {
    const admin = await env.login('admin');
    const id = (await env.db('users').where({ email: 'new.welder@example.test' }).first()).id as number;
    const reset = await admin
      .patch(`/api/admin/users/${id}`)
      .send({ password: 'harbor crane at dawn 4' })
      .expect(200);
    expect(reset.body.mustChangePassword).toBe(true);
    const agent = request.agent(env.app);
    await agent
      .post('/api/auth/login')
      .send({ email: NEW.email, password: 'harbor crane at dawn 4' })
      .expect(200);
    expect((await agent.get('/api/projects')).body.error.code).toBe('password_change_required');
    expect(await welcomes('new.welder@example.test')).toHaveLength(1);
  });
});
