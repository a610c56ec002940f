// Rational roots, real roots and the gcd kernels against PARI/GP. PARI's times are taken inside gp with
// gettime() around a loop, so its start-up is excluded; ours are medians of repeated runs in this process.
// Both sides are CPU time (gettime() is CPU time; ours from process.cpuUsage), so a busy machine inflates
// neither side.
//
// "rational roots": degree-9 integer polynomials, each (two to four linear factors v·x − u with 1..6-digit
// u, v) × (a random rest of the remaining degree with 50- or 500-digit coefficients). PARI's counterpart is
// nfroots(,p): the rational roots over Q (without multiplicities; ours also returns multiplicities).
// "gcd kernel": plain Euclid on BigInt vs the kernel in src/exact/gcd.ts vs PARI's gcd, at 100, 1,000 and
// 20,000 digits, on pairs with a planted common factor. `kernelMs` is `gcd` as callers get it (GMP through
// WebAssembly above 2^256 where it loads, i.e. in Node), `lehmerMs` the BigInt kernel alone (the fallback).
import { median, medianCpuMs, type BenchFigure, type BenchSuite } from './bench.ts';
import { gp, seededRandom } from '../reference/oracles.ts';
import { upolyRationalRoots } from '../../src/exact/rational-roots.ts';
import { upolyRealRootIntervals } from '../../src/exact/root-isolation.ts';
import { algebraicRealRoots, algebraicToDecimal } from '../../src/exact/algebraic.ts';
import { gcd, gcdBigInt, gcdEuclid, gcdLargeKernel } from '../../src/exact/gcd.ts';
import { upolyGcd, upolyGcdSubresultant, upolyMul, upolyResultant, upolySquarefreeFactorisation, type UPoly } from '../../src/exact/upoly.ts';
import { ratToString } from '../../src/exact/rational.ts';

const medianMs = medianCpuMs;

function digitsExactly(rand: () => number, digits: number): bigint {
  let s = String(1 + Math.floor(rand() * 9));
  for (let i = 1; i < digits; i++) s += Math.floor(rand() * 10).toString();
  return rand() < 0.5 ? -BigInt(s) : BigInt(s);
}

function upTo(rand: () => number, digits: number): bigint {
  return digitsExactly(rand, 1 + Math.floor(rand() * digits));
}

/** The fixed set: products of linear factors and a dense rest, degree 9 in all. */
export function rootsBenchSet(seed: number, count: number, digits: number): UPoly[] {
  const rand = seededRandom(seed);
  const out: UPoly[] = [];
  for (let i = 0; i < count; i++) {
    const k = 2 + Math.floor(rand() * 3);
    let p: UPoly = [1n];
    for (let j = 0; j < k; j++) {
      let v = upTo(rand, 6);
      if (v < 0n) v = -v;
      p = upolyMul(p, [-upTo(rand, 6), v]);
    }
    const rest = Array.from({ length: 10 - k }, () => digitsExactly(rand, digits));
    out.push(upolyMul(p, rest));
  }
  return out;
}

const gpPoly = (p: UPoly) => `Pol([${p.slice().reverse().join(',')}])`;

function pariMs(setup: string, loop: string, reps: number): number {
  const out = gp(`${setup}\ngettime(); for(r=1,${reps}, ${loop}); print(gettime())`);
  return Number(out[out.length - 1]) / reps;
}

