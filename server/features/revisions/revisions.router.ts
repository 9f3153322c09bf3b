/** Revisions, submission and review. There is deliberately no route that changes a revision. */
import { Router } from 'express';
import { createRevisionSchema, reviewSchema, submitSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import {
  awaitingReview,
  getRevisionJson,
  listRevisions,
  reviewRevision,
  saveRevisionForMember,
  submitRevision,
} from './revisions.service';

export function revisionsRouter(ctx: AppContext): Router {
  const router = Router();
  const cantileverParams = idParams('cantileverId');
  const revisionParams = idParams('revisionId');

  router.get(
    '/cantilevers/:cantileverId/revisions',
    typedRoute({ params: cantileverParams }, async ({ params }, req, res) => {
      res.json(await listRevisions(ctx, currentUser(req), params.cantileverId));
    }),
  );

  router.post(
    '/cantilevers/:cantileverId/revisions',
    typedRoute(
      { params: cantileverParams, body: createRevisionSchema },
      async ({ params, body }, req, res) => {
        res.status(201).json(await saveRevisionForMember(ctx, currentUser(req), params.cantileverId, body));
      },
    ),
  );

  router.get(
    '/reviews/awaiting',
    typedRoute({}, async (_input, req, res) => {
      res.json(await awaitingReview(ctx, currentUser(req)));
    }),
  );

  router.get(
    '/revisions/:revisionId',
    typedRoute({ params: revisionParams }, async ({ params }, req, res) => {
      res.type('application/json').send(await getRevisionJson(ctx, currentUser(req), params.revisionId));
    }),
  );

  // A saved revision is a record: changing or deleting one is refused for everybody.
  router.all('/revisions/:revisionId', () => {
    throw new HttpError(
      405,
      'immutable',
      'A saved revision cannot be changed or deleted; save a new revision instead.',
    );
  });

  router.post(
    '/revisions/:revisionId/submit',
    typedRoute({ params: revisionParams, body: submitSchema }, async ({ params, body }, req, res) => {
      res.json(await submitRevision(ctx, currentUser(req), params.revisionId, body));
    }),
  );

  router.post(
    '/revisions/:revisionId/reviews',
    typedRoute({ params: revisionParams, body: reviewSchema }, async ({ params, body }, req, res) => {
      res.status(201).json(await reviewRevision(ctx, currentUser(req), params.revisionId, body));
    }),
  );

  return router;
}
