/** Saving, reading, submitting and reviewing revisions. */
import type { Knex } from 'knex';
import type {
  CreateRevisionRequest,
  AwaitingReviewDto,
  ReviewRequest,
  RevisionDto,
  SubmitRequest,
  SubmitResponse,
  RevisionSummaryDto,
  StaleSaveBody,
} from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { isUniqueViolation } from '../../db/knex';
import { HttpError, conflict, forbidden, notFound } from '../../lib/http-error';
import { recordAudit } from '../audit/audit.repository';
import {
  cantileverForMember,
  revisionForMember,
  type CantileverRow,
  type RevisionRow,
} from '../projects/project-access';
import { assertMayChange } from './edit-rights';
import { mailDecision, mailSubmission, type SubmitNotice } from './review-mail';
import { evaluateWithSections, storedSections } from './evaluate';
import {
  getRevisionDto,
  insertReview,
  insertRevision,
  latestRevision,
  lockCantilever,
  memberRevisionJson,
  listRevisionSummaries,
  listSubmittedFor,
  reviewStates,
} from './revisions.repository';

/**
 * Saves a new revision inside one transaction: the base must still be the latest revision (else
 * 409 with the latest), the role must be allowed to change what changed, the engine computes the
 * result, and the number is the next one for this cantilever.
 */
export async function saveRevision(
  db: Knex,
  user: Express.User,
  cantilever: CantileverRow,
  body: CreateRevisionRequest,
): Promise<RevisionDto> {
  const stale = async (db: Knex, latest: RevisionRow | undefined) => {
    const latestDto = latest ? await getRevisionDto(db, latest.id) : null;
    const message = latest
      ? `Revision ${latest.number} was saved since you started from ${body.baseRevision === null ? 'nothing' : `revision ${body.baseRevision}`}; compare and save again.`
      : 'This cantilever has no revisions yet; save with baseRevision null.';
    const extra: Omit<StaleSaveBody, 'error'> | { latest: null } = { latest: latestDto as RevisionDto };
    return new HttpError(409, 'stale_base', message, [], extra);
  };
  const run = async (trx: Knex.Transaction) => {
    // Several instances: the cantilever row is locked until commit (PostgreSQL), so the next number
    // and the stale-base rule are decided by one save at a time. SQLite has one writer anyway.
    await lockCantilever(trx, cantilever.id);
    const latest = await latestRevision(trx, cantilever.id);
    if ((latest?.number ?? null) !== body.baseRevision) throw await stale(trx, latest);
    assertMayChange(user.role, latest ? JSON.parse(latest.input_json) : undefined, body.input.document);
    const { result, sections } = await evaluateWithSections(trx, body.input.parsed, {
      stations: true,
      projectId: cantilever.project_id,
      pinned: storedSections(latest?.sections_json),
    });
    const id = await insertRevision(trx, {
      sections,
      cantileverId: cantilever.id,
      number: (latest?.number ?? 0) + 1,
      authorId: user.id,
      message: body.message,
      input: body.input.document,
      result,
      baseRevisionId: latest?.id ?? null,
    });
    return (await getRevisionDto(trx, id)) as RevisionDto;
  };
  // Inside an outer transaction this nests as a savepoint.
  try {
    return await db.transaction(run);
  } catch (err) {
    // The lock makes this rare; a writer that took the number anyway (another process on SQLite,
    // a save outside the lock) is a stale base too: 409 with the latest, never a 500.
    if (!isUniqueViolation(err)) throw err;
    throw await stale(db, await latestRevision(db, cantilever.id));
  }
}

export async function saveRevisionForMember(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
  body: CreateRevisionRequest,
): Promise<RevisionDto> {
  const cantilever = await cantileverForMember(ctx.db, cantileverId, user.id);
  return saveRevision(ctx.db, user, cantilever, body);
}

export async function listRevisions(
  ctx: AppContext,
  user: Express.User,
  cantileverId: number,
): Promise<RevisionSummaryDto[]> {
  await cantileverForMember(ctx.db, cantileverId, user.id);
  return listRevisionSummaries(ctx.db, cantileverId);
}

