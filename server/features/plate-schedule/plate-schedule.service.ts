/**
 * The fabricator's plate schedule as CSV, for one revision, one cantilever or a whole project.
 * Only approved designs reach the shop by default: a cantilever or project schedule lists the
 * latest approved revision of each cantilever; `include=drafts` adds the latest revision where it
 * is newer, marked in its row. Every row carries its revision, state, approver, date and quantity,
 * and the file ends with the caution.
 */
import {
  plateScheduleCsv,
  plateScheduleRow,
  type ScheduleLine,
} from '../../../shared/engine/connection/plate-schedule';
import { CAUTION, type DesignResult } from '../../../shared/engine/types';
import type { DesignInput } from '../../../shared/schemas/design';
import { parsedConnectionSchema } from '../../../shared/schemas/parsed-design';
import type { AppContext } from '../../context';
import { HttpError } from '../../lib/http-error';
import {
  cantileverForMember,
  projectForMember,
  revisionForMember,
  type CantileverRow,
  type RevisionRow,
} from '../projects/project-access';
import {
  latestApprovedRevisions,
  latestRevision,
  listReviews,
  type ApprovedRevision,
} from '../revisions/revisions.repository';

export interface CsvFile {
  filename: string;
  csv: string;
}

const EXTRA = ['Revision', 'State', 'Approved by', 'Approved on', 'Quantity'];

function slug(text: string): string {
  return (
    text
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 60) || 'schedule'
  );
}

function lineFor(
  cantilever: CantileverRow,
  revision: RevisionRow,
  approval: { approvedBy: string; approvedAt: string } | null,
  state: string,
): ScheduleLine | null {
  const input = JSON.parse(revision.input_json) as DesignInput;
  if (!input.connection) return null;
  const result = JSON.parse(revision.result_json) as DesignResult;
  const approved = approval !== null;
  const mark = `${cantilever.name} (rev ${revision.number}${approved ? '' : ', NOT APPROVED'})`;
  return {
    before: {
      Revision: String(revision.number),
      State: approved ? 'approved' : `${state.toUpperCase()}, NOT APPROVED: not for construction`,
      'Approved by': approval?.approvedBy ?? '',
      'Approved on': approval?.approvedAt.slice(0, 10) ?? '',
      Quantity: String(cantilever.quantity ?? 1),
    },
    row: plateScheduleRow(mark, parsedConnectionSchema.parse(input.connection), result.connection),
  };
}

function footer(includeDrafts: boolean, missing: string[]): string[] {
  return [
    includeDrafts
      ? 'Drafts included on request: a row whose state is not "approved" is not for construction.'
      : 'Approved revisions only: each cantilever is listed at its latest approved revision.',
    ...(missing.length ? [`Not listed (no approved revision with a plate): ${missing.join('; ')}`] : []),
    `Caution: ${CAUTION}`,
  ];
}

async function stateOf(ctx: AppContext, revisionId: number): Promise<string> {
  const reviews = await listReviews(ctx.db, revisionId);
  return reviews.length ? reviews[reviews.length - 1].state : 'draft';
}

/** The lines of a set of cantilevers: approved first, then (with drafts) the newer latest revision. */
async function linesFor(
  ctx: AppContext,
  cantilevers: CantileverRow[],
  includeDrafts: boolean,
): Promise<{ lines: ScheduleLine[]; missing: string[] }> {
  const approved = await latestApprovedRevisions(
    ctx.db,
    cantilevers.map((c) => c.id),
  );
  const lines: ScheduleLine[] = [];
  const missing: string[] = [];
  for (const c of cantilevers) {
    const a: ApprovedRevision | undefined = approved.get(c.id);
    const line = a ? lineFor(c, a.revision, a, 'approved') : null;
    if (line) lines.push(line);
    else if (!includeDrafts) missing.push(c.name);
    if (includeDrafts) {
      const latest = await latestRevision(ctx.db, c.id);
      if (latest && latest.id !== a?.revision.id) {
        const draft = lineFor(c, latest, null, await stateOf(ctx, latest.id));
        if (draft) lines.push(draft);
      }
    }
  }
  return { lines, missing };
}

export async function revisionSchedule(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
): Promise<CsvFile> {
  const { revision, cantilever } = await revisionForMember(ctx.db, revisionId, user.id);
  const approved = (await latestApprovedRevisions(ctx.db, [cantilever.id])).get(cantilever.id);
  const reviews = await listReviews(ctx.db, revision.id);
  const approval = reviews.find((r) => r.state === 'approved');
  const state = reviews.length ? reviews[reviews.length - 1].state : 'draft';
  const line = lineFor(
    cantilever,
    revision,
    approval ? { approvedBy: approval.reviewerName, approvedAt: approval.createdAt } : null,
    state,
  );
  if (!line)
    throw new HttpError(
      409,
      'no_connection',
      `Revision ${revision.number} of ${cantilever.name} has no connection, so there is no plate to schedule.`,
    );
  const notes = approval
    ? []
    : [
        `Revision ${revision.number} is ${state}, not approved: not for construction.${approved ? ` The latest approved revision is ${approved.revision.number}.` : ''}`,
      ];
  return {
    filename: `plate-schedule-${slug(cantilever.name)}-rev${revision.number}.csv`,
    csv: plateScheduleCsv([line], EXTRA, [...notes, `Caution: ${CAUTION}`]),
  };
}

export async function cantileverSchedule(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
  includeDrafts: boolean,
): Promise<CsvFile> {
  const cantilever = await cantileverForMember(ctx.db, cantileverId, user.id);
  const { lines, missing } = await linesFor(ctx, [cantilever], includeDrafts);
  return {
    filename: `plate-schedule-${slug(cantilever.name)}${includeDrafts ? '-with-drafts' : ''}.csv`,
    csv: plateScheduleCsv(lines, EXTRA, footer(includeDrafts, missing)),
  };
}

export async function projectSchedule(
  ctx: AppContext,
  user: Express.User,
  projectId: number,
  includeDrafts: boolean,
): Promise<CsvFile> {
  const project = await projectForMember(ctx.db, projectId, user.id);
  const cantilevers = (await ctx
    .db('cantilevers')
    .where({ project_id: projectId })
    .orderBy('name')) as CantileverRow[];
  const { lines, missing } = await linesFor(ctx, cantilevers, includeDrafts);
  return {
    filename: `plate-schedule-${slug(project.name)}${includeDrafts ? '-with-drafts' : ''}.csv`,
    csv: plateScheduleCsv(lines, EXTRA, footer(includeDrafts, missing)),
  };
}
