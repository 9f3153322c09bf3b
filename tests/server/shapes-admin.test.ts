import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseDesign, createTestEnv, PASSWORD, type TestEnv } from '../helpers/api';
import request from 'supertest';

const CUSTOM_CSV = [
  'label,family,W,A,d,bf,tf,tw,Ht,B,tdes,OD,Ix,Zx,Sx,Iy,ry,J',
  'RL14X22,W,22,6.5,14,5,0.335,0.23,,,,,199,32,28.4,7,1.04,0.2',
  'RL-TUBE-7X5,HSS,25,7.1,,,,,7,5,0.35,,48,16.5,13.7,28,1.98,55',
  'RL10X15,W,15,4.4,10,4,0.27,0.23,,,,,69,16,20.5,2.1,0.69,0.1',
  'RL8X10,W,10,2.9,,4,0.2,0.17,,,,,30,8.5,7.5,1.3,0.67,0.05',
  'RLX,BEAM,10,2.9,8,4,0.2,0.17,,,,,30,8.5,7.5,1.3,0.67,0.05',
].join('\n');

const PUBLISHED_LAYOUT_CSV = [
  'Type,EDI_Std_Nomenclature,AISC_Manual_Label,T_F,W,A,d,bf,tf,tw,Ht,B,tdes,OD,Ix,Zx,Sx,Iy,ry,J,Cw',
  'W,RLW9X13,RLW9X13,F,13,3.8,9,4,0.25,0.2,–,–,–,–,52,13,11.6,1.9,0.7,0.08,36',
  'W,W12X26,W12X26,F,26,7.65,12.2,6.49,0.38,0.23,–,–,–,–,204,37.2,33.4,17.3,1.51,0.3,607',
  'L,L4X4X1/2,L4X4X1/2,F,12.8,3.75,–,–,–,–,–,–,–,–,5.52,5.52,1.96,5.52,1.22,0.322,–',
  'HSS,RLHSS5.000X0.250,RLHSS5.000X0.250,F,12.7,3.4,–,–,–,–,–,–,0.233,5,10,5.2,4,10,1.7,20,–',
].join('\n');

describe('shapes', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('searches the built-in table by family, label and depth', async () => {
    const agent = await env.login('fabricator');
    const res = await agent.get('/api/shapes?family=W&q=w12x&minDepth=12&maxDepth=12.5').expect(200);
    expect(res.body.source).toMatch(/Shapes Database/);
    expect(res.body.shapes.length).toBeGreaterThan(2);
    for (const s of res.body.shapes) {
      expect(s.family).toBe('W');
      expect(s.label).toMatch(/^W12X/);
      expect(s.d).toBeGreaterThanOrEqual(12);
      expect(s.d).toBeLessThanOrEqual(12.5);
    }
    expect(res.body.shapes.map((s: { label: string }) => s.label)).toContain('W12X26');
    const bad = await agent.get('/api/shapes?family=Z&minDepth=-1');
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['family', 'minDepth']);
  });

  it('imports a custom CSV, reporting each bad row with its number and reason', async () => {
    const agent = await env.login('engineer');
    const res = await agent
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from(CUSTOM_CSV), 'mine.csv')
      .expect(201);
    expect(res.body.imported).toBe(2);
    expect(res.body.rejected).toEqual([
      {
        row: 4,
        label: 'RL10X15',
        reason: expect.stringMatching(/^Sx = 20.5 does not agree with Ix\/\(d\/2\)/),
      },
      { row: 5, label: 'RL8X10', reason: 'a W shape needs d' },
      { row: 6, label: 'RLX', reason: expect.stringMatching(/^family: must be W, HSS, PIPE or C/) },
    ]);
    const found = await agent.get(`/api/shapes?q=RL&projectId=${env.projectId}`).expect(200);
    expect(found.body.shapes.map((s: { label: string; custom?: boolean }) => [s.label, s.custom])).toEqual([
      ['RL-TUBE-7X5', true],
      ['RL14X22', true],
    ]);
    expect(found.body.source).toMatch(/2 imported shape/);
  });

  it('imports the published layout, keeping the built-in shapes and refusing families it does not design with', async () => {
    const agent = await env.login('architect');
    const res = await agent
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from(PUBLISHED_LAYOUT_CSV), 'published.csv')
      .expect(201);
    expect(res.body.imported).toBe(1);
    expect(res.body.rejected).toEqual([
      { row: 3, label: 'W12X26', reason: expect.stringMatching(/built-in/) },
      { row: 4, label: 'L4X4X1/2', reason: expect.stringMatching(/family/) },
      { row: 5, label: 'RLHSS5.000X0.250', reason: expect.stringMatching(/round HSS/) },
    ]);
  });

  it('uses a project shape in that project only, and refuses an import by an admin into a project or without a file', async () => {
    const agent = await env.login('architect');
    const input = baseDesign();
    input.member.section = { shape: 'RL14X22' };
    const res = await agent.post('/api/check').send({ input, projectId: env.projectId }).expect(200);
    expect(res.body.member.section.label).toMatch(/RL14X22/);
    const elsewhere = await agent.post('/api/check').send({ input });
    expect(elsewhere.status).toBe(400);
    expect(elsewhere.body.error.issues[0].path).toBe('input.member.section.shape');
    const admin = await env.login('admin');
    await admin
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from(CUSTOM_CSV), 'x.csv')
      .expect(403);
    const noProject = await agent.post('/api/shapes/import').attach('file', Buffer.from(CUSTOM_CSV), 'x.csv');
    expect(noProject.status).toBe(403);
    expect(noProject.body.error.issues[0].path).toBe('projectId');
    const none = await agent.post('/api/shapes/import').field('projectId', String(env.projectId));
    expect(none.status).toBe(400);
    expect(none.body.error.issues[0].path).toBe('file');
    const noHeader = await agent
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from('a,b\n1,2\n'), 'x.csv');
    expect(noHeader.status).toBe(400);
    expect(noHeader.body.error.issues[0]).toMatchObject({
      path: 'file',
      message: expect.stringMatching(/header/),
    });
  });
});