/** GET /revisions/:id: the RevisionDto as JSON text (see memberRevisionJson); 404 for a non-member. */
export async function getRevisionJson(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
): Promise<string> {
  const json = await memberRevisionJson(ctx.db, revisionId, user.id);
  if (json === undefined) throw notFound('revision');
  return json;
}

export async function getRevision(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
): Promise<RevisionDto> {
  await revisionForMember(ctx.db, revisionId, user.id);
  const dto = await getRevisionDto(ctx.db, revisionId);
  if (!dto) throw notFound('revision');
  return dto;
}

const DESIGN_ROLES = new Set(['architect', 'fabricator', 'engineer']);

/**
 * Submits a revision for review and e-mails the project's engineers who may review it (queued in
 * the same transaction), with the submitter's note; answers who was told, or why nobody could be.
 */
export async function submitRevision(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
  body: SubmitRequest = { note: '' },
): Promise<SubmitResponse> {
  const { revision, cantilever } = await revisionForMember(ctx.db, revisionId, user.id);
  if (revision.author_id !== user.id && !DESIGN_ROLES.has(user.role)) {
    throw forbidden(`Your role (${user.role}) may not submit a revision for review.`);
  }
  const told: SubmitNotice = await ctx.db.transaction(async (trx) => {
    await lockCantilever(trx, cantilever.id);
    const state = (await reviewStates(trx, [revision.id])).get(revision.id) ?? 'draft';
    if (state === 'submitted')
      throw conflict('already_submitted', `Revision ${revision.number} is already waiting for review.`);
    if (state === 'approved')
      throw conflict('already_approved', `Revision ${revision.number} is already approved.`);
    await insertReview(trx, {
      revisionId: revision.id,
      state: 'submitted',
      reviewerId: user.id,
      comment: body.note,
    });
    return mailSubmission(trx, ctx.config, { revision, cantilever, submitter: user, note: body.note });
  });
  ctx.mail.kick();
  return { ...(await getRevision(ctx, user, revisionId)), ...told };
}

/** Submitted revisions in the engineer's projects that wait for a decision, oldest request first. */
export async function awaitingReview(ctx: AppContext, user: Express.User): Promise<AwaitingReviewDto[]> {
  if (user.role !== 'engineer') return [];
  return listSubmittedFor(ctx.db, user.id);
}

/** An engineer's decision on a submitted revision; never their own. Approvals go to the audit trail. */
export async function reviewRevision(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
  body: ReviewRequest,
): Promise<RevisionDto> {
  const { revision, cantilever } = await revisionForMember(ctx.db, revisionId, user.id);
  if (user.role !== 'engineer') throw forbidden('Only an engineer may review a revision.');
  if (revision.author_id === user.id)
    throw forbidden('You may not review your own revision; ask another engineer.');
  const state = body.decision === 'approve' ? 'approved' : 'changes-requested';
  await ctx.db.transaction(async (trx) => {
    await lockCantilever(trx, cantilever.id);
    const current = (await reviewStates(trx, [revision.id])).get(revision.id) ?? 'draft';
    if (current !== 'submitted') {
      throw conflict(
        'not_submitted',
        `Revision ${revision.number} is ${current === 'draft' ? 'not submitted for review' : current}; only a submitted revision can be reviewed.`,
      );
    }
    await insertReview(trx, { revisionId: revision.id, state, reviewerId: user.id, comment: body.comment });
    await recordAudit(trx, {
      kind: state === 'approved' ? 'approval' : 'changes-requested',
      userId: user.id,
      subject: `revision ${revision.id}`,
      detail: `${cantilever.name}, revision ${revision.number}${body.comment ? `: ${body.comment}` : ''}`,
    });
    await mailDecision(trx, ctx.config, {
      revision,
      cantilever,
      reviewer: user,
      approved: state === 'approved',
      comment: body.comment,
    });
  });
  ctx.mail.kick();
  return getRevision(ctx, user, revisionId);
}
