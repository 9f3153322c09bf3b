/**
 * The Express app: security headers, sessions in the database, passport, the API routers, one
 * error handler, and the built client. No port is opened here (supertest imports it).
 */
import express, { type Express, type RequestHandler } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { Knex } from 'knex';
import { createPassport } from './auth/passport';
import { GuardedSessionStore } from './auth/session-store';
import type { AppContext, MailKick } from './context';
import { LOCAL_HOSTS, type Config } from './env';
import { adminRouter } from './features/admin/admin.router';
import { attachmentsRouter } from './features/attachments/attachments.router';
import { authRouter } from './features/auth/auth.router';
import { checkRouter } from './features/check/check.router';
import { commentsRouter } from './features/comments/comments.router';
import { packageRouter } from './features/package/package.router';
import { plateScheduleRouter } from './features/plate-schedule/plate-schedule.router';
import { projectsRouter } from './features/projects/projects.router';
import { revisionsRouter } from './features/revisions/revisions.router';
import { shapesRouter } from './features/shapes/shapes.router';
import { decoyHash } from './lib/password';
import { errorHandler, notFoundApi } from './middleware/error-handler';
import { requireAuth } from './middleware/require-auth';
import { hostCheck } from './middleware/host-check';
import { passwordChangeGate } from './middleware/password-change';
import { sameOrigin } from './middleware/same-origin';
import { serveClient } from './static-client';
import { healthRouter } from './features/health/health.router';
import { createLogger, httpLogger } from './lib/logger';
import type { Logger } from 'pino';
import { createStorage, type Storage } from './storage/storage';
import { createEnginePool, engineThreads } from './engine/engine-pool';

export interface AppDeps {
  db: Knex;
  mail: MailKick;
  /** Default: a JSON logger at config.logLevel (silent when unset, as in tests). */
  logger?: Logger;
  /** Default: the storage the configuration names (createStorage). */
  storage?: Storage;
}

export type ReachlineApp = Express & { closeApp(): void };

/** Routes anyone may call without signing in. */
const PUBLIC = new Set(['POST /auth/login', 'POST /auth/logout', 'GET /health']);

const authGate: RequestHandler = (req, res, next) => {
  if (PUBLIC.has(`${req.method} ${req.path}`)) return next();
  requireAuth(req, res, next);
};

export function createApp(config: Config, deps: AppDeps): ReachlineApp {
  const storage = deps.storage ?? createStorage(config);
  const engine = createEnginePool(engineThreads(config.engineThreads ?? 0));
  const ctx: AppContext = { config, db: deps.db, mail: deps.mail, storage, engine };
  const app = express() as ReachlineApp;
  app.disable('x-powered-by');
  const logger = deps.logger ?? createLogger(config.logLevel ?? 'silent');
  app.use(httpLogger(logger));
  // Only the configured proxies' X-Forwarded-For is believed (a hop count or their addresses).
  if (config.trustProxy !== false) app.set('trust proxy', config.trustProxy === true ? 1 : config.trustProxy);
  const allowedHosts = config.allowedHosts ?? LOCAL_HOSTS;
  const https = config.appOrigin?.startsWith('https://') ?? false;
  app.use(hostCheck(allowedHosts));

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'"],
          // Charts and the sketch set style attributes; attributes cannot run scripts.
          styleSrcAttr: ["'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
        },
      },
      // Plain http on a local machine is normal; https deployments set HSTS at their proxy.
      strictTransportSecurity: https,
    }),
  );

  const store = new GuardedSessionStore(deps.db);
  let decoy: Promise<string> | null = null;
  const passport = createPassport(
    deps.db,
    () => (decoy ??= decoyHash(config.passwordCost)),
    (req) => store.takeAccount(req.sessionID),
  );

  const api = express.Router();
  api.use(sameOrigin({ appOrigin: config.appOrigin, allowedHosts }));
  // Before sessions: a load balancer's probe carries no cookie and needs none.
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use(healthRouter(ctx));
  if (https) {
    // APP_ORIGIN is https: people only reach the app through TLS (at a proxy, maybe with no
    // X-Forwarded-Proto we may trust), so the session cookie is always marked Secure.
    api.use((req, _res, next) => {
      Object.defineProperty(req, 'secure', { value: true, configurable: true });
      next();
    });
  }
  api.use(express.json({ limit: '1mb' }));
  api.use(
    session({
      name: 'reachline.sid',
      secret: config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      // Without `proxy`, express-session asks req.secure, which honours "trust proxy" (and the override above).
      cookie: { httpOnly: true, sameSite: 'lax', secure: https ? true : 'auto', maxAge: 12 * 60 * 60 * 1000 },
    }),
  );
  api.use(passport.session());
  api.use(authGate);
  api.use(passwordChangeGate);
  api.use(authRouter(ctx, passport));
  api.use(projectsRouter(ctx));
  api.use(commentsRouter(ctx));
  api.use(plateScheduleRouter(ctx));
  api.use(packageRouter(ctx));
  api.use(revisionsRouter(ctx));
  api.use(attachmentsRouter(ctx));
  api.use(shapesRouter(ctx));
  api.use(checkRouter(ctx));
  api.use(adminRouter(ctx));
  api.use(notFoundApi);
  app.use('/api', api);

  serveClient(app, config.distDir);
  app.use(errorHandler);
  app.closeApp = () => {
    store.close();
    // In-flight requests have finished (the server closed first); idle workers just stop.
    void engine.close().catch(() => undefined);
  };
  return app;
}
