/** Revisions and their reviews (Knex only). Revisions are only ever inserted. */
import type { Knex } from 'knex';
import type {
  AwaitingReviewDto,
  ReviewDto,
  ReviewState,
  RevisionDto,
  RevisionSummaryDto,
} from '../../../shared/schemas/api';
import type { DesignDocument } from '../../../shared/schemas/design';
import type { DesignResult } from '../../../shared/engine/types';
import { isPostgres, nowIso, toBool, toIso, insertReturningId } from '../../db/knex';
import type { RevisionRow } from '../projects/project-access';

type Db = Knex | Knex.Transaction;

interface ReviewRow {
  id: number;
  revision_id: number;
  state: ReviewDto['state'];
  reviewer_id: number;
  reviewer_name: string;
  comment: string;
  created_at: string;
}

type SummaryRow = RevisionRow & {
  author_name: string;
  base_number: number | null;
  review_state?: ReviewState | null;
};

/** The columns a summary reads: not the input and result documents (about 20 kB a revision). */
const SUMMARY_COLUMNS = [
  'r.id',
  'r.cantilever_id',
  'r.number',
  'r.author_id',
  'r.message',
  'r.engine_version',
  'r.created_at',
  'r.ok',
];

/** Revisions with author and base number; `documents` adds every column of the revision. */
function summarySelect(db: Db, documents: 'with documents' | 'summary only' = 'with documents') {
  return db('revisions as r')
    .join('users as u', 'u.id', 'r.author_id')
    .leftJoin('revisions as b', 'b.id', 'r.base_revision_id')
    .select(
      ...(documents === 'with documents' ? ['r.*'] : SUMMARY_COLUMNS),
      'u.display_name as author_name',
      'b.number as base_number',
    );
}

/**
 * The latest review state of the revision in `revisionColumn`, as a column named `alias` of the
 * outer query (null when never submitted, which reads as 'draft'): one query instead of two.
 */
export function latestStateColumn(db: Db, revisionColumn: string, alias: string): Knex.QueryBuilder {
  return db('reviews as lv')
    .select('lv.state')
    .where('lv.revision_id', db.ref(revisionColumn))
    .orderBy('lv.id', 'desc')
    .limit(1)
    .as(alias);
}

/** The latest review state of each revision ('draft' when never submitted). */
export async function reviewStates(db: Db, revisionIds: number[]): Promise<Map<number, ReviewState>> {
  const states = new Map<number, ReviewState>();
  if (revisionIds.length === 0) return states;
  const rows = await db('reviews')
    .whereIn('revision_id', revisionIds)
    .orderBy('id')
    .select<{ revision_id: number; state: ReviewState }[]>('revision_id', 'state');
  for (const row of rows) states.set(row.revision_id, row.state);
  return states;
}

function toSummary(row: SummaryRow, state: ReviewState): RevisionSummaryDto {
  return {
    id: row.id,
    cantileverId: row.cantilever_id,
    number: row.number,
    authorId: row.author_id,
    authorName: row.author_name,
    message: row.message,
    engineVersion: row.engine_version,
    baseRevisionNumber: row.base_number ?? null,
    createdAt: toIso(row.created_at),
    ok: toBool(row.ok),
    reviewState: state,
  };
}

export async function listRevisionSummaries(db: Db, cantileverId: number): Promise<RevisionSummaryDto[]> {
  const rows = (await summarySelect(db, 'summary only')
    .select(latestStateColumn(db, 'r.id', 'review_state'))
    .where('r.cantilever_id', cantileverId)
    .orderBy('r.number', 'desc')) as SummaryRow[];
  return rows.map((r) => toSummary(r, r.review_state ?? 'draft'));
}

export async function listReviews(db: Db, revisionId: number): Promise<ReviewDto[]> {
  const rows = await db('reviews as v')
    .join('users as u', 'u.id', 'v.reviewer_id')
    .where('v.revision_id', revisionId)
    .orderBy('v.id')
    .select<ReviewRow[]>('v.*', 'u.display_name as reviewer_name');
  return rows.map((r) => ({
    id: r.id,
    revisionId: r.revision_id,
    state: r.state,
    reviewerId: r.reviewer_id,
    reviewerName: r.reviewer_name,
    comment: r.comment,
    createdAt: toIso(r.created_at),
  }));
}

