/** POST /api/check: the engine on one document, nothing stored (for scripts and quick checks). */
import { Router } from 'express';
import { checkRequestSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { checkDesign } from './check.service';

export function checkRouter(ctx: AppContext): Router {
  const router = Router();
  router.post(
    '/check',
    typedRoute({ body: checkRequestSchema }, async ({ body }, req, res) => {
      res.type('application/json').send(await checkDesign(ctx, currentUser(req), body));
    }),
  );
  return router;
}
