/** GET /api/shapes (search) and POST /api/shapes/import (multipart CSV, field `file`). */
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { shapesQuerySchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError, badRequest } from '../../lib/http-error';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { typedRoute } from '../../lib/route';
import { importShapes, searchShapes } from './shapes.service';

const IMPORT_MAX_BYTES = 5 * 1024 * 1024;

const csvUpload: RequestHandler = (req, res, next) => {
  multer({ storage: multer.memoryStorage(), limits: { fileSize: IMPORT_MAX_BYTES, files: 1 } }).single(
    'file',
  )(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(
          new HttpError(413, 'too_large', 'The shapes file is larger than 5 MiB.', [
            { path: 'file', message: 'is too large' },
          ]),
        );
      return next(
        badRequest(`The upload is not valid: ${err.message}.`, [
          { path: err.field ?? 'file', message: err.message },
        ]),
      );
    }
    next(err);
  });
};

export function shapesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/shapes',
    typedRoute({ query: shapesQuerySchema }, async ({ query }, _req, res) => {
      res.json(await searchShapes(ctx, query));
    }),
  );
  router.post(
    '/shapes/import',
    requireRole(['architect', 'fabricator', 'engineer'], 'import shapes'),
    csvUpload,
    async (req, res) => {
      res.status(201).json(await importShapes(ctx, currentUser(req), req.file));
    },
  );
  return router;
}
