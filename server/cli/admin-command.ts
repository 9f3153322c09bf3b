/**
 * `reachline admin create --email <e-mail> [--name <display name>]`: creates an admin account in
 * the configured database (DATABASE_URL), the way to a first admin on a production install where
 * no demo is seeded. The password is read from standard input (one line, so it never appears in
 * the process list or the shell history) and must pass the strength rule. Exit 0 created, 2 a
 * problem (one line per problem on stderr, `field: message`). Like an account an admin makes on
 * the Team screen, it gets a welcome e-mail through the outbox (sent by the server's mail worker,
 * without the password) and must choose a new password at its first sign-in.
 */
import { z } from 'zod';
import { createDb } from '../db/knex';
import { migrateLatest } from '../db/migrate';
import { FirstAdminError, createFirstAdmin } from '../db/seed';
import { ConfigError, parseEnv } from '../env';
import { queueWelcomeMail } from '../features/admin/welcome-mail';
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
    const displayName = name?.trim() || 'Administrator';
    const address = email.trim().toLowerCase();
    await createFirstAdmin(
      db,
      { email, password, displayName },
      { passwordCost: config.passwordCost, mustChange: true, evenIfAdminExists: true },
    );
    await queueWelcomeMail(db, config, { email: address, displayName, role: 'admin' }, null);
    io.out(
      `Created the admin account ${address} in ${redactUrl(config.databaseUrl)}; ` +
        'a welcome e-mail is queued, and a new password is asked for at the first sign-in.\n',
    );
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
