/** Guards: 401 when nobody is signed in, 403 when the role may not. */
import type { Request, RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/api';
import { forbidden, unauthorized } from '../lib/http-error';

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthorized());
};

export function requireRole(roles: readonly Role[], what: string): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthorized());
    if (!roles.includes(req.user.role))
      return next(forbidden(`Your role (${req.user.role}) may not ${what}.`));
    next();
  };
}

/** The signed-in user; routes behind requireAuth only. */
export function currentUser(req: Request): Express.User {
  if (!req.user) throw unauthorized();
  return req.user;
}
