/** POST /api/check: the engine on one document, nothing stored (for scripts and quick checks). */
import { Router } from 'express';
import { checkRequestSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { projectForMember } from '../projects/project-access';
import { evaluateOnServer } from '../revisions/evaluate';

export function checkRouter(ctx: AppContext): Router {
  const router = Router();
  router.post(
    '/check',
    typedRoute({ body: checkRequestSchema }, async ({ body }, req, res) => {
      // A project's imported shapes only for its members; without one, the organisation's.
      if (body.projectId !== undefined) await projectForMember(ctx.db, body.projectId, currentUser(req).id);
      res.json(
        await evaluateOnServer(ctx.db, body.input, { stations: true, projectId: body.projectId ?? null }),
      );
    }),
  );
  return router;
}
