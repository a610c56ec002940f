// Exact linear algebra against PARI/GP run live: matrank, matker (kernel dimension) and matdet on seeded
// random integer matrices, including rank-deficient ones built as products A·B with a thin inner size.
import { describe, expect, it } from 'vitest';
import { gp, randomBigInt, seededRandom } from './oracles.ts';
import {
  matDeterminant, matDeterminantRational, matKernel, matKernelRational, matMul, matMulVec, matRank, matRankRational,
} from '../../src/exact/linalg.ts';
import { rat, ratToString, type Rational } from '../../src/exact/rational.ts';

const SEED = 20261201;

function randomMatrix(rand: () => number, rows: number, cols: number, digits: number): bigint[][] {
  return Array.from({ length: rows }, () =>
    Array.from({ length: cols }, () => (rand() < 0.15 ? 0n : randomBigInt(rand, digits))),
  );
}

// Mat(...) so that a one-row matrix is not read as a vector.
const gpMatrix = (m: bigint[][]) => (m.length === 0 ? '[;]' : 'Mat([' + m.map((r) => r.join(',')).join(';') + '])');

describe('linear algebra agrees with PARI/GP (matrank, matker, matdet)', () => {
  it('rank and kernel dimension of random and rank-deficient matrices up to 20 x 28', () => {
    const rand = seededRandom(SEED);
    const cases: bigint[][][] = [];
    for (let t = 0; t < 60; t++) {
      const rows = 1 + Math.floor(rand() * 20);
      const cols = 1 + Math.floor(rand() * 28);
      if (t % 2 === 0) {
        cases.push(randomMatrix(rand, rows, cols, 1 + Math.floor(rand() * 30)));
      } else {
        const inner = 1 + Math.floor(rand() * Math.min(rows, cols));
        cases.push(matMul(randomMatrix(rand, rows, inner, 8), randomMatrix(rand, inner, cols, 8)));
      }
    }
    cases.push(matMul(randomMatrix(rand, 20, 7, 20), randomMatrix(rand, 7, 28, 20)));
    cases.push(randomMatrix(rand, 20, 28, 40));
    const script = cases.map((m) => `M=${gpMatrix(m)}; print(matrank(M), " ", #matker(M))`).join('\n');
    const out = gp(script);
    expect(out.length).toBe(cases.length);
    cases.forEach((m, i) => {
      const [rank, nullity] = out[i].split(' ').map(Number);
      const ours = matRank(m);
      const kernel = matKernel(m);
      const where = `seed ${SEED}, case ${i}: ${gpMatrix(m)}`;
      expect(ours, where).toBe(rank);
      expect(kernel.length, where).toBe(nullity);
      for (const v of kernel) expect(matMulVec(m, v).every((x) => x === 0n), where).toBe(true);
      if (kernel.length > 0) expect(matRank(kernel), where).toBe(nullity);
    });
  });

  it('determinants of random square matrices up to 20 x 20, singular ones included', () => {
    const rand = seededRandom(SEED + 1);
    const cases: bigint[][][] = [];
    for (let t = 0; t < 40; t++) {
      const n = 1 + Math.floor(rand() * 20);
      if (t % 3 === 2 && n > 1) {
        const inner = Math.floor(rand() * (n - 1)) + 1;
        cases.push(matMul(randomMatrix(rand, n, inner, 10), randomMatrix(rand, inner, n, 10)));
      } else {
        cases.push(randomMatrix(rand, n, n, 1 + Math.floor(rand() * 25)));
      }
    }
    const out = gp(cases.map((m) => `print(matdet(${gpMatrix(m)}))`).join('\n'));
    cases.forEach((m, i) => {
      expect(matDeterminant(m).toString(), `seed ${SEED + 1}, case ${i}: ${gpMatrix(m)}`).toBe(out[i]);
    });
  });

  it('rational matrices: rank, kernel dimension and determinant (rows cleared) agree with matrank, matker, matdet', () => {
    const rand = seededRandom(SEED + 2);
    const cases: Rational[][][] = [];
    for (let t = 0; t < 25; t++) {
      const n = 1 + Math.floor(rand() * 10);
      const cols = t % 2 === 0 ? n : 1 + Math.floor(rand() * 14);
      const num = randomMatrix(rand, n, cols, 12);
      const den = randomMatrix(rand, n, cols, 6);
      const m = num.map((r, i) => r.map((a, j) => rat(a, den[i][j] === 0n ? 1n : den[i][j])));
      // Make some of them rank-deficient: the last row a rational multiple of the first.
      if (t % 3 === 0 && n > 1) m[n - 1] = m[0].map((q) => rat(q.num * 7n, q.den * 3n));
      cases.push(m);
    }
    const gpRat = (m: Rational[][]) => 'Mat([' + m.map((r) => r.map(ratToString).join(',')).join(';') + '])';
    const out = gp(cases.map((m) => `M=${gpRat(m)}; print(matrank(M), " ", #matker(M), " ", if(#M==#M~, matdet(M), "-"))`).join('\n'));
    cases.forEach((m, i) => {
      const [rank, nullity, det] = out[i].split(' ');
      const where = `seed ${SEED + 2}, case ${i}: ${gpRat(m)}`;
      expect(matRankRational(m), where).toBe(Number(rank));
      expect(matKernelRational(m).length, where).toBe(Number(nullity));
      if (det !== '-') expect(ratToString(matDeterminantRational(m)), where).toBe(det);
    });
  });
});
