/**
 * The one test command (`npm test`): typecheck, lint, unit, client, API and browser tests.
 * Every step runs even when an earlier one fails, so one run shows everything that is wrong.
 * Ends with the plain line "N passed, N failed" that CI reads.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';

interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}

const total: Tally = { passed: 0, failed: 0, skipped: 0 };
const outDir = 'tests/output';
mkdirSync(outDir, { recursive: true });

function run(label: string, cmd: string, args: string[]): boolean {
  console.log(`\n=== ${label}: ${cmd} ${args.join(' ')}`);
  const started = Date.now();
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: process.env });
  console.log(
    `=== ${label}: ${r.status === 0 ? 'ok' : `failed (exit ${r.status})`} in ${((Date.now() - started) / 1000).toFixed(1)} s`,
  );
  return r.status === 0;
}

function step(label: string, cmd: string, args: string[]): void {
  if (run(label, cmd, args)) total.passed += 1;
  else total.failed += 1;
}

function vitest(project: string): void {
  const report = `${outDir}/vitest-${project}.json`;
  rmSync(report, { force: true });
  const ok = run(`tests (${project})`, 'npx', [
    'vitest',
    'run',
    '--project',
    project,
    '--reporter=default',
    '--reporter=json',
    `--outputFile=${report}`,
  ]);
  if (!existsSync(report)) {
    total.failed += 1; // the runner itself failed before reporting
    return;
  }
  const json = JSON.parse(readFileSync(report, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests: number;
    numFailedTestSuites: number;
    numTotalTests: number;
  };
  total.passed += json.numPassedTests;
  total.failed +=
    json.numFailedTests +
    (json.numFailedTestSuites > 0 && json.numFailedTests === 0 ? json.numFailedTestSuites : 0);
  total.skipped += json.numPendingTests + json.numTodoTests;
  if (json.numTotalTests === 0) {
    console.log(`=== ${project}: no tests ran`);
    total.failed += 1;
  } else if (!ok && json.numFailedTests === 0 && json.numFailedTestSuites === 0) {
    total.failed += 1; // e.g. an unhandled error outside any test
  }
}

step('typecheck', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.json']);
step('lint', 'npx', ['eslint', '.', '--max-warnings=0']);
vitest('unit');
vitest('client');
vitest('api');
step('build', 'npx', ['vite', 'build']);
vitest('e2e');

const skipped = total.skipped ? `, ${total.skipped} skipped` : '';
console.log(`\n${total.passed} passed, ${total.failed} failed${skipped}`);
process.exit(total.failed > 0 ? 1 : 0);
