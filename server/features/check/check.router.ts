/** POST /api/check: the engine on one document, nothing stored (for scripts and quick checks). */
import { Router } from 'express';
import { checkRequestSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { validate } from '../../middleware/validate';
import { evaluateOnServer } from '../revisions/evaluate';

export function checkRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/check', validate({ body: checkRequestSchema }), async (req, res) => {
    res.json(await evaluateOnServer(ctx.db, req.body.input, { stations: true }));
  });
  return router;
}
