import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  matClearRows, matDeterminant, matEchelon, matKernel, matMul, matMulVec, matRank,
} from '../../../src/exact/linalg.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';
import { content } from '../../../src/exact/integer.ts';
import { rat } from '../../../src/exact/rational.ts';

const arbEntry = fc.bigInt({ min: -(10n ** 12n), max: 10n ** 12n });
const arbMatrix = (rows: number, cols: number) =>
  fc.array(fc.array(arbEntry, { minLength: cols, maxLength: cols }), { minLength: rows, maxLength: rows });

/** Laplace expansion along the first row: the textbook definition, for small sizes only (common practice). */
function detLaplace(m: bigint[][]): bigint {
  if (m.length === 0) return 1n;
  let s = 0n;
  for (let j = 0; j < m.length; j++) {
    const minor = m.slice(1).map((r) => r.filter((_, k) => k !== j));
    s += (j % 2 === 0 ? 1n : -1n) * m[0][j] * detLaplace(minor);
  }
  return s;
}

describe('fraction-free linear algebra (Bareiss 1968)', () => {
  it('determinant agrees with the Laplace expansion (definition) on random 1x1..5x5', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }).chain((n) => arbMatrix(n, n)), (m) => {
        expect(matDeterminant(m)).toBe(detLaplace(m));
      }),
      { numRuns: 150 },
    );
  });
  it('known small values (hand computation)', () => {
    expect(matDeterminant([])).toBe(1n);
    expect(matDeterminant([[0n, 1n], [1n, 0n]])).toBe(-1n);
    expect(matDeterminant([[2n, 4n], [1n, 2n]])).toBe(0n);
    expect(matRank([[1n, 2n, 3n], [2n, 4n, 6n]])).toBe(1);
    expect(matKernel([[1n, 2n, 3n]])).toEqual([[2n, -1n, 0n], [3n, 0n, -1n]]);
    expect(matKernel([], 2)).toEqual([[1n, 0n], [0n, 1n]]);
    expect(matKernel([[0n, 0n]])).toEqual([[1n, 0n], [0n, 1n]]);
  });
  it('kernel vectors lie in the kernel, are primitive, and rank + nullity = cols (random products)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 8 }),
        fc.integer({ min: 1, max: 10 }),
        fc.integer({ min: 1, max: 6 }),
        fc.infiniteStream(arbEntry),
        (rows, cols, inner, s) => {
          const it = s[Symbol.iterator]();
          const next = () => it.next().value as bigint;
          const a = Array.from({ length: rows }, () => Array.from({ length: inner }, next));
          const b = Array.from({ length: inner }, () => Array.from({ length: cols }, next));
          const m = matMul(a, b);
          const k = matKernel(m);
          const r = matRank(m);
          expect(r).toBeLessThanOrEqual(Math.min(rows, cols, inner));
          expect(r + k.length).toBe(cols);
          expect(matEchelon(m).rank).toBe(r);
          for (const v of k) {
            expect(matMulVec(m, v).every((x) => x === 0n)).toBe(true);
            expect(content(v)).toBe(1n);
            expect(v.find((x) => x !== 0n)! > 0n).toBe(true);
          }
          // The kernel vectors are independent.
          if (k.length > 0) expect(matRank(k)).toBe(k.length);
        },
      ),
      { numRuns: 120 },
    );
  });
  it('rational rows are cleared row by row', () => {
    const { matrix, scales } = matClearRows([[rat(1n, 2n), rat(1n, 3n)], [rat(2n), rat(-3n, 4n)]]);
    expect(matrix).toEqual([[3n, 2n], [8n, -3n]]);
    expect(scales).toEqual([6n, 4n]);
  });
  it('refuses ragged rows and non-square determinants with a message', () => {
    expect(() => matRank([[1n, 2n], [3n]])).toThrow(InvalidInput);
    expect(() => matRank([[1n, 2n], [3n]])).toThrow(/row 2 has 1 entries, expected 2/);
    expect(() => matDeterminant([[1n, 2n]])).toThrow(/square/);
  });
});
