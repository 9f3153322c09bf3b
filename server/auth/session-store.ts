/**
 * Sessions in the database through connect-session-knex. Its methods call the callback with a
 * database error and then re-throw it from the returned promise, which express-session never
 * awaits: an unhandled rejection. The subclass keeps the callback and swallows the re-throw.
 */
import type { Knex } from 'knex';
import type { SessionData } from 'express-session';
import { ConnectSessionKnexStore } from 'connect-session-knex';

type Callback = (err?: unknown) => void;

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

  override set(sid: string, session: SessionData, callback?: Callback): Promise<void> {
    return super.set(sid, session, callback).catch(() => undefined);
  }

  override get(
    sid: string,
    callback: (err: unknown, session?: SessionData | null) => void,
  ): Promise<SessionData | null> {
    return super.get(sid, callback).catch(() => null);
  }

  override destroy(sid: string, callback?: Callback): Promise<number> {
    return super.destroy(sid, callback).catch(() => 0);
  }

  override touch(sid: string, session: SessionData, callback?: () => void): Promise<void> {
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
