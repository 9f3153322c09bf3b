import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

describe('submission, review, comments and immutability', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  const rev = (suffix = '') => `/api/revisions/${env.revisionId}${suffix}`;

  it('refuses a review of a revision that was not submitted (409) and a review by a non-engineer (403)', async () => {
    const engineer = await env.login('engineer');
    const notSubmitted = await engineer.post(rev('/reviews')).send({ decision: 'approve' });
    expect(notSubmitted.status).toBe(409);
    const architect = await env.login('architect');
    const submitted = await architect.post(rev('/submit')).expect(200);
    expect(submitted.body.reviewState).toBe('submitted');
    expect(submitted.body.reviews).toEqual([
      expect.objectContaining({ state: 'submitted', reviewerId: env.ids.architect }),
    ]);
    await architect.post(rev('/submit')).expect(409);
    const fabricator = await env.login('fabricator');
    const byFabricator = await fabricator.post(rev('/reviews')).send({ decision: 'approve' });
    expect(byFabricator.status).toBe(403);
    const badDecision = await engineer.post(rev('/reviews')).send({ decision: 'maybe' });
    expect(badDecision.status).toBe(400);
    expect(badDecision.body.error.issues[0].path).toBe('decision');
  });

  it('never lets an engineer approve their own revision', async () => {
    const engineer = await env.login('engineer');
    const own = await engineer
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 1, message: 'Engineer tweak', input: { ...baseDesign(), frequencyMin: '9 Hz' } })
      .expect(201);
    await engineer.post(`/api/revisions/${own.body.id}/submit`).expect(200);
    const self = await engineer.post(`/api/revisions/${own.body.id}/reviews`).send({ decision: 'approve' });
    expect(self.status).toBe(403);
    expect(self.body.error.message).toMatch(/own revision/);
    expect(await env.db('audit').where({ kind: 'approval' })).toHaveLength(0);
  });

  it('lets another engineer approve a submitted revision and records it in the audit trail', async () => {
    const engineer = await env.login('engineer');
    const res = await engineer
      .post(rev('/reviews'))
      .send({ decision: 'approve', comment: 'Checked, fine.' })
      .expect(201);
    expect(res.body.reviewState).toBe('approved');
    expect(res.body.reviews.map((r: { state: string }) => r.state)).toEqual(['submitted', 'approved']);
    expect(res.body.reviews[1]).toMatchObject({ reviewerId: env.ids.engineer, comment: 'Checked, fine.' });
    const audit = await env.db('audit').where({ kind: 'approval' });
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ user_id: env.ids.engineer, subject: `revision ${env.revisionId}` });
    await engineer.post(rev('/submit')).expect(409);
    await engineer.post(rev('/reviews')).send({ decision: 'request-changes' }).expect(409);
  });

  it('requests changes with a comment, and the revision can be submitted again', async () => {
    const [own] = await env.db('revisions').where({ cantilever_id: env.cantileverId, number: 2 });
    const engineer2 = await env.login('engineer2');
    const res = await engineer2
      .post(`/api/revisions/${own.id}/reviews`)
      .send({ decision: 'request-changes', comment: 'Check the plate.' })
      .expect(201);
    expect(res.body.reviewState).toBe('changes-requested');
    expect(await env.db('audit').where({ kind: 'changes-requested' })).toHaveLength(1);
    const architect = await env.login('architect');
    const again = await architect.post(`/api/revisions/${own.id}/submit`).expect(200);
    expect(again.body.reviewState).toBe('submitted');
  });

  it('refuses PATCH, PUT and DELETE on an approved revision and leaves it unchanged', async () => {
    const engineer = await env.login('engineer');
    const before = await engineer.get(rev()).expect(200);
    for (const method of ['patch', 'put', 'delete'] as const) {
      const res = await engineer[method](rev()).send({ message: 'rewritten', input: baseDesign() });
      expect(res.status, method).toBe(405);
      expect(res.body.error.code).toBe('immutable');
    }
    const after = await engineer.get(rev()).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('refuses a direct UPDATE of any revision and a DELETE of an approved one in the database itself', async () => {
    await expect(
      env.db('revisions').where({ id: env.revisionId }).update({ input_json: '{}' }),
    ).rejects.toThrow(/immutable/);
    await expect(
      env.db('revisions').where({ id: env.revisionId }).update({ message: 'changed' }),
    ).rejects.toThrow(/immutable/);
    await expect(env.db('revisions').where({ id: env.revisionId }).del()).rejects.toThrow(
      /approved revision cannot be deleted/,
    );
    await expect(
      env.db('reviews').where({ revision_id: env.revisionId, state: 'approved' }).del(),
    ).rejects.toThrow(/approval cannot be deleted/);
    const row = await env.db('revisions').where({ id: env.revisionId }).first();
    expect(JSON.parse(row.input_json).member.length).toBe(baseDesign().member.length);
  });

  it('lets every project member comment on a revision and read the comments', async () => {
    const fabricator = await env.login('fabricator');
    const posted = await fabricator
      .post(rev('/comments'))
      .send({ body: 'Plate stock is 1-1/2 in.' })
      .expect(201);
    expect(posted.body).toMatchObject({
      revisionId: env.revisionId,
      authorId: env.ids.fabricator,
      authorName: 'Test Fabricator',
      body: 'Plate stock is 1-1/2 in.',
    });
    const admin = await env.login('admin');
    await admin.post(rev('/comments')).send({ body: 'Noted.' }).expect(201);
    const list = await (await env.login('architect')).get(rev('/comments')).expect(200);
    expect(list.body.map((c: { body: string }) => c.body)).toEqual(['Plate stock is 1-1/2 in.', 'Noted.']);
    const empty = await fabricator.post(rev('/comments')).send({ body: '  ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.issues[0].path).toBe('body');
  });
});
