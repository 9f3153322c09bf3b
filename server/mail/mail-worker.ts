/**
 * Sends the outbox after commit, so a slow or dead mail server never blocks or fails a save.
 * A small timer (unref'd) picks due messages; a failure is retried with exponential backoff until
 * the last attempt, then marked failed. Headers carry the outbox id so the local fake can mark
 * what it captured.
 */
import type { Knex } from 'knex';
import nodemailer, { type Transporter } from 'nodemailer';
import { dueMail, markAttemptFailed, markSent } from './outbox.repository';

export const OUTBOX_HEADER = 'X-Reachline-Outbox-Id';

export interface MailWorkerOptions {
  smtpUrl: string;
  from: string;
  retryBaseMs: number;
  maxAttempts: number;
  pollMs: number;
}

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
    this.transporter = nodemailer.createTransport(options.smtpUrl, { from: options.from });
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

  private async sendDue(): Promise<void> {
    const due = await dueMail(this.db, new Date().toISOString());
    for (const row of due) {
      if (this.stopped) return;
      try {
        await this.transporter.sendMail({
          from: this.options.from,
          to: JSON.parse(row.to_json) as string[],
          subject: row.subject,
          text: row.text,
          html: row.html ?? undefined,
          headers: { [OUTBOX_HEADER]: String(row.id) },
        });
        await markSent(this.db, row.id);
      } catch (err) {
        const attempts = row.attempts + 1;
        const last = attempts >= this.options.maxAttempts;
        const delay = this.options.retryBaseMs * 2 ** (attempts - 1);
        const next = last ? null : new Date(Date.now() + delay).toISOString();
        await markAttemptFailed(this.db, row.id, err instanceof Error ? err.message : String(err), next);
      }
    }
  }
}
