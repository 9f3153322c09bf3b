/**
 * `npm run fuzz`: the fuzz tests with many more cases (FUZZ_SCALE, default 20 times the runs that
 * `npm test` makes: about 20,000 checks, 6,000 saves and 30,000 CLI inputs).
 */
import { spawnSync } from 'node:child_process';

const scale = process.env.FUZZ_SCALE ?? '20';
const r = spawnSync(
  process.execPath,
  ['node_modules/vitest/vitest.mjs', 'run', 'tests/server/fuzz.test.ts', 'tests/scripts/fuzz-cli.test.ts'],
  { stdio: 'inherit', env: { ...process.env, FUZZ_SCALE: scale } },
);
process.exitCode = r.status ?? 1;
