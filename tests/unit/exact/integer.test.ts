import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bitLength, content, isqrt, isSquare, primitive } from '../../../src/exact/integer.ts';

describe('integer helpers (common practice)', () => {
  it('isqrt is the floor of the square root, also far past the double range', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 1n << 4000n }), (n) => {
        const r = isqrt(n);
        expect(r * r <= n && (r + 1n) * (r + 1n) > n).toBe(true);
      }),
    );
    const big = (10n ** 700n + 12345n) ** 2n;
    expect(isqrt(big)).toBe(10n ** 700n + 12345n);
    expect(isSquare(big)).toBe(true);
    expect(isSquare(big + 1n)).toBe(false);
  });
  it('bitLength counts the bits of |a|', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(1n << 300n), max: 1n << 300n }), (a) => {
        expect(bitLength(a)).toBe(a === 0n ? 0 : (a < 0n ? -a : a).toString(2).length);
      }),
    );
  });
  it('primitive parts have content 1 and a positive first non-zero entry', () => {
    expect(primitive([0n, -6n, 4n, 10n])).toEqual([0n, 3n, -2n, -5n]);
    expect(content([0n, 0n])).toBe(0n);
    expect(primitive([0n, 0n])).toEqual([0n, 0n]);
  });
});
