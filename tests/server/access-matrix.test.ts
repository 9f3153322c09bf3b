/**
 * Who may call what: every API route, taken from the app's own route table, called by every kind
 * of person (signed out; an admin, architect, fabricator and engineer who are members of the
 * project; the same four roles outside it). The policy below states the expected answer for each
 * route; a route added to a router without a policy entry fails this test, and so does an entry
 * whose route no longer exists.
 *
 * Expected answers (DESIGN.md "Who uses it", the EDIT_RIGHTS table): 401 signed out; 404 for a
 * project's items to anyone outside it (existence is not revealed); 403 for a member whose role may
 * not do it; otherwise the route's own success status. Mutating routes get a fresh target per call
 * (a new revision to submit or review, a new account to edit), so one allowed call never changes
 * what the next one sees.
 */
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../../server/lib/password';
import { insertUser } from '../../server/features/users/users.repository';
import { addMember } from '../../server/features/projects/projects.repository';
import type { Role } from '../../shared/schemas/api';
import { baseDesign, createTestEnv, PASSWORD, TEAM, type TestEnv } from '../helpers/api';

type Subject = 'anonymous' | `member-${Role}` | `outsider-${Role}`;

const ROLES: readonly Role[] = ['admin', 'architect', 'fabricator', 'engineer'];
const SUBJECTS: readonly Subject[] = [
  'anonymous',
  ...ROLES.map((r) => `member-${r}` as const),
  ...ROLES.map((r) => `outsider-${r}` as const),
];

type Outcome = 'ok' | 401 | 403 | 404 | 405;

interface Target {
  path: string;
  body?: unknown;
  /** multipart fields and one file */
  multipart?: { fields: Record<string, string>; file: { name: string; bytes: Buffer } };
}

interface Policy {
  /** What each subject should get. */
  expect(subject: Subject): Outcome;
  /** The concrete call (fresh targets for mutating routes). */
  target(env: MatrixEnv, subject: Subject): Promise<Target> | Target;
  /** Statuses that count as "ok" for this route (default 200, 201 and 204). */
  okStatus?: readonly number[];
  /** Use a new agent signed in for this call only (routes that end the session). */
  freshAgent?: boolean;
  /** Method to use for an `all` route. */
  method?: 'put' | 'delete' | 'patch';
}

interface MatrixEnv extends TestEnv {
  extra: Record<`outsider-${Exclude<Role, 'engineer'>}`, number>;
}

const roleOf = (s: Subject): Role | null => (s === 'anonymous' ? null : (s.split('-')[1] as Role));
const isMemberSubject = (s: Subject) => s.startsWith('member-');

/** Signed in, whoever you are. */
const signedIn = (s: Subject): Outcome => (s === 'anonymous' ? 401 : 'ok');
/** Admins only; membership does not matter. */
const adminOnly = (s: Subject): Outcome => (s === 'anonymous' ? 401 : roleOf(s) === 'admin' ? 'ok' : 403);
/** Members of the project, these roles. */
const members =
  (...roles: Role[]) =>
  (s: Subject): Outcome => {
    if (s === 'anonymous') return 401;
    if (!isMemberSubject(s)) return 404;
    return roles.length === 0 || roles.includes(roleOf(s)!) ? 'ok' : 403;
  };
const anyMember = members();
const DESIGN: Role[] = ['architect', 'fabricator', 'engineer'];

const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);
const SHAPE_CSV = (label: string) =>
  Buffer.from(
    [
      'label,family,W,A,d,bf,tf,tw,Ht,B,tdes,OD,Ix,Zx,Sx,Iy,ry,J',
      `${label},W,22,6.5,14,5,0.335,0.23,,,,,199,32,28.4,7,1.04,0.2`,
    ].join('\n'),
  );

let counter = 0;
const unique = (prefix: string) => `${prefix}${++counter}`;

/** A new revision of the test cantilever by the architect (so every engineer may review it). */
async function freshRevision(env: MatrixEnv, submitted: boolean): Promise<number> {
  const architect = await env.login('architect');
  const list = await architect.get(`/api/cantilevers/${env.cantileverId}/revisions`).expect(200);
  const latest = Math.max(...(list.body as { number: number }[]).map((r) => r.number));
  const saved = await architect
    .post(`/api/cantilevers/${env.cantileverId}/revisions`)
    .send({ baseRevision: latest, message: unique('matrix '), input: baseDesign() })
    .expect(201);
  if (submitted) await architect.post(`/api/revisions/${saved.body.id}/submit`).expect(200);
  return saved.body.id as number;
}

