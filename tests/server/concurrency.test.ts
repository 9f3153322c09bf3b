/**
 * What several app instances rely on the database for, on whichever database this run
 * uses (SQLite by default, PostgreSQL with TEST_PG=1): concurrent saves on one base give one 201
 * and 409s, never a 500 or two revisions with one number; the outbox is claimed, so two workers
 * send each message once; a claim whose worker died is sent after its lease, never lost; a
 * migration meeting another database client fails loudly.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { dialectOf } from '../../server/db/knex';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { MailWorker } from '../../server/mail/mail-worker';
import { claimDueMail, markSent, queueMail } from '../../server/mail/outbox.repository';
import * as revisionsMigration from '../../migrations/20261202010200_revisions';
import * as outboxMigration from '../../migrations/20261203030000_outbox_claim';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';

describe('concurrency done by the database', () => {
  let env: TestEnv;
  let smtp: FakeSmtp;
  beforeAll(async () => {
    env = await createTestEnv();
    smtp = await startFakeSmtp(env.db);
  });
  afterAll(async () => {
    await smtp.close();
    await env.close();
  });

  const worker = () =>
    new MailWorker(env.db, {
      smtpUrl: smtp.url,
      from: 'Reachline <reachline@example.test>',
      retryBaseMs: 1,
      maxAttempts: 3,
      pollMs: 60_000,
      maxConnections: 3,
    });

  it('six concurrent saves on one base: one 201, five 409 with the latest, numbers unique', async () => {
    const architect = await env.login('architect');
    const engineer = await env.login('engineer');
    const saves = Array.from({ length: 6 }, (_, i) => {
      const input = baseDesign();
      input.member.length = `${7 + i * 0.25} ft`;
      return (i % 2 ? engineer : architect)
        .post(`/api/cantilevers/${env.cantileverId}/revisions`)
        .send({ baseRevision: 1, message: `Save ${i}`, input });
    });
    const results = await Promise.all(saves);
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409, 409, 409]);
    for (const r of results.filter((x) => x.status === 409)) {
      expect(r.body.error.code).toBe('stale_base');
      expect(r.body.latest).toMatchObject({ number: 2 });
    }
    const numbers = (await env.db('revisions').where({ cantilever_id: env.cantileverId }).select('number'))
      .map((r: { number: number }) => r.number)
      .sort();
    expect(numbers).toEqual([1, 2]);
  });

  it('two workers on one outbox send each of 30 messages exactly once', async () => {
    await env.db('outbox').delete();
    for (let i = 0; i < 30; i += 1)
      await queueMail(env.db, { to: [`p${i}@example.test`], subject: `m${i}`, text: 'x' });
    const before = smtp.received.length;
    const a = worker();
    const b = worker();
    try {
      await Promise.all([a.runOnce(), b.runOnce(), a.runOnce(), b.runOnce()]);
    } finally {
      await a.stop();
      await b.stop();
    }
    const ids = smtp.received.slice(before).map((m) => m.outboxId);
    expect(ids).toHaveLength(30);
    expect(new Set(ids).size).toBe(30);
    const rows = (await env.db('outbox').select('status', 'attempts')) as {
      status: string;
      attempts: number;
    }[];
    expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
  });

  it('a claim whose worker died is sent once its lease ends, and the dead claim cannot mark it', async () => {
    await env.db('outbox').delete();
    await queueMail(env.db, { to: ['late@example.test'], subject: 'after a crash', text: 'x' });
    // A worker claims the message and dies before sending (nothing else happens with its claim).
    const [claimed] = await claimDueMail(env.db, 'dead-worker', 150, 5);
    expect(claimed.subject).toBe('after a crash');
    const before = smtp.received.length;
    const w = worker();
    try {
      await w.runOnce();
      expect(smtp.received.length - before).toBe(0);
      await new Promise((r) => setTimeout(r, 200));
      await w.runOnce();
    } finally {
      await w.stop();
    }
    expect(smtp.received.slice(before).map((m) => m.subject)).toEqual(['after a crash']);
    expect(await markSent(env.db, claimed.id, 'dead-worker')).toBe(false);
    expect(await env.db('outbox').where({ id: claimed.id }).first()).toMatchObject({
      status: 'sent',
      attempts: 1,
    });
  });
});

describe('migrations on an unsupported database client', () => {
  const mysql = { client: { config: { client: 'mysql2' } } } as unknown as Knex;

  it('fail loudly, naming the migration and the client, before touching anything', async () => {
    expect(() => dialectOf(mysql)).toThrow(/unsupported database client "mysql2"/);
    await expect(revisionsMigration.up(mysql)).rejects.toThrow(
      /migration 20261202010200_revisions: unsupported database client "mysql2"/,
    );
    await expect(outboxMigration.down(mysql)).rejects.toThrow(/20261203030000_outbox_claim/);
  });
});
