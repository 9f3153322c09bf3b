/**
 * Sessions in the database through connect-session-knex. Its methods call the callback with a
 * database error and then re-throw it from the returned promise, which express-session never
 * awaits: an unhandled rejection. The subclass keeps the callback and swallows the re-throw.
 */
import type { Knex } from 'knex';
import type { SessionData } from 'express-session';
import { ConnectSessionKnexStore } from 'connect-session-knex';
import { dialectOf } from '../db/knex';
import type { UserRow } from '../features/users/users.repository';

type Callback = (err?: unknown) => void;

/**
 * express-session touches the stored session at the end of every request that did not change it
 * (one UPDATE per request). The expiry slides by 12 hours; moving it at most once a minute per
 * session and instance costs a minute of sliding at worst and saves a write on nearly every request.
 */
const TOUCH_EVERY_MS = 60_000;

/**
 * The session and its account in one query: the account id is read from the stored session
 * ({ passport: { user: { id, v } } }, see passport.ts). A session without one, or with the bare id
 * older sessions hold, joins nothing and Passport reads the account itself.
 */
function sessionWithAccountSql(db: Knex): string {
  return dialectOf(db, 'the session store') === 'sqlite'
    ? `select s.sess as sess__, u.* from sessions s
       left join users u on u.id = json_extract(s.sess, '$.passport.user.id')
       where s.sid = ? and datetime(?) <= datetime(s.expired)`
    : `select s.sess as sess__, u.* from sessions s
       left join users u on json_typeof(s.sess->'passport'->'user'->'id') = 'number'
         and u.id = (s.sess->'passport'->'user'->>'id')::integer
       where s.sid = ? and cast(? as timestamptz) <= s.expired`;
}

type SessionAccountRow = Partial<UserRow> & { sess__: string | SessionData };

/** How long an account read with its session waits for Passport in the same request. */
const HANDOFF_MS = 5_000;

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
    this.sql = sessionWithAccountSql(db);
  }

  /**
   * The account read with this session by the request's own `get`, once (a second call, or a
   * request that did not read the session, gets undefined and Passport asks the database).
   */
  takeAccount(sid: string): UserRow | undefined {
    const held = this.accounts.get(sid);
    if (!held) return undefined;
    this.accounts.delete(sid);
    return Date.now() - held.at < HANDOFF_MS ? held.row : undefined;
  }

  private readonly touched = new Map<string, number>();
  private readonly sql: string;
  /** Accounts read with their session, waiting for Passport's deserialize in the same request. */
  private readonly accounts = new Map<string, { row: UserRow; at: number }>();

  override set(sid: string, session: SessionData, callback?: Callback): Promise<void> {
    this.remember(sid);
    return super.set(sid, session, callback).catch(() => undefined);
  }

  private remember(sid: string): void {
    if (this.touched.size > 10_000) this.touched.clear();
    this.touched.set(sid, Date.now());
  }

  /** The session, with its account put aside for Passport: one query instead of two per request. */
  override async get(
    sid: string,
    callback: (err: unknown, session?: SessionData | null) => void,
  ): Promise<SessionData | null> {
    let rows: SessionAccountRow[];
    try {
      await this.ready;
      const { knex } = this.options;
      const result: unknown = await knex.raw(this.sql, [sid, new Date().toISOString()]);
      rows = (Array.isArray(result) ? result : (result as { rows: unknown[] }).rows) as SessionAccountRow[];
    } catch (err) {
      callback(err);
      return null;
    }
    const row = rows[0];
    if (!row) {
      this.accounts.delete(sid);
      callback(null, null);
      return null;
    }
    const { sess__: stored, ...account } = row;
    const session = (typeof stored === 'string' ? JSON.parse(stored) : stored) as SessionData;
    if (account.id !== undefined && account.id !== null) {
      if (this.accounts.size > 10_000) this.accounts.clear();
      this.accounts.set(sid, { row: account as UserRow, at: Date.now() });
    } else this.accounts.delete(sid);
    callback(null, session);
    return session;
  }

  override destroy(sid: string, callback?: Callback): Promise<number> {
    this.touched.delete(sid);
    this.accounts.delete(sid);
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
