/**
 * The Host allow-list, before any route: a request whose Host header names another host answers
 * 421. Without it a DNS-rebinding page (attacker.example resolving to 127.0.0.1) is "same origin"
 * with the app in the browser's eyes and can drive the API with the victim's cookie.
 */
import type { RequestHandler } from 'express';

/** "name" matches that name on any port; "name:port" only that port. Lower case. */
export function hostAllowed(hostHeader: string | undefined, allowed: readonly string[]): boolean {
  if (!hostHeader) return false;
  const host = hostHeader.trim().toLowerCase();
  const name = host.startsWith('[') ? host.slice(0, host.indexOf(']') + 1) : host.split(':')[0];
  return allowed.some((entry) => entry === host || entry === name);
}

export function hostCheck(allowed: readonly string[]): RequestHandler {
  return (req, res, next) => {
    if (hostAllowed(req.headers.host, allowed)) return next();
    res.status(421).json({
      error: {
        code: 'misdirected',
        message: 'This server does not answer for that host name.',
        issues: [{ path: '(host)', message: 'is not one of the served host names' }],
      },
    });
  };
}