/** A new attachment of the test cantilever, uploaded by the member engineer. */
async function freshAttachment(env: MatrixEnv): Promise<number> {
  const engineer = await env.login('engineer');
  const up = await engineer
    .post(`/api/cantilevers/${env.cantileverId}/attachments`)
    .attach('file', PNG, 'dot.png')
    .expect(201);
  return up.body.id as number;
}

async function latestNumber(env: MatrixEnv): Promise<number> {
  const rows = await env.db('revisions').where({ cantilever_id: env.cantileverId }).max({ n: 'number' });
  return Number(rows[0]!.n);
}

async function freshAccount(env: MatrixEnv, member: boolean): Promise<number> {
  const id = await insertUser(env.db, {
    email: `${unique('person')}@example.test`,
    displayName: 'Matrix Person',
    role: 'architect',
    passwordHash: await hashPassword(PASSWORD, env.config.passwordCost),
  });
  if (member) await addMember(env.db, env.projectId, id);
  return id;
}

const POLICY: Record<string, Policy> = {
  'GET /health': { expect: () => 'ok', target: () => ({ path: '/api/health' }) },
  'POST /auth/login': {
    expect: () => 'ok',
    freshAgent: true,
    target: () => ({ path: '/api/auth/login', body: { email: TEAM.architect.email, password: PASSWORD } }),
  },
  'POST /auth/logout': { expect: () => 'ok', freshAgent: true, target: () => ({ path: '/api/auth/logout' }) },
  'GET /auth/me': { expect: signedIn, target: () => ({ path: '/api/auth/me' }) },
  'PATCH /auth/me': {
    expect: signedIn,
    target: () => ({ path: '/api/auth/me', body: { displayName: 'Same Name' } }),
  },
  // Past the gate a wrong current password is refused in words (400), which is what a caller may learn.
  'POST /auth/password': {
    expect: signedIn,
    okStatus: [400],
    target: () => ({
      path: '/api/auth/password',
      body: { currentPassword: 'not the password', newPassword: 'violet kettle drums in april' },
    }),
  },
  'GET /projects': { expect: signedIn, target: () => ({ path: '/api/projects' }) },
  'POST /projects': {
    // admin, architect and engineer start projects (projects.service PROJECT_CREATORS)
    expect: (s) => (s === 'anonymous' ? 401 : roleOf(s) === 'fabricator' ? 403 : 'ok'),
    target: () => ({ path: '/api/projects', body: { name: unique('Matrix project '), site: 'Somewhere' } }),
  },
  'GET /projects/:projectId': {
    expect: anyMember,
    target: (e) => ({ path: `/api/projects/${e.projectId}` }),
  },
  'GET /projects/:projectId/cantilevers': {
    expect: anyMember,
    target: (e) => ({ path: `/api/projects/${e.projectId}/cantilevers` }),
  },
  'POST /projects/:projectId/cantilevers': {
    expect: members(...DESIGN),
    target: (e) => ({
      path: `/api/projects/${e.projectId}/cantilevers`,
      body: { name: unique('Matrix beam ') },
    }),
  },
  'POST /projects/:projectId/members': {
    expect: adminOnly,
    target: async (e) => ({
      path: `/api/projects/${e.projectId}/members`,
      body: { userId: await freshAccount(e, false) },
    }),
  },
  'DELETE /projects/:projectId/members/:userId': {
    expect: adminOnly,
    target: async (e) => ({ path: `/api/projects/${e.projectId}/members/${await freshAccount(e, true)}` }),
  },
  'GET /cantilevers/:cantileverId': {
    expect: anyMember,
    target: (e) => ({ path: `/api/cantilevers/${e.cantileverId}` }),
  },
  // The number of beams (plate schedule quantity): design roles of the project.
  'PATCH /cantilevers/:cantileverId': {
    expect: members(...DESIGN),
    target: (e) => ({ path: `/api/cantilevers/${e.cantileverId}`, body: { quantity: 2 } }),
  },
  'GET /cantilevers/:cantileverId/plate-schedule.csv': {
    expect: anyMember,
    target: (e) => ({ path: `/api/cantilevers/${e.cantileverId}/plate-schedule.csv` }),
  },
  'GET /revisions/:revisionId/package.pdf': {
    expect: anyMember,
    target: (e) => ({ path: `/api/revisions/${e.revisionId}/package.pdf` }),
  },
  'GET /revisions/:revisionId/comments': {
    expect: anyMember,
    target: (e) => ({ path: `/api/revisions/${e.revisionId}/comments` }),
  },
  'POST /revisions/:revisionId/comments': {
    expect: anyMember,
    target: (e) => ({ path: `/api/revisions/${e.revisionId}/comments`, body: { body: 'A matrix comment.' } }),
  },
  'GET /revisions/:revisionId/plate-schedule.csv': {
    expect: anyMember,
    target: (e) => ({ path: `/api/revisions/${e.revisionId}/plate-schedule.csv` }),
  },
  'GET /projects/:projectId/plate-schedule.csv': {
    expect: anyMember,
    target: (e) => ({ path: `/api/projects/${e.projectId}/plate-schedule.csv` }),
  },
  'GET /cantilevers/:cantileverId/revisions': {
    expect: anyMember,
    target: (e) => ({ path: `/api/cantilevers/${e.cantileverId}/revisions` }),
  },
  // An unchanged document is within every design role's rights; an admin has no design rights.
  'POST /cantilevers/:cantileverId/revisions': {
    expect: members(...DESIGN),
    target: async (e) => ({
      path: `/api/cantilevers/${e.cantileverId}/revisions`,
      body: { baseRevision: await latestNumber(e), message: unique('matrix save '), input: baseDesign() },
    }),
  },
  'GET /revisions/:revisionId': {
    expect: anyMember,
    target: (e) => ({ path: `/api/revisions/${e.revisionId}` }),
  },
  // Saved revisions never change: every method but GET answers 405 past the sign-in gate.
  '_ALL /revisions/:revisionId': {
    expect: (s) => (s === 'anonymous' ? 401 : 405),
    method: 'delete',
    target: (e) => ({ path: `/api/revisions/${e.revisionId}` }),
  },
  // Any design role submits (revisions.service submitRevision); an admin who is not the author may not.
  'POST /revisions/:revisionId/submit': {
    expect: members(...DESIGN),
    target: async (e) => ({ path: `/api/revisions/${await freshRevision(e, false)}/submit` }),
  },
  // Engineers only, never on their own revision (the fresh revision is the architect's).
  'POST /revisions/:revisionId/reviews': {
    expect: members('engineer'),
    target: async (e) => ({
      path: `/api/revisions/${await freshRevision(e, true)}/reviews`,
      body: { decision: 'request-changes', comment: 'matrix' },
    }),
  },
  // Anyone signed in: an engineer's own queue (empty for the other roles and outside projects).
  'GET /reviews/awaiting': { expect: signedIn, target: () => ({ path: '/api/reviews/awaiting' }) },
  'GET /cantilevers/:cantileverId/attachments': {
    expect: anyMember,
    target: (e) => ({ path: `/api/cantilevers/${e.cantileverId}/attachments` }),
  },
  'POST /cantilevers/:cantileverId/attachments': {
    expect: members(...DESIGN),
    target: (e) => ({
      path: `/api/cantilevers/${e.cantileverId}/attachments`,
      multipart: { fields: {}, file: { name: 'dot.png', bytes: PNG } },
    }),
  },
  'GET /attachments/:attachmentId': {
    expect: anyMember,
    target: async (e) => {
      const engineer = await e.login('engineer');
      const up = await engineer
        .post(`/api/cantilevers/${e.cantileverId}/attachments`)
        .attach('file', PNG, 'dot.png')
        .expect(201);
      return { path: `/api/attachments/${up.body.id}` };
    },
  },
  // The uploader only (the engineer uploads a fresh file per call); admins may delete but not describe.
  'PATCH /attachments/:attachmentId': {
    expect: members('engineer'),
    target: async (e) => ({
      path: `/api/attachments/${await freshAttachment(e)}`,
      body: { description: unique('matrix ') },
    }),
  },
  // The uploader or an admin of the project; outside it, 404 (existence is not revealed).
  'DELETE /attachments/:attachmentId': {
    expect: members('engineer', 'admin'),
    target: async (e) => ({ path: `/api/attachments/${await freshAttachment(e)}` }),
  },
  'GET /shapes': { expect: signedIn, target: () => ({ path: '/api/shapes?family=HSS' }) },
  // Into a project: its members with a design role (shapes.service importScope).
  'POST /shapes/import': {
    expect: members(...DESIGN),
    target: (e) => ({
      path: '/api/shapes/import',
      multipart: {
        fields: { projectId: String(e.projectId) },
        file: { name: 'shapes.csv', bytes: SHAPE_CSV(unique('RLMATRIX')) },
      },
    }),
  },
  'POST /check': { expect: signedIn, target: () => ({ path: '/api/check', body: { input: baseDesign() } }) },
  'GET /admin/users': { expect: adminOnly, target: () => ({ path: '/api/admin/users' }) },
  'POST /admin/users': {
    expect: adminOnly,
    target: () => ({
      path: '/api/admin/users',
      body: {
        email: `${unique('new')}@example.test`,
        displayName: 'New Person',
        role: 'fabricator',
        password: 'quiet lanterns over harbour',
      },
    }),
  },
  'PATCH /admin/users/:userId': {
    expect: adminOnly,
    target: async (e) => ({
      path: `/api/admin/users/${await freshAccount(e, false)}`,
      body: { displayName: 'Renamed' },
    }),
  },
  'GET /admin/outbox': { expect: adminOnly, target: () => ({ path: '/api/admin/outbox' }) },
  'POST /admin/outbox/retry': { expect: adminOnly, target: () => ({ path: '/api/admin/outbox/retry' }) },
  'GET /admin/audit': { expect: adminOnly, target: () => ({ path: '/api/admin/audit' }) },
};

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
  match?(path: string): boolean;
}

