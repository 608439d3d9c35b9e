// Reads the JSON result files of jest and vitest and prints one line per suite and the totals.
const fs = require('node:fs');
const path = require('node:path');
const [dir, ...rest] = process.argv.slice(2);
const totalsOnly = rest[0] === '--totals';
const suites = totalsOnly ? rest.slice(1) : rest;
let passed = 0;
let failed = 0;
let skipped = 0;
for (const suite of suites) {
  const file = path.join(dir, `${suite}.json`);
  if (!fs.existsSync(file)) {
    failed += 1;
    if (!totalsOnly) console.log(`${suite.padEnd(8)} no results (the suite did not run)`);
    continue;
  }
  const result = JSON.parse(fs.readFileSync(file, 'utf8'));
  passed += result.numPassedTests;
  failed += result.numFailedTests + (result.numRuntimeErrorTestSuites || 0);
  skipped += result.numPendingTests + (result.numTodoTests || 0);
  if (!totalsOnly) {
    console.log(`${suite.padEnd(8)} ${result.numPassedTests} passed, ${result.numFailedTests} failed (${result.numTotalTestSuites} files)`);
  }
}
console.log(`${passed} passed, ${failed} failed` + (skipped ? `, ${skipped} skipped` : ''));
