/**
 * What `npm start` runs once the builds are done (bundled by scripts/lib/server-build.ts, run by
 * plain Node): migrates the database and seeds the demo into an empty one, printing one line with
 * the time taken, then starts the server (server/index.ts).
 */
import { migrateAndSeed, shownPath } from './lib/database';
import { timed } from './lib/timing';
import { ConfigError, parseEnv } from '../server/env';

async function main(): Promise<void> {
  const config = parseEnv();
  await timed('Database', `migrating ${shownPath(config.databaseUrl)}`, () => migrateAndSeed(config));
  // Imported only now: importing server/index starts the server.
  await import('../server/index');
}

main().catch((err: unknown) => {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(1);
});
