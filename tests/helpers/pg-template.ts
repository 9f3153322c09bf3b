/**
 * The migrated template database of a PostgreSQL test run and the per-file copies made from it.
 * `CREATE DATABASE … TEMPLATE` copies the migrated schema in milliseconds.
 */
import { randomBytes } from 'node:crypto';
import type { knex as KnexFactory } from 'knex';
import { createDb } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';

export const TEMPLATE_DB = 'reachline_template';

export function databaseUrl(adminUrl: string, name: string): string {
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

/** Drops and rebuilds the template database through the migrations. */
export async function buildPgTemplate(knex: typeof KnexFactory, adminUrl: string): Promise<void> {
  const admin = knex({ client: 'pg', connection: adminUrl, pool: { min: 0, max: 1 } });
  try {
    await admin.raw(`DROP DATABASE IF EXISTS ${TEMPLATE_DB}`);
    await admin.raw(`CREATE DATABASE ${TEMPLATE_DB}`);
  } finally {
    await admin.destroy();
  }
  const db = createDb(databaseUrl(adminUrl, TEMPLATE_DB));
  try {
    await migrateLatest(db);
  } finally {
    await db.destroy();
  }
}

/** A fresh database copied from the template; returns its URL. */
export async function createPgTestDatabase(adminUrl: string): Promise<string> {
  const name = `reachline_t_${randomBytes(6).toString('hex')}`;
  const admin = createDb(adminUrl, { poolMax: 1 });
  try {
    for (let attempt = 0; ; attempt += 1) {
      try {
        await admin.raw(`CREATE DATABASE ${name} TEMPLATE ${TEMPLATE_DB}`);
        break;
      } catch (err) {
        // Two files copying the template at the same instant: "source database is being accessed".
        if (attempt >= 20 || !/being accessed/.test(String(err))) throw err;
        await new Promise((r) => setTimeout(r, 50 + Math.random() * 100));
      }
    }
  } finally {
    await admin.destroy();
  }
  return databaseUrl(adminUrl, name);
}
