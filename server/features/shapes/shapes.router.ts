/**
 * GET /api/shapes (search; `projectId` adds that project's shapes) and POST /api/shapes/import
 * (multipart CSV in `file`, and `projectId` for a project's shapes; without it, an admin's
 * organisation import).
 */
import { Router } from 'express';
import { shapesQuerySchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { typedRoute } from '../../lib/route';
import { singleFileUpload } from '../../middleware/multipart';
import { currentUser } from '../../middleware/require-auth';
import { importShapes, searchShapes } from './shapes.service';

const IMPORT_MAX_BYTES = 5 * 1024 * 1024;

export function shapesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/shapes',
    typedRoute({ query: shapesQuerySchema }, async ({ query }, req, res) => {
      res.json(await searchShapes(ctx, currentUser(req), query));
    }),
  );
  router.post(
    '/shapes/import',
    singleFileUpload({ maxBytes: IMPORT_MAX_BYTES, fields: 2 }),
    async (req, res) => {
      const fields = (req.body ?? {}) as Record<string, unknown>;
      res.status(201).json(await importShapes(ctx, currentUser(req), req.file, fields));
    },
  );
  return router;
}
