/** GET /revisions/:revisionId/package.pdf: the calculation package of a stored revision. */
import { Router } from 'express';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { revisionPackage } from './package.service';

export function packageRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/revisions/:revisionId/package.pdf',
    typedRoute({ params: idParams('revisionId') }, async ({ params }, req, res) => {
      const file = await revisionPackage(ctx, currentUser(req), params.revisionId);
      res.attachment(file.filename);
      res.type('application/pdf').send(file.pdf);
    }),
  );
  return router;
}
