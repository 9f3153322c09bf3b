/** Drawings and photos kept with a cantilever: list, upload, download, describe, delete. */
import { Router } from 'express';
import { z } from 'zod';
import { updateAttachmentSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { singleFileUpload } from '../../middleware/multipart';
import { currentUser } from '../../middleware/require-auth';
import {
  assertMayUpload,
  attachmentForMember,
  attachmentsOf,
  editAttachment,
  removeAttachment,
  storeAttachment,
} from './attachments.service';

const INLINE_TYPES = new Set(['application/pdf', 'image/png', 'image/jpeg']);

export function attachmentsRouter(ctx: AppContext): Router {
  const router = Router();
  const params = idParams('cantileverId');

  router.get(
    '/cantilevers/:cantileverId/attachments',
    typedRoute({ params }, async ({ params }, req, res) => {
      res.json(await attachmentsOf(ctx, currentUser(req), params.cantileverId));
    }),
  );

  router.post(
    '/cantilevers/:cantileverId/attachments',
    typedRoute({ params }, async ({ params }, req, _res, next) => {
      await assertMayUpload(ctx, currentUser(req), params.cantileverId);
      next();
    }),
    // `description` (up to 500 characters, so 2000 bytes of UTF-8) and `revisionId` beside the file.
    singleFileUpload({ maxBytes: ctx.config.attachmentMaxBytes, fields: 2, fieldBytes: 2048 }),
    typedRoute({ params }, async ({ params }, req, res) => {
      res
        .status(201)
        .json(await storeAttachment(ctx, currentUser(req), params.cantileverId, req.file, req.body));
    }),
  );

  router.get(
    '/attachments/:attachmentId',
    typedRoute(
      {
        params: idParams('attachmentId'),
        query: z.object({ inline: z.enum(['0', '1']).optional() }),
      },
      async ({ params, query }, req, res) => {
        const { row, bytes } = await attachmentForMember(ctx, currentUser(req), params.attachmentId);
        const inline = query.inline === '1' && INLINE_TYPES.has(row.mime_type);
        res.attachment(row.original_name); // sets a type from the name: overwritten with the sniffed one below
        res.setHeader('Content-Type', row.mime_type);
        res.setHeader('Content-Length', String(bytes.length));
        res.setHeader('X-Content-Type-Options', 'nosniff');
        // Nothing in a stored file may run scripts; Chromium will not show a PDF in a sandboxed document,
        // and a PDF viewer runs no page scripts of ours, so only the other types get `sandbox`.
        res.setHeader(
          'Content-Security-Policy',
          row.mime_type === 'application/pdf'
            ? "default-src 'none'; img-src 'self'; object-src 'self'"
            : "default-src 'none'; img-src 'self'; sandbox",
        );
        res.setHeader('Cache-Control', 'private, no-store');
        if (inline)
          res.setHeader(
            'Content-Disposition',
            (res.getHeader('Content-Disposition') as string).replace(/^attachment/, 'inline'),
          );
        res.end(bytes);
      },
    ),
  );

  router.patch(
    '/attachments/:attachmentId',
    typedRoute(
      { params: idParams('attachmentId'), body: updateAttachmentSchema },
      async ({ params, body }, req, res) => {
        res.json(await editAttachment(ctx, currentUser(req), params.attachmentId, body));
      },
    ),
  );

  router.delete(
    '/attachments/:attachmentId',
    typedRoute({ params: idParams('attachmentId') }, async ({ params }, req, res) => {
      await removeAttachment(ctx, currentUser(req), params.attachmentId);
      res.status(204).end();
    }),
  );
  return router;
}
