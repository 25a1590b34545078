// Reads jest's --json results (one file per jest process) and prints the closing line CI reads:
// "N passed, N failed".
const fs = require('node:fs');

const files = process.argv.slice(2);
const missing = files.length === 0 ? ['(none given)'] : files.filter((file) => !fs.existsSync(file));
if (missing.length > 0) {
  console.error(`no jest results were written (${missing.join(', ')}); a run stopped before any test finished`);
  console.log('0 passed, 1 failed');
  process.exit(1);
}
const total = { passedSuites: 0, failedSuites: 0, passed: 0, failed: 0, skipped: 0 };
for (const file of files) {
  const results = JSON.parse(fs.readFileSync(file, 'utf8'));
  total.passedSuites += results.numPassedTestSuites;
  total.failedSuites += results.numFailedTestSuites ?? 0;
  total.passed += results.numPassedTests;
  // A suite that failed to load counts as a failure even though none of its tests ran.
  total.failed += results.numFailedTests + (results.numRuntimeErrorTestSuites ?? 0);
  total.skipped += results.numPendingTests + (results.numTodoTests ?? 0);
}
console.log(`suites: ${total.passedSuites} passed, ${total.failedSuites} failed`);
console.log(`${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ''}`);
process.exit(total.failed > 0 || total.passed === 0 ? 1 : 0);
