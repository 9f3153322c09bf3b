/**
 * Defence in depth against cross-site requests (the session cookie is SameSite=lax already): a
 * state-changing request whose browser-sent Origin is not the app's own is refused. The app's
 * origin is APP_ORIGIN when configured; otherwise the request's own Host, which the host check
 * has already limited to the allowed names (so a rebinding page's Host never gets this far).
 */
import type { RequestHandler } from 'express';
import { forbidden } from '../lib/http-error';
import { hostAllowed } from './host-check';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export function sameOrigin(config: {
  appOrigin?: string | null;
  allowedHosts: readonly string[];
}): RequestHandler {
  return (req, _res, next) => {
    const origin = req.headers.origin;
    if (SAFE.has(req.method) || !origin) return next();
    let url: URL;
    try {
      url = new URL(origin);
    } catch {
      return next(forbidden('The request came from a page of another site.'));
    }
    const ok = config.appOrigin
      ? url.origin === config.appOrigin
      : url.host === req.headers.host && hostAllowed(url.host, config.allowedHosts);
    if (!ok) return next(forbidden('The request came from a page of another site.'));
    next();
  };
}
