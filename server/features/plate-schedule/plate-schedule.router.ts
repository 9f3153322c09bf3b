/**
 * GET …/plate-schedule.csv for a revision, a cantilever and a whole project. The cantilever and
 * project schedules list approved revisions only unless `?include=drafts`.
 */
import { Router, type Response } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import {
  cantileverSchedule,
  projectSchedule,
  revisionSchedule,
  type CsvFile,
} from './plate-schedule.service';

const scheduleQuery = z.object({
  include: z.enum(['drafts'], { error: 'must be "drafts" or left out' }).optional(),
});

function sendCsv(res: Response, file: CsvFile): void {
  res.attachment(file.filename);
  res.type('text/csv; charset=utf-8').send(file.csv);
}

export function plateScheduleRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/revisions/:revisionId/plate-schedule.csv',
    typedRoute({ params: idParams('revisionId') }, async ({ params }, req, res) => {
      sendCsv(res, await revisionSchedule(ctx, currentUser(req), params.revisionId));
    }),
  );
  router.get(
    '/cantilevers/:cantileverId/plate-schedule.csv',
    typedRoute(
      { params: idParams('cantileverId'), query: scheduleQuery },
      async ({ params, query }, req, res) => {
        sendCsv(
          res,
          await cantileverSchedule(ctx, currentUser(req), params.cantileverId, query.include === 'drafts'),
        );
      },
    ),
  );
  router.get(
    '/projects/:projectId/plate-schedule.csv',
    typedRoute(
      { params: idParams('projectId'), query: scheduleQuery },
      async ({ params, query }, req, res) => {
        sendCsv(
          res,
          await projectSchedule(ctx, currentUser(req), params.projectId, query.include === 'drafts'),
        );
      },
    ),
  );
  return router;
}
