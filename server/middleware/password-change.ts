/**
 * An account whose password an admin chose (a new account, a reset, `reachline admin create`)
 * must choose its own first: until it does, every API route but reading who is signed in,
 * changing the password and signing out answers 403 with the code `password_change_required`,
 * which the client answers with the change-password form.
 */
import type { RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';

const ALLOWED = new Set(['GET /auth/me', 'POST /auth/password', 'POST /auth/logout', 'POST /auth/login']);

export const passwordChangeGate: RequestHandler = (req, _res, next) => {
  if (!req.user?.mustChangePassword || ALLOWED.has(`${req.method} ${req.path}`)) return next();
  next(
    new HttpError(
      403,
      'password_change_required',
      'Choose a new password first: the one you signed in with was set by an admin.',
      [{ path: 'newPassword', message: 'is required before anything else' }],
    ),
  );
};