function rootsFigure(digits: number, count: number, reps: number, floatCandidates = true): BenchFigure {
  const set = rootsBenchSet(9000 + digits, count, digits);
  // Same answers first: a benchmark of wrong answers would be meaningless.
  const ours = set.map((p) => upolyRationalRoots(p).map((r) => ratToString(r.root)).sort().join(' '));
  const theirs = gp(`v=[${set.map(gpPoly).join(',')}];\nfor(i=1,#v, my(s=""); my(r=nfroots(,v[i])); for(j=1,#r, s=Str(s, r[j], " ")); print(s))`);
  const mismatch = ours.findIndex((o, i) => o !== (theirs[i] ?? '').trim().split(/\s+/).filter(Boolean).sort().join(' '));
  if (mismatch >= 0) throw new Error(`rational roots disagree with PARI nfroots at case ${mismatch} (seed ${9000 + digits})`);
  const perPoly = set.map((p) => medianMs(() => upolyRationalRoots(p, { floatCandidates }), reps, 1));
  const ninefoldMs = median(perPoly);
  // PARI: median over the set of the per-polynomial time, each timed over `reps` calls inside gp.
  const pariTimes = gp(
    `v=[${set.map(gpPoly).join(',')}];\nfor(i=1,#v, gettime(); for(r=1,${reps * 40}, nfroots(,v[i])); print(gettime()/${reps * 40}.))`,
  ).map(Number);
  const pariMsMedian = median(pariTimes);
  return {
    label: `rational roots of degree-9 polynomials, ${digits}-digit coefficients (${count} polynomials, median per polynomial; PARI nfroots(,p))${floatCandidates ? '' : ', exact steps only (no floating candidates)'}`,
    values: { ninefoldMs, pariMs: pariMsMedian, ratio: ninefoldMs / pariMsMedian },
  };
}

export const rootsBench: BenchSuite = {
  name: 'rational roots',
  async run(): Promise<BenchFigure[]> {
    return [rootsFigure(50, 40, 9), rootsFigure(500, 20, 5), rootsFigure(50, 40, 5, false), rootsFigure(500, 20, 3, false)];
  },
};

function gcdPairs(seed: number, digits: number, n: number): [bigint, bigint][] {
  const rand = seededRandom(seed);
  return Array.from({ length: n }, () => {
    const g = digitsExactly(rand, Math.max(1, digits / 10));
    return [digitsExactly(rand, digits - digits / 10) * g, digitsExactly(rand, digits - digits / 10) * g];
  });
}

export const gcdBench: BenchSuite = {
  name: 'gcd kernel',
  async run(): Promise<BenchFigure[]> {
    const figures: BenchFigure[] = [];
    for (const [digits, n, reps] of [
      [100, 2000, 7],
      [1000, 200, 7],
      [20000, 3, 3],
    ] as const) {
      const pairs = gcdPairs(777 + digits, digits, n);
      for (const [a, b] of pairs) if (gcd(a, b) !== gcdEuclid(a, b)) throw new Error('gcd kernel disagrees with Euclid');
      const euclidMs = medianMs(() => pairs.forEach(([a, b]) => gcdEuclid(a, b)), digits === 20000 ? 1 : reps, 1) / n;
      for (const [a, b] of pairs) if (gcdBigInt(a, b) !== gcd(a, b)) throw new Error('the BigInt kernel disagrees with gcd');
      const kernelMs = medianMs(() => pairs.forEach(([a, b]) => gcd(a, b)), reps, 1) / n;
      const lehmerMs = medianMs(() => pairs.forEach(([a, b]) => gcdBigInt(a, b)), reps, 1) / n;
      const loops = digits === 20000 ? 200 : digits === 1000 ? 5000 : 50000;
      const pariMsEach = pariMs(`v=[${pairs.map(([a, b]) => `[${a},${b}]`).join(',')}]; m=#v;`, `gcd(v[r%m+1][1], v[r%m+1][2])`, loops);
      figures.push({
        label: `gcd of two ${digits}-digit integers (ms per gcd)`,
        values: { euclidMs, kernelMs, kernel: gcdLargeKernel(), lehmerMs, pariMs: pariMsEach, euclidOverKernel: euclidMs / kernelMs, kernelOverPari: kernelMs / pariMsEach, lehmerOverPari: lehmerMs / pariMsEach },
      });
    }
    // Polynomial gcd (modular, after the coprimality filter), square-free factorisation and resultant
    // (sub-resultant PRS), degree 9, against PARI's gcd, gcd(p, p') and polresultant.
    const rand = seededRandom(2468);
    const polyPairs = Array.from({ length: 20 }, () => {
      const c = Array.from({ length: 4 }, () => digitsExactly(rand, 50));
      const a = upolyMul(c, Array.from({ length: 7 }, () => digitsExactly(rand, 50)));
      const b = upolyMul(c, Array.from({ length: 7 }, () => digitsExactly(rand, 50)));
      return [a, b] as const;
    });
    const gpPairs = `v=[${polyPairs.map(([a, b]) => `[${gpPoly(a)},${gpPoly(b)}]`).join(',')}]; m=#v;`;
    const gcdOurs = medianMs(() => polyPairs.forEach(([a, b]) => upolyGcd(a, b)), 7, 5) / polyPairs.length;
    const gcdPari = pariMs(gpPairs, 'gcd(v[r%m+1][1], v[r%m+1][2])', 2000);
    const gcdPrs = medianMs(() => polyPairs.forEach(([a, b]) => upolyGcdSubresultant(a, b)), 5, 5) / polyPairs.length;
    figures.push({
      label: 'gcd of two degree-9 polynomials with a common cubic, 50-digit coefficients (ours: modular; also the sub-resultant PRS)',
      values: { ninefoldMs: gcdOurs, subresultantMs: gcdPrs, pariMs: gcdPari, ratio: gcdOurs / gcdPari, prsOverModular: gcdPrs / gcdOurs },
    });
    const sqfSet = polyPairs.map(([a, b]) => upolyMul(a, upolyGcd(a, b))); // a repeated cubic factor
    const sqfOurs = medianMs(() => sqfSet.forEach((p) => upolySquarefreeFactorisation(p)), 7, 5) / sqfSet.length;
    const sqfPari = pariMs(`w=[${sqfSet.map(gpPoly).join(',')}]; m=#w;`, 'my(p=w[r%m+1]); gcd(p, deriv(p))', 1000);
    figures.push({ label: 'square-free factorisation, degree 12 with a repeated cubic (PARI: gcd(p, p\'), one step of it)', values: { ninefoldMs: sqfOurs, pariMs: sqfPari, ratio: sqfOurs / sqfPari } });
    const resPairs = Array.from({ length: 20 }, () => [0, 1].map(() => Array.from({ length: 10 }, () => digitsExactly(rand, 50))) as [UPoly, UPoly]);
    const resOurs = medianMs(() => resPairs.forEach(([a, b]) => upolyResultant(a, b)), 5, 1) / resPairs.length;
    const resPari = pariMs(`u=[${resPairs.map(([a, b]) => `[${gpPoly(a)},${gpPoly(b)}]`).join(',')}]; m=#u;`, 'polresultant(u[r%m+1][1], u[r%m+1][2])', 500);
    figures.push({ label: 'resultant of two dense degree-9 polynomials, 50-digit coefficients', values: { ninefoldMs: resOurs, pariMs: resPari, ratio: resOurs / resPari } });
    return figures;
  },
};

