// Turns the test runners' JSON reports into one count. Vitest never prints a plain
// "N passed, N failed" line, and a failing beforeAll shows up only as skipped tests, so the test
// command counts for itself. Node built-ins only (see setup.mjs).
import { existsSync, readFileSync } from 'node:fs';

/**
 * Counts one vitest JSON report. A file that failed without a failed test in it (a failing
 * beforeAll, a file that did not load) is one failure; so is a missing or unreadable report, and
 * a run that exited non-zero although its report shows no failure (an unhandled error).
 * Returns { passed, failed, problems: string[] }.
 */
export function countVitestReport(file, exitCode) {
  if (!existsSync(file)) {
    return { passed: 0, failed: 1, problems: [`no report at ${file}`] };
  }
  let report;
  try {
    report = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    return { passed: 0, failed: 1, problems: [`unreadable report ${file}: ${error.message}`] };
  }
  const passed = Number(report.numPassedTests ?? 0);
  let failed = Number(report.numFailedTests ?? 0);
  const problems = [];
  for (const result of report.testResults ?? []) {
    const failedInside = (result.assertionResults ?? []).some((test) => test.status === 'failed');
    if (result.status === 'failed' && !failedInside) {
      failed += 1;
      const reason = String(result.message ?? '').split('\n')[0] || 'failed outside its tests';
      problems.push(`${result.name}: ${reason}`);
    }
  }
  if (exitCode !== undefined && exitCode !== 0 && failed === 0) {
    failed += 1;
    problems.push(`the run exited with code ${exitCode} (see its output above)`);
  }
  return { passed, failed, problems };
}

/** Adds counts together. */
export function addCounts(...counts) {
  return counts.reduce(
    (sum, count) => ({
      passed: sum.passed + count.passed,
      failed: sum.failed + count.failed,
      problems: [...sum.problems, ...(count.problems ?? [])],
    }),
    { passed: 0, failed: 0, problems: [] },
  );
}

/** The last line the test command prints. */
export function summaryLine({ passed, failed }) {
  return `${passed} passed, ${failed} failed`;
}

/** The test command's exit code: failure when anything failed or nothing passed. */
export function exitCodeFor({ passed, failed }) {
  return failed > 0 || passed === 0 ? 1 : 0;
}
