/** Opens the SQLite database through Knex with the pragmas every connection needs. */
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import knex, { type Knex } from 'knex';

interface SqliteConnection {
  pragma(source: string): unknown;
}

export function createDb(databaseUrl: string): Knex {
  if (databaseUrl !== ':memory:') mkdirSync(dirname(databaseUrl), { recursive: true });
  return knex({
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
          done(null, conn);
        } catch (err) {
          done(err as Error, conn);
        }
      },
    },
  });
}

/** True when the database behind this Knex instance is SQLite (for SQLite-only statements). */
export function isSqlite(db: Knex): boolean {
  const client = String(db.client.config.client);
  return client === 'better-sqlite3' || client === 'sqlite3';
}

/** Timestamps are stored as ISO strings in UTC; PostgreSQL would hand back Date objects. */
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
