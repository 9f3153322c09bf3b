/**
 * The demo: four accounts (password `reachline-demo`), one project with all four as members, and
 * two cantilevers, each with revision 1 computed by the engine. Only ever written into an empty
 * database (no users yet), so it never touches real data, and only when asked: `npm start` in
 * development asks; with NODE_ENV=production only SEED_DEMO=1 does (server/env.ts).
 */
import type { Knex } from 'knex';
import { evaluateDesign } from '../../shared/engine/design';
import { DEFAULT_CODE_BASIS, type Role } from '../../shared/schemas/api';
import { designSchema } from '../../shared/schemas/design';
import { parseDesign } from '../../shared/schemas/parsed-design';
import { toFieldIssues } from '../../shared/schemas/quantity';
import { insertCantilever } from '../features/cantilevers/cantilevers.repository';
import { addMember, insertProject } from '../features/projects/projects.repository';
import { insertReview, insertRevision } from '../features/revisions/revisions.repository';
import { findUserByEmail, insertUser } from '../features/users/users.repository';
import { hashPassword, passwordProblem } from '../lib/password';
import { ENTRY_CANOPY_DESIGN, EAST_DECK_DESIGN } from './demo-designs';

export const DEMO_PASSWORD = 'reachline-demo';

export const DEMO_ACCOUNTS: { email: string; displayName: string; role: Role }[] = [
  { email: 'admin@reachline.test', displayName: 'Ines Ortega (admin)', role: 'admin' },
  { email: 'architect@reachline.test', displayName: 'Tomas Brandt', role: 'architect' },
  { email: 'fabricator@reachline.test', displayName: 'Wren Okafor', role: 'fabricator' },
  { email: 'engineer@reachline.test', displayName: 'Priya Vasquez, PE', role: 'engineer' },
];

export async function isEmpty(db: Knex): Promise<boolean> {
  const [row] = await db('users').count<{ n: number | string }[]>({ n: '*' });
  return Number(row.n) === 0;
}

export async function seedDemo(db: Knex, passwordCost: number): Promise<void> {
  // One salted hash per account, computed before the transaction (scrypt is slow on purpose).
  const hashes = await Promise.all(DEMO_ACCOUNTS.map(() => hashPassword(DEMO_PASSWORD, passwordCost)));
  await db.transaction(async (trx) => {
    const ids: Record<Role, number> = { admin: 0, architect: 0, fabricator: 0, engineer: 0 };
    for (const [i, account] of DEMO_ACCOUNTS.entries()) {
      ids[account.role] = await insertUser(trx, { ...account, passwordHash: hashes[i] });
    }
    const projectId = await insertProject(trx, {
      name: 'Harbor View Studio',
      site: 'Lot 7, Cedar Bluff Road',
      codeBasis: DEFAULT_CODE_BASIS,
      units: 'US',
      createdBy: ids.architect,
    });
    for (const id of Object.values(ids)) await addMember(trx, projectId, id);

    const designs = [
      {
        name: 'East deck, typical beam',
        description: 'Six beams at 4 ft, web tapered to 7 in at the tip, posts on piers.',
        doc: EAST_DECK_DESIGN,
        author: ids.architect,
        // Submitted by the architect and approved by the engineer: what the shop builds from.
        approvedBy: ids.engineer as number | null,
      },
      {
        name: 'Entry canopy',
        description: 'Tube outriggers over the front door, end plates on the wall.',
        doc: ENTRY_CANOPY_DESIGN,
        author: ids.engineer,
        approvedBy: null,
      },
    ];
    for (const d of designs) {
      const parsed = designSchema.safeParse(d.doc);
      if (!parsed.success) {
        const first = toFieldIssues(parsed.error)[0];
        throw new Error(`The demo design "${d.name}" is not valid: ${first.path}: ${first.message}`);
      }
      const cantileverId = await insertCantilever(trx, {
        projectId,
        name: d.name,
        description: d.description,
      });
      const revisionId = await insertRevision(trx, {
        cantileverId,
        number: 1,
        authorId: d.author,
        message: 'First design',
        input: parsed.data,
        result: evaluateDesign(parseDesign(parsed.data), { stations: true }),
        baseRevisionId: null,
      });
      if (d.approvedBy !== null) {
        await insertReview(trx, { revisionId, state: 'submitted', reviewerId: d.author, comment: '' });
        await insertReview(trx, {
          revisionId,
          state: 'approved',
          reviewerId: d.approvedBy,
          comment: 'Checked against the shop drawings; approved for fabrication.',
        });
      }
    }
  });
}

/** Seeds the demo when the database has no accounts; returns whether it did. */
export async function seedDemoIfEmpty(db: Knex, passwordCost: number): Promise<boolean> {
  if (!(await isEmpty(db))) return false;
  await seedDemo(db, passwordCost);
  return true;
}

/** The demo's accounts share a public password: say so loudly when it is seeded in production. */
export function warnAboutDemoInProduction(config: { nodeEnv: string; seedDemo: boolean }): void {
  if (config.nodeEnv === 'production' && config.seedDemo) {
    console.warn(
      `WARNING: SEED_DEMO is set with NODE_ENV=production: an empty database gets the demo accounts, whose password (${DEMO_PASSWORD}) is public. Disable or delete them before real use.`,
    );
  }
}

export class FirstAdminError extends Error {}

/**
 * Creates an admin account when the database has none (ADMIN_EMAIL / ADMIN_PASSWORD, or
 * `reachline admin create`). The password must pass the strength rule; the account must change
 * it at its first sign-in when it came from the environment, where it may linger.
 * Returns the new account's id, or null when an admin exists already.
 */
export async function createFirstAdmin(
  db: Knex,
  admin: { email: string; password: string; displayName: string },
  options: { passwordCost: number; mustChange: boolean; evenIfAdminExists?: boolean },
): Promise<number | null> {
  const problem = passwordProblem(admin.password, [admin.email, admin.displayName]);
  if (problem) throw new FirstAdminError(`password: ${problem}`);
  if (!options.evenIfAdminExists && (await db('users').where({ role: 'admin', active: true }).first()))
    return null;
  if (await findUserByEmail(db, admin.email))
    throw new FirstAdminError(`email: an account with ${admin.email} exists already`);
  const id = await insertUser(db, {
    email: admin.email,
    displayName: admin.displayName,
    role: 'admin',
    passwordHash: await hashPassword(admin.password, options.passwordCost),
  });
  if (options.mustChange) await db('users').where({ id }).update({ must_change_password: true });
  return id;
}
