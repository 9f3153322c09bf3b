/** GET …/plate-schedule.csv for a revision and for a whole project (current revisions). */
import { Router, type Response } from 'express';
import type { AppContext } from '../../context';
import { idParams, paramId } from '../../lib/params';
import { currentUser } from '../../middleware/require-auth';
import { validate } from '../../middleware/validate';
import { projectSchedule, revisionSchedule, type CsvFile } from './plate-schedule.service';

function sendCsv(res: Response, file: CsvFile): void {
  res.attachment(file.filename);
  res.type('text/csv; charset=utf-8').send(file.csv);
}

export function plateScheduleRouter(ctx: AppContext): Router {
  const router = Router();
  router.get(
    '/revisions/:revisionId/plate-schedule.csv',
    validate({ params: idParams('revisionId') }),
    async (req, res) => {
      sendCsv(res, await revisionSchedule(ctx, currentUser(req), paramId(req, 'revisionId')));
    },
  );
  router.get(
    '/projects/:projectId/plate-schedule.csv',
    validate({ params: idParams('projectId') }),
    async (req, res) => {
      sendCsv(res, await projectSchedule(ctx, currentUser(req), paramId(req, 'projectId')));
    },
  );
  return router;
}
