/**
 * After an admin's reset the account must choose its own password first: until it does, every API
 * route but reading who is signed in, changing the password and signing out answers 403.
 */
import type { RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';

const ALLOWED = new Set(['GET /auth/me', 'POST /auth/password', 'POST /auth/logout', 'POST /auth/login']);

export const passwordChangeGate: RequestHandler = (req, _res, next) => {
  if (!req.user?.mustChangePassword || ALLOWED.has(`${req.method} ${req.path}`)) return next();
  next(
    new HttpError(403, 'password_change_required', 'Choose a new password first: an admin reset yours.', [
      { path: 'newPassword', message: 'is required before anything else' },
    ]),
  );
};
