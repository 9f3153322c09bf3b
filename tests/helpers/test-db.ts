/**
 * A real migrated database per test file. SQLite (the default): the migrations run once into a
 * template file (named by a hash of the migration sources, written atomically so parallel workers
 * can share it), and each test file gets its own copy in a fresh temporary folder. PostgreSQL
 * (TEST_PG_URL, set by tests/helpers/pg-global-setup.ts): each test file gets its own database
 * copied from the migrated template database.
 */
import { createHash, randomUUID } from 'node:crypto';
import {
  copyFileSync,
  existsSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  renameSync,
  rmSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDb } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';
import { createPgTestDatabase } from './pg-template';

/** True when this run's API tests use PostgreSQL (TEST_PG=1 through the api project's global setup). */
export const ON_POSTGRES = Boolean(process.env.TEST_PG_URL);

const MIGRATIONS_DIR = new URL('../../migrations/', import.meta.url);

function templatePath(): string {
  const hash = createHash('sha256');
  for (const name of readdirSync(MIGRATIONS_DIR).sort()) {
    hash.update(name);
    hash.update(readFileSync(new URL(name, MIGRATIONS_DIR)));
  }
  return join(tmpdir(), `reachline-test-template-${hash.digest('hex').slice(0, 16)}.sqlite`);
}

let template: Promise<string> | null = null;

async function buildTemplate(): Promise<string> {
  const path = templatePath();
  if (existsSync(path)) return path;
  const building = `${path}.${randomUUID()}.tmp`;
  const db = createDb(building);
  try {
    await migrateLatest(db);
    // Fold the WAL into the main file so one file copy is the whole database.
    await db.raw('PRAGMA wal_checkpoint(TRUNCATE)');
    await db.raw('PRAGMA journal_mode = DELETE');
  } finally {
    await db.destroy();
  }
  renameSync(building, path);
  for (const suffix of ['-wal', '-shm']) rmSync(`${building}${suffix}`, { force: true });
  return path;
}

export interface TestDirs {
  root: string;
  databaseUrl: string;
  uploadDir: string;
  remove(): void;
}

/** A temporary folder holding a copy of the migrated template database and an uploads folder. */
export async function freshTestDirs(): Promise<TestDirs> {
  if (process.env.TEST_PG_URL) {
    const root = mkdtempSync(join(tmpdir(), 'reachline-test-'));
    return {
      root,
      // The cluster is thrown away at the end of the run, with every database in it.
      databaseUrl: await createPgTestDatabase(process.env.TEST_PG_URL),
      uploadDir: join(root, 'uploads'),
      remove: () => rmSync(root, { recursive: true, force: true }),
    };
  }
  template ??= buildTemplate();
  const source = await template;
  const root = mkdtempSync(join(tmpdir(), 'reachline-test-'));
  const databaseUrl = join(root, 'test.sqlite');
  copyFileSync(source, databaseUrl);
  return {
    root,
    databaseUrl,
    uploadDir: join(root, 'uploads'),
    remove: () => rmSync(root, { recursive: true, force: true }),
  };
}
