/** The counts we read from jest's `--json` results file. */
export interface JestSummary {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests: number;
  numRuntimeErrorTestSuites: number;
}

/**
 * The plain closing line CI reads: `jest: N passed, N failed, N skipped`. A suite that crashed
 * before running its tests counts as a failure, so the line never says 0 failed on a red run.
 */
export function summaryLine(summary: JestSummary): string {
  const failed = summary.numFailedTests + summary.numRuntimeErrorTestSuites;
  const skipped = summary.numPendingTests + summary.numTodoTests;
  return `jest: ${summary.numPassedTests} passed, ${failed} failed, ${skipped} skipped`;
}
