import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

describe('saving revisions', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  const url = () => `/api/cantilevers/${env.cantileverId}/revisions`;
  const latestNumber = async () =>
    Number(
      (
        (await env.db('revisions').where({ cantilever_id: env.cantileverId }).max({ n: 'number' })) as {
          n: number;
        }[]
      )[0].n,
    );

  it('numbers revisions per cantilever and records the base, the author and the engine result', async () => {
    const architect = await env.login('architect');
    const input = baseDesign();
    input.member.length = '7.5 ft';
    const res = await architect
      .post(url())
      .send({ baseRevision: 1, message: 'Shorter reach', input })
      .expect(201);
    expect(res.body).toMatchObject({
      number: 2,
      baseRevisionNumber: 1,
      authorId: env.ids.architect,
      message: 'Shorter reach',
      reviewState: 'draft',
    });
    expect(res.body.input.member.length).toBe('7.5 ft');
    expect(res.body.result.engineVersion).toBe(res.body.engineVersion);
    expect(res.body.ok).toBe(res.body.result.ok);
    const ids = res.body.result.checks.map((c: { id: string }) => c.id);
    expect(ids).toEqual(expect.arrayContaining(['member.flexure', 'member.shear', 'member.deflection.live']));
    const list = await architect.get(url()).expect(200);
    expect(list.body.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    const cantilever = await architect.get(`/api/cantilevers/${env.cantileverId}`).expect(200);
    expect(cantilever.body).toMatchObject({ currentRevisionId: res.body.id, currentRevisionNumber: 2 });
  });

  it('answers 409 with the latest revision when the base is stale, and stores nothing', async () => {
    const engineer = await env.login('engineer');
    const before = await env.db('revisions').where({ cantilever_id: env.cantileverId }).count({ n: '*' });
    const res = await engineer
      .post(url())
      .send({ baseRevision: 1, message: 'From an old copy', input: baseDesign() });
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({
      code: 'stale_base',
      message: expect.stringContaining('Revision 2'),
      issues: [],
    });
    expect(res.body.latest).toMatchObject({ number: 2, message: 'Shorter reach' });
    expect(res.body.latest.input.member.length).toBe('7.5 ft');
    const after = await env.db('revisions').where({ cantilever_id: env.cantileverId }).count({ n: '*' });
    expect(after).toEqual(before);
    const nullBase = await engineer
      .post(url())
      .send({ baseRevision: null, message: 'Start over', input: baseDesign() });
    expect(nullBase.status).toBe(409);
  });

  it('lets exactly one of two simultaneous saves from the same base win', async () => {
    const [architect, engineer] = [await env.login('architect'), await env.login('engineer')];
    const latest = (await architect.get(url())).body[0].number as number;
    const a = baseDesign();
    a.member.length = '7.25 ft';
    const b = baseDesign();
    b.member.length = '7.75 ft';
    const [ra, rb] = await Promise.all([
      architect.post(url()).send({ baseRevision: latest, message: 'A', input: a }),
      engineer.post(url()).send({ baseRevision: latest, message: 'B', input: b }),
    ]);
    expect([ra.status, rb.status].sort()).toEqual([201, 409]);
    const winner = ra.status === 201 ? ra : rb;
    const loser = ra.status === 201 ? rb : ra;
    expect(winner.body.number).toBe(latest + 1);
    expect(loser.body.latest.number).toBe(latest + 1);
    // Put the cantilever back on the shared fixture's design for the tests below.
    await architect
      .post(url())
      .send({
        baseRevision: latest + 1,
        message: 'Back to 7.5 ft',
        input: { ...baseDesign(), member: { ...baseDesign().member, length: '7.5 ft' } },
      })
      .expect(201);
  });

  it('answers 400 naming the field for an invalid document', async () => {
    const engineer = await env.login('engineer');
    const input = { ...baseDesign(), member: { ...baseDesign().member, length: '-3 ft' } };
    const res = await engineer
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'bad', input });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.issues).toContainEqual({
      path: 'input.member.length',
      message: expect.stringContaining('-3 ft'),
    });
    const noMessage = await engineer
      .post(url())
      .send({ baseRevision: await latestNumber(), message: ' ', input: baseDesign() });
    expect(noMessage.body.error.issues[0].path).toBe('message');
  });

  it("answers 400 with the engine's field for a shape that does not exist", async () => {
    const engineer = await env.login('engineer');
    const input = baseDesign();
    input.member.section = { shape: 'W99X999' };
    const res = await engineer
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'unknown shape', input });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('input.member.section.shape');
  });

  it('refuses a design save by an admin (403)', async () => {
    const admin = await env.login('admin');
    const res = await admin
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'admin edit', input: baseDesign() });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/admin/);
  });

  it('refuses an architect changing the connection, naming the fields', async () => {
    const architect = await env.login('architect');
    const input = (await architect.get(url())).body[0];
    const latest = (await architect.get(`/api/revisions/${input.id}`)).body.input;
    latest.connection.plate.thickness = '2 in';
    const res = await architect
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'thicker plate', input: latest });
    expect(res.status).toBe(403);
    expect(res.body.error.issues).toEqual([
      { path: 'input.connection.plate.thickness', message: expect.stringContaining('connection') },
    ]);
  });

  it('refuses a fabricator changing the member, but lets them change the connection', async () => {
    const fabricator = await env.login('fabricator');
    const latest = (await fabricator.get(`/api/revisions/${(await fabricator.get(url())).body[0].id}`)).body
      .input;
    const member = structuredClone(latest);
    member.member.section.shape = 'W12X30';
    const refused = await fabricator
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'heavier beam', input: member });
    expect(refused.status).toBe(403);
    expect(refused.body.error.issues[0].path).toBe('input.member.section.shape');
    const plate = structuredClone(latest);
    plate.connection.plate.thickness = '2 in';
    const saved = await fabricator
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'Plate to 2 in', input: plate });
    expect(saved.status).toBe(201);
    expect(saved.body.number).toBe(5);
    expect(saved.body.input.connection.plate.thickness).toBe('2 in');
  });

  it('lets anyone with a design role switch the display units', async () => {
    const fabricator = await env.login('fabricator');
    const latest = (await fabricator.get(`/api/revisions/${(await fabricator.get(url())).body[0].id}`)).body
      .input;
    const res = await fabricator
      .post(url())
      .send({ baseRevision: await latestNumber(), message: 'Show SI', input: { ...latest, units: 'SI' } });
    expect(res.status).toBe(201);
    expect(res.body.result.units).toBe('SI');
  });

  it('POST /api/check returns the engine result without storing anything, and 400 for a bad document', async () => {
    const architect = await env.login('architect');
    const before = await env.db('revisions').count({ n: '*' });
    const res = await architect.post('/api/check').send({ input: baseDesign() }).expect(200);
    expect(res.body.checks.find((c: { id: string }) => c.id === 'member.flexure')).toMatchObject({
      reference: expect.stringMatching(/AISC 360/),
      ratio: expect.any(Number),
    });
    expect(res.body.caution).toMatch(/design aid/);
    // As the CLI without --stations: the station arrays only when asked for.
    expect(res.body.stations).toBeUndefined();
    const withStations = await architect
      .post('/api/check')
      .send({ input: baseDesign(), stations: true })
      .expect(200);
    expect(withStations.body.stations.x[0]).toBe(0);
    expect(withStations.body.stations.x.length).toBeGreaterThan(10);
    expect(withStations.body.checks).toEqual(res.body.checks);
    expect(await env.db('revisions').count({ n: '*' })).toEqual(before);
    const unknown = await architect
      .post('/api/check')
      .send({ input: { ...baseDesign(), member: { ...baseDesign().member, section: { shape: 'W1X1' } } } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.issues[0].path).toBe('input.member.section.shape');
    const missing = await architect.post('/api/check').send({});
    expect(missing.status).toBe(400);
    expect(missing.body.error.issues[0].path).toBe('input');
  });

  it('exports the plate schedule as CSV for a revision and for the project, to members only', async () => {
    const fabricator = await env.login('fabricator');
    const one = await fabricator.get(`/api/revisions/${env.revisionId}/plate-schedule.csv`).expect(200);
    expect(one.headers['content-type']).toMatch(/^text\/csv/);
    expect(one.headers['content-disposition']).toMatch(
      /^attachment; filename="?plate-schedule-test-beam-rev1\.csv"?$/,
    );
    const lines = one.text.trimEnd().split('\r\n');
    // header, the row, the note that it is not approved, the caution
    expect(lines).toHaveLength(4);
    expect(lines[0]).toMatch(/^Revision,State,Approved by,Approved on,Quantity,Mark,Arrangement,/);
    expect(lines[1]).toMatch(
      /^1,"DRAFT, NOT APPROVED: not for construction",,,1,"Test beam \(rev 1, NOT APPROVED\)",post-base,24 x 16 x 1-1\/2,/,
    );
    expect(lines[3]).toMatch(/^"Caution: Reachline is a design aid/);
    // Nothing is approved yet: the project schedule lists no row unless drafts are asked for.
    const project = await fabricator.get(`/api/projects/${env.projectId}/plate-schedule.csv`).expect(200);
    const projectLines = project.text.trimEnd().split('\r\n');
    expect(projectLines[1]).toMatch(/^Approved revisions only/);
    expect(projectLines[2]).toMatch(/^Not listed \(no approved revision with a plate\): Test beam$/);
    const drafts = await fabricator
      .get(`/api/projects/${env.projectId}/plate-schedule.csv?include=drafts`)
      .expect(200);
    const draftLines = drafts.text.trimEnd().split('\r\n');
    expect(draftLines[1]).toMatch(
      /^6,"DRAFT, NOT APPROVED: not for construction",,,1,"Test beam \(rev 6, NOT APPROVED\)",post-base,24 x 16 x 2,/,
    );
    const outsider = await env.login('outsider');
    await outsider.get(`/api/revisions/${env.revisionId}/plate-schedule.csv`).expect(404);
    await outsider.get(`/api/projects/${env.projectId}/plate-schedule.csv`).expect(404);
    const architect = await env.login('architect');
    const input = baseDesign();
    delete input.connection;
    const other = await architect
      .post(`/api/projects/${env.projectId}/cantilevers`)
      .send({ name: 'Bare beam', input })
      .expect(201);
    const none = await architect.get(`/api/revisions/${other.body.currentRevisionId}/plate-schedule.csv`);
    expect(none.status).toBe(409);
    expect(none.body.error.code).toBe('no_connection');
  });
});
