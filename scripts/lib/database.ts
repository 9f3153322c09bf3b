/** Migrating and seeding the configured database, as `npm start` and `npm run db:reset` do it. */
import { relative } from 'node:path';
import { createDb } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';
import { seedDemoIfEmpty } from '../../server/db/seed';
import { redactUrl } from '../../server/lib/logger';
import type { parseEnv } from '../../server/env';

type DbConfig = Pick<ReturnType<typeof parseEnv>, 'databaseUrl' | 'passwordCost' | 'seedDemo'>;

export function shownPath(path: string): string {
  if (/^postgres(ql)?:\/\//i.test(path)) return redactUrl(path);
  const rel = relative(process.cwd(), path);
  return rel && !rel.startsWith('..') ? rel : path;
}

/** Brings the schema up to date and seeds the demo into an empty database; returns what it did. */
export async function migrateAndSeed(config: DbConfig): Promise<string> {
  const db = createDb(config.databaseUrl);
  try {
    const ran = await migrateLatest(db);
    const schema = ran.length ? `applied ${ran.length} migration(s)` : 'schema up to date';
    const seeded = config.seedDemo && (await seedDemoIfEmpty(db, config.passwordCost));
    return `${schema}${seeded ? ', seeded the demo (every account: password reachline-demo)' : ''}`;
  } finally {
    await db.destroy();
  }
}
