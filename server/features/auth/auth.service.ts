/** Sign-in records and the signed-in person's own settings. */
import type { UpdateMeRequest, UserDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { unauthorized } from '../../lib/http-error';
import { recordAudit } from '../audit/audit.repository';
import { findUserById, toUserDto, updateUser } from '../users/users.repository';

export function recordSignIn(ctx: AppContext, user: Express.User, ip: string): Promise<void> {
  return recordAudit(ctx.db, { kind: 'sign-in', userId: user.id, subject: user.email, detail: `ip ${ip}` });
}

export function recordFailedSignIn(ctx: AppContext, email: string, ip: string): Promise<void> {
  return recordAudit(ctx.db, { kind: 'sign-in-failed', userId: null, subject: email, detail: `ip ${ip}` });
}

export async function updateMe(ctx: AppContext, user: Express.User, body: UpdateMeRequest): Promise<UserDto> {
  await updateUser(ctx.db, user.id, {
    ...(body.units ? { units: body.units } : {}),
    ...(body.displayName ? { display_name: body.displayName } : {}),
  });
  const row = await findUserById(ctx.db, user.id);
  if (!row) throw unauthorized();
  return toUserDto(row);
}
