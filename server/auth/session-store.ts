/**
 * Sessions in the database through connect-session-knex. Its methods call the callback with a
 * database error and then re-throw it from the returned promise, which express-session never
 * awaits: an unhandled rejection. The subclass keeps the callback and swallows the re-throw.
 */
import type { Knex } from 'knex';
import type { SessionData } from 'express-session';
import { ConnectSessionKnexStore } from 'connect-session-knex';

type Callback = (err?: unknown) => void;

/**
 * express-session touches the stored session at the end of every request that did not change it
 * (one UPDATE per request). The expiry slides by 12 hours; moving it at most once a minute per
 * session and instance costs a minute of sliding at worst and saves a write on nearly every request.
 */
const TOUCH_EVERY_MS = 60_000;

export class GuardedSessionStore extends ConnectSessionKnexStore {
  constructor(db: Knex) {
    super({
      knex: db,
      tableName: 'sessions',
      createTable: false,
      cleanupInterval: 10 * 60 * 1000,
      onDbCleanupError: (err) => console.warn('session cleanup failed:', err),
    });
    // The table check at construction fails when the database closes first; every call re-awaits it.
    this.ready.catch(() => undefined);
  }

  private readonly touched = new Map<string, number>();

  override set(sid: string, session: SessionData, callback?: Callback): Promise<void> {
    this.remember(sid);
    return super.set(sid, session, callback).catch(() => undefined);
  }

  private remember(sid: string): void {
    if (this.touched.size > 10_000) this.touched.clear();
    this.touched.set(sid, Date.now());
  }

  override get(
    sid: string,
    callback: (err: unknown, session?: SessionData | null) => void,
  ): Promise<SessionData | null> {
    return super.get(sid, callback).catch(() => null);
  }

  override destroy(sid: string, callback?: Callback): Promise<number> {
    this.touched.delete(sid);
    return super.destroy(sid, callback).catch(() => 0);
  }

  override touch(sid: string, session: SessionData, callback?: () => void): Promise<void> {
    const last = this.touched.get(sid);
    if (last !== undefined && Date.now() - last < TOUCH_EVERY_MS) {
      callback?.();
      return Promise.resolve();
    }
    this.remember(sid);
    return super.touch(sid, session, callback).catch(() => {
      callback?.();
    });
  }

  /** Stops the periodic clean-up timer (it is unref'd, but a closed app should leave nothing behind). */
  close(): void {
    if (this.nextDbCleanup) clearTimeout(this.nextDbCleanup);
    this.options.cleanupInterval = 0;
  }
}
