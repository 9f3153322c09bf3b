/**
 * `reachline admin create --email <e-mail> [--name <display name>]`: creates an admin account in
 * the configured database (DATABASE_URL), the way to a first admin on a production install where
 * no demo is seeded. The password is read from standard input (one line, so it never appears in
 * the process list or the shell history) and must pass the strength rule. Exit 0 created, 2 a
 * problem (one line per problem on stderr, `field: message`).
 */
import { z } from 'zod';
import { createDb } from '../db/knex';
import { migrateLatest } from '../db/migrate';
import { FirstAdminError, createFirstAdmin } from '../db/seed';
import { ConfigError, parseEnv } from '../env';
import { redactUrl } from '../lib/logger';
import type { CliIo } from './check-command';

const emailSchema = z.email();

export async function adminCreateCommand(
  email: string | undefined,
  name: string | undefined,
  io: CliIo,
  env: NodeJS.ProcessEnv = process.env,
): Promise<number> {
  if (!email || !emailSchema.safeParse(email).success) {
    io.err('email: give --email with an e-mail address\n');
    return 2;
  }
  const password = (await io.readStdin()).replace(/^\uFEFF/, '').split(/\r?\n/)[0] ?? '';
  if (!password) {
    io.err('password: type the password on standard input (one line)\n');
    return 2;
  }
  let config: ReturnType<typeof parseEnv>;
  try {
    config = parseEnv(env);
  } catch (err) {
    io.err(`${err instanceof ConfigError ? err.message : String(err)}\n`);
    return 2;
  }
  const db = createDb(config.databaseUrl);
  try {
    await migrateLatest(db);
    await createFirstAdmin(
      db,
      { email, password, displayName: name?.trim() || 'Administrator' },
      { passwordCost: config.passwordCost, mustChange: false, evenIfAdminExists: true },
    );
    io.out(`Created the admin account ${email.trim().toLowerCase()} in ${redactUrl(config.databaseUrl)}.\n`);
    return 0;
  } catch (err) {
    if (err instanceof FirstAdminError) {
      io.err(`${err.message}\n`);
      return 2;
    }
    throw err;
  } finally {
    await db.destroy();
  }
}
