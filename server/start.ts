/**
 * Starts the whole server: configuration, database (migrate, seed an empty one), the mail path
 * (the local fake SMTP server when SMTP_URL is absent, and the retry worker), the app, and the
 * HTTP listener. Every path comes from the configuration, so a harness can keep all writes in its
 * own temporary folders.
 */
import type { AddressInfo } from 'node:net';
import { createServer, type Server } from 'node:http';
import { mkdirSync } from 'node:fs';
import { createApp } from './app';
import { createDb } from './db/knex';
import { migrateLatest } from './db/migrate';
import { FirstAdminError, createFirstAdmin, seedDemoIfEmpty, warnAboutDemoInProduction } from './db/seed';
import { ConfigError, loadConfig, type Config } from './env';
import { startFakeSmtp, type FakeSmtp } from './mail/fake-smtp';
import { MailWorker } from './mail/mail-worker';
import { createLogger } from './lib/logger';
import { createStorage } from './storage/storage';

/** How long shutdown waits for requests in flight before cutting their connections. */
const SHUTDOWN_GRACE_MS = 8_000;

export interface RunningServer {
  url: string;
  port: number;
  config: Config;
  /** The local fake SMTP server, when SMTP_URL was not given. */
  fakeSmtp: FakeSmtp | null;
  close(): Promise<void>;
}

export async function startServer(overrides: Partial<Config> = {}): Promise<RunningServer> {
  const config = loadConfig(overrides);
  if (!config.storageUrl) mkdirSync(config.uploadDir, { recursive: true });
  const db = createDb(config.databaseUrl, { poolMax: config.databasePoolMax });
  let fakeSmtp: FakeSmtp | null = null;
  let worker: MailWorker | null = null;
  let server: Server | null = null;
  const logger = createLogger(config.logLevel ?? 'info');
  const storage = createStorage(config);
  /**
   * Graceful: stop accepting, let the requests in flight finish (idle keep-alive connections are
   * closed as they become idle; whatever still runs after SHUTDOWN_GRACE_MS is cut), then let the
   * mail worker finish the send in hand, then close the database.
   */
  const cleanup = async () => {
    if (server) {
      const s = server;
      const idle = setInterval(() => s.closeIdleConnections(), 50);
      const cut = setTimeout(() => s.closeAllConnections(), SHUTDOWN_GRACE_MS);
      await new Promise<void>((resolve) => s.close(() => resolve()));
      clearInterval(idle);
      clearTimeout(cut);
    }
    await worker?.stop();
    await fakeSmtp?.close();
    await db.destroy();
  };
  try {
    await migrateLatest(db);
    warnAboutDemoInProduction(config);
    if (config.seedDemo) await seedDemoIfEmpty(db, config.passwordCost);
    if (config.firstAdmin) {
      try {
        const id = await createFirstAdmin(db, config.firstAdmin, {
          passwordCost: config.passwordCost,
          mustChange: true,
        });
        if (id !== null)
          console.log(`Created the admin account ${config.firstAdmin.email} (from ADMIN_EMAIL).`);
      } catch (err) {
        if (err instanceof FirstAdminError)
          throw new ConfigError(`ADMIN_PASSWORD / ADMIN_EMAIL: ${err.message}`);
        throw err;
      }
    }
    if (!config.smtpUrl) fakeSmtp = await startFakeSmtp(db);
    worker = new MailWorker(db, {
      smtpUrl: config.smtpUrl ?? fakeSmtp!.url,
      from: config.mailFrom,
      retryBaseMs: config.mailRetryBaseMs,
      maxAttempts: config.mailMaxAttempts,
      pollMs: config.mailPollMs,
    });
    worker.start();
    const app = createApp(config, { db, mail: worker, logger, storage });
    server = createServer(app);
    await new Promise<void>((resolve, reject) => {
      server!.once('error', reject);
      server!.listen(config.port, config.host, () => resolve());
    });
    const { port } = server.address() as AddressInfo;
    const host = config.host === '0.0.0.0' || config.host === '::' ? 'localhost' : config.host;
    let closing: Promise<void> | null = null;
    return {
      url: `http://${host}:${port}`,
      port,
      config,
      fakeSmtp,
      close: () => {
        closing ??= (async () => {
          app.closeApp();
          await cleanup();
        })();
        return closing;
      },
    };
  } catch (err) {
    await cleanup().catch(() => undefined);
    throw err;
  }
}
