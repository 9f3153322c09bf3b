/**
 * Structured JSON logs (pino), one line per event; requests through pino-http with a request id
 * (the caller's X-Request-Id when it is a plain token, else a new UUID), echoed in the response's
 * X-Request-Id so a user's report can be found in the logs of whichever instance answered.
 */
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import pino, { type Logger } from 'pino';
import { pinoHttp } from 'pino-http';

export function createLogger(level = 'info'): Logger {
  return pino({
    level,
    base: { pid: process.pid, app: 'reachline' },
    // Never a password, a session cookie or a cookie being set.
    redact: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]', '*.password'],
  });
}

const REQUEST_ID = /^[A-Za-z0-9._:-]{1,100}$/;

export function httpLogger(logger: Logger) {
  return pinoHttp({
    logger,
    genReqId(req: IncomingMessage, res: ServerResponse) {
      const given = req.headers['x-request-id'];
      const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
      res.setHeader('X-Request-Id', id);
      return id;
    },
    customLogLevel(_req, res, err) {
      // A 4xx is the client's business (a wrong password, a stale save): info, like a success.
      return err || res.statusCode >= 500 ? 'error' : 'info';
    },
    // The health probe of a load balancer every few seconds is not worth a line.
    autoLogging: { ignore: (req) => (req as { originalUrl?: string }).originalUrl === '/api/health' },
    serializers: {
      req: (req: { id: unknown; method: string; url: string }) => ({
        id: req.id,
        method: req.method,
        url: req.url,
      }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}

/** Removes the password from a postgres:// URL for messages and logs. */
export function redactUrl(url: string): string {
  try {
    const u = new URL(url);
    if (u.password) u.password = '***';
    return u.protocol.startsWith('postgres') ? u.toString() : url;
  } catch {
    return url;
  }
}
