/**
 * Migrations from static imports: Knex scanning a folder of .ts files fails under Vitest, and a
 * fixed list also means the bundle of migrations is exactly what the code was tested with.
 */
import type { Knex } from 'knex';
import * as accounts from '../../migrations/20261202010000_accounts';
import * as projects from '../../migrations/20261202010100_projects';
import * as revisions from '../../migrations/20261202010200_revisions';
import * as filesMailShapes from '../../migrations/20261202010300_files_mail_shapes';
import * as security from '../../migrations/20261203020000_security';
import * as outboxClaim from '../../migrations/20261203030000_outbox_claim';
import * as cantileverQuantity from '../../migrations/20261203040000_cantilever_quantity';

interface Migration {
  up(knex: Knex): Promise<void>;
  down(knex: Knex): Promise<void>;
}

const MIGRATIONS: Record<string, Migration> = {
  '20261202010000_accounts': accounts,
  '20261202010100_projects': projects,
  '20261202010200_revisions': revisions,
  '20261202010300_files_mail_shapes': filesMailShapes,
  '20261203020000_security': security,
  '20261203030000_outbox_claim': outboxClaim,
  '20261203040000_cantilever_quantity': cantileverQuantity,
};

const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: () => Promise.resolve(Object.keys(MIGRATIONS).sort()),
  getMigrationName: (name) => name,
  getMigration: (name) => Promise.resolve(MIGRATIONS[name]),
};

/** Brings the database to the latest schema; returns the names of the migrations it ran. */
export async function migrateLatest(db: Knex): Promise<string[]> {
  const [, ran] = (await db.migrate.latest({ migrationSource })) as [number, string[]];
  return ran;
}
