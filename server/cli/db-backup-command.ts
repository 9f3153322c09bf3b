/**
 * `reachline db backup FILE`: a consistent copy of the configured database (DATABASE_URL) while
 * the app keeps running. SQLite: the online backup API (better-sqlite3's backup(), page by page,
 * consistent even with writers). PostgreSQL: pg_dump in its custom format (restore with
 * pg_restore), one snapshot; a clear message when pg_dump is not installed. Never overwrites a file.
 * Exit 0 written, 2 a problem (one line on stderr).
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { createDb, isPostgresUrl } from '../db/knex';
import { ConfigError, parseEnv } from '../env';
import { redactUrl } from '../lib/logger';
import type { CliIo } from './check-command';

interface SqliteBackup {
  backup(file: string): Promise<unknown>;
}

/** pg_dump: $PG_DUMP, then the newest /usr/lib/postgresql/<v>/bin/pg_dump, then the PATH. */
export function findPgDump(env: NodeJS.ProcessEnv = process.env): string | null {
  if (env.PG_DUMP) return existsSync(env.PG_DUMP) ? env.PG_DUMP : null;
  const root = '/usr/lib/postgresql';
  if (existsSync(root)) {
    const versions = readdirSync(root)
      .filter((v) => existsSync(join(root, v, 'bin', 'pg_dump')))
      .sort((a, b) => Number(b) - Number(a));
    if (versions.length) return join(root, versions[0], 'bin', 'pg_dump');
  }
  const which = spawnSync('sh', ['-c', 'command -v pg_dump'], { encoding: 'utf8' });
  return which.status === 0 && which.stdout.trim() ? which.stdout.trim() : null;
}

export async function dbBackupCommand(
  file: string,
  io: CliIo,
  env: NodeJS.ProcessEnv = process.env,
): Promise<number> {
  let config: ReturnType<typeof parseEnv>;
  try {
    config = parseEnv(env);
  } catch (err) {
    io.err(`${err instanceof ConfigError ? err.message : String(err)}\n`);
    return 2;
  }
  const target = resolve(file);
  if (existsSync(target)) {
    io.err(`FILE: ${target} exists; give a new file name (a backup never overwrites)\n`);
    return 2;
  }
  if (isPostgresUrl(config.databaseUrl)) {
    const pgDump = findPgDump(env);
    if (!pgDump) {
      io.err(
        'pg_dump was not found: install the PostgreSQL client tools (Debian: apt-get install postgresql-client) or set PG_DUMP to its path\n',
      );
      return 2;
    }
    const code = await new Promise<number | null>((done) => {
      const child = spawn(
        pgDump,
        ['--format=custom', '--no-owner', `--file=${target}`, `--dbname=${config.databaseUrl}`],
        {
          stdio: ['ignore', 'inherit', 'pipe'],
        },
      );
      child.stderr.on('data', (c: Buffer) => io.err(c.toString()));
      child.once('error', (err) => {
        io.err(`pg_dump could not start: ${err.message}\n`);
        done(null);
      });
      child.once('close', done);
    });
    if (code !== 0) {
      io.err(`pg_dump failed (exit ${code ?? 'error'}) for ${redactUrl(config.databaseUrl)}\n`);
      return 2;
    }
    io.out(
      `Wrote ${target} (${statSync(target).size} bytes, pg_dump custom format; restore with pg_restore).\n`,
    );
    return 0;
  }
  if (!existsSync(config.databaseUrl)) {
    io.err(`DATABASE_URL: there is no database at ${config.databaseUrl}\n`);
    return 2;
  }
  const db = createDb(config.databaseUrl);
  try {
    const client = db.client as {
      acquireConnection(): Promise<unknown>;
      releaseConnection(conn: unknown): Promise<void>;
    };
    const conn = (await client.acquireConnection()) as SqliteBackup;
    try {
      await conn.backup(target);
    } finally {
      await client.releaseConnection(conn);
    }
  } finally {
    await db.destroy();
  }
  io.out(`Wrote ${target} (${statSync(target).size} bytes, an SQLite database file).\n`);
  return 0;
}
