/** Accounts and the outbox, for admins. */
import type { CreateUserRequest, UpdateUserRequest, UserDto } from '../../../shared/schemas/api';
import type { AppContext } from '../../context';
import { HttpError, badRequest, notFound } from '../../lib/http-error';
import { hashPassword } from '../../lib/password';
import { assertStrongPassword } from '../auth/auth.service';
import { listOutbox, retryNow, toOutboxDto, type OutboxEntryDto } from '../../mail/outbox.repository';
import { listAudit, recordAudit } from '../audit/audit.repository';
import { queueWelcomeMail } from './welcome-mail';
import {
  findUserByEmail,
  findUserById,
  insertUser,
  listUsers,
  setPassword,
  toUserDto,
  updateUser,
} from '../users/users.repository';

export async function listAccounts(ctx: AppContext): Promise<UserDto[]> {
  return (await listUsers(ctx.db)).map(toUserDto);
}

export async function createAccount(
  ctx: AppContext,
  admin: Express.User,
  body: CreateUserRequest,
): Promise<UserDto> {
  if (await findUserByEmail(ctx.db, body.email)) {
    throw new HttpError(409, 'email_taken', 'An account with this e-mail already exists.', [
      { path: 'email', message: 'is already used by another account' },
    ]);
  }
  assertStrongPassword(body.password, [body.email, body.displayName], 'password');
  const passwordHash = await hashPassword(body.password, ctx.config.passwordCost);
  // The account, its first-password flag, the audit row and the welcome mail commit together.
  const id = await ctx.db.transaction(async (trx) => {
    const newId = await insertUser(trx, {
      email: body.email,
      displayName: body.displayName,
      role: body.role,
      passwordHash,
      mustChangePassword: true,
    });
    await recordAudit(trx, {
      kind: 'account-created',
      userId: admin.id,
      subject: body.email,
      detail: `role ${body.role}`,
    });
    await queueWelcomeMail(
      trx,
      ctx.config,
      { email: body.email.trim().toLowerCase(), displayName: body.displayName, role: body.role },
      admin.displayName,
    );
    return newId;
  });
  ctx.mail.kick();
  const row = await findUserById(ctx.db, id);
  return toUserDto(row!);
}

export async function updateAccount(
  ctx: AppContext,
  admin: Express.User,
  userId: number,
  body: UpdateUserRequest,
): Promise<UserDto> {
  const row = await findUserById(ctx.db, userId);
  if (!row) throw notFound('account');
  if (userId === admin.id && (body.active === false || (body.role && body.role !== 'admin'))) {
    // Keeps at least the acting admin able to manage accounts.
    throw badRequest('You may not disable your own account or take away your own admin role.', [
      { path: body.active === false ? 'active' : 'role', message: 'cannot be changed on your own account' },
    ]);
  }
  if (body.password !== undefined) {
    assertStrongPassword(body.password, [row.email, row.display_name], 'password');
    // The person must choose their own at the next sign-in; their sessions end now.
    await setPassword(
      ctx.db,
      userId,
      await hashPassword(body.password, ctx.config.passwordCost),
      userId !== admin.id,
    );
    await recordAudit(ctx.db, { kind: 'password-reset', userId: admin.id, subject: row.email });
  }
  await updateUser(ctx.db, userId, {
    ...(body.displayName !== undefined ? { display_name: body.displayName } : {}),
    ...(body.role !== undefined ? { role: body.role } : {}),
    ...(body.active !== undefined ? { active: body.active } : {}),
  });
  if (body.role !== undefined && body.role !== row.role) {
    await recordAudit(ctx.db, {
      kind: 'role-change',
      userId: admin.id,
      subject: row.email,
      detail: `${row.role} -> ${body.role}`,
    });
  }
  if (body.active !== undefined && body.active !== Boolean(row.active)) {
    await recordAudit(ctx.db, {
      kind: body.active ? 'account-enabled' : 'account-disabled',
      userId: admin.id,
      subject: row.email,
    });
  }
  return toUserDto((await findUserById(ctx.db, userId))!);
}

export async function outbox(ctx: AppContext): Promise<OutboxEntryDto[]> {
  return (await listOutbox(ctx.db)).map(toOutboxDto);
}

export async function retryOutbox(ctx: AppContext): Promise<{ queued: number }> {
  const queued = await retryNow(ctx.db);
  ctx.mail.kick();
  return { queued };
}

export function auditTrail(ctx: AppContext): ReturnType<typeof listAudit> {
  return listAudit(ctx.db);
}
