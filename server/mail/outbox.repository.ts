/**
 * The outbox: every e-mail is written here first (in the same transaction as the change that
 * causes it) and sent after commit by the mail worker. Status: pending (not yet accepted by an
 * SMTP server, maybe retrying), sent (accepted), failed (gave up after the last attempt).
 */
import type { Knex } from 'knex';
import type { OutboxDto } from '../../shared/schemas/api';
import { isPostgres, nowIso, toIso } from '../db/knex';

export interface OutboxRow {
  id: number;
  to_json: string;
  subject: string;
  text: string;
  html: string | null;
  status: 'pending' | 'sent' | 'failed';
  attempts: number;
  last_error: string | null;
  next_attempt_at: string;
  created_at: string;
  sent_at: string | null;
  captured_at: string | null;
  claim_token?: string | null;
  claimed_at?: string | null;
}

export interface OutgoingMail {
  to: string[];
  subject: string;
  text: string;
  html?: string;
}

export type OutboxEntryDto = OutboxDto & { capturedAt: string | null };

export function toOutboxDto(row: OutboxRow): OutboxEntryDto {
  return {
    id: row.id,
    to: JSON.parse(row.to_json) as string[],
    subject: row.subject,
    text: row.text,
    status: row.status,
    attempts: row.attempts,
    lastError: row.last_error,
    createdAt: toIso(row.created_at),
    sentAt: row.sent_at === null ? null : toIso(row.sent_at),
    capturedAt: row.captured_at === null ? null : toIso(row.captured_at),
  };
}

/** Queues one message; pass the transaction of the change that causes it. */
export async function queueMail(db: Knex | Knex.Transaction, mail: OutgoingMail): Promise<void> {
  if (mail.to.length === 0) return;
  const now = nowIso();
  await db('outbox').insert({
    to_json: JSON.stringify(mail.to),
    subject: mail.subject,
    text: mail.text,
    html: mail.html ?? null,
    status: 'pending',
    attempts: 0,
    next_attempt_at: now,
    created_at: now,
  });
}

export async function listOutbox(db: Knex, limit = 200): Promise<OutboxRow[]> {
  return db<OutboxRow>('outbox').orderBy('id', 'desc').limit(limit);
}

export async function dueMail(db: Knex, now: string, limit = 20): Promise<OutboxRow[]> {
  return db<OutboxRow>('outbox')
    .where({ status: 'pending' })
    .andWhere('next_attempt_at', '<=', now)
    .orderBy('id')
    .limit(limit);
}

/**
 * Claims up to `limit` due messages for one worker: in one UPDATE, the rows get this worker's
 * token and their next_attempt_at moves to the end of the lease, so no other worker (another app
 * instance) picks them while this one sends. PostgreSQL: the candidate rows are locked with
 * FOR UPDATE SKIP LOCKED (two claimers never wait for or take each other's rows); SQLite: the
 * single writer makes the UPDATE atomic. A worker that dies holding a claim leaves the row pending
 * and due again when the lease ends: it is sent later, never lost.
 */
export async function claimDueMail(
  db: Knex,
  token: string,
  leaseMs: number,
  limit = 20,
): Promise<OutboxRow[]> {
  const now = new Date();
  const candidates = db('outbox')
    .select('id')
    .where({ status: 'pending' })
    .andWhere('next_attempt_at', '<=', now.toISOString())
    .orderBy('id')
    .limit(limit);
  if (isPostgres(db)) candidates.forUpdate().skipLocked();
  const rows = (await db('outbox')
    .whereIn('id', candidates)
    .update({
      claim_token: token,
      claimed_at: now.toISOString(),
      next_attempt_at: new Date(now.getTime() + leaseMs).toISOString(),
    })
    .returning('*')) as OutboxRow[];
  return rows.sort((a, b) => a.id - b.id);
}

/** Marks a claimed message sent; false when the claim was lost (the lease ran out and another worker took it). */
export async function markSent(db: Knex, id: number, token?: string): Promise<boolean> {
  const n = await db('outbox')
    .where({ id })
    .modify((q) => {
      if (token) q.andWhere({ claim_token: token });
    })
    .update({
      status: 'sent',
      sent_at: nowIso(),
      last_error: null,
      attempts: db.raw('attempts + 1'),
      claim_token: null,
    });
  return n > 0;
}

export async function markAttemptFailed(
  db: Knex,
  id: number,
  error: string,
  nextAttemptAt: string | null,
  token?: string,
): Promise<void> {
  await db('outbox')
    .where({ id })
    .modify((q) => {
      if (token) q.andWhere({ claim_token: token });
    })
    .update({
      claim_token: null,
      status: nextAttemptAt ? 'pending' : 'failed',
      attempts: db.raw('attempts + 1'),
      last_error: error.slice(0, 1000),
      ...(nextAttemptAt ? { next_attempt_at: nextAttemptAt } : {}),
    });
}

export async function markCaptured(db: Knex, id: number): Promise<void> {
  await db('outbox').where({ id }).update({ captured_at: nowIso() });
}

/** Makes failed and waiting messages due now (the admin's "retry now"). */
export async function retryNow(db: Knex): Promise<number> {
  return (
    db('outbox')
      .whereIn('status', ['pending', 'failed'])
      // A message being sent right now (claimed, lease running) stays with its worker.
      .where((q) => {
        q.whereNull('claim_token').orWhere('status', 'failed');
      })
      .update({ status: 'pending', next_attempt_at: nowIso() })
  );
}
