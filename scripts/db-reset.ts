/**
 * npm run db:reset [-- --yes]: deletes the local SQLite database and the uploads folder, then
 * migrates and seeds the demo. Asks first unless --yes; refuses in production and while something
 * listens on the server's port (a running server would keep the deleted database open).
 */
import { existsSync, rmSync } from 'node:fs';
import { connect } from 'node:net';
import { createInterface } from 'node:readline/promises';
import { migrateAndSeed, shownPath } from './lib/database';
import { timed } from './lib/timing';
import { ConfigError, parseEnv } from '../server/env';

/** True when something accepts a connection on host:port within 300 ms. */
function listening(host: string, port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect({ host, port });
    const done = (answer: boolean) => {
      socket.destroy();
      resolve(answer);
    };
    socket.setTimeout(300, () => done(false));
    socket.once('connect', () => done(true));
    socket.once('error', () => done(false));
  });
}

async function confirmed(what: string): Promise<boolean> {
  // `npm run db:reset --yes` hands --yes to npm itself, which passes it on as npm_config_yes.
  if (process.argv.includes('--yes') || process.env.npm_config_yes === 'true') return true;
  if (!process.stdin.isTTY) {
    console.error(
      `db:reset deletes ${what}. Not a terminal, so nothing to ask: run npm run db:reset -- --yes`,
    );
    return false;
  }
  const rl = createInterface({ input: process.stdin, output: process.stdout });
  const answer = await rl.question(`This deletes ${what}, then seeds the demo. Type "yes" to go on: `);
  rl.close();
  return answer.trim().toLowerCase() === 'yes';
}

async function main(): Promise<number> {
  const config = parseEnv();
  if (config.nodeEnv === 'production') {
    console.error('db:reset refuses to run with NODE_ENV=production.');
    return 1;
  }
  if (/^postgres(ql)?:\/\//i.test(config.databaseUrl)) {
    console.error(
      'db:reset works on the local SQLite file only; on PostgreSQL drop and create the database with your own tools, then npm run db:seed.',
    );
    return 1;
  }
  if (config.databaseUrl === ':memory:') {
    console.error('DATABASE_URL is :memory:, there is no database file to reset.');
    return 1;
  }
  const host = config.host === '0.0.0.0' || config.host === '::' ? '127.0.0.1' : config.host;
  if (config.port !== 0 && (await listening(host, config.port))) {
    console.error(
      `Something is listening on ${host}:${config.port} (a running Reachline?). Stop it first: it would keep the deleted database open.`,
    );
    return 1;
  }
  const what = `every project, revision, account and attachment in ${shownPath(config.databaseUrl)} and ${shownPath(config.uploadDir)}/`;
  if (!(await confirmed(what))) {
    console.log('Nothing was deleted.');
    return 1;
  }
  await timed(
    'Delete',
    `removing ${shownPath(config.databaseUrl)} and ${shownPath(config.uploadDir)}/`,
    () => {
      const files = ['', '-wal', '-shm', '-journal']
        .map((s) => config.databaseUrl + s)
        .filter((f) => existsSync(f));
      for (const f of files) rmSync(f, { force: true });
      rmSync(config.uploadDir, { recursive: true, force: true });
      return files.length ? 'done' : 'there was no database yet';
    },
  );
  await timed('Database', `migrating ${shownPath(config.databaseUrl)}`, () =>
    migrateAndSeed({ ...config, seedDemo: true }),
  );
  return 0;
}

main().then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(err instanceof ConfigError ? err.message : err);
    process.exit(1);
  },
);
