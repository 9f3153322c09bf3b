/**
 * One Passport instance per app (the default export is a process-wide singleton, and two apps in
 * one test run would share strategies and serializers).
 */
import type { Knex } from 'knex';
import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { findUserByEmail, findUserById, toUserDto } from '../features/users/users.repository';
import { verifyPassword } from '../lib/password';

export interface SignInFailure {
  message: string;
}

export type PassportInstance = InstanceType<typeof Passport>;

export function createPassport(db: Knex, decoy: () => Promise<string>): PassportInstance {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      (async () => {
        const row = await findUserByEmail(db, email);
        // Compare against a decoy hash when the account is unknown, so timing reveals nothing.
        const ok = await verifyPassword(password, row ? row.password_hash : await decoy());
        if (!row || !ok) return done(null, false, { message: 'The e-mail or the password is not right.' });
        if (!row.active) return done(null, false, { message: 'This account is disabled; ask an admin.' });
        return done(null, toUserDto(row));
      })().catch((err: unknown) => done(err));
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: unknown, done) => {
    findUserById(db, Number(id))
      .then((row) => done(null, row && row.active ? toUserDto(row) : false))
      .catch((err: unknown) => done(err));
  });
  return passport;
}
