// "rational points": the complete height sieve (src/cubic/search-sieve.ts) on ten seeded Weierstrass
// curves at H = 100 and 300, against PARI/GP's ellratpoints at the same bound timed inside gp. The two
// bounds differ in kind — ours is max(|X|, |Y|, |Z|) of the projective point, PARI's the naive height
// of x = a/d², so PARI's search covers more points — so the ratio is a yardstick, not a race.
import { median, type BenchFigure, type BenchSuite } from './bench.ts';
import { gp, randomBigInt, seededRandom } from '../reference/oracles.ts';
import { cubicRationalPoints } from '../../src/cubic/search.ts';
import { formParse } from '../../src/poly/parse.ts';

export const pointsBench: BenchSuite = {
  name: 'rational points',
  async run(): Promise<BenchFigure[]> {
    const rand = seededRandom(300);
    const curves: bigint[][] = [];
    while (curves.length < 10) {
      const a = [BigInt(Math.floor(rand() * 2)), 0n, BigInt(Math.floor(rand() * 2)), randomBigInt(rand, 2), randomBigInt(rand, 3)];
      const check = gp(`print(ellinit([${a.join(',')}]) != [])`);
      if (check[0] === '1') curves.push(a);
    }
    const forms = curves.map(([a1, a2, a3, a4, a6]) =>
      formParse(`Y^2 Z + (${a1}) X Y Z + (${a3}) Y Z^2 - X^3 - (${a2}) X^2 Z - (${a4}) X Z^2 - (${a6}) Z^3`).form,
    );
    const figures: BenchFigure[] = [];
    for (const f of forms) cubicRationalPoints(f, { height: 30 }); // warm-up (JIT)
    for (const h of [100, 300]) {
      const times: number[] = [];
      let found = 0;
      for (const f of forms) {
        const t0 = performance.now();
        found += cubicRationalPoints(f, { height: h }).points.length;
        times.push(performance.now() - t0);
      }
      const script = `{ my(E = [${curves.map((a) => `ellinit([${a.join(',')}])`).join(',')}], n = 0, t0 = getabstime());
        for (r = 1, 5, for (i = 1, #E, n += #ellratpoints(E[i], ${h})));
        print((getabstime() - t0) / 5.); }`;
      const pariTotal = Number(gp(script).at(-1));
      const ours = times.reduce((a, b) => a + b, 0);
      figures.push({
        label: `height sieve, 10 Weierstrass curves, H = ${h} (complete; ${found} points in all)`,
        values: { medianMs: +median(times).toFixed(2), totalMs: +ours.toFixed(1), pariEllratpointsTotalMs: +pariTotal.toFixed(2), ratio: +(ours / Math.max(pariTotal, 0.01)).toFixed(1) },
      });
    }
    return figures;
  },
};
