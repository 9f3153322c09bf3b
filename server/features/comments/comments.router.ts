/** Comments on a revision: every project member may read and write them. */
import { Router } from 'express';
import { commentSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { addComment, revisionComments } from './comments.service';

export function commentsRouter(ctx: AppContext): Router {
  const router = Router();
  const params = idParams('revisionId');

  router.get(
    '/revisions/:revisionId/comments',
    typedRoute({ params }, async ({ params }, req, res) => {
      res.json(await revisionComments(ctx, currentUser(req), params.revisionId));
    }),
  );

  router.post(
    '/revisions/:revisionId/comments',
    typedRoute({ params, body: commentSchema }, async ({ params, body }, req, res) => {
      res.status(201).json(await addComment(ctx, currentUser(req), params.revisionId, body.body));
    }),
  );
  return router;
}
