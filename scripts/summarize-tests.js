// Reads jest's --json results and prints the closing line CI reads: "N passed, N failed".
const fs = require('node:fs');

const file = process.argv[2];
if (!file || !fs.existsSync(file)) {
  console.error('no jest results were written; the run stopped before any test finished');
  console.log('0 passed, 1 failed');
  process.exit(1);
}
const results = JSON.parse(fs.readFileSync(file, 'utf8'));
const failedSuites = results.numFailedTestSuites ?? 0;
// A suite that failed to load counts as a failure even though none of its tests ran.
const failed = results.numFailedTests + (results.numRuntimeErrorTestSuites ?? 0);
const skipped = results.numPendingTests + (results.numTodoTests ?? 0);
console.log(`suites: ${results.numPassedTestSuites} passed, ${failedSuites} failed`);
console.log(`${results.numPassedTests} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 || results.numPassedTests === 0 ? 1 : 0);
