/**
 * The welcome e-mail to a new account, queued through the outbox in the transaction that creates
 * the account (by an admin on the Team screen or by `reachline admin create`). It names the sign-in
 * address and the account's e-mail; the first password is never mailed: the admin who set it
 * hands it over another way, and the account must choose its own at the first sign-in.
 */
import type { Knex } from 'knex';
import type { Role } from '../../../shared/schemas/api';
import type { Config } from '../../env';
import { queueMail } from '../../mail/outbox.repository';
import { appBase } from '../revisions/review-mail';

const ROLE_WORDS: Record<Role, string> = {
  admin: 'an admin (accounts and project teams)',
  architect: 'an architect (the member and its loads)',
  fabricator: 'a fabricator (the connection)',
  engineer: 'an engineer (the whole design and its review)',
};

export const WELCOME_SUBJECT = 'Your Reachline account';

export function signInLink(config: Pick<Config, 'appOrigin' | 'port'>): string {
  return `${appBase(config)}/sign-in`;
}

export async function queueWelcomeMail(
  db: Knex | Knex.Transaction,
  config: Pick<Config, 'appOrigin' | 'port'>,
  account: { email: string; displayName: string; role: Role },
  createdBy: string | null,
): Promise<void> {
  const who = createdBy ?? 'An administrator';
  await queueMail(db, {
    to: [account.email],
    subject: WELCOME_SUBJECT,
    text: [
      `Hello ${account.displayName},`,
      '',
      `${who} made a Reachline account for you, as ${ROLE_WORDS[account.role]}.`,
      `Sign in at ${signInLink(config)} with the e-mail address ${account.email}.`,
      '',
      `Your first password comes from ${createdBy ?? 'the administrator'} by another way; it is never sent by e-mail.`,
      'At your first sign-in you are asked to choose a new password that only you know.',
      '',
      'If you did not expect this account, tell your administrator; nothing else is needed.',
    ].join('\n'),
  });
}
