import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

/**
 * Four test projects: unit (engine and shared code, node), client (React components, jsdom),
 * api (Express on a real migrated SQLite database), e2e (the built app in headless Chromium).
 *
 * Test files share one module graph per worker (`isolate: false`): with isolation every file paid
 * the imports again (mathjs alone is about 2 s of CPU per file), which was most of the unit run.
 * What a test changes globally is put back after each test: stubbed globals such as fetch
 * (`unstubGlobals`), spies (setup-loud.ts), the rendered DOM (setup-dom.ts); every API and browser
 * test file opens its own database in its own temporary folder. Each project has its own
 * `groupOrder`: when one run holds several projects, each then runs as one batch in one worker
 * (interleaved files of different projects would start a fresh worker, imports and all, per file).
 */
export default defineConfig({
  plugins: [react()],
  test: {
    isolate: false,
    // Generous: a shared 2-core machine can be ten times slower than an idle one. Speed is measured
    // by the benchmark scripts, never by a test's timeout.
    testTimeout: 30000,
    hookTimeout: 30000,
    unstubGlobals: true,
    // Servers started by tests log warnings and errors only (JSON request lines would flood the output).
    env: { LOG_LEVEL: 'warn' },
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          sequence: { groupOrder: 0 },
          environment: 'node',
          include: ['tests/shared/**/*.test.ts', 'tests/scripts/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          sequence: { groupOrder: 1 },
          environment: 'jsdom',
          include: ['tests/src/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/helpers/setup-dom.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          sequence: { groupOrder: 2 },
          environment: 'node',
          include: ['tests/server/**/*.test.ts'],
          setupFiles: ['tests/helpers/setup-loud.ts'],
          // TEST_PG=1: the same suite on a throwaway PostgreSQL cluster (one database per file).
          globalSetup: ['tests/helpers/pg-global-setup.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          sequence: { groupOrder: 3 },
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/helpers/e2e-global-setup.ts'],
          testTimeout: 120000,
          hookTimeout: 120000,
          fileParallelism: false,
        },
      },
    ],
  },
});
