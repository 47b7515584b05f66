// Prints the one closing line CI reads ("N passed, N failed[, N skipped]") from Vitest's JSON report.
import { existsSync, readFileSync } from 'node:fs';

const file = process.argv[2];
if (!file || !existsSync(file)) {
  console.log('0 passed, 1 failed');
  process.exit(1);
}
const report = JSON.parse(readFileSync(file, 'utf8'));
let passed = 0;
let failed = 0;
let skipped = 0;
for (const suite of report.testResults ?? []) {
  let failedHere = 0;
  for (const test of suite.assertionResults ?? []) {
    if (test.status === 'passed') passed += 1;
    else if (test.status === 'failed') failedHere += 1;
    else skipped += 1;
  }
  // A file that fails to load, or whose beforeAll fails (its tests then count as skipped), has no failed
  // test but must still count as a failure.
  failed += failedHere || (suite.status === 'failed' ? 1 : 0);
}
const tail = skipped ? `, ${skipped} skipped` : '';
console.log(`${passed} passed, ${failed} failed${tail}`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
