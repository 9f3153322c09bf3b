/** POST /api/check: the engine on one document, nothing stored (for scripts and quick checks). */
import { Router } from 'express';
import { checkRequestSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { typedRoute } from '../../lib/route';
import { evaluateOnServer } from '../revisions/evaluate';

export function checkRouter(ctx: AppContext): Router {
  const router = Router();
  router.post(
    '/check',
    typedRoute({ body: checkRequestSchema }, async ({ body }, _req, res) => {
      res.json(await evaluateOnServer(ctx.db, body.input, { stations: true }));
    }),
  );
  return router;
}
