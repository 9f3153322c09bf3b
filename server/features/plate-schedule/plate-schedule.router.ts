/** GET …/plate-schedule.csv for a revision and for a whole project (current revisions). */
import { Router, type Response } from 'express';
import type { AppContext } from '../../context';
import { idParams } from '../../lib/params';
import { typedRoute } from '../../lib/route';
import { currentUser } from '../../middleware/require-auth';
import { projectSchedule, revisionSchedule, type CsvFile } from './plate-schedule.service';

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
    '/projects/:projectId/plate-schedule.csv',
    typedRoute({ params: idParams('projectId') }, async ({ params }, req, res) => {
      sendCsv(res, await projectSchedule(ctx, currentUser(req), params.projectId));
    }),
  );
  return router;
}