describe('admin: accounts', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('lists and creates accounts (admin only), with field errors', async () => {
    const admin = await env.login('admin');
    const list = await admin.get('/api/admin/users').expect(200);
    expect(list.body.length).toBe(6);
    expect(list.body[0]).not.toHaveProperty('password_hash');
    expect(JSON.stringify(list.body)).not.toMatch(/scrypt/);
    const created = await admin
      .post('/api/admin/users')
      .send({
        email: 'New.Person@Example.test',
        displayName: 'New Person',
        role: 'fabricator',
        password: 'long enough password',
      })
      .expect(201);
    expect(created.body).toMatchObject({
      email: 'new.person@example.test',
      role: 'fabricator',
      active: true,
    });
    await request(env.app)
      .post('/api/auth/login')
      .send({ email: 'new.person@example.test', password: 'long enough password' })
      .expect(200);
    const dup = await admin.post('/api/admin/users').send({
      email: 'new.person@example.test',
      displayName: 'Again',
      role: 'fabricator',
      password: 'long enough password',
    });
    expect(dup.status).toBe(409);
    expect(dup.body.error.issues[0].path).toBe('email');
    const short = await admin
      .post('/api/admin/users')
      .send({ email: 'x@example.test', displayName: 'X', role: 'engineer', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.issues[0].path).toBe('password');
    const engineer = await env.login('engineer');
    await engineer.get('/api/admin/users').expect(403);
    await engineer
      .post('/api/admin/users')
      .send({ email: 'y@example.test', displayName: 'Y', role: 'admin', password: 'long enough password' })
      .expect(403);
  });

  it('changes roles with an audit row, disables accounts, and protects the acting admin', async () => {
    const admin = await env.login('admin');
    const res = await admin
      .patch(`/api/admin/users/${env.ids.outsider}`)
      .send({ role: 'architect', displayName: 'Out Sider II' })
      .expect(200);
    expect(res.body).toMatchObject({ role: 'architect', displayName: 'Out Sider II' });
    const audit = await env.db('audit').where({ kind: 'role-change' });
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({
      user_id: env.ids.admin,
      subject: 'outsider@example.test',
      detail: 'engineer -> architect',
    });
    await admin.patch(`/api/admin/users/${env.ids.outsider}`).send({ active: false }).expect(200);
    await request(env.app)
      .post('/api/auth/login')
      .send({ email: 'outsider@example.test', password: PASSWORD })
      .expect(401);
    const self = await admin.patch(`/api/admin/users/${env.ids.admin}`).send({ active: false });
    expect(self.status).toBe(400);
    expect(self.body.error.issues[0].path).toBe('active');
    await admin.patch('/api/admin/users/99999').send({ role: 'engineer' }).expect(404);
    const bad = await admin.patch(`/api/admin/users/${env.ids.outsider}`).send({ role: 'boss' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('role');
  });
});
