// "curve report": the library call behind the `curve` verb (src/cubic/curve-report.ts: singular points,
// components, invariants, flexes) on 1,000 seeded cubics, half random dense (almost all smooth) and half
// singular or reducible of every configuration (tests/unit/cubic/singular-samples.ts). Prints the median
// and total time per cubic, the share spent on the singular points alone, and the singular points
// against Singular (the system) doing the same job in the same run. Never asserted.
import { median, percentile, type BenchFigure, type BenchSuite } from './bench.ts';
import { seededRandom, singular } from '../reference/oracles.ts';
import { formPrimitive, monomials, type Form } from '../../src/poly/form.ts';
import { cubicReport } from '../../src/cubic/curve-report.ts';
import { cubicSingularPoints } from '../../src/cubic/singular.ts';
import { singularSample } from '../unit/cubic/singular-samples.ts';

function randomCubic(rand: () => number): Form {
  const coeffs = Array.from({ length: 10 }, () => BigInt(Math.floor(rand() * 201) - 100));
  if (!coeffs.some((c) => c !== 0n)) coeffs[0] = 1n;
  return formPrimitive({ degree: 3, coeffs });
}

const singularPoly = (f: Form) =>
  monomials(3).map(([i, j, k], n) => `(${f.coeffs[n]})*x^${i}*y^${j}*z^${k}`).join('+');

/**
 * Singular's time per cubic, taken inside Singular (rtimer in ms around the loop, start-up excluded) for
 * the same job: the saturated Jacobian ideal, its associated primes over Q (the singular points by
 * Galois orbit) and factorize (the components).
 */
function singularMsPerCubic(curves: readonly Form[]): number {
  const script = `LIB "elim.lib"; LIB "primdec.lib"; system("--ticks-per-sec", 1000);
ring r = 0,(x,y,z),dp;
list L = ${curves.map(singularPoly).join(',\n')};
int i; int t0 = rtimer;
for (i = 1; i <= size(L); i++) { def S0 = sat(jacob(L[i]), maxideal(1)); ideal S = std(S0[1]); list P = minAssGTZ(S0[1]); list fa = factorize(L[i]); kill S0; kill S; kill P; kill fa; }
print(rtimer - t0);`;
  const out = singular(script, 600_000);
  return Number(out[out.length - 1]) / curves.length;
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
      const sing = singularMsPerCubic(set);
      const ourMean = s.reduce((a, b) => a + b, 0) / s.length;
      figures.push({
        label: `curve report, ${label}`,
        values: {
          medianMs: median(t),
          p90Ms: percentile(t, 90),
          totalMs: t.reduce((a, b) => a + b, 0),
          singularMedianMs: median(s),
          singularShare: s.reduce((a, b) => a + b, 0) / t.reduce((a, b) => a + b, 0),
          singularMeanMs: ourMean,
          singularSystemMeanMs: sing,
          ratioToSingularSystem: ourMean / sing,
        },
      });
    }
    return figures;
  },
};
