/**
 * `npm run bench:outbox`: how far the outbox falls behind while four people save and submit at
 * once. A real server (SQLite, the demo, the built-in fake SMTP server) takes saves and submissions
 * from four clients for DURATION_MS; every submission queues a review request. Prints JSON: the
 * messages queued and sent, and the lag from queueing to sending (median, p95, max, in ms).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startServer } from '../server/start';
import { createDb } from '../server/db/knex';

const DURATION_MS = Number(process.env.DURATION_MS ?? 15_000);
const dir = mkdtempSync(join(tmpdir(), 'reachline-bench-outbox-'));
const databaseUrl = join(dir, 'reachline.sqlite');
const server = await startServer({
  port: 0,
  databaseUrl,
  dataDir: dir,
  uploadDir: join(dir, 'uploads'),
  seedDemo: true,
  passwordCost: 1024,
  loginRateLimit: 1000,
});
const url = server.url;

async function signIn(role: string): Promise<string> {
  const res = await fetch(`${url}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: `${role}@reachline.test`, password: 'reachline-demo' }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${role}: ${res.status}`);
  return res.headers.get('set-cookie')!.split(';')[0]!;
}

const json = (cookie: string) => ({ cookie, 'content-type': 'application/json' });
const architect = await signIn('architect');
const projects = (await (await fetch(`${url}/api/projects`, { headers: { cookie: architect } })).json()) as {
  id: number;
}[];
const projectId = projects[0]!.id;
const first = (
  (await (
    await fetch(`${url}/api/projects/${projectId}/cantilevers`, { headers: { cookie: architect } })
  ).json()) as { currentRevisionId: number }[]
)[0]!;
const template = (
  (await (
    await fetch(`${url}/api/revisions/${first.currentRevisionId}`, { headers: { cookie: architect } })
  ).json()) as {
    input: unknown;
  }
).input;

let saves = 0;
const end = Date.now() + DURATION_MS;
await Promise.all(
  ['architect', 'architect', 'fabricator', 'architect'].map(async (role, i) => {
    const cookie = await signIn(role);
    const created = await fetch(`${url}/api/projects/${projectId}/cantilevers`, {
      method: 'POST',
      headers: json(architect),
      body: JSON.stringify({ name: `Outbox bench beam ${i + 1}`, input: template }),
    });
    const cantileverId = ((await created.json()) as { id: number }).id;
    let base = 1;
    while (Date.now() < end) {
      const saved = await fetch(`${url}/api/cantilevers/${cantileverId}/revisions`, {
        method: 'POST',
        headers: json(cookie),
        body: JSON.stringify({ baseRevision: base, message: `bench save ${base + 1}`, input: template }),
      });
      if (saved.status !== 201) throw new Error(`save answered ${saved.status}`);
      const revision = (await saved.json()) as { id: number; number: number };
      base = revision.number;
      const submitted = await fetch(`${url}/api/revisions/${revision.id}/submit`, {
        method: 'POST',
        headers: json(cookie),
        body: JSON.stringify({ note: '' }),
      });
      if (submitted.status !== 200) throw new Error(`submit answered ${submitted.status}`);
      saves += 1;
    }
  }),
);

// Let the worker drain (at most 60 s), then read the lags from the outbox itself.
const db = createDb(databaseUrl);
const drainBy = Date.now() + 60_000;
while (Date.now() < drainBy) {
  const [{ n }] = (await db('outbox').where({ status: 'pending' }).count({ n: '*' })) as { n: number }[];
  if (Number(n) === 0) break;
  await new Promise((r) => setTimeout(r, 200));
}
const rows = (await db('outbox').select('created_at', 'sent_at', 'status')) as {
  created_at: string;
  sent_at: string | null;
  status: string;
}[];
await db.destroy();
await server.close();
rmSync(dir, { recursive: true, force: true });

const lags = rows
  .filter((r) => r.sent_at)
  .map((r) => new Date(r.sent_at!).getTime() - new Date(r.created_at).getTime())
  .sort((a, b) => a - b);
const at = (q: number) =>
  lags.length ? lags[Math.min(lags.length - 1, Math.floor(q * lags.length))]! : null;
console.log(
  JSON.stringify(
    {
      clients: 4,
      durationMs: DURATION_MS,
      savesAndSubmissions: saves,
      queued: rows.length,
      sent: lags.length,
      notSent: rows.filter((r) => !r.sent_at).length,
      lagMedianMs: at(0.5),
      lagP95Ms: at(0.95),
      lagMaxMs: lags.length ? lags[lags.length - 1] : null,
    },
    null,
    2,
  ),
);
