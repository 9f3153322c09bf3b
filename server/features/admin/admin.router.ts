/** Admin screens: Team (accounts) and Outbox. */
import { Router } from 'express';
import { createUserSchema, updateUserSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams, paramId } from '../../lib/params';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { validate } from '../../middleware/validate';
import { listAudit } from '../audit/audit.repository';
import { createAccount, listAccounts, outbox, retryOutbox, updateAccount } from './admin.service';

export function adminRouter(ctx: AppContext): Router {
  const router = Router();
  router.use('/admin', requireRole(['admin'], 'use the admin screens'));

  router.get('/admin/users', async (_req, res) => {
    res.json(await listAccounts(ctx));
  });
  router.post('/admin/users', validate({ body: createUserSchema }), async (req, res) => {
    res.status(201).json(await createAccount(ctx, currentUser(req), req.body));
  });
  router.patch(
    '/admin/users/:userId',
    validate({ params: idParams('userId'), body: updateUserSchema }),
    async (req, res) => {
      res.json(await updateAccount(ctx, currentUser(req), paramId(req, 'userId'), req.body));
    },
  );
  router.get('/admin/outbox', async (_req, res) => {
    res.json(await outbox(ctx));
  });
  router.post('/admin/outbox/retry', async (_req, res) => {
    res.json(await retryOutbox(ctx));
  });
  router.get('/admin/audit', async (_req, res) => {
    res.json(await listAudit(ctx.db));
  });
  return router;
}
