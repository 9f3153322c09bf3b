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
  const stations = body.stations === true;
  // The published table first: the imported shapes are read only for a document that names one.
  let answer = await ctx.engine.run({ input: body.input, custom: 'built-in first', stations });
  if (!answer.ok && 'needsImportedShapes' in answer) {
    const custom = await listShapesInScope(ctx.db, body.projectId ?? null);
    answer = await ctx.engine.run({ input: body.input, custom, stations });
  }
  if (!answer.ok) {
    if ('needsImportedShapes' in answer) throw new Error('the engine asked for imported shapes twice');
    throw designNotComputed(answer.issues, 'input');
  }
  return answer.json;
}
