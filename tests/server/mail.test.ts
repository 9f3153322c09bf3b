import { createServer, type AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { MailWorker } from '../../server/mail/mail-worker';
import { baseDesign, createTestEnv, TEAM, type TestEnv } from '../helpers/api';

/** A port on 127.0.0.1 with nothing listening (taken, then released). */
async function deadPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

describe('e-mail through the local fake SMTP server', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv({ mail: 'fake' });
  });
  afterAll(async () => env.close());

  it('a submit e-mails every engineer of the project, queued in the outbox and captured by the fake', async () => {
    const architect = await env.login('architect');
    await architect.post(`/api/revisions/${env.revisionId}/submit`).expect(200);
    expect(env.kicks).toBeGreaterThan(0);
    const [queued] = await env.db('outbox').orderBy('id', 'desc');
    expect(queued.status).toBe('pending');
    await env.worker!.runOnce();
    expect(env.smtp!.received).toHaveLength(1);
    const mail = env.smtp!.received[0];
    expect(mail.to.sort()).toEqual([TEAM.engineer.email, TEAM.engineer2.email].sort());
    expect(mail.subject).toBe('Review requested: Test beam, revision 1');
    expect(mail.text).toContain('Test Architect submitted revision 1');
    const row = await env.db('outbox').where({ id: queued.id }).first();
    expect(row).toMatchObject({ status: 'sent', attempts: 1, last_error: null });
    expect(row.sent_at).toBeTruthy();
    expect(row.captured_at).toBeTruthy();
  });

  it('a review e-mails the author', async () => {
    const engineer = await env.login('engineer');
    await engineer
      .post(`/api/revisions/${env.revisionId}/reviews`)
      .send({ decision: 'request-changes', comment: 'Thicker plate, please.' })
      .expect(201);
    await env.worker!.runOnce();
    expect(env.smtp!.received).toHaveLength(2);
    const mail = env.smtp!.received[1];
    expect(mail.to).toEqual([TEAM.architect.email]);
    expect(mail.subject).toMatch(/Revision 1 of Test beam was returned with changes requested/);
    expect(mail.text).toContain('Thicker plate, please.');
  });

  it('shows the outbox to an admin only', async () => {
    const admin = await env.login('admin');
    const res = await admin.get('/api/admin/outbox').expect(200);
    expect(res.body).toHaveLength(2);
    expect(res.body[0]).toMatchObject({
      to: [TEAM.architect.email],
      status: 'sent',
      attempts: 1,
      lastError: null,
      sentAt: expect.any(String),
    });
    for (const person of ['architect', 'engineer', 'fabricator'] as const) {
      const agent = await env.login(person);
      expect((await agent.get('/api/admin/outbox')).status, person).toBe(403);
    }
  });
});

describe('e-mail when the SMTP server is down', () => {
  let env: TestEnv;
  let port: number;
  beforeAll(async () => {
    port = await deadPort();
    env = await createTestEnv({
      mail: { smtpUrl: `smtp://127.0.0.1:${port}` },
      config: { mailRetryBaseMs: 1, mailMaxAttempts: 5 },
    });
  });
  afterAll(async () => env.close());

  it('still saves, keeps the message pending with attempts and the error, and sends it once the server is back', async () => {
    const architect = await env.login('architect');
    const input = baseDesign();
    input.member.length = '7.5 ft';
    const saved = await architect
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 1, message: 'Shorter', input })
      .expect(201);
    await architect.post(`/api/revisions/${saved.body.id}/submit`).expect(200);
    await env.worker!.runOnce();
    let row = await env.db('outbox').first();
    expect(row.status).toBe('pending');
    expect(row.attempts).toBe(1);
    expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);
    const admin = await env.login('admin');
    const listed = await admin.get('/api/admin/outbox').expect(200);
    expect(listed.body[0]).toMatchObject({
      status: 'pending',
      attempts: 1,
      lastError: expect.any(String),
      sentAt: null,
    });

    // The mail server comes back on the same port; the next due retry delivers.
    const smtp = await startFakeSmtp(env.db, port);
    try {
      await new Promise((resolve) => setTimeout(resolve, 5));
      await env.worker!.runOnce();
      row = await env.db('outbox').first();
      expect(row).toMatchObject({ status: 'sent', attempts: 2 });
      expect(smtp.received).toHaveLength(1);
      expect(smtp.received[0].to.sort()).toEqual([TEAM.engineer.email, TEAM.engineer2.email].sort());
    } finally {
      await smtp.close();
    }
  });

  it('marks a message failed after the last attempt', async () => {
    const worker = new MailWorker(env.db, {
      smtpUrl: `smtp://127.0.0.1:${await deadPort()}`,
      from: 'x@example.test',
      retryBaseMs: 0,
      maxAttempts: 2,
      pollMs: 60_000,
    });
    await env.db('outbox').insert({
      to_json: '["a@example.test"]',
      subject: 's',
      text: 't',
      status: 'pending',
      attempts: 0,
      next_attempt_at: new Date().toISOString(),
      created_at: new Date().toISOString(),
    });
    try {
      await worker.runOnce();
      await worker.runOnce();
    } finally {
      await worker.stop();
    }
    const row = await env.db('outbox').orderBy('id', 'desc').first();
    expect(row).toMatchObject({ status: 'failed', attempts: 2 });
  });
});
