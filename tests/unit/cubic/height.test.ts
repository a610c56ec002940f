import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { pointHeight, pointHeightCompare, pointLogHeight } from '../../../src/cubic/height.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

describe('pointHeight (Silverman–Tate, Rational Points on Elliptic Curves, III.1)', () => {
  it('is max |coordinate| of the primitive triple', () => {
    expect(pointHeight([3n, -7n, 2n])).toBe(7n);
    expect(pointHeight([6n, -14n, 4n])).toBe(7n); // same point, scaled
    expect(pointHeight([0n, 0n, -5n])).toBe(1n);
    expect(pointHeight([1n, 0n, 0n])).toBe(1n);
  });
  it('refuses the zero vector with a clear error', () => {
    expect(() => pointHeight([0n, 0n, 0n])).toThrow(InvalidInput);
  });
  it('is invariant under scaling (property)', () => {
    fc.assert(
      fc.property(fc.bigInt(-1000n, 1000n), fc.bigInt(-1000n, 1000n), fc.bigInt(1n, 1000n), fc.bigInt(-50n, 50n), (x, y, z, s) => {
        fc.pre(s !== 0n);
        expect(pointHeight([x * s, y * s, z * s])).toBe(pointHeight([x, y, z]));
      }),
      { seed: 61, numRuns: 200 },
    );
  });
  it('log height agrees with Math.log for small heights and stays finite for huge ones', () => {
    expect(pointLogHeight([2n, 5n, 1n])).toBeCloseTo(Math.log(5), 12);
    const big = 10n ** 400n;
    expect(pointLogHeight([big, 1n, 1n])).toBeCloseTo(400 * Math.LN10, 9);
  });
  it('orders by height, then coordinates', () => {
    const pts = [[1n, 2n, 1n], [0n, 1n, 0n], [1n, -1n, 1n]] as const;
    const sorted = [...pts].sort(pointHeightCompare);
    expect(sorted).toEqual([[0n, 1n, 0n], [1n, -1n, 1n], [1n, 2n, 1n]]);
  });
});
