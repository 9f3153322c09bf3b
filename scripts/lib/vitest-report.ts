/** Counts one vitest run from its JSON report, so `npm test` can print "N passed, N failed". */
import { existsSync, readFileSync } from 'node:fs';

export interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}

interface VitestJson {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests: number;
  numFailedTestSuites: number;
  numTotalTests: number;
}

/**
 * The tally of one run. A run that wrote no report, ran no tests, or failed with no failed test
 * (an error outside any test, a file that did not load) counts as one failure, never as a pass.
 */
export function countReport(reportFile: string, exitedOk: boolean): Tally & { note?: string } {
  if (!existsSync(reportFile)) return { passed: 0, failed: 1, skipped: 0, note: 'vitest wrote no report' };
  const json = JSON.parse(readFileSync(reportFile, 'utf8')) as VitestJson;
  const tally: Tally & { note?: string } = {
    passed: json.numPassedTests,
    failed:
      json.numFailedTests +
      (json.numFailedTestSuites > 0 && json.numFailedTests === 0 ? json.numFailedTestSuites : 0),
    skipped: json.numPendingTests + json.numTodoTests,
  };
  if (json.numTotalTests === 0) {
    tally.failed += 1;
    tally.note = 'no tests ran';
  } else if (!exitedOk && tally.failed === 0) {
    tally.failed += 1;
    tally.note = 'vitest failed outside any test';
  }
  return tally;
}
