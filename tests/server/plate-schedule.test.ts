import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

/** The CSV's lines without the final empty one. */
const linesOf = (text: string) => text.trimEnd().split('\r\n');

describe('only approved designs reach the shop: the plate schedule', () => {
  let env: TestEnv;
  let approvedId: number;
  beforeAll(async () => {
    env = await createTestEnv();
    // Revision 1 is approved; revision 2, a bigger plate, is a draft saved after it.
    const architect = await env.login('architect');
    await architect.post(`/api/revisions/${env.revisionId}/submit`).expect(200);
    const engineer = await env.login('engineer');
    await engineer.post(`/api/revisions/${env.revisionId}/reviews`).send({ decision: 'approve' }).expect(201);
    approvedId = env.revisionId;
    const fabricator = await env.login('fabricator');
    const input = baseDesign();
    input.connection!.plate.N = '28 in';
    await fabricator
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 1, message: 'Longer plate', input })
      .expect(201);
  });
  afterAll(async () => env.close());

  it('lists the latest approved revision by default, with revision, state, approver, date, quantity and the caution', async () => {
    const fabricator = await env.login('fabricator');
    for (const url of [
      `/api/projects/${env.projectId}/plate-schedule.csv`,
      `/api/cantilevers/${env.cantileverId}/plate-schedule.csv`,
    ]) {
      const res = await fabricator.get(url).expect(200);
      const lines = linesOf(res.text);
      expect(lines[0]).toMatch(/^Revision,State,Approved by,Approved on,Quantity,Mark,/);
      const rows = lines.filter((l) => /^\d+,/.test(l));
      expect(rows).toHaveLength(1);
      const today = new Date().toISOString().slice(0, 10);
      expect(rows[0]).toMatch(
        new RegExp(`^1,approved,Test Engineer,${today},1,Test beam \\(rev 1\\),post-base,24 x 16 x 1-1/2,`),
      );
      expect(res.text).not.toMatch(/28 x 16/);
      expect(lines.at(-1)).toMatch(/^"Caution: Reachline is a design aid\./);
    }
  });

  it('adds the newer draft only with ?include=drafts, marked in its row', async () => {
    const fabricator = await env.login('fabricator');
    const res = await fabricator
      .get(`/api/projects/${env.projectId}/plate-schedule.csv?include=drafts`)
      .expect(200);
    expect(res.headers['content-disposition']).toMatch(/with-drafts\.csv/);
    const rows = linesOf(res.text).filter((l) => /^\d+,/.test(l));
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatch(/^1,approved,/);
    expect(rows[1]).toMatch(
      /^2,"DRAFT, NOT APPROVED: not for construction",,,1,"Test beam \(rev 2, NOT APPROVED\)",post-base,28 x 16 x 1-1\/2,/,
    );
    const bad = await fabricator.get(`/api/projects/${env.projectId}/plate-schedule.csv?include=everything`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('include');
  });

  it('carries the cantilever quantity, which design roles set and others may not', async () => {
    const architect = await env.login('architect');
    const changed = await architect
      .patch(`/api/cantilevers/${env.cantileverId}`)
      .send({ quantity: 6 })
      .expect(200);
    expect(changed.body.quantity).toBe(6);
    const bad = await architect.patch(`/api/cantilevers/${env.cantileverId}`).send({ quantity: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('quantity');
    const admin = await env.login('admin');
    await admin.patch(`/api/cantilevers/${env.cantileverId}`).send({ quantity: 2 }).expect(403);
    const fabricator = await env.login('fabricator');
    const res = await fabricator.get(`/api/cantilevers/${env.cantileverId}/plate-schedule.csv`).expect(200);
    expect(linesOf(res.text)[1]).toMatch(/^1,approved,Test Engineer,[\d-]+,6,/);
    const outsider = await env.login('outsider');
    await outsider.get(`/api/cantilevers/${env.cantileverId}/plate-schedule.csv`).expect(404);
  });

  it('shows per cantilever the latest revision and the latest approved one', async () => {
    const fabricator = await env.login('fabricator');
    const project = await fabricator.get(`/api/projects/${env.projectId}`).expect(200);
    const c = project.body.cantilevers.find((x: { id: number }) => x.id === env.cantileverId);
    expect(c.currentRevisionNumber).toBe(2);
    expect(c.reviewState).toBe('draft');
    expect(c.latestApproved).toMatchObject({
      revisionId: approvedId,
      number: 1,
      approvedBy: 'Test Engineer',
    });
  });
});
