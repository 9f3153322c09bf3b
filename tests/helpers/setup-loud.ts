/** Loud tests: a console.error during a test fails it (STYLE habit 4). */
import { afterEach, beforeEach, vi } from 'vitest';

let errors: unknown[][] = [];

beforeEach(() => {
  errors = [];
  vi.spyOn(console, 'error').mockImplementation((...args: unknown[]) => {
    errors.push(args);
  });
});

afterEach(() => {
  vi.restoreAllMocks();
  if (errors.length > 0) {
    const first = errors[0].map((a) => (a instanceof Error ? a.stack : String(a))).join(' ');
    throw new Error(`console.error was called during the test: ${first}`);
  }
});