/**
 * One revision as the JSON of a RevisionDto, for a member only (undefined otherwise): membership,
 * the revision and its author in one query, the reviews in a second, and the stored input and
 * result documents spliced in as stored (they are JSON already; parsing and re-serialising 20 kB
 * per read was most of a read's time).
 */
export async function memberRevisionJson(
  db: Db,
  revisionId: number,
  userId: number,
): Promise<string | undefined> {
  const row = (await summarySelect(db)
    .join('cantilevers as c', 'c.id', 'r.cantilever_id')
    .join('project_members as m', (j) => j.on('m.project_id', 'c.project_id').andOnVal('m.user_id', userId))
    .where('r.id', revisionId)
    .first()) as SummaryRow | undefined;
  if (!row) return undefined;
  const reviews = await listReviews(db, revisionId);
  const state = reviews.length > 0 ? reviews[reviews.length - 1].state : 'draft';
  const summary = JSON.stringify({ ...toSummary(row, state), reviews });
  return `${summary.slice(0, -1)},"input":${row.input_json},"result":${row.result_json}}`;
}

export async function getRevisionDto(db: Db, revisionId: number): Promise<RevisionDto | undefined> {
  const row = (await summarySelect(db).where('r.id', revisionId).first()) as SummaryRow | undefined;
  if (!row) return undefined;
  const reviews = await listReviews(db, revisionId);
  const state = reviews.length > 0 ? reviews[reviews.length - 1].state : 'draft';
  return {
    ...toSummary(row, state),
    input: JSON.parse(row.input_json) as DesignDocument,
    result: JSON.parse(row.result_json) as DesignResult,
    reviews,
  };
}

/**
 * Locks the cantilever row until the transaction ends (SELECT … FOR UPDATE on PostgreSQL), so
 * saves and reviews of one cantilever on several instances go one at a time. SQLite's single
 * writer already serialises them.
 */
export async function lockCantilever(trx: Knex.Transaction, cantileverId: number): Promise<void> {
  if (isPostgres(trx)) await trx('cantilevers').where({ id: cantileverId }).forUpdate().first('id');
}

export async function latestRevision(db: Db, cantileverId: number): Promise<RevisionRow | undefined> {
  return db<RevisionRow>('revisions')
    .where({ cantilever_id: cantileverId })
    .orderBy('number', 'desc')
    .first();
}

export async function insertRevision(
  db: Db,
  r: {
    cantileverId: number;
    number: number;
    authorId: number;
    message: string;
    input: unknown;
    result: DesignResult;
    baseRevisionId: number | null;
    /** The catalog sections the result was computed with. */
    sections?: readonly unknown[];
  },
): Promise<number> {
  const id = await insertReturningId(db, 'revisions', {
    cantilever_id: r.cantileverId,
    number: r.number,
    author_id: r.authorId,
    message: r.message,
    input_json: JSON.stringify(r.input),
    result_json: JSON.stringify(r.result),
    engine_version: r.result.engineVersion,
    base_revision_id: r.baseRevisionId,
    ok: r.result.ok,
    sections_json: r.sections ? JSON.stringify(r.sections) : null,
    created_at: nowIso(),
  });
  await db('cantilevers')
    .where({ id: r.cantileverId })
    .update({ current_revision_id: id, updated_at: nowIso() });
  return id;
}

export async function insertReview(
  db: Db,
  r: { revisionId: number; state: ReviewDto['state']; reviewerId: number; comment: string },
): Promise<void> {
  await db('reviews').insert({
    revision_id: r.revisionId,
    state: r.state,
    reviewer_id: r.reviewerId,
    comment: r.comment,
    created_at: nowIso(),
  });
}

export interface ApprovedRevision {
  revision: RevisionRow;
  approvedBy: string;
  approvedAt: string;
}