/**
 * "real roots": exact isolation of all real roots (ours) against PARI's polsturm (a count only), and all
 * real roots to 30 significant digits (ours: isolate, refine, round correctly) against PARI's
 * polrootsreal at 30 digits, on dense degree-9 polynomials with 50-digit coefficients.
 */
export const realRootsBench: BenchSuite = {
  name: 'real roots',
  async run(): Promise<BenchFigure[]> {
    const rand = seededRandom(31337);
    const set: UPoly[] = Array.from({ length: 30 }, () => Array.from({ length: 10 }, () => digitsExactly(rand, 50)));
    const reps = 5;
    const isoMs = median(set.map((p) => medianMs(() => upolyRealRootIntervals(p), reps, 1)));
    const decMs = median(set.map((p) => medianMs(() => algebraicRealRoots(p).map((a) => algebraicToDecimal(a, 30)), reps, 1)));
    const sturm = gp(`v=[${set.map(gpPoly).join(',')}];\nfor(i=1,#v, gettime(); for(r=1,200, polsturm(v[i])); print(gettime()/200.))`).map(Number);
    const real = gp(`default(realprecision, 30); v=[${set.map(gpPoly).join(',')}];\nfor(i=1,#v, gettime(); for(r=1,200, polrootsreal(v[i])); print(gettime()/200.))`).map(Number);
    const pariIso = median(sturm);
    const pariReal = median(real);
    return [
      { label: 'isolate all real roots, degree 9, 50-digit coefficients (PARI: polsturm count)', values: { ninefoldMs: isoMs, pariMs: pariIso, ratio: isoMs / pariIso } },
      { label: 'all real roots to 30 digits, correctly rounded (PARI: polrootsreal at 30 digits)', values: { ninefoldMs: decMs, pariMs: pariReal, ratio: decMs / pariReal } },
    ];
  },
};
