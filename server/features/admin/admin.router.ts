/** Admin screens: Team (accounts) and Outbox. */
import { Router } from 'express';
import { createUserSchema, updateUserSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { auditTrail, createAccount, listAccounts, outbox, retryOutbox, updateAccount } from './admin.service';

export function adminRouter(ctx: AppContext): Router {
  const router = Router();
  router.use('/admin', requireRole(['admin'], 'use the admin screens'));

  router.get('/admin/users', async (_req, res) => {
    res.json(await listAccounts(ctx));
  });
  router.post(
    '/admin/users',
    typedRoute({ body: createUserSchema }, async ({ body }, req, res) => {
      res.status(201).json(await createAccount(ctx, currentUser(req), body));
    }),
  );
  router.patch(
    '/admin/users/:userId',
    typedRoute({ params: idParams('userId'), body: updateUserSchema }, async ({ params, body }, req, res) => {
      res.json(await updateAccount(ctx, currentUser(req), params.userId, body));
    }),
  );
  router.get('/admin/outbox', async (_req, res) => {
    res.json(await outbox(ctx));
  });
  router.post('/admin/outbox/retry', async (_req, res) => {
    res.json(await retryOutbox(ctx));
  });
  router.get('/admin/audit', async (_req, res) => {
    res.json(await auditTrail(ctx));
  });
  return router;
}
