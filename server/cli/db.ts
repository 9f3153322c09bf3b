/**
 * npm run db:migrate | db:seed: brings the configured database to the latest schema, and seeds the
 * demo into it when it has no accounts yet (never over real data).
 */
import { createDb } from '../db/knex';
import { migrateLatest } from '../db/migrate';
import { seedDemoIfEmpty } from '../db/seed';
import { ConfigError, parseEnv } from '../env';

async function main(command: string | undefined): Promise<number> {
  if (command !== 'migrate' && command !== 'seed') {
    console.error('usage: node --import tsx server/cli/db.ts migrate|seed');
    return 2;
  }
  const config = parseEnv();
  const db = createDb(config.databaseUrl);
  try {
    const ran = await migrateLatest(db);
    console.log(
      ran.length
        ? `Applied ${ran.length} migration(s): ${ran.join(', ')}`
        : 'The database schema is up to date.',
    );
    if (command === 'seed') {
      const seeded = await seedDemoIfEmpty(db, config.passwordCost);
      console.log(
        seeded
          ? 'Seeded the demo project and accounts (password: reachline-demo).'
          : 'The database already has accounts; the demo was not seeded.',
      );
    }
    console.log(`Database: ${config.databaseUrl}`);
    return 0;
  } finally {
    await db.destroy();
  }
}

main(process.argv[2]).then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(err instanceof ConfigError ? err.message : err);
    process.exit(1);
  },
);
