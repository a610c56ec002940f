// "curve report": the library call behind the `curve` verb (src/cubic/curve-report.ts: singular points,
// components, invariants, flexes) on 1,000 seeded cubics, half random dense (almost all smooth) and half
// singular or reducible of every configuration (tests/unit/cubic/singular-samples.ts). Prints the median
// and total time per cubic, and the share spent on the singular points alone. Never asserted.
import { median, percentile, type BenchFigure, type BenchSuite } from './bench.ts';
import { seededRandom } from '../reference/oracles.ts';
import { formPrimitive, type Form } from '../../src/poly/form.ts';
import { cubicReport } from '../../src/cubic/curve-report.ts';
import { cubicSingularPoints } from '../../src/cubic/singular.ts';
import { singularSample } from '../unit/cubic/singular-samples.ts';

function randomCubic(rand: () => number): Form {
  const coeffs = Array.from({ length: 10 }, () => BigInt(Math.floor(rand() * 201) - 100));
  if (!coeffs.some((c) => c !== 0n)) coeffs[0] = 1n;
  return formPrimitive({ degree: 3, coeffs });
}

function timeEach(curves: readonly Form[], fn: (f: Form) => unknown): number[] {
  return curves.map((f) => {
    const t0 = performance.now();
    fn(f);
    return performance.now() - t0;
  });
}

export const curveBench: BenchSuite = {
  name: 'curve report',
  async run(): Promise<BenchFigure[]> {
    const rand = seededRandom(1000);
    const dense = Array.from({ length: 500 }, () => randomCubic(rand));
    const special = Array.from({ length: 500 }, (_, n) => singularSample(rand, n).curve);
    const all = [...dense, ...special];
    // Warm-up (JIT) on a few curves, not counted.
    for (const f of all.slice(0, 20)) cubicReport(f);
    const figures: BenchFigure[] = [];
    for (const [label, set] of [['500 random dense cubics', dense], ['500 singular or reducible cubics', special], ['1,000 mixed cubics', all]] as const) {
      const t = timeEach(set, cubicReport);
      const s = timeEach(set, cubicSingularPoints);
      figures.push({
        label: `curve report, ${label}`,
        values: {
          medianMs: median(t),
          p90Ms: percentile(t, 90),
          totalMs: t.reduce((a, b) => a + b, 0),
          singularMedianMs: median(s),
          singularShare: s.reduce((a, b) => a + b, 0) / t.reduce((a, b) => a + b, 0),
        },
      });
    }
    return figures;
  },
};
