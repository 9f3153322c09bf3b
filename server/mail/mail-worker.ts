/**
 * Sends the outbox after commit, so a slow or dead mail server never blocks or fails a save.
 * A small timer (unref'd) claims due messages (outbox.repository: a token and a lease, so several
 * app instances never send one message twice) and sends them several at once over a pool of SMTP
 * connections (nodemailer `pool`); a failure is retried with exponential backoff until the last
 * attempt, then marked failed. Headers carry the outbox id so the local fake can mark what it
 * captured.
 */
import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import nodemailer, { type Transporter } from 'nodemailer';
import { claimDueMail, markAttemptFailed, markSent, type OutboxRow } from './outbox.repository';

export const OUTBOX_HEADER = 'X-Reachline-Outbox-Id';

export interface MailWorkerOptions {
  smtpUrl: string;
  from: string;
  retryBaseMs: number;
  maxAttempts: number;
  pollMs: number;
  /** SMTP connections used at once (default 4). */
  maxConnections?: number;
  /** How long a claim holds a message before another worker may take it (default 2 min; above the SMTP timeouts). */
  leaseMs?: number;
}

/** SMTP timeouts well under the claim lease, so a send that hangs fails before its claim runs out. */
const SMTP_TIMEOUT_MS = 30_000;

export class MailWorker {
  private transporter: Transporter;
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  private again = false;
  private stopped = false;

  constructor(
    private readonly db: Knex,
    private readonly options: MailWorkerOptions,
  ) {
    this.transporter = nodemailer.createTransport(
      {
        url: options.smtpUrl,
        pool: true,
        maxConnections: options.maxConnections ?? 4,
        maxMessages: 100,
        connectionTimeout: SMTP_TIMEOUT_MS,
        greetingTimeout: SMTP_TIMEOUT_MS,
        socketTimeout: SMTP_TIMEOUT_MS,
      } as Parameters<typeof nodemailer.createTransport>[0],
      { from: options.from },
    ) as Transporter;
  }

  start(): void {
    this.stopped = false;
    this.schedule(0);
  }

  /** Asks for a run soon (after a commit that queued mail). */
  kick(): void {
    if (this.stopped) return;
    if (this.running) {
      this.again = true;
      return;
    }
    this.schedule(0);
  }

  /** Sends everything due now; resolves when done. Used by the timer and by tests. */
  runOnce(): Promise<void> {
    if (!this.running) {
      this.running = this.sendDue().finally(() => {
        this.running = null;
      });
    }
    return this.running;
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    if (this.running) await this.running.catch(() => undefined);
    this.transporter.close();
  }

  private schedule(ms: number): void {
    if (this.stopped) return;
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = null;
      this.runOnce()
        .catch((err: unknown) => console.warn('mail worker run failed:', err))
        .finally(() => {
          const next = this.again ? 0 : this.options.pollMs;
          this.again = false;
          this.schedule(next);
        });
    }, ms);
    this.timer.unref();
  }

  /** Claims and sends batches until nothing is due (or the worker stops: the batch in hand is finished). */
  private async sendDue(): Promise<void> {
    const batch = (this.options.maxConnections ?? 4) * 5;
    for (;;) {
      if (this.stopped) return;
      const token = randomUUID();
      const claimed = await claimDueMail(this.db, token, this.options.leaseMs ?? 120_000, batch);
      if (claimed.length === 0) return;
      // The pool sends maxConnections at a time and queues the rest.
      await Promise.all(claimed.map((row) => this.sendOne(row, token)));
      if (claimed.length < batch) return;
    }
  }

  private async sendOne(row: OutboxRow, token: string): Promise<void> {
    try {
      await this.transporter.sendMail({
        from: this.options.from,
        to: JSON.parse(row.to_json) as string[],
        subject: row.subject,
        text: row.text,
        html: row.html ?? undefined,
        headers: { [OUTBOX_HEADER]: String(row.id) },
      });
    } catch (err) {
      const attempts = row.attempts + 1;
      const last = attempts >= this.options.maxAttempts;
      const delay = this.options.retryBaseMs * 2 ** (attempts - 1);
      const next = last ? null : new Date(Date.now() + delay).toISOString();
      await markAttemptFailed(this.db, row.id, err instanceof Error ? err.message : String(err), next, token);
      return;
    }
    await markSent(this.db, row.id, token);
  }
}
