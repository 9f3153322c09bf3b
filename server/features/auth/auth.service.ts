/** Sign-in records and the signed-in person's own settings and password. */
import type { ChangePasswordRequest, UpdateMeRequest, UserDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError, badRequest, unauthorized } from '../../lib/http-error';
import { hashPassword, passwordProblem, verifyPassword } from '../../lib/password';
import { recordAudit } from '../audit/audit.repository';
import { findUserById, setPassword, toUserDto, updateUser } from '../users/users.repository';
import { clearFailures, countFailures, recordFailure } from './sign-in-limits.repository';

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

/** 400 naming `field` when a new password is too short or too easy to guess. */
export function assertStrongPassword(password: string, known: readonly string[], field: string): void {
  const problem = passwordProblem(password, known);
  if (problem) throw badRequest(`The new password ${problem}.`, [{ path: field, message: problem }]);
}

/**
 * Changes one's own password: the current one must be given, the new one must pass the strength
 * rule and differ. Every session of the account ends (the caller signs the current one in again).
 */
export async function changeOwnPassword(
  ctx: AppContext,
  user: Express.User,
  body: ChangePasswordRequest,
): Promise<void> {
  const row = await findUserById(ctx.db, user.id);
  if (!row) throw unauthorized();
  if (!(await verifyPassword(body.currentPassword, row.password_hash))) {
    throw new HttpError(400, 'wrong_password', 'The current password is not right.', [
      { path: 'currentPassword', message: 'is not right' },
    ]);
  }
  if (body.newPassword === body.currentPassword)
    throw badRequest('The new password must differ from the current one.', [
      { path: 'newPassword', message: 'must differ from the current password' },
    ]);
  assertStrongPassword(body.newPassword, [row.email, row.display_name], 'newPassword');
  await setPassword(ctx.db, row.id, await hashPassword(body.newPassword, ctx.config.passwordCost), false);
  await recordAudit(ctx.db, { kind: 'password-changed', userId: row.id, subject: row.email });
}

// ---- sign-in limits -----------------------------------------------------------------------------

function limitKeys(email: string, address: string): { account: string; address: string } {
  return { account: `account:${email.trim().toLowerCase()}`, address: `address:${address}` };
}

/**
 * 429 when the account (from any address) or the client address (for any account) has had too
 * many failed sign-ins in the window. Checked before the password, so a locked account's right
 * password is not confirmed either.
 */
export async function assertMaySignIn(ctx: AppContext, email: string, address: string): Promise<void> {
  const keys = limitKeys(email, address);
  const since = new Date(Date.now() - ctx.config.loginRateWindowMs);
  const counts = await countFailures(ctx.db, [keys.account, keys.address], since);
  const perAddress = ctx.config.loginAddressRateLimit ?? ctx.config.loginRateLimit * 3;
  if (
    (counts.get(keys.account) ?? 0) >= ctx.config.loginRateLimit ||
    (counts.get(keys.address) ?? 0) >= perAddress
  ) {
    const minutes = Math.ceil(ctx.config.loginRateWindowMs / 60_000);
    throw new HttpError(
      429,
      'too_many_attempts',
      `Too many failed sign-in attempts; wait ${minutes} minutes and try again.`,
    );
  }
}

export async function noteFailedSignIn(ctx: AppContext, email: string, address: string): Promise<void> {
  const keys = limitKeys(email, address);
  await recordFailure(
    ctx.db,
    [keys.account, keys.address],
    new Date(Date.now() - ctx.config.loginRateWindowMs),
  );
  await recordFailedSignIn(ctx, email, address);
}

export async function noteSignIn(ctx: AppContext, user: Express.User, address: string): Promise<void> {
  await clearFailures(ctx.db, limitKeys(user.email, address).account);
  await recordSignIn(ctx, user, address);
}
