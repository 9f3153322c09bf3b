/** The fabricator's plate schedule as CSV, for one revision or for a project's current revisions. */
import {
  plateScheduleCsv,
  plateScheduleRow,
  type PlateScheduleRow,
} from '../../../shared/engine/connection/plate-schedule';
import type { DesignResult } from '../../../shared/engine/types';
import type { DesignInput } from '../../../shared/schemas/design';
import type { AppContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import {
  projectForMember,
  revisionForMember,
  type CantileverRow,
  type RevisionRow,
} from '../projects/project-access';

export interface CsvFile {
  filename: string;
  csv: string;
}

function slug(text: string): string {
  return (
    text
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 60) || 'schedule'
  );
}

function rowFor(cantilever: CantileverRow, revision: RevisionRow): PlateScheduleRow | null {
  const input = JSON.parse(revision.input_json) as DesignInput;
  if (!input.connection) return null;
  const result = JSON.parse(revision.result_json) as DesignResult;
  return plateScheduleRow(`${cantilever.name} (rev ${revision.number})`, input.connection, result.connection);
}

export async function revisionSchedule(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
): Promise<CsvFile> {
  const { revision, cantilever } = await revisionForMember(ctx.db, revisionId, user.id);
  const row = rowFor(cantilever, revision);
  if (!row)
    throw new HttpError(
      409,
      'no_connection',
      `Revision ${revision.number} of ${cantilever.name} has no connection, so there is no plate to schedule.`,
    );
  return {
    filename: `plate-schedule-${slug(cantilever.name)}-rev${revision.number}.csv`,
    csv: plateScheduleCsv([row]),
  };
}

export async function projectSchedule(
  ctx: AppContext,
  user: Express.User,
  projectId: number,
): Promise<CsvFile> {
  const project = await projectForMember(ctx.db, projectId, user.id);
  const pairs = (await ctx
    .db('cantilevers as c')
    .join('revisions as r', 'r.id', 'c.current_revision_id')
    .where('c.project_id', projectId)
    .orderBy('c.name')
    .select('c.id as c_id', 'c.name as c_name', 'r.*')) as (RevisionRow & { c_id: number; c_name: string })[];
  const rows = pairs
    .map((p) => rowFor({ id: p.c_id, name: p.c_name } as CantileverRow, p))
    .filter((r): r is PlateScheduleRow => r !== null);
  return { filename: `plate-schedule-${slug(project.name)}.csv`, csv: plateScheduleCsv(rows) };
}
