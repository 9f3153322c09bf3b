/** The engine on one document, nothing stored: the answer is the result as JSON text. */
import type { z } from 'zod';
import type { checkRequestSchema } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { projectForMember } from '../projects/project-access';
import { designNotComputed } from '../revisions/evaluate';
import { listShapesInScope } from '../shapes/shapes.repository';

export async function checkDesign(
  ctx: AppContext,
  user: Express.User,
  body: z.output<typeof checkRequestSchema>,
): Promise<string> {
  // A project's imported shapes only for its members; without one, the organisation's.
  if (body.projectId !== undefined) await projectForMember(ctx.db, body.projectId, user.id);
  const custom = await listShapesInScope(ctx.db, body.projectId ?? null);
  const answer = await ctx.engine.run({ input: body.input, custom, stations: body.stations === true });
  if (!answer.ok) throw designNotComputed(answer.issues, 'input');
  return answer.json;
}
