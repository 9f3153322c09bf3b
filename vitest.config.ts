import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

/**
 * Four test projects: unit (engine and shared code, node), client (React components, jsdom),
 * api (Express on a real migrated SQLite database), e2e (the built app in headless Chromium).
 */
export default defineConfig({
  plugins: [react()],
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          include: ['tests/shared/**/*.test.ts', 'tests/scripts/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          environment: 'jsdom',
          include: ['tests/src/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/helpers/setup-dom.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          environment: 'node',
          include: ['tests/server/**/*.test.ts'],
          setupFiles: ['tests/helpers/setup-loud.ts'],
          testTimeout: 20000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          testTimeout: 120000,
          hookTimeout: 120000,
          fileParallelism: false,
        },
      },
    ],
  },
});
