// "nine points": the ninth base point of the pencil of cubics through 1,000 seeded random eight-point
// sets (coordinates in [-9, 9]), timed per set (median and total), split into the linear system (E2's
// kernel of the 8 × 10 monomial matrix) and the rest; against the full meet of the two generators
// (curveCurveMeet, root isolation included) on the first 100 sets, and against PARI/GP doing the same
// algebra (matker, polresultant, factor) timed inside gp with gettime().
import { median, type BenchFigure, type BenchSuite } from './bench.ts';
import { gp, seededRandom } from '../reference/oracles.ts';
import { ninthPoint } from '../../src/cubic/nine.ts';
import { curveCurveMeet } from '../../src/cubic/meet.ts';
import { curvesThroughPoints } from '../../src/plane/linear-system.ts';
import { triple, tripleProportional, type Point } from '../../src/plane/point.ts';

function eightPointSets(seed: number, count: number): Point[][] {
  const rand = seededRandom(seed);
  const sets: Point[][] = [];
  while (sets.length < count) {
    const s: Point[] = [];
    while (s.length < 8) {
      const c = [0, 1, 2].map(() => BigInt(Math.floor(rand() * 19) - 9));
      if (c.every((v) => v === 0n)) continue;
      const p = triple(c[0], c[1], c[2]);
      if (!s.some((q) => tripleProportional(p, q))) s.push(p);
    }
    sets.push(s);
  }
  return sets;
}

function timeEach<T>(items: readonly T[], fn: (t: T) => unknown): number[] {
  return items.map((t) => {
    const t0 = performance.now();
    fn(t);
    return performance.now() - t0;
  });
}

export const nineBench: BenchSuite = {
  name: 'nine points',
  async run(): Promise<BenchFigure[]> {
    const sets = eightPointSets(8, 1000);
    for (const s of sets.slice(0, 20)) ninthPoint(s); // warm-up
    let found = 0;
    const ours = timeEach(sets, (s) => {
      if (ninthPoint(s).point) found++;
    });
    const system = timeEach(sets, (s) => curvesThroughPoints(3, s));
    const pencils = sets.slice(0, 100).map((s) => curvesThroughPoints(3, s)).filter((p) => p.dimension === 1);
    const full = timeEach(pencils, (p) => curveCurveMeet(p.basis[0], p.basis[1]));
    const gpSets = sets.map((s) => `[${s.map((p) => `[${p.join(',')}]`).join(',')}]`).join(',');
    const script = `
S = [${gpSets}];
mons = [x^3, x^2*y, x^2*z, x*y^2, x*y*z, x*z^2, y^3, y^2*z, y*z^2, z^3];
{
t0 = getabstime();
for (i = 1, #S, P = S[i]; M = matrix(8, 10, r, c, substvec(mons[c], [x,y,z], P[r])); K = matker(M);
  if (#K == 2, F1 = subst(K[,1]~ * mons~, z, 1); F2 = subst(K[,2]~ * mons~, z, 1); R = polresultant(F1, F2, y); if (R != 0, factor(R))));
print(getabstime() - t0);
}`;
    const pariMs = Number(gp(script).at(-1));
    const total = ours.reduce((a, b) => a + b, 0);
    return [
      {
        label: 'ninth point of 1,000 random eight-point sets (ninthPoint: linear system + resultant divided by the eight known factors + one gcd)',
        values: {
          medianMs: +median(ours).toFixed(3),
          totalMs: +total.toFixed(1),
          withNinth: found,
          linearSystemMedianMs: +median(system).toFixed(3),
        },
      },
      {
        label: 'the full meet of the two generators (curveCurveMeet, with root isolation), first 100 sets',
        values: { medianMs: +median(full).toFixed(3), ratioToNinthPoint: +(median(full) / median(ours)).toFixed(2) },
      },
      {
        label: 'PARI/GP on the same 1,000 sets: matker + polresultant + factor (timed inside gp)',
        values: { totalMs: pariMs, perSetMs: +(pariMs / sets.length).toFixed(3), oursOverPari: +(total / pariMs).toFixed(2) },
      },
    ];
  },
};
