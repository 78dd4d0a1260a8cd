/**
 * Jest reporter that ends the run with one plain line, `N passed, N failed` (plus
 * `, N skipped` when tests were skipped), counting tests across every suite. A suite that
 * fails to load counts as one failed test, so a broken file can never pass silently.
 */
class SummaryReporter {
  onRunComplete(_contexts, results) {
    const brokenSuites = results.testResults.filter((r) => r.testExecError || (r.failureMessage && r.numFailingTests === 0)).length;
    const passed = results.numPassedTests;
    const failed = results.numFailedTests + brokenSuites;
    const skipped = results.numPendingTests + results.numTodoTests;
    const tail = skipped > 0 ? `, ${skipped} skipped` : "";
    // stderr, like jest's own summary, so that this line comes last in the combined output.
    process.stderr.write(`\n${passed} passed, ${failed} failed${tail}\n`);
  }
}
module.exports = SummaryReporter;
