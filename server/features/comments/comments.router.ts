/** Comments on a revision: every project member may read and write them. */
import { Router } from 'express';
import { commentSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams, paramId } from '../../lib/params';
import { currentUser } from '../../middleware/require-auth';
import { validate } from '../../middleware/validate';
import { revisionForMember } from '../projects/project-access';
import { insertComment, listComments } from './comments.repository';

export function commentsRouter(ctx: AppContext): Router {
  const router = Router();
  const params = idParams('revisionId');

  router.get('/revisions/:revisionId/comments', validate({ params }), async (req, res) => {
    const revisionId = paramId(req, 'revisionId');
    await revisionForMember(ctx.db, revisionId, currentUser(req).id);
    res.json(await listComments(ctx.db, revisionId));
  });

  router.post(
    '/revisions/:revisionId/comments',
    validate({ params, body: commentSchema }),
    async (req, res) => {
      const user = currentUser(req);
      const revisionId = paramId(req, 'revisionId');
      await revisionForMember(ctx.db, revisionId, user.id);
      const id = await insertComment(ctx.db, { revisionId, authorId: user.id, body: req.body.body });
      res.status(201).json((await listComments(ctx.db, revisionId)).find((c) => c.id === id));
    },
  );
  return router;
}
