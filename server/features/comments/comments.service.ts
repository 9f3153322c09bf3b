/** Comments on a revision: every project member may read and write them. */
import type { CommentDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { revisionForMember } from '../projects/project-access';
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
  await revisionForMember(ctx.db, revisionId, user.id);
  const id = await insertComment(ctx.db, { revisionId, authorId: user.id, body });
  return (await listComments(ctx.db, revisionId)).find((c) => c.id === id);
}
