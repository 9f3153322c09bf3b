/**
 * Sign-in, sign-out and the signed-in person's own settings. The login route is rate limited per
 * IP and e-mail; every attempt leaves an audit row.
 */
import { Router, type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { PassportInstance } from '../../auth/passport';
import { loginSchema, updateMeSchema, type UserDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError, unauthorized } from '../../lib/http-error';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { recordFailedSignIn, recordSignIn, updateMe } from './auth.service';

function loginLimiter(ctx: AppContext): RequestHandler {
  return rateLimit({
    windowMs: ctx.config.loginRateWindowMs,
    limit: ctx.config.loginRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
    },
    handler: (_req, _res, next) => {
      next(
        new HttpError(429, 'too_many_attempts', 'Too many sign-in attempts; wait 15 minutes and try again.'),
      );
    },
  });
}

export function authRouter(ctx: AppContext, passport: PassportInstance): Router {
  const router = Router();

  router.post(
    '/auth/login',
    loginLimiter(ctx),
    typedRoute({ body: loginSchema }, ({ body }, req, res, next) => {
      const email = body.email.toLowerCase();
      const ip = req.ip ?? '';
      passport.authenticate(
        'local',
        (err: unknown, user: Express.User | false, info?: { message?: string }) => {
          if (err) return next(err);
          if (!user) {
            recordFailedSignIn(ctx, email, ip)
              .then(() =>
                next(
                  new HttpError(
                    401,
                    'sign_in_failed',
                    info?.message ?? 'The e-mail or the password is not right.',
                  ),
                ),
              )
              .catch(next);
            return;
          }
          // passport regenerates the session id here, so a session fixed before sign-in is worthless.
          req.logIn(user, (loginErr) => {
            if (loginErr) return next(loginErr);
            recordSignIn(ctx, user, ip)
              .then(() => res.json(user satisfies UserDto))
              .catch(next);
          });
        },
      )(req, res, next);
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

  return router;
}
