/**
 * Sign-in, sign-out, the signed-in person's own settings and password. Failed sign-ins are
 * limited per account and per client address (counted in the database); every attempt leaves an
 * audit row. The client address is the socket's unless TRUST_PROXY names the proxies in front.
 */
import { Router } from 'express';
import type { PassportInstance } from '../../auth/passport';
import { changePasswordSchema, loginSchema, updateMeSchema, type UserDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError, unauthorized } from '../../lib/http-error';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { assertMaySignIn, changeOwnPassword, noteFailedSignIn, noteSignIn, updateMe } from './auth.service';
import { SIGN_IN_FAILED } from '../../auth/passport';

export function authRouter(ctx: AppContext, passport: PassportInstance): Router {
  const router = Router();

  router.post(
    '/auth/login',
    typedRoute({ body: loginSchema }, async ({ body }, req, res, next) => {
      const email = body.email.toLowerCase();
      const ip = req.ip ?? 'unknown';
      await assertMaySignIn(ctx, email, ip);
      passport.authenticate('local', (err: unknown, user: Express.User | false) => {
        if (err) return next(err);
        if (!user) {
          noteFailedSignIn(ctx, email, ip)
            .then(() => next(new HttpError(401, 'sign_in_failed', SIGN_IN_FAILED)))
            .catch(next);
          return;
        }
        // passport regenerates the session id here, so a session fixed before sign-in is worthless.
        req.logIn(user, (loginErr) => {
          if (loginErr) return next(loginErr);
          noteSignIn(ctx, user, ip)
            .then(() => res.json(user satisfies UserDto))
            .catch(next);
        });
      })(req, res, next);
    }),
  );

  router.post('/auth/logout', (req, res, next) => {
    if (!req.user) {
      res.status(204).end();
      return;
    }
    req.logOut((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie('reachline.sid');
        res.status(204).end();
      });
    });
  });

  router.get('/auth/me', (req, res) => {
    if (!req.user) throw unauthorized();
    res.json(req.user);
  });

  router.patch(
    '/auth/me',
    typedRoute({ body: updateMeSchema }, async ({ body }, req, res) => {
      res.json(await updateMe(ctx, currentUser(req), body));
    }),
  );

  // Every session of the account ends; this one is signed in again under the new session version.
  router.post(
    '/auth/password',
    typedRoute({ body: changePasswordSchema }, async ({ body }, req, res, next) => {
      const user = currentUser(req);
      await changeOwnPassword(ctx, user, body);
      const fresh = { ...user, mustChangePassword: false };
      req.logIn(fresh, (err) => {
        if (err) return next(err);
        res.json(fresh satisfies UserDto);
      });
    }),
  );

  return router;
}
