/**
 * One Passport instance per app (the default export is a process-wide singleton, and two apps in
 * one test run would share strategies and serializers).
 *
 * The session holds the account id and its session version; a password change raises the
 * version, so every session signed in before it ends. A disabled account is told exactly what a
 * wrong password is told: the answer never confirms a password.
 */
import type { Knex } from 'knex';
import type { Handler, Request, RequestHandler } from 'express';
import { Passport, type Authenticator } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { findUserByEmail, findUserById, toUserDto, type UserRow } from '../features/users/users.repository';
import { verifyPassword } from '../lib/password';

export interface SignInFailure {
  message: string;
}

/** An Authenticator whose authenticate() returns an Express handler (the package's default is `any`). */
export type PassportInstance = Authenticator<Handler, RequestHandler>;

export const SIGN_IN_FAILED = 'The e-mail or the password is not right.';

/** What the session stores: { id, v } (older sessions hold the bare id, version 0). */
function sessionKey(value: unknown): { id: number; v: number } | null {
  if (typeof value === 'number') return { id: value, v: 0 };
  if (value && typeof value === 'object') {
    const { id, v } = value as { id?: unknown; v?: unknown };
    if (typeof id === 'number' && typeof v === 'number') return { id, v };
  }
  return null;
}

/** The account the session store read with this request's session, if it did (session-store.ts). */
export type PrefetchedAccount = (req: Request) => UserRow | undefined;

export function createPassport(
  db: Knex,
  decoy: () => Promise<string>,
  prefetched: PrefetchedAccount = () => undefined,
): PassportInstance {
  // The package types the constructor with its `any` defaults; authenticate() returns Express middleware.
  const passport = new Passport() as PassportInstance;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      (async () => {
        const row = await findUserByEmail(db, email);
        // Compare against a decoy hash when the account is unknown, so timing reveals nothing.
        const ok = await verifyPassword(password, row ? row.password_hash : await decoy());
        if (!row || !ok || !row.active) return done(null, false, { message: SIGN_IN_FAILED });
        return done(null, toUserDto(row));
      })().catch((err: unknown) => done(err));
    }),
  );
  passport.serializeUser((user, done) => {
    findUserById(db, user.id)
      .then((row) =>
        row ? done(null, { id: row.id, v: row.session_version }) : done(new Error('no such account')),
      )
      .catch((err: unknown) => done(err));
  });
  const accept = (row: UserRow | undefined, key: { id: number; v: number }) =>
    row && row.active && row.session_version === key.v ? toUserDto(row) : false;
  passport.deserializeUser(
    // Passport passes the request first when the function takes three arguments.
    (req: Request, value: unknown, done: (err: unknown, user?: Express.User | false) => void) => {
      const key = sessionKey(value);
      if (!key) return done(null, false);
      const row = prefetched(req);
      if (row && row.id === key.id) return done(null, accept(row, key));
      findUserById(db, key.id)
        .then((found) => done(null, accept(found, key)))
        .catch((err: unknown) => done(err));
    },
  );
  return passport;
}
