/** Revisions, submission and review. There is deliberately no route that changes a revision. */
import { Router } from 'express';
import { createRevisionSchema, reviewSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import { idParams, paramId } from '../../lib/params';
import { currentUser } from '../../middleware/require-auth';
import { validate } from '../../middleware/validate';
import {
  getRevision,
  listRevisions,
  reviewRevision,
  saveRevisionForMember,
  submitRevision,
} from './revisions.service';

export function revisionsRouter(ctx: AppContext): Router {
  const router = Router();

  router.get(
    '/cantilevers/:cantileverId/revisions',
    validate({ params: idParams('cantileverId') }),
    async (req, res) => {
      res.json(await listRevisions(ctx, currentUser(req), paramId(req, 'cantileverId')));
    },
  );

  router.post(
    '/cantilevers/:cantileverId/revisions',
    validate({ params: idParams('cantileverId'), body: createRevisionSchema }),
    async (req, res) => {
      res
        .status(201)
        .json(await saveRevisionForMember(ctx, currentUser(req), paramId(req, 'cantileverId'), req.body));
    },
  );

  router.get('/revisions/:revisionId', validate({ params: idParams('revisionId') }), async (req, res) => {
    res.json(await getRevision(ctx, currentUser(req), paramId(req, 'revisionId')));
  });

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
    validate({ params: idParams('revisionId') }),
    async (req, res) => {
      res.json(await submitRevision(ctx, currentUser(req), paramId(req, 'revisionId')));
    },
  );

  router.post(
    '/revisions/:revisionId/reviews',
    validate({ params: idParams('revisionId'), body: reviewSchema }),
    async (req, res) => {
      res.status(201).json(await reviewRevision(ctx, currentUser(req), paramId(req, 'revisionId'), req.body));
    },
  );

  return router;
}
