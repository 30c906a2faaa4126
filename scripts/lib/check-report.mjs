// Writes a one-test JSON report (same shape as the runners') for a step that is a single check,
// such as a type-check: node check-report.mjs <file> <name> <exit code>.
import { writeFileSync } from 'node:fs';

const [, , file, name, code] = process.argv;
const ok = code === '0';
writeFileSync(
  file,
  JSON.stringify({
    numPassedTests: ok ? 1 : 0,
    numFailedTests: ok ? 0 : 1,
    testResults: [{ name, status: ok ? 'passed' : 'failed', assertionResults: [{ title: name, status: ok ? 'passed' : 'failed' }] }],
  }),
);
