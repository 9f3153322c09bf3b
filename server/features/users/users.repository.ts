/** Accounts (Knex only). */
import type { Knex } from 'knex';
import type { Role, UserDto } from '../../../shared/schemas/api';
import { nowIso, toBool, insertReturningId } from '../../db/knex';

export interface UserRow {
  id: number;
  email: string;
  display_name: string;
  password_hash: string;
  role: Role;
  units: 'US' | 'SI';
  active: number | boolean;
  must_change_password: number | boolean;
  /** Raised whenever the password changes; sessions signed in under an older value end. */
  session_version: number;
  created_at: string;
}

export function toUserDto(row: UserRow): UserDto {
  return {
    id: row.id,
    email: row.email,
    displayName: row.display_name,
    role: row.role,
    units: row.units,
    active: toBool(row.active),
    mustChangePassword: toBool(row.must_change_password ?? false),
  };
}

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function findUserByEmail(
  db: Knex | Knex.Transaction,
  email: string,
): Promise<UserRow | undefined> {
  return db<UserRow>('users')
    .where({ email: normalizeEmail(email) })
    .first();
}

export async function findUserById(db: Knex, id: number): Promise<UserRow | undefined> {
  return db<UserRow>('users').where({ id }).first();
}

export async function listUsers(db: Knex): Promise<UserRow[]> {
  return db<UserRow>('users').orderBy('id');
}

export async function insertUser(
  db: Knex | Knex.Transaction,
  user: {
    email: string;
    displayName: string;
    passwordHash: string;
    role: Role;
    units?: 'US' | 'SI';
    /** An admin chose the password: the person must choose their own at the first sign-in. */
    mustChangePassword?: boolean;
  },
): Promise<number> {
  return insertReturningId(db, 'users', {
    email: normalizeEmail(user.email),
    display_name: user.displayName,
    password_hash: user.passwordHash,
    role: user.role,
    units: user.units ?? 'US',
    active: true,
    must_change_password: user.mustChangePassword ?? false,
    created_at: nowIso(),
  });
}

export async function updateUser(
  db: Knex,
  id: number,
  patch: Partial<
    Pick<
      UserRow,
      | 'display_name'
      | 'role'
      | 'units'
      | 'active'
      | 'password_hash'
      | 'must_change_password'
      | 'session_version'
    >
  >,
): Promise<void> {
  if (Object.keys(patch).length === 0) return;
  await db('users').where({ id }).update(patch);
}

/**
 * Sets a new password hash and ends every session signed in with the old one (the session
 * version goes up); `mustChange` marks an admin's reset (cleared by the person's own change).
 */
export async function setPassword(
  db: Knex | Knex.Transaction,
  id: number,
  passwordHash: string,
  mustChange: boolean,
): Promise<void> {
  await db('users')
    .where({ id })
    .update({
      password_hash: passwordHash,
      must_change_password: mustChange,
      session_version: db.raw('session_version + 1'),
    });
}
