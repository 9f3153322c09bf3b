/**
 * The one test command (`npm test`). First it finds a Chromium for the browser tests (installing
 * Debian's when it may: scripts/lib/chromium.ts). Then, side by side: typecheck, lint, the
 * formatting check, the client build and the server bundle; the vitest runs below in two lanes
 * (each run in its own vitest process, with its own environment): the runs that need the build
 * start as soon as it is done, beside the others, which go one after the other (the machine has
 * 2 cores: a third lane made the whole slower). Every step runs even when an earlier one
 * fails, so one run shows everything that is wrong. The last line is exactly "N passed, N failed",
 * which CI reads: each vitest test counts, and each other step counts as one.
 */
import { mkdirSync, rmSync } from 'node:fs';
import { realHost, resolveChromium } from './lib/chromium';
import { findPgBin, startPgCluster, type PgCluster } from './lib/pg-cluster';
import { report, runNode, type Finished } from './lib/processes';
import { countReport, type Tally } from './lib/vitest-report';

interface VitestRun {
  /** Names the run in the log and its JSON report (tests/output/vitest-<label>.json). */
  label: string;
  /** vitest projects (vitest.config.ts) run together in one vitest process. */
  projects: string[];
  /** Extra environment for this run only. */
  env?: Record<string, string>;
  /**
   * Starts once the client build has finished (the browser tests serve dist/), in its own lane beside
   * the other runs (the browser tests wait on the browser much of the time; the machine has 2 cores);
   * its output is printed in one block when it ends.
   */
  needsBuild?: boolean;
  /** Runs on the throwaway PostgreSQL cluster (TEST_PG_URL); fails as one step when PostgreSQL is missing. */
  needsPg?: boolean;
}

/**
 * The vitest runs, in order. To run a suite again under other settings, add a row, e.g.
 * `{ label: 'api-postgres', projects: ['api'], env: { DATABASE_URL: 'postgres://…' } }`.
 */
const VITEST_RUNS: VitestRun[] = [
  { label: 'unit-client-api', projects: ['unit', 'client', 'api'] },
  // The API suite again on PostgreSQL, with the multi-instance test (tests/server/multi-instance.test.ts).
  { label: 'api-postgres', projects: ['api'], needsPg: true },
  { label: 'e2e', projects: ['e2e'], needsBuild: true },
];

/** The other steps, run side by side; each passes or fails as a whole. */
const CACHE = 'node_modules/.cache/reachline';
const CHECKS: { label: string; args: string[] }[] = [
  {
    label: 'typecheck',
    // TypeScript 7's native compiler (the `typescript-native` alias): the same checks in about a
    // quarter of TypeScript 5.9's CPU with the cache and a seventh without. 5.9 stays for ESLint's
    // typed rules and the typed-routes test (typescript-eslint needs its JavaScript API).
    // Incremental: it re-checks only what changed since the last run and what depends on it.
    args: [
      'node_modules/typescript-native/bin/tsc',
      '--noEmit',
      '-p',
      'tsconfig.json',
      '--incremental',
      '--tsBuildInfoFile',
      `${CACHE}/typecheck.tsbuildinfo`,
    ],
  },
  {
    label: 'lint',
    // Cached by content: only changed files are linted again. The type-aware rules (server/ and
    // shared/) also read the types of other files, which the cache does not track; a clean run
    // (CI, or deleting the cache folder) is the full check.
    args: [
      'node_modules/eslint/bin/eslint.js',
      '.',
      '--max-warnings=0',
      '--cache',
      '--cache-location',
      `${CACHE}/eslint/`,
      '--cache-strategy',
      'content',
    ],
  },
  {
    label: 'format',
    args: [
      'node_modules/prettier/bin/prettier.cjs',
      '--check',
      '.',
      '--cache',
      '--cache-strategy',
      'content',
    ],
  },
];
const BUILD = { label: 'build', args: ['--import', 'tsx', 'scripts/build.ts', '--if-stale'] };
/**
 * The server bundle npm start runs, for the tests that start server processes: they run it once it
 * is up to date (scripts/lib/server-build.ts freshServerBundle), the sources through tsx before.
 */
