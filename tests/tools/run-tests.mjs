// `npm test`: make sure the reference systems are present (installing them through apt as root), run
// every vitest suite (unit, reference, e2e) once, and print one closing line of totals taken from
// vitest's JSON report: "tests: N passed, M failed".
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, existsSync } from 'node:fs';
import { ensureOracles } from './oracles.mjs';

const missing = ensureOracles();
if (missing.length > 0) {
  for (const o of missing) console.error(`missing: ${o.command} (Debian ${o.packages.join(', ')}), needed for ${o.why}`);
  console.error('Install them (apt-get install -y ' + missing.flatMap((o) => o.packages).join(' ') + ') and run npm test again.');
  console.log('tests: 0 passed, 1 failed');
  process.exit(1);
}

mkdirSync('test-output', { recursive: true });
const report = 'test-output/vitest.json';
const extra = process.argv.slice(2);
const run = spawnSync(
  'npx',
  ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extra],
  { stdio: 'inherit' },
);

let passed = 0;
let failed = 0;
if (existsSync(report)) {
  const json = JSON.parse(readFileSync(report, 'utf8'));
  passed = json.numPassedTests ?? 0;
  failed = json.numFailedTests ?? 0;
  // A suite that fails to load has no tests of its own; count it as a failure so it cannot hide.
  for (const file of json.testResults ?? []) {
    if (file.status === 'failed' && (file.assertionResults ?? []).length === 0) failed += 1;
  }
} else {
  failed = 1;
}
const code = run.status === 0 && failed === 0 ? 0 : 1;
console.log(`tests: ${passed} passed, ${failed} failed`);
process.exit(code);
