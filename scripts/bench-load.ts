/**
 * `npm run bench:load`: load figures on loopback with autocannon (a devDependency), bounded in
 * time. For each setup (one instance on SQLite; one and two instances on one PostgreSQL, a
 * throwaway cluster from scripts/lib/pg-cluster.ts) the server entry (server/index.ts) runs in its
 * own process(es) on a fresh demo database; a signed-in demo engineer then measures, one after
 * the other: /api/health, the project, the revisions list, one revision, POST /api/check (the
 * result, and "check+stn" with the station arrays), and a 50-client mix of the reads and the check.
 * The server is the bundle npm start runs (scripts/lib/server-build.ts), built first if stale. Prints req/s, p50/p99 latency and errors, with each
 * figure's ratio to /api/health in the same run; `--json` prints one object.
 *
 * Every run opens its connections at once. Node 20's libuv (1.45 and later) accepts one new
 * connection per turn of the event loop, and on a saturated 2-core machine a turn lasts as long as
 * the answers it sends (20 ms for health, 60-100 ms for the mix): the 50th connection of the mix
 * waits about two seconds for its first answer, and those 50 first answers are more than 1 % of a
 * 5 s run, so they make its p99. A plain Node http server with 2 ms of work per request shows the
 * same. So beside autocannon's figures, "open p99" leaves out each connection's first answer
 * (what clients on kept-alive connections, or behind a pooling load balancer, see), and "1st max"
 * is the slowest first answer.
 *
 * Options: --duration <s> per measurement (default 5), --connections <n> (default 10),
 * --only sqlite|pg1|pg2.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../server/db/seed';
import { startFakeSmtp } from '../server/mail/fake-smtp';
import { findPgBin, startPgCluster, type PgCluster } from './lib/pg-cluster';
import { serverBuildStep, serverOutDir } from './lib/server-build';
import { startServerProcess, type ServerProcess } from './lib/server-process';
import { percentile } from './lib/stats';

const args = process.argv.slice(2);
const option = (name: string, fallback: string) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
};
const DURATION = Number(option('--duration', '5'));
const CONNECTIONS = Number(option('--connections', '10'));
const ONLY = option('--only', '');
const JSON_OUT = args.includes('--json');

interface Figure {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  max: number;
  /** p99 of the answers on connections already open (each connection's first answer left out). */
  openP99: number;
  /** The slowest first answer on a new connection (it waits to be accepted, see the header). */
  firstMax: number;
  errors: number;
  non2xx: number;
  ratio?: number;
}

/** The bundled server, as npm start runs it (built first when out of date). */
const BUNDLE = join(serverOutDir(process.cwd()), 'serve.js');

function startInstance(env: Record<string, string>, name: string): Promise<ServerProcess> {
  return startServerProcess(env, name, 90_000, BUNDLE);
}

