// Prints the one closing line CI reads: "N passed, N failed", summed over every suite's JSON report.
const fs = require('node:fs');
const path = require('node:path');

const dir = process.argv[2];
let passed = 0;
let failed = 0;
const expected = ['unit.json', 'e2e.json', 'client.json', 'browser.json'];
for (const name of expected) {
  const file = path.join(dir, name);
  if (!fs.existsSync(file)) {
    console.log(`${name}: no report (the suite did not run to the end)`);
    failed += 1;
    continue;
  }
  const report = JSON.parse(fs.readFileSync(file, 'utf8'));
  passed += report.numPassedTests;
  failed += report.numFailedTests + (report.numRuntimeErrorTestSuites || 0);
  if (report.numTotalTests === 0) {
    console.log(`${name}: no tests ran`);
    failed += 1;
  }
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