/** Every route of the mounted API router, as "METHOD /path" (Express 5 route table). */
function apiRoutes(app: TestEnv['app']): string[] {
  const top = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  const api = top.find((l) => l.handle?.stack && l.match?.('/api/health'));
  if (!api?.handle?.stack) throw new Error('the API router is not mounted at /api');
  const out: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route)
        for (const m of Object.keys(layer.route.methods)) out.push(`${m.toUpperCase()} ${layer.route.path}`);
      else if (layer.handle?.stack) walk(layer.handle.stack);
    }
  };
  walk(api.handle.stack);
  return out;
}

describe('route x role x membership', () => {
  let env: MatrixEnv;
  const agents = new Map<Subject, TestAgent>();
  let routes: string[] = [];

  async function signIn(email: string): Promise<TestAgent> {
    const agent = request.agent(env.app);
    await agent.post('/api/auth/login').send({ email, password: PASSWORD }).expect(200);
    return agent;
  }
  const emailOf = async (s: Subject): Promise<string> => {
    const ids: Record<Exclude<Subject, 'anonymous'>, number> = {
      'member-admin': env.ids.admin,
      'member-architect': env.ids.architect,
      'member-fabricator': env.ids.fabricator,
      'member-engineer': env.ids.engineer,
      'outsider-engineer': env.ids.outsider,
      ...env.extra,
    };
    const row = await env
      .db('users')
      .where({ id: ids[s as Exclude<Subject, 'anonymous'>] })
      .first();
    return row.email as string;
  };

  beforeAll(async () => {
    const base = await createTestEnv();
    const hash = await hashPassword(PASSWORD, base.config.passwordCost);
    const extra = {} as MatrixEnv['extra'];
    for (const role of ['admin', 'architect', 'fabricator'] as const) {
      extra[`outsider-${role}`] = await insertUser(base.db, {
        email: `outsider-${role}@example.test`,
        displayName: `Outside ${role}`,
        role,
        passwordHash: hash,
      });
    }
    env = Object.assign(base, { extra });
    for (const s of SUBJECTS) if (s !== 'anonymous') agents.set(s, await signIn(await emailOf(s)));
    routes = apiRoutes(env.app);
  });
  afterAll(async () => env.close());

  it('has a policy for every route and a route for every policy', () => {
    expect(routes.length).toBeGreaterThan(30);
    const missing = routes.filter((r) => !(r in POLICY));
    const stale = Object.keys(POLICY).filter((k) => !routes.includes(k));
    expect({ missing, stale }).toEqual({ missing: [], stale: [] });
  });

  // About 370 requests, some creating revisions: minutes on a loaded 2-core machine.
  it('answers every cell as the policy says', { timeout: 300_000 }, async () => {
    const mismatches: string[] = [];
    let cells = 0;
    for (const route of routes) {
      const policy = POLICY[route];
      if (!policy) continue;
      const [verb] = route.split(' ') as [string];
      const method = (verb === '_ALL' ? policy.method! : verb.toLowerCase()) as
        'get' | 'post' | 'patch' | 'delete' | 'put';
      for (const subject of SUBJECTS) {
        const target = await policy.target(env, subject);
        const client =
          subject === 'anonymous'
            ? request(env.app)
            : policy.freshAgent
              ? await signIn(await emailOf(subject))
              : agents.get(subject)!;
        let call = client[method](target.path);
        if (target.multipart) {
          for (const [k, v] of Object.entries(target.multipart.fields)) call = call.field(k, v);
          call = call.attach('file', target.multipart.file.bytes, target.multipart.file.name);
        } else if (target.body !== undefined) call = call.send(target.body as object);
        const res = await call;
        cells += 1;
        const expected = policy.expect(subject);
        const okStatus = policy.okStatus ?? [200, 201, 204];
        const good = expected === 'ok' ? okStatus.includes(res.status) : res.status === expected;
        if (!good)
          mismatches.push(
            `${route} as ${subject}: expected ${expected === 'ok' ? okStatus.join('/') : expected}, got ${res.status} ${JSON.stringify(res.body?.error?.message ?? '')}`,
          );
      }
    }
    expect(cells).toBe(routes.length * SUBJECTS.length);
    expect(mismatches).toEqual([]);
  });
});
