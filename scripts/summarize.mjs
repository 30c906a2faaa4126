// Reads the JSON reports of every runner in one `npm test` run and prints the single closing line
// CI reads: `N passed, N failed`. A step without a report (the runner crashed) counts as failed.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const [, , reportDir, ...steps] = process.argv;
let passed = 0;
let failed = 0;
let skipped = 0;
const rows = [];

for (const step of steps) {
  const file = join(reportDir, `${step}.json`);
  if (!existsSync(file)) {
    failed += 1;
    rows.push([step, 'no report (runner failed to start or crashed)']);
    continue;
  }
  const report = JSON.parse(readFileSync(file, 'utf8'));
  // Suites that failed before running a test (syntax error, failed import) count once each.
  const brokenSuites = (report.testResults ?? []).filter(
    (suite) => suite.status === 'failed' && (suite.assertionResults ?? []).length === 0,
  ).length;
  const p = report.numPassedTests ?? 0;
  const f = (report.numFailedTests ?? 0) + brokenSuites;
  const s = (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  passed += p;
  failed += f;
  skipped += s;
  rows.push([step, `${p} passed, ${f} failed${s ? `, ${s} skipped` : ''}`]);
}

console.log('\nSummary by step:');
for (const [step, text] of rows) console.log(`  ${step.padEnd(18)} ${text}`);
console.log('');
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exitCode = failed > 0 ? 1 : 0;
