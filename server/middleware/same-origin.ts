/**
 * Defence in depth against cross-site requests (the session cookie is SameSite=lax already): a
 * state-changing request whose browser-sent Origin names another host is refused.
 */
import type { RequestHandler } from 'express';
import { forbidden } from '../lib/http-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export const sameOrigin: RequestHandler = (req, _res, next) => {
  const origin = req.headers.origin;
  if (SAFE.has(req.method) || !origin) return next();
  let host: string;
  try {
    host = new URL(origin).host;
  } catch {
    return next(forbidden('The request came from a page of another site.'));
  }
  const expected =
    req.headers['x-forwarded-host'] && req.app.get('trust proxy')
      ? String(req.headers['x-forwarded-host'])
      : req.headers.host;
  if (host !== expected) return next(forbidden('The request came from a page of another site.'));
  next();
};