async function signIn(url: string): Promise<string> {
  const engineer = DEMO_ACCOUNTS.find((a) => a.role === 'engineer')!;
  const res = await fetch(`${url}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: engineer.email, password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
  return res.headers.getSetCookie()[0].split(';')[0];
}

async function getJson<T>(url: string, cookie: string): Promise<T> {
  const res = await fetch(url, { headers: { cookie } });
  if (res.status !== 200) throw new Error(`${url}: ${res.status}`);
  return (await res.json()) as T;
}

type Req = { method: 'GET' | 'POST'; path: string; body?: string };

/** One autocannon run per instance at once (the connections split between them); figures merged. */
async function measure(
  name: string,
  instances: ServerProcess[],
  cookie: string,
  requests: Req[],
  connections: number,
) {
  const per = Math.max(1, Math.round(connections / instances.length));
  const open: number[] = [];
  let firstMax = 0;
  const results = await Promise.all(
    instances.map((i) => {
      const run = autocannon({
        url: i.url,
        connections: per,
        duration: DURATION,
        headers: { cookie, 'content-type': 'application/json' },
        requests: requests.map((r) => ({ method: r.method, path: r.path, body: r.body })),
      });
      const answered = new WeakSet<object>();
      run.on('response', (client: object, _status: number, _bytes: number, ms: number) => {
        if (answered.has(client)) open.push(ms);
        else {
          answered.add(client);
          firstMax = Math.max(firstMax, ms);
        }
      });
      return run;
    }),
  );
  open.sort((a, b) => a - b);
  const openP99 = percentile(open, 0.99);
  const figure: Figure = {
    name,
    rps: results.reduce((s, r) => s + r.requests.average, 0),
    // Merged conservatively: the slowest instance's percentiles.
    p50: Math.max(...results.map((r) => r.latency.p50)),
    p99: Math.max(...results.map((r) => r.latency.p99)),
    max: Math.max(...results.map((r) => r.latency.max)),
    openP99,
    firstMax,
    errors: results.reduce((s, r) => s + r.errors + r.timeouts, 0),
    non2xx: results.reduce((s, r) => s + r.non2xx, 0),
  };
  return figure;
}

async function runSetup(label: string, databaseUrl: string, count: number): Promise<Figure[]> {
  const dir = mkdtempSync(join(tmpdir(), 'reachline-bench-'));
  const smtp = await startFakeSmtp(null);
  const base = {
    NODE_ENV: 'production',
    SEED_DEMO: '1',
    PORT: '0',
    HOST: '127.0.0.1',
    DATABASE_URL: databaseUrl,
    UPLOAD_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'bench-secret-long-enough-for-the-check',
    SMTP_URL: smtp.url,
    LOG_LEVEL: 'warn',
    LOGIN_RATE_LIMIT: '1000',
  };
  const instances: ServerProcess[] = [];
  try {
    // The first instance migrates and seeds; the second starts on the ready database.
    instances.push(await startInstance({ ...base, DATA_DIR: join(dir, 'a') }, `${label} A`));
    if (count > 1) instances.push(await startInstance({ ...base, DATA_DIR: join(dir, 'b') }, `${label} B`));
    const cookie = await signIn(instances[0].url);
    const projects = await getJson<{ id: number }[]>(`${instances[0].url}/api/projects`, cookie);
    const projectId = projects[0].id;
    const cantilevers = await getJson<{ id: number; currentRevisionId: number | null }[]>(
      `${instances[0].url}/api/projects/${projectId}/cantilevers`,
      cookie,
    );
    const cantilever = cantilevers.find((c) => c.currentRevisionId)!;
    const revision = await getJson<{ input: unknown }>(
      `${instances[0].url}/api/revisions/${cantilever.currentRevisionId}`,
      cookie,
    );
    const check: Req = {
      method: 'POST',
      path: '/api/check',
      body: JSON.stringify({ input: revision.input }),
    };
    const checkStations: Req = { ...check, body: JSON.stringify({ input: revision.input, stations: true }) };
    const reads: Record<string, Req> = {
      project: { method: 'GET', path: `/api/projects/${projectId}` },
      revisions: { method: 'GET', path: `/api/cantilevers/${cantilever.id}/revisions` },
      revision: { method: 'GET', path: `/api/revisions/${cantilever.currentRevisionId}` },
    };
    // Warm-up: JIT and caches, not measured.
    await measure('warm-up', instances, cookie, [reads.revision, check], CONNECTIONS).catch(() => undefined);
    const figures: Figure[] = [];
    const health = await measure(
      'health',
      instances,
      cookie,
      [{ method: 'GET', path: '/api/health' }],
      CONNECTIONS,
    );
    figures.push(health);
    for (const [name, req] of Object.entries(reads))
      figures.push(await measure(name, instances, cookie, [req], CONNECTIONS));
    figures.push(await measure('check', instances, cookie, [check], CONNECTIONS));
    figures.push(await measure('check+stn', instances, cookie, [checkStations], CONNECTIONS));
    figures.push(
      await measure('mix-50', instances, cookie, [reads.project, reads.revisions, reads.revision, check], 50),
    );
    for (const f of figures) f.ratio = f.rps / health.rps;
    return figures;
  } finally {
    for (const i of instances) i.child.kill('SIGTERM');
    await new Promise((r) => setTimeout(r, 300));
    for (const i of instances) if (i.child.exitCode === null) i.child.kill('SIGKILL');
    await smtp.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

function print(label: string, figures: Figure[]): void {
  console.log(`\n${label} (${DURATION} s each, ${CONNECTIONS} connections; the mix: 50)`);
  console.log(
    '  what         req/s    p50 ms   p99 ms   max ms  open p99  1st max   errors  non-2xx  of health',
  );
  const ms = (n: number, width: number) => (Number.isFinite(n) ? n.toFixed(0) : '-').padStart(width);
  for (const f of figures) {
    console.log(
      `  ${f.name.padEnd(10)} ${f.rps.toFixed(0).padStart(7)} ${ms(f.p50, 9)} ${ms(f.p99, 8)} ${ms(f.max, 8)} ${ms(
        f.openP99,
        9,
      )} ${ms(f.firstMax, 8)} ${String(f.errors).padStart(8)} ${String(f.non2xx).padStart(8)} ${`${(
        (f.ratio ?? 0) * 100
      ).toFixed(0)} %`.padStart(10)}`,
    );
  }
  console.log(
    '  open p99: the answers on connections already open; 1st max: the slowest first answer of a new connection.',
  );
}

async function main(): Promise<void> {
  const build = serverBuildStep(process.cwd());
  await build.run();
  const all: Record<string, Figure[]> = {};
  const setups: { key: string; label: string; count: number; pg: boolean }[] = [
    { key: 'sqlite', label: 'SQLite, one instance', count: 1, pg: false },
    { key: 'pg1', label: 'PostgreSQL, one instance', count: 1, pg: true },
    { key: 'pg2', label: 'PostgreSQL, two instances', count: 2, pg: true },
  ].filter((s) => !ONLY || s.key === ONLY);
  let cluster: PgCluster | null = null;
  try {
    for (const setup of setups) {
      let url: string;
      if (setup.pg) {
        if (!findPgBin()) {
          console.log(`${setup.label}: skipped, PostgreSQL is not installed`);
          continue;
        }
        cluster ??= await startPgCluster();
        const db = `bench_${setup.key}`;
        const admin = await import('knex').then((k) => k.default({ client: 'pg', connection: cluster!.url }));
        await admin.raw(`CREATE DATABASE ${db}`);
        await admin.destroy();
        url = cluster.urlFor(db);
      } else {
        url = join(mkdtempSync(join(tmpdir(), 'reachline-bench-db-')), 'bench.sqlite');
      }
      all[setup.key] = await runSetup(setup.label, url, setup.count);
      if (!JSON_OUT) print(setup.label, all[setup.key]);
    }
  } finally {
    cluster?.stop();
  }
  if (JSON_OUT)
    console.log(JSON.stringify({ duration: DURATION, connections: CONNECTIONS, setups: all }, null, 2));
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
