import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

describe('projects, membership and the 404 rule', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('lists only the projects the person is a member of', async () => {
    const member = await env.login('fabricator');
    const mine = await member.get('/api/projects').expect(200);
    expect(mine.body.map((p: { id: number }) => p.id)).toEqual([env.projectId]);
    expect(mine.body[0]).toMatchObject({ name: 'Test terrace', cantileverCount: 1, units: 'US' });
    const outsider = await env.login('outsider');
    expect((await outsider.get('/api/projects').expect(200)).body).toEqual([]);
  });

  it('answers 401 to every project route when signed out', async () => {
    for (const path of [
      '/api/projects',
      `/api/projects/${env.projectId}`,
      `/api/cantilevers/${env.cantileverId}`,
      `/api/revisions/${env.revisionId}`,
    ]) {
      const res = await request(env.app).get(path);
      expect(res.status, path).toBe(401);
    }
  });

  it('answers 404 to a non-member for the project, its cantilever, revision and attachments, the same as for missing items', async () => {
    const outsider = await env.login('outsider');
    const paths = [
      `/api/projects/${env.projectId}`,
      `/api/projects/${env.projectId}/cantilevers`,
      `/api/cantilevers/${env.cantileverId}`,
      `/api/cantilevers/${env.cantileverId}/revisions`,
      `/api/cantilevers/${env.cantileverId}/attachments`,
      `/api/revisions/${env.revisionId}`,
      `/api/revisions/${env.revisionId}/comments`,
    ];
    for (const path of paths) {
      const res = await outsider.get(path);
      expect(res.status, path).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    const missing = await outsider.get('/api/projects/99999');
    expect(missing.status).toBe(404);
    const save = await outsider
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 1, message: 'sneaky', input: baseDesign() });
    expect(save.status).toBe(404);
    await outsider.post(`/api/revisions/${env.revisionId}/comments`).send({ body: 'hello' }).expect(404);
  });

  it('shows a member the project with its team and cantilevers', async () => {
    const agent = await env.login('architect');
    const res = await agent.get(`/api/projects/${env.projectId}`).expect(200);
    expect(res.body.members.map((m: { role: string }) => m.role).sort()).toEqual([
      'admin',
      'architect',
      'engineer',
      'engineer',
      'fabricator',
    ]);
    expect(res.body.cantilevers).toEqual([
      expect.objectContaining({
        id: env.cantileverId,
        currentRevisionId: env.revisionId,
        currentRevisionNumber: 1,
        reviewState: 'draft',
      }),
    ]);
  });

  it('lets admins, architects and engineers create projects (creator becomes a member); not fabricators', async () => {
    const architect = await env.login('architect');
    const created = await architect
      .post('/api/projects')
      .send({ name: 'Pier house', site: 'Quay 3' })
      .expect(201);
    expect(created.body).toMatchObject({
      name: 'Pier house',
      site: 'Quay 3',
      units: 'US',
      codeBasis: expect.stringContaining('AISC 360-16'),
    });
    expect(created.body.members.map((m: { userId: number }) => m.userId)).toEqual([env.ids.architect]);
    const fabricator = await env.login('fabricator');
    const refused = await fabricator.post('/api/projects').send({ name: 'Nope' });
    expect(refused.status).toBe(403);
    const invalid = await architect.post('/api/projects').send({ name: '' });
    expect(invalid.status).toBe(400);
    expect(invalid.body.error.issues[0].path).toBe('name');
  });

  it('creates a cantilever with a first design as revision 1, computed by the server', async () => {
    const engineer = await env.login('engineer');
    const res = await engineer
      .post(`/api/projects/${env.projectId}/cantilevers`)
      .send({ name: 'West deck', description: 'typical', input: baseDesign() })
      .expect(201);
    expect(res.body).toMatchObject({ name: 'West deck', currentRevisionNumber: 1, reviewState: 'draft' });
    const revision = await engineer.get(`/api/revisions/${res.body.currentRevisionId}`).expect(200);
    expect(revision.body.message).toBe('First design');
    expect(revision.body.result.checks.length).toBeGreaterThan(3);
    expect(revision.body.result.caution).toMatch(/licensed engineer/);
    const admin = await env.login('admin');
    await admin.post(`/api/projects/${env.projectId}/cantilevers`).send({ name: 'Admin beam' }).expect(403);
    const bad = await engineer
      .post(`/api/projects/${env.projectId}/cantilevers`)
      .send({ name: 'X', input: { ...baseDesign(), member: { ...baseDesign().member, length: '-3 ft' } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('input.member.length');
  });

  it('lets only an admin add and remove members', async () => {
    const architect = await env.login('architect');
    await architect
      .post(`/api/projects/${env.projectId}/members`)
      .send({ userId: env.ids.outsider })
      .expect(403);
    const admin = await env.login('admin');
    const added = await admin
      .post(`/api/projects/${env.projectId}/members`)
      .send({ userId: env.ids.outsider })
      .expect(201);
    expect(added.body.members.map((m: { userId: number }) => m.userId)).toContain(env.ids.outsider);
    const outsider = await env.login('outsider');
    await outsider.get(`/api/projects/${env.projectId}`).expect(200);
    await admin.delete(`/api/projects/${env.projectId}/members/${env.ids.outsider}`).expect(200);
    await outsider.get(`/api/projects/${env.projectId}`).expect(404);
    const bad = await admin.post(`/api/projects/${env.projectId}/members`).send({ userId: 'x' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('userId');
    const badParam = await admin.get('/api/projects/abc');
    expect(badParam.status).toBe(400);
    expect(badParam.body.error.issues[0].path).toBe('projectId');
  });
});