export interface LatestApproval {
  revisionId: number;
  number: number;
  approvedBy: string;
  approvedAt: string;
}

/**
 * The latest approval of each cantilever, without the revisions' documents and results (tens of
 * kilobytes each, and the project list needs only the number). An approved revision stays
 * approved (no review may follow an approval), so an 'approved' review row is enough.
 */
export async function latestApprovals(
  db: Db,
  cantileverIds: readonly number[],
): Promise<Map<number, LatestApproval>> {
  const out = new Map<number, LatestApproval>();
  if (cantileverIds.length === 0) return out;
  const rows = await db('reviews as v')
    .join('revisions as r', 'r.id', 'v.revision_id')
    .join('users as u', 'u.id', 'v.reviewer_id')
    .where('v.state', 'approved')
    .whereIn('r.cantilever_id', [...cantileverIds])
    .orderBy('r.number')
    .select<
      { id: number; number: number; cantilever_id: number; approver_name: string; approved_at: string }[]
    >(
      'r.id',
      'r.number',
      'r.cantilever_id',
      'u.display_name as approver_name',
      'v.created_at as approved_at',
    );
  for (const row of rows) {
    out.set(row.cantilever_id, {
      revisionId: row.id,
      number: row.number,
      approvedBy: row.approver_name,
      approvedAt: toIso(row.approved_at),
    });
  }
  return out;
}

/** The latest approved revision of each cantilever, whole (the plate schedule reads its results). */
export async function latestApprovedRevisions(
  db: Db,
  cantileverIds: readonly number[],
): Promise<Map<number, ApprovedRevision>> {
  const approvals = await latestApprovals(db, cantileverIds);
  const out = new Map<number, ApprovedRevision>();
  if (approvals.size === 0) return out;
  const rows = (await db('revisions').whereIn(
    'id',
    [...approvals.values()].map((a) => a.revisionId),
  )) as RevisionRow[];
  for (const revision of rows) {
    const a = approvals.get(revision.cantilever_id)!;
    out.set(revision.cantilever_id, { revision, approvedBy: a.approvedBy, approvedAt: a.approvedAt });
  }
  return out;
}

/** Revisions waiting for review in the projects `userId` belongs to, not written by them. */
export async function listSubmittedFor(db: Db, userId: number): Promise<AwaitingReviewDto[]> {
  const rows = await db('reviews as v')
    .join('revisions as r', 'r.id', 'v.revision_id')
    .join('cantilevers as c', 'c.id', 'r.cantilever_id')
    .join('projects as p', 'p.id', 'c.project_id')
    .join('project_members as m', function on() {
      this.on('m.project_id', '=', 'p.id').andOnVal('m.user_id', '=', userId);
    })
    .join('users as u', 'u.id', 'r.author_id')
    .where('v.state', 'submitted')
    .whereNot('r.author_id', userId)
    .orderBy('v.id')
    .select<
      {
        revision_id: number;
        number: number;
        message: string;
        cantilever_id: number;
        cantilever_name: string;
        project_id: number;
        project_name: string;
        author_name: string;
        submitted_at: string;
      }[]
    >(
      'r.id as revision_id',
      'r.number',
      'r.message',
      'c.id as cantilever_id',
      'c.name as cantilever_name',
      'p.id as project_id',
      'p.name as project_name',
      'u.display_name as author_name',
      'v.created_at as submitted_at',
    );
  const states = await reviewStates(
    db,
    rows.map((r) => r.revision_id),
  );
  const seen = new Set<number>();
  const out: AwaitingReviewDto[] = [];
  for (const r of rows) {
    // A revision submitted again after changes were requested appears once, at its latest request.
    if (states.get(r.revision_id) !== 'submitted' || seen.has(r.revision_id)) continue;
    seen.add(r.revision_id);
    out.push({
      revisionId: r.revision_id,
      number: r.number,
      message: r.message,
      cantileverId: r.cantilever_id,
      cantileverName: r.cantilever_name,
      projectId: r.project_id,
      projectName: r.project_name,
      authorName: r.author_name,
      submittedAt: toIso(r.submitted_at),
    });
  }
  return out;
}
