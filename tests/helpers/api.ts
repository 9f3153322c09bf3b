/**
 * The API under test: createApp on a fresh copy of the migrated database, with a small team, one
 * project and one cantilever that has revision 1 (computed by the engine). Passwords are hashed
 * with a low scrypt cost so the suite stays fast; everything else is as in production.
 */
import type { Knex } from 'knex';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createApp, type ReachlineApp } from '../../server/app';
import type { Config } from '../../server/env';
import { createDb } from '../../server/db/knex';
import { EAST_DECK_DESIGN } from '../../server/db/demo-designs';
import { insertCantilever } from '../../server/features/cantilevers/cantilevers.repository';
import { cantileverForMember } from '../../server/features/projects/project-access';
import { addMember, insertProject } from '../../server/features/projects/projects.repository';
import { saveRevision } from '../../server/features/revisions/revisions.service';
import { findUserById, insertUser, toUserDto } from '../../server/features/users/users.repository';
import { hashPassword } from '../../server/lib/password';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { MailWorker } from '../../server/mail/mail-worker';
import { createRevisionSchema, type Role } from '../../shared/schemas/api';
import { designSchema, type DesignInput } from '../../shared/schemas/design';
import { freshTestDirs, type TestDirs } from './test-db';

export const PASSWORD = 'correct horse battery';

export const TEAM = {
  admin: { email: 'admin@example.test', displayName: 'Test Admin', role: 'admin' },
  architect: { email: 'architect@example.test', displayName: 'Test Architect', role: 'architect' },
  fabricator: { email: 'fabricator@example.test', displayName: 'Test Fabricator', role: 'fabricator' },
  engineer: { email: 'engineer@example.test', displayName: 'Test Engineer', role: 'engineer' },
  engineer2: { email: 'engineer2@example.test', displayName: 'Second Engineer', role: 'engineer' },
  /** Not a member of the project. */
  outsider: { email: 'outsider@example.test', displayName: 'Out Sider', role: 'engineer' },
} satisfies Record<string, { email: string; displayName: string; role: Role }>;
export type Person = keyof typeof TEAM;

export function baseDesign(): DesignInput {
  return designSchema.parse(structuredClone(EAST_DECK_DESIGN));
}

export interface TestEnv {
  app: ReachlineApp;
  db: Knex;
  config: Config;
  dirs: TestDirs;
  ids: Record<Person, number>;
  projectId: number;
  cantileverId: number;
  revisionId: number;
  /** The mail worker (sending to the fake SMTP server or to `smtpUrl`), when asked for. */
  worker: MailWorker | null;
  smtp: FakeSmtp | null;
  kicks: number;
  login(person: Person): Promise<TestAgent>;
  close(): Promise<void>;
}

export interface TestEnvOptions {
  /** 'fake': start the fake SMTP server and a worker sending to it; a URL: a worker sending there. */
  mail?: 'none' | 'fake' | { smtpUrl: string };
  config?: Partial<Config>;
}

export async function createTestEnv(options: TestEnvOptions = {}): Promise<TestEnv> {
  const dirs = await freshTestDirs();
  const config: Config = {
    nodeEnv: 'test',
    port: 0,
    host: '127.0.0.1',
    databaseUrl: dirs.databaseUrl,
    dataDir: dirs.root,
    sessionSecret: 'test-secret-that-is-long-enough-for-tests',
    smtpUrl: null,
    uploadDir: dirs.uploadDir,
    mailFrom: 'Reachline <reachline@example.test>',
    attachmentMaxBytes: 64 * 1024,
    distDir: `${dirs.root}/dist`,
    loginRateLimit: 1000,
    loginRateWindowMs: 60_000,
    passwordCost: 16,
    mailRetryBaseMs: 1,
    mailMaxAttempts: 5,
    mailPollMs: 60_000,
    trustProxy: false,
    seedDemo: false,
    ...options.config,
  };
  const db = createDb(config.databaseUrl);
  try {
    return await populate(db, config, dirs, options);
  } catch (err) {
    await db.destroy();
    dirs.remove();
    throw err;
  }
}

async function populate(db: Knex, config: Config, dirs: TestDirs, options: TestEnvOptions): Promise<TestEnv> {
  const hash = await hashPassword(PASSWORD, config.passwordCost);
  const ids = {} as Record<Person, number>;
  for (const [key, person] of Object.entries(TEAM) as [Person, (typeof TEAM)[Person]][]) {
    ids[key] = await insertUser(db, { ...person, passwordHash: hash });
  }
  const projectId = await insertProject(db, {
    name: 'Test terrace',
    site: 'Test site',
    codeBasis: 'test basis',
    units: 'US',
    createdBy: ids.architect,
  });
  for (const person of ['admin', 'architect', 'fabricator', 'engineer', 'engineer2'] as const)
    await addMember(db, projectId, ids[person]);
  const cantileverId = await insertCantilever(db, { projectId, name: 'Test beam', description: '' });
  const architect = toUserDto((await findUserById(db, ids.architect))!);
  const first = await saveRevision(
    db,
    architect,
    await cantileverForMember(db, cantileverId, ids.architect),
    // What the route hands the service: the body through its schema (the document validated and parsed).
    createRevisionSchema.parse({ baseRevision: null, message: 'First design', input: baseDesign() }),
  );

  let smtp: FakeSmtp | null = null;
  let worker: MailWorker | null = null;
  if (options.mail === 'fake') smtp = await startFakeSmtp(db);
  const smtpUrl =
    options.mail === 'fake' ? smtp!.url : typeof options.mail === 'object' ? options.mail.smtpUrl : null;
  if (smtpUrl) {
    worker = new MailWorker(db, {
      smtpUrl,
      from: config.mailFrom,
      retryBaseMs: config.mailRetryBaseMs,
      maxAttempts: config.mailMaxAttempts,
      pollMs: config.mailPollMs,
    });
  }
  const env: TestEnv = {
    app: undefined as unknown as ReachlineApp,
    db,
    config,
    dirs,
    ids,
    projectId,
    cantileverId,
    revisionId: first.id,
    worker,
    smtp,
    kicks: 0,
    async login(person) {
      const agent = request.agent(env.app);
      await agent.post('/api/auth/login').send({ email: TEAM[person].email, password: PASSWORD }).expect(200);
      return agent;
    },
    async close() {
      env.app.closeApp();
      await worker?.stop();
      await smtp?.close();
      await db.destroy();
      dirs.remove();
    },
  };
  // Tests send mail explicitly with worker.runOnce(), so a kick only counts.
  env.app = createApp(config, { db, mail: { kick: () => void (env.kicks += 1) } });
  return env;
}
