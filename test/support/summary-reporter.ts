import type { Reporter, TestModule, TestRunEndReason } from 'vitest/node';

/**
 * Prints one last line, `N passed, N failed` (plus `, N skipped` when any were skipped), that
 * CI and people can read at a glance. It runs after the default reporter (it is listed after
 * it in vitest.config.ts), so the line is the last one printed.
 *
 * Counts test cases. A test file that fails before any of its tests run (a syntax or import
 * error) and an error thrown outside any test each count as one failure, so that the line can
 * never read "0 failed" on a run that failed.
 */
export default class SummaryReporter implements Reporter {
  onTestRunEnd(
    testModules: ReadonlyArray<TestModule>,
    unhandledErrors: ReadonlyArray<unknown>,
    _reason: TestRunEndReason,
  ): void {
    let passed = 0;
    let failed = unhandledErrors.length;
    let skipped = 0;
    for (const module of testModules) {
      let failedTests = 0;
      for (const test of module.children.allTests()) {
        const { state } = test.result();
        if (state === 'passed') passed++;
        else if (state === 'failed') failedTests++;
        else if (state === 'skipped') skipped++;
      }
      failed += failedTests;
      if (failedTests === 0 && module.state() === 'failed') failed++;
    }
    const line = `${passed} passed, ${failed} failed` + (skipped > 0 ? `, ${skipped} skipped` : '');
    process.stdout.write(`${line}\n`);
  }
}
