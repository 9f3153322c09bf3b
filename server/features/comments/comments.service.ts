/** Comments on a revision: every project member may read and write them. */
import type { CommentDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { revisionForMember } from '../projects/project-access';
import { mailComment } from '../revisions/review-mail';
import { insertComment, listComments } from './comments.repository';

export async function revisionComments(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
): Promise<CommentDto[]> {
  await revisionForMember(ctx.db, revisionId, user.id);
  return listComments(ctx.db, revisionId);
}

export async function addComment(
  ctx: AppContext,
  user: Express.User,
  revisionId: number,
  body: string,
): Promise<CommentDto | undefined> {
  const { revision, cantilever } = await revisionForMember(ctx.db, revisionId, user.id);
  // The revision's author and earlier commenters hear of it; the mail is queued with the comment.
  const id = await ctx.db.transaction(async (trx) => {
    await mailComment(trx, ctx.config, { revision, cantilever, commenter: user, body });
    return insertComment(trx, { revisionId, authorId: user.id, body });
  });
  ctx.mail.kick();
  return (await listComments(ctx.db, revisionId)).find((c) => c.id === id);
}
