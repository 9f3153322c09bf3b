/**
 * The e-mails around a review, queued in the transaction of the change that causes them: a
 * submission (to the project's engineers who may review it, with the submitter's note), a decision
 * (to the author; an approval also to the project's fabricators), and a comment (to the revision's
 * author and everyone who commented on it before). Every mail links to the page it is about,
 * under APP_ORIGIN.
 */
import type { Knex } from 'knex';
import { CAUTION } from '../../../shared/engine/types';
import type { Config } from '../../env';
import { queueMail } from '../../mail/outbox.repository';
import type { CantileverRow, RevisionRow } from '../projects/project-access';
import { activeMembers, findProject, type Recipient } from '../projects/projects.repository';

type Db = Knex | Knex.Transaction;

/** The address people open the app at: APP_ORIGIN, else the local server. */
export function appBase(config: Pick<Config, 'appOrigin' | 'port'>): string {
  return config.appOrigin ?? `http://localhost:${config.port || 3000}`;
}

export const reviewLink = (config: Pick<Config, 'appOrigin' | 'port'>, revisionId: number) =>
  `${appBase(config)}/revisions/${revisionId}/review`;
export const revisionLink = (config: Pick<Config, 'appOrigin' | 'port'>, revisionId: number) =>
  `${appBase(config)}/revisions/${revisionId}`;

function names(people: readonly Recipient[]): string {
  const list = people.map((p) => p.displayName);
  return list.length <= 2 ? list.join(' and ') : `${list.slice(0, -1).join(', ')} and ${list.at(-1)}`;
}

export interface SubmitNotice {
  notice: string;
  notified: string[];
}

export async function mailSubmission(
  db: Db,
  config: Config,
  a: {
    revision: RevisionRow;
    cantilever: CantileverRow;
    submitter: Express.User;
    note: string;
  },
): Promise<SubmitNotice> {
  const { revision, cantilever, submitter, note } = a;
  const project = await findProject(db, cantilever.project_id);
  const engineers = await activeMembers(db, cantilever.project_id, 'engineer');
  // An engineer never reviews their own revision, so the author is not asked either.
  const reviewers = engineers.filter((e) => e.id !== submitter.id && e.id !== revision.author_id);
  const lead = `Revision ${revision.number} was submitted for review.`;
  if (reviewers.length === 0) {
    const why =
      engineers.length === 0
        ? 'this project has no active engineer'
        : 'the only engineers on this project wrote or submitted this revision, and an engineer never reviews their own';
    return {
      notice: `${lead} Nobody was notified: ${why}. Ask an admin to add another engineer to the project.`,
      notified: [],
    };
  }
  await queueMail(db, {
    to: reviewers.map((e) => e.email),
    subject: `Review requested: ${cantilever.name}, revision ${revision.number}`,
    text: [
      `${submitter.displayName} submitted revision ${revision.number} of "${cantilever.name}" (${project?.name ?? 'project'}) for review.`,
      `Message: ${revision.message}`,
      note ? `Note to the reviewer: ${note}` : '',
      `Result: ${revision.ok ? 'every computed check passes' : 'at least one check fails or was not computed'}.`,
      `Open the review: ${reviewLink(config, revision.id)}`,
    ]
      .filter(Boolean)
      .concat('', CAUTION)
      .join('\n'),
  });
  return {
    notice: `${lead} ${names(reviewers)} ${reviewers.length === 1 ? 'was' : 'were'} notified by e-mail.`,
    notified: reviewers.map((r) => r.displayName),
  };
}

export async function mailDecision(
  db: Db,
  config: Config,
  a: {
    revision: RevisionRow;
    cantilever: CantileverRow;
    reviewer: Express.User;
    approved: boolean;
    comment: string;
  },
): Promise<void> {
  const { revision, cantilever, reviewer, approved, comment } = a;
  const members = await activeMembers(db, cantilever.project_id);
  const author = members.filter((m) => m.id === revision.author_id);
  const fabricators = approved ? members.filter((m) => m.role === 'fabricator') : [];
  const to = [...author, ...fabricators.filter((f) => f.id !== revision.author_id)].filter(
    (p) => p.id !== reviewer.id,
  );
  if (to.length === 0) return;
  const verdict = approved ? 'approved' : 'returned with changes requested';
  await queueMail(db, {
    to: to.map((p) => p.email),
    subject: `Revision ${revision.number} of ${cantilever.name} was ${verdict}`,
    text: [
      `${reviewer.displayName} ${verdict} revision ${revision.number} of "${cantilever.name}".`,
      comment ? `Comment: ${comment}` : '',
      approved
        ? `The plate schedule now lists revision ${revision.number} for this cantilever. Revision and calculation package: ${revisionLink(config, revision.id)}`
        : `Review record: ${reviewLink(config, revision.id)}`,
    ]
      .filter(Boolean)
      .concat('', CAUTION)
      .join('\n'),
  });
}

export async function mailComment(
  db: Db,
  config: Config,
  a: { revision: RevisionRow; cantilever: CantileverRow; commenter: Express.User; body: string },
): Promise<void> {
  const { revision, cantilever, commenter, body } = a;
  const earlier = await db('comments')
    .where({ revision_id: revision.id })
    .distinct<{ author_id: number }[]>('author_id');
  const wanted = new Set([revision.author_id, ...earlier.map((e) => e.author_id)]);
  wanted.delete(commenter.id);
  const to = (await activeMembers(db, cantilever.project_id)).filter((m) => wanted.has(m.id));
  if (to.length === 0) return;
  await queueMail(db, {
    to: to.map((p) => p.email),
    subject: `New comment on ${cantilever.name}, revision ${revision.number}`,
    text: [
      `${commenter.displayName} commented on revision ${revision.number} of "${cantilever.name}":`,
      body,
      `Open the revision: ${reviewLink(config, revision.id)}`,
    ].join('\n'),
  });
}
