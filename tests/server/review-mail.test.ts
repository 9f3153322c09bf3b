import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../shared/engine/types';
import { TEAM, baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

interface Mail {
  to: string[];
  subject: string;
  text: string;
}

describe('e-mail around the review: links, the right people, an honest notice', () => {
  let env: TestEnv;
  let seen = 0;
  /** The mails queued since the last call. */
  async function newMail(): Promise<Mail[]> {
    const rows = (await env.db('outbox').where('id', '>', seen).orderBy('id')) as {
      id: number;
      to_json: string;
      subject: string;
      text: string;
    }[];
    if (rows.length) seen = rows[rows.length - 1].id;
    return rows.map((r) => ({ to: JSON.parse(r.to_json) as string[], subject: r.subject, text: r.text }));
  }

  beforeAll(async () => {
    env = await createTestEnv({ config: { appOrigin: 'http://reachline.example.test' } });
  });
  afterAll(async () => env.close());

  it('a submission mails the engineers who may review it, with the note and a link to the review; the notice names them', async () => {
    const architect = await env.login('architect');
    const res = await architect
      .post(`/api/revisions/${env.revisionId}/submit`)
      .send({ note: 'Please look at the rod edge distance.' })
      .expect(200);
    expect(res.body.reviewState).toBe('submitted');
    expect(res.body.notified).toEqual(['Test Engineer', 'Second Engineer']);
    expect(res.body.notice).toBe(
      'Revision 1 was submitted for review. Test Engineer and Second Engineer were notified by e-mail.',
    );
    expect(res.body.reviews[0].comment).toBe('Please look at the rod edge distance.');
    const [mail] = await newMail();
    expect(mail.to).toEqual([TEAM.engineer.email, TEAM.engineer2.email]);
    expect(mail.text).toContain('Note to the reviewer: Please look at the rod edge distance.');
    expect(mail.text).toContain(
      `Open the review: http://reachline.example.test/revisions/${env.revisionId}/review`,
    );
    expect(mail.text).toContain(CAUTION);
  });

  it('lists the submitted revision under "Awaiting my review" for the other engineers only', async () => {
    const engineer = await env.login('engineer');
    const waiting = await engineer.get('/api/reviews/awaiting').expect(200);
    expect(waiting.body).toEqual([
      expect.objectContaining({
        revisionId: env.revisionId,
        number: 1,
        cantileverName: 'Test beam',
        projectName: 'Test terrace',
        authorName: 'Test Architect',
      }),
    ]);
    const architect = await env.login('architect');
    expect((await architect.get('/api/reviews/awaiting').expect(200)).body).toEqual([]);
    const outsider = await env.login('outsider');
    expect((await outsider.get('/api/reviews/awaiting').expect(200)).body).toEqual([]);
  });

  it('a comment mails the author and earlier commenters, never the one who wrote it', async () => {
    const fabricator = await env.login('fabricator');
    await fabricator
      .post(`/api/revisions/${env.revisionId}/comments`)
      .send({ body: 'Stock is 1-1/2 in.' })
      .expect(201);
    let [mail] = await newMail();
    expect(mail.to).toEqual([TEAM.architect.email]);
    expect(mail.subject).toBe('New comment on Test beam, revision 1');
    expect(mail.text).toContain(`http://reachline.example.test/revisions/${env.revisionId}/review`);
    const engineer = await env.login('engineer');
    await engineer.post(`/api/revisions/${env.revisionId}/comments`).send({ body: 'Noted.' }).expect(201);
    [mail] = await newMail();
    expect(mail.to.sort()).toEqual([TEAM.architect.email, TEAM.fabricator.email].sort());
  });

  it('an approval mails the author and the fabricators with a link to the revision; the approval is gone from the queue', async () => {
    const engineer = await env.login('engineer');
    await engineer.post(`/api/revisions/${env.revisionId}/reviews`).send({ decision: 'approve' }).expect(201);
    const [mail] = await newMail();
    expect(mail.to).toEqual([TEAM.architect.email, TEAM.fabricator.email]);
    expect(mail.subject).toBe('Revision 1 of Test beam was approved');
    expect(mail.text).toContain(`http://reachline.example.test/revisions/${env.revisionId}`);
    expect((await engineer.get('/api/reviews/awaiting').expect(200)).body).toEqual([]);
  });

  it('says that nobody was notified, and why, when the only engineer wrote the revision', async () => {
    const engineer = await env.login('engineer');
    const admin = await env.login('admin');
    await admin.delete(`/api/projects/${env.projectId}/members/${env.ids.engineer2}`).expect(200);
    const own = await engineer
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({
        baseRevision: 1,
        message: 'Engineer revision',
        input: { ...baseDesign(), frequencyMin: '9 Hz' },
      })
      .expect(201);
    const res = await engineer.post(`/api/revisions/${own.body.id}/submit`).expect(200);
    expect(res.body.notified).toEqual([]);
    expect(res.body.notice).toBe(
      'Revision 2 was submitted for review. Nobody was notified: the only engineers on this project wrote or submitted this revision, and an engineer never reviews their own. Ask an admin to add another engineer to the project.',
    );
    expect(await newMail()).toEqual([]);
  });
});
