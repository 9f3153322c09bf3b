/** GET /api/health: 200 when the database and the storage answer, 503 (with what failed) when not. */
import { Router } from 'express';
import type { AppContext } from '../../context';
import { healthProbe } from './health.service';

export function healthRouter(ctx: AppContext): Router {
  const router = Router();
  const probe = healthProbe(ctx);
  router.get('/health', async (_req, res) => {
    const report = await probe();
    res.status(report.ok ? 200 : 503).json(report);
  });
  return router;
}
