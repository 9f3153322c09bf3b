/**
 * The shapes attack from the hardening review: a fabricator outside a project
 * re-imports the label a design in that project uses, with ten times the stiffness. The
 * project's stored results and its next save (a connection-only change) must not move.
 * Shape values are invented for the test; only their internal consistency (Sx = Ix/(d/2)) matters.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertUser } from '../../server/features/users/users.repository';
import { hashPassword } from '../../server/lib/password';
import { baseDesign, createTestEnv, PASSWORD, type TestEnv } from '../helpers/api';

const HEADER = 'label,family,W,A,d,bf,tf,tw,Ix,Zx,Sx,Iy,ry,J';
const GENUINE = `${HEADER}\nRLX14,W,22,6.5,14,5,0.335,0.23,199,32,28.4,7,1.04,0.2\n`;
/** The same label with Ix, Sx and Zx ten times larger. */
const STIFF = `${HEADER}\nRLX14,W,22,6.5,14,5,0.335,0.23,1990,320,284,7,1.04,0.2\n`;

interface Check {
  id: string;
  ratio: number | null;
}
interface Revision {
  id: number;
  number: number;
  result: { checks: Check[]; member: { section: unknown; cases: unknown } };
}

function ratio(rev: Revision, id: string): number | null {
  return rev.result.checks.find((c) => c.id === id)?.ratio ?? null;
}

describe('imported shapes belong to their project', () => {
  let env: TestEnv;
  let stranger: Awaited<ReturnType<TestEnv['login']>>;
  let rev2: Revision;
  beforeAll(async () => {
    env = await createTestEnv();
    await insertUser(env.db, {
      email: 'stranger@example.test',
      displayName: 'Stranger Fabricator',
      role: 'fabricator',
      passwordHash: await hashPassword(PASSWORD, env.config.passwordCost),
    });
    stranger = request.agent(env.app);
    await stranger
      .post('/api/auth/login')
      .send({ email: 'stranger@example.test', password: PASSWORD })
      .expect(200);
    // The project imports its shape and saves revision 2 with it.
    const engineer = await env.login('engineer');
    await engineer
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from(GENUINE), 'ours.csv')
      .expect(201);
    const input = baseDesign();
    input.member.section = { shape: 'RLX14' };
    const saved = await engineer
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 1, message: 'Our own section', input })
      .expect(201);
    rev2 = saved.body as Revision;
  });
  afterAll(async () => env.close());

  it('stores the section properties a revision was computed with', async () => {
    const row = await env.db('revisions').where({ id: rev2.id }).first();
    const sections = JSON.parse(row.sections_json) as { label: string; Ix: number; custom?: boolean }[];
    expect(sections).toEqual([expect.objectContaining({ label: 'RLX14', Ix: 199, custom: true })]);
    expect(ratio(rev2, 'member.flexure')).toBeGreaterThan(0);
  });

  it('refuses the outsider: no organisation import, no import into a project they are not in', async () => {
    const org = await stranger.post('/api/shapes/import').attach('file', Buffer.from(STIFF), 'x.csv');
    expect(org.status).toBe(403);
    expect(org.body.error.issues[0].path).toBe('projectId');
    const into = await stranger
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from(STIFF), 'x.csv');
    expect(into.status).toBe(404);
    const seen = await stranger.get(`/api/shapes?projectId=${env.projectId}`);
    expect(seen.status).toBe(404);
    const listed = await stranger.get('/api/shapes?q=RLX14').expect(200);
    expect(listed.body.shapes).toEqual([]);
  });

  it('refuses a member re-importing a label in use, asking for a new name', async () => {
    const fabricator = await env.login('fabricator');
    const res = await fabricator
      .post('/api/shapes/import')
      .field('projectId', String(env.projectId))
      .attach('file', Buffer.from(STIFF), 'x.csv');
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('label_taken');
    expect(res.body.error.message).toMatch(/new name/);
    expect(res.body.error.issues).toEqual([
      { path: 'file', message: expect.stringMatching(/^row 2: RLX14 is already used in this project/) },
    ]);
    const count = await env.db('shapes').where({ label: 'RLX14' }).count({ n: '*' });
    expect(Number(count[0].n)).toBe(1);
  });

  it("keeps the other project's next save and stored results after another project's and the organisation's import of the label", async () => {
    // The outsider's own project (an engineer may create one) with the stiff shape of the same label.
    const outsider = await env.login('outsider');
    const own = await outsider.post('/api/projects').send({ name: 'Elsewhere' }).expect(201);
    await outsider
      .post('/api/shapes/import')
      .field('projectId', String(own.body.id))
      .attach('file', Buffer.from(STIFF), 'x.csv')
      .expect(201);
    // An admin's organisation shape of the same label does not reach a project that has its own.
    const admin = await env.login('admin');
    await admin.post('/api/shapes/import').attach('file', Buffer.from(STIFF), 'org.csv').expect(201);

    const stored = await env.db('revisions').where({ id: rev2.id }).first();
    const fabricator = await env.login('fabricator');
    const input = baseDesign();
    input.member.section = { shape: 'RLX14' };
    input.connection!.plate.thickness = '1.75 in';
    const next = await fabricator
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 2, message: 'Thicker plate', input })
      .expect(201);
    const rev3 = next.body as Revision;
    // The member is computed with the project's own section: its properties, strength and its own
    // bending (rigid root) are unchanged. The thicker plate stiffens the flexible root a little, so the
    // service deflection moves by a few per cent, never the tenfold of the stiff shape.
    expect(rev3.result.member.section).toEqual(rev2.result.member.section);
    expect(rev3.result.member.cases).toEqual(rev2.result.member.cases);
    expect(ratio(rev3, 'member.flexure')).toBe(ratio(rev2, 'member.flexure'));
    const live3 = ratio(rev3, 'member.deflection.live')!;
    const live2 = ratio(rev2, 'member.deflection.live')!;
    expect(Math.abs(live3 / live2 - 1)).toBeLessThan(0.05);
    const again = await fabricator.get(`/api/revisions/${rev2.id}`).expect(200);
    expect(again.body.result).toEqual(rev2.result);
    expect((await env.db('revisions').where({ id: rev2.id }).first()).result_json).toBe(stored.result_json);
  });

  it('computes the next save with the sections stored in its base, even if a table row were changed', async () => {
    // Simulates a shape row altered behind the application's back (no route can do this).
    const row = await env.db('shapes').where({ label: 'RLX14', project_id: env.projectId }).first();
    const props = JSON.parse(row.props_json);
    await env
      .db('shapes')
      .where({ id: row.id })
      .update({ props_json: JSON.stringify({ ...props, Ix: 1990, Sx: 284, Zx: 320 }) });
    const engineer = await env.login('engineer');
    const latest = await engineer.get(`/api/cantilevers/${env.cantileverId}/revisions`).expect(200);
    const input = baseDesign();
    input.member.section = { shape: 'RLX14' };
    const next = await engineer
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: latest.body[0].number, message: 'Plate back', input })
      .expect(201);
    expect(ratio(next.body as Revision, 'member.flexure')).toBe(ratio(rev2, 'member.flexure'));
  });
});
