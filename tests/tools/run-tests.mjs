// `npm test`: make sure the reference systems are present (installing them through apt as root), run the
// unit and reference suites, then the browser suite on its own (one file at a time, so Chromium never
// competes with PARI and Singular for the two cores), and print one closing line of totals taken from
// vitest's JSON reports: "tests: N passed, M failed". Extra arguments go to both vitest runs.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, existsSync, rmSync } from 'node:fs';
import { ensureOracles } from './oracles.mjs';

const missing = ensureOracles();
if (missing.length > 0) {
  for (const o of missing) console.error(`missing: ${o.command} (Debian ${o.packages.join(', ')}), needed for ${o.why}`);
  console.error('Install them (apt-get install -y ' + missing.flatMap((o) => o.packages).join(' ') + ') and run npm test again.');
  console.log('tests: 0 passed, 1 failed');
  process.exit(1);
}

mkdirSync('test-output', { recursive: true });
const extra = process.argv.slice(2);
const RUNS = [
  { name: 'unit and reference', report: 'test-output/vitest-core.json', args: ['tests/unit', 'tests/reference'] },
  { name: 'browser', report: 'test-output/vitest-e2e.json', args: ['tests/e2e', '--no-file-parallelism'] },
];

let passed = 0;
let failed = 0;
let ok = true;
for (const r of RUNS) {
  rmSync(r.report, { force: true });
  console.error(`\n== ${r.name} tests`);
  const run = spawnSync(
    'npx',
    ['vitest', 'run', ...r.args, '--reporter=default', '--reporter=json', `--outputFile.json=${r.report}`, ...extra],
    { stdio: 'inherit' },
  );
  if (run.status !== 0) ok = false;
  if (!existsSync(r.report)) {
    failed += 1;
    ok = false;
    continue;
  }
  const json = JSON.parse(readFileSync(r.report, 'utf8'));
  passed += json.numPassedTests ?? 0;
  failed += json.numFailedTests ?? 0;
  // A file that fails to load has no tests of its own; count it as a failure so it cannot hide.
  for (const file of json.testResults ?? []) {
    if (file.status === 'failed' && (file.assertionResults ?? []).length === 0) failed += 1;
  }
}
console.log(`tests: ${passed} passed, ${failed} failed`);
process.exit(ok && failed === 0 ? 0 : 1);
