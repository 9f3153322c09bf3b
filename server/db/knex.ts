/**
 * Opens the database through Knex: SQLite (a file path, the embedded default) with the pragmas
 * every connection needs, or PostgreSQL (DATABASE_URL=postgres://…) through `pg`.
 */
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import knex, { type Knex } from 'knex';

interface SqliteConnection {
  pragma(source: string): unknown;
  prepare(source: string): unknown;
}

/** Distinct statements kept per connection; `in (?, ?, …)` lists make new texts, so the cache is bounded. */
const STATEMENT_CACHE_SIZE = 500;

/**
 * Knex prepares every query anew (better-sqlite3's prepare compiles the SQL each time), which was
 * the largest single cost of a signed-in read. A prepared statement is reusable once its previous
 * run has returned, and Knex runs each one to completion (`all` or `run`) before the next, on the
 * single connection. Knex's only per-run statement setting, safeIntegers, is never used here.
 */
export function cachePreparedStatements(conn: SqliteConnection): void {
  const prepare = conn.prepare.bind(conn);
  const cache = new Map<string, unknown>();
  conn.prepare = (source: string) => {
    let statement = cache.get(source);
    if (statement === undefined) {
      if (cache.size >= STATEMENT_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
      statement = prepare(source);
      cache.set(source, statement);
    }
    return statement;
  };
}

/** What the SQLite query compiler reads from a query builder (Knex internals, knex 3.1). */
interface BuilderSingle {
  _single: { limit?: unknown; offset?: unknown; skipBinding?: Record<string, boolean> };
}

/**
 * SQLite prepares a statement again on every run when its LIMIT or OFFSET is a bound parameter
 * (measured with better-sqlite3 12: a primary-key read with `limit ?` took 26 µs, with `limit 1`
 * 10 µs), and Knex binds both, `first()` included. Knex has already turned them into integers
 * (`limit()` and `offset()` parse the value and drop anything else), so writing them into the
 * text is safe and gives one reusable statement per shape.
 */
const inline = (value: unknown) => value === undefined || Number.isSafeInteger(value);

export function inlineLimits(db: Knex): void {
  const client = db.client as { queryCompiler(builder: BuilderSingle, formatter?: unknown): unknown };
  const compiler = client.queryCompiler.bind(client);
  client.queryCompiler = (builder, formatter) => {
    const single = builder._single;
    if (
      (single.limit !== undefined || single.offset !== undefined) &&
      inline(single.limit) &&
      inline(single.offset)
    )
      single.skipBinding = { ...single.skipBinding, limit: true, offset: true };
    return compiler(builder, formatter);
  };
}

export type Dialect = 'sqlite' | 'postgres';

export function isPostgresUrl(databaseUrl: string): boolean {
  return /^postgres(ql)?:\/\//i.test(databaseUrl);
}

export interface DbOptions {
  /** PostgreSQL pool size per app instance (DATABASE_POOL_MAX). */
  poolMax?: number;
}

export function createDb(databaseUrl: string, options: DbOptions = {}): Knex {
  if (isPostgresUrl(databaseUrl)) {
    return knex({
      client: 'pg',
      connection: { connectionString: databaseUrl, application_name: 'reachline' },
      pool: { min: 0, max: options.poolMax ?? 10 },
      acquireConnectionTimeout: 10_000,
    });
  }
  if (databaseUrl !== ':memory:') mkdirSync(dirname(databaseUrl), { recursive: true });
  const db = knex({
    client: 'better-sqlite3',
    connection: { filename: databaseUrl },
    useNullAsDefault: true,
    pool: {
      min: 1,
      max: 1,
      // WAL lets readers proceed during a write; foreign keys are off by default in SQLite.
      afterCreate(conn: SqliteConnection, done: (err: Error | null, conn: SqliteConnection) => void) {
        try {
          conn.pragma('journal_mode = WAL');
          conn.pragma('synchronous = NORMAL');
          conn.pragma('foreign_keys = ON');
          conn.pragma('busy_timeout = 5000');
          cachePreparedStatements(conn);
          done(null, conn);
        } catch (err) {
          done(err as Error, conn);
        }
      },
    },
  });
  inlineLimits(db);
  return db;
}

/**
 * Which of the two supported databases this Knex instance talks to. Any other client throws, so
 * a migration or a statement written for these two can never run half-applied elsewhere.
 */
export function dialectOf(db: Knex, what = 'Reachline'): Dialect {
  const client = String((db.client as { config: Knex.Config }).config.client);
  if (client === 'better-sqlite3' || client === 'sqlite3') return 'sqlite';
  if (client === 'pg' || client === 'postgres' || client === 'postgresql') return 'postgres';
  throw new Error(
    `${what}: unsupported database client "${client}"; Reachline runs on SQLite (better-sqlite3) or PostgreSQL (pg) only`,
  );
}

/** True when the database behind this Knex instance is SQLite (for SQLite-only statements). */
export function isSqlite(db: Knex): boolean {
  return dialectOf(db) === 'sqlite';
}

export function isPostgres(db: Knex): boolean {
  return dialectOf(db) === 'postgres';
}

/**
 * True when the error is a unique-key violation (two writers took the same number): PostgreSQL
 * 23505, SQLite SQLITE_CONSTRAINT_UNIQUE / PRIMARYKEY.
 */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string } | null;
  return (
    e?.code === '23505' ||
    e?.code === 'SQLITE_CONSTRAINT_UNIQUE' ||
    e?.code === 'SQLITE_CONSTRAINT_PRIMARYKEY'
  );
}

/**
 * Inserts one row and answers its id. PostgreSQL and SQLite (through Knex's RETURNING) both answer
 * [{ id }]; an older SQLite path answered the bare number, which is still accepted.
 */
export async function insertReturningId(
  db: Knex | Knex.Transaction,
  table: string,
  row: Record<string, unknown>,
): Promise<number> {
  const rows = (await db(table).insert(row).returning('id')) as unknown[];
  const first = rows[0];
  const id = typeof first === 'object' && first !== null ? (first as { id?: unknown }).id : first;
  if (typeof id !== 'number' || !Number.isInteger(id)) throw new Error(`${table}: the insert answered no id`);
  return id;
}

/** Timestamps are stored as ISO strings in UTC; PostgreSQL hands back Date objects. */
export function nowIso(): string {
  return new Date().toISOString();
}

export function toIso(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  return String(value);
}

export function toBool(value: unknown): boolean {
  return value === true || value === 1 || value === '1';
}
