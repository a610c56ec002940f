// `npm run bench [-- --json] [-- --only NAME]`: run every suite and print its figures; with --json, print
// all figures as one JSON document instead.
import { SUITES } from './suites.ts';
import type { BenchFigure } from './bench.ts';

const argv = process.argv.slice(2);
const json = argv.includes('--json');
const onlyAt = argv.indexOf('--only');
const only = onlyAt >= 0 ? argv[onlyAt + 1] : undefined;

const results: Record<string, BenchFigure[]> = {};
for (const suite of SUITES) {
  if (only && suite.name !== only) continue;
  if (!json) console.log(`\n== ${suite.name}`);
  const figures = await suite.run();
  results[suite.name] = figures;
  if (!json) {
    for (const f of figures) {
      const vals = Object.entries(f.values)
        .map(([k, v]) => `${k}=${typeof v === 'number' ? +v.toPrecision(4) : v}`)
        .join('  ');
      console.log(`  ${f.label}: ${vals}`);
    }
  }
}
if (json) console.log(JSON.stringify(results, null, 2));