const SERVER_BUILD = { label: 'server build', args: ['--import', 'tsx', 'scripts/build.ts', '--server'] };

const OUT_DIR = 'tests/output';
const total: Tally = { passed: 0, failed: 0, skipped: 0 };
let pg: PgCluster | null = null;

function finish(): never {
  pg?.stop();
  const skipped = total.skipped ? `, ${total.skipped} skipped` : '';
  console.log(`\n${total.passed} passed, ${total.failed} failed${skipped}`);
  process.exit(total.failed > 0 ? 1 : 0);
}

/** A step whose output is held back and printed in one block when it ends (steps run side by side). */
async function sideStep(label: string, args: string[]): Promise<Finished> {
  const started = Date.now();
  console.log(`=== ${label}: started`);
  const r = await runNode(args, { buffer: true });
  if (r.output.trim()) console.log(`--- ${label} output:\n${r.output.trimEnd()}`);
  report(label, r, started);
  if (r.ok) total.passed += 1;
  else total.failed += 1;
  return r;
}

async function vitestRun(run: VitestRun, chromium: string, buffer: boolean): Promise<void> {
  const file = `${OUT_DIR}/vitest-${run.label}.json`;
  rmSync(file, { force: true });
  const args = ['node_modules/vitest/vitest.mjs', 'run', ...run.projects.flatMap((p) => ['--project', p])];
  args.push('--reporter=default', '--reporter=json', `--outputFile=${file}`);
  console.log(`\n=== tests (${run.label}): vitest ${args.slice(1).join(' ')}`);
  const started = Date.now();
  const pgEnv: Record<string, string> = run.needsPg && pg ? { TEST_PG_URL: pg.url } : {};
  const r = await runNode(args, {
    env: { ...process.env, CHROMIUM_PATH: chromium, ...pgEnv, ...run.env },
    buffer,
  });
  if (buffer && r.output.trim()) console.log(`\n--- tests (${run.label}) output:\n${r.output.trimEnd()}`);
  report(`tests (${run.label})`, r, started);
  const tally = countReport(file, r.ok);
  if (tally.note) console.log(`=== tests (${run.label}): ${tally.note}`);
  total.passed += tally.passed;
  total.failed += tally.failed;
  total.skipped += tally.skipped;
}

async function main(): Promise<void> {
  mkdirSync(OUT_DIR, { recursive: true });
  mkdirSync(CACHE, { recursive: true });
  const chromium = resolveChromium(realHost);
  if ('problem' in chromium) {
    console.log(chromium.problem);
    total.failed += 1;
    finish();
  }
  console.log(`Chromium for the browser tests: ${chromium.path}`);

  const checks = Promise.all(CHECKS.map((c) => sideStep(c.label, c.args)));
  const build = sideStep(BUILD.label, BUILD.args);
  const serverBuild = sideStep(SERVER_BUILD.label, SERVER_BUILD.args);
  const afterBuild = (async () => {
    const runs = VITEST_RUNS.filter((run) => run.needsBuild);
    if (runs.length > 0 && !(await build).ok) {
      for (const run of runs) console.log(`=== tests (${run.label}): not run, the client build failed`);
      total.failed += runs.length;
      return;
    }
    for (const run of runs) await vitestRun(run, chromium.path, true);
  })();
  for (const run of VITEST_RUNS.filter((r) => !r.needsBuild)) {
    if (run.needsPg && !pg) {
      try {
        if (!findPgBin())
          throw new Error('PostgreSQL is not installed (Debian: apt-get install -y postgresql)');
        pg = await startPgCluster();
        console.log(`\n=== PostgreSQL for the ${run.label} run: ${pg.url} (binaries in ${pg.bin})`);
      } catch (err) {
        console.log(`=== tests (${run.label}): not run: ${err instanceof Error ? err.message : String(err)}`);
        total.failed += 1;
        continue;
      }
    }
    await vitestRun(run, chromium.path, false);
  }
  await afterBuild;
  await Promise.all([checks, build, serverBuild]);
  finish();
}

main().catch((err: unknown) => {
  console.error(err);
  total.failed += 1;
  finish();
});
