import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  binaryAdd, binaryDegree, binaryEval, binaryFromUPolyInS, binaryMul, binaryPow, binaryPrimitive, binaryToUPolyInS,
} from '../../../src/poly/binary.ts';

const arbBinary = fc.array(fc.bigInt({ min: -1000n, max: 1000n }), { minLength: 1, maxLength: 7 });
const arbInt = fc.bigInt({ min: -50n, max: 50n });

describe('binary forms (ring laws by evaluation: common practice)', () => {
  it('product and power evaluate to the product and power of the values', () => {
    fc.assert(
      fc.property(arbBinary, arbBinary, arbInt, arbInt, (a, b, s, t) => {
        expect(binaryEval(binaryMul(a, b), s, t)).toBe(binaryEval(a, s, t) * binaryEval(b, s, t));
        expect(binaryEval(binaryPow(a, 3), s, t)).toBe(binaryEval(a, s, t) ** 3n);
        expect(binaryDegree(binaryMul(a, b))).toBe(binaryDegree(a) + binaryDegree(b));
      }),
    );
  });
  it('sum, primitive part and the passage to one variable', () => {
    expect(binaryAdd([1n, 2n], [3n, -2n])).toEqual([4n, 0n]);
    expect(binaryPrimitive([-4n, 6n, 0n])).toEqual([2n, -3n, 0n]);
    // s^2 t - 3 t^3 at t = 1 is x^2 - 3.
    expect(binaryToUPolyInS([0n, 1n, 0n, -3n])).toEqual([-3n, 0n, 1n]);
    expect(binaryFromUPolyInS([-3n, 0n, 1n], 3)).toEqual([0n, 1n, 0n, -3n]);
    expect(binaryEval([0n, 1n, 0n, -3n], 2n, 5n)).toBe(4n * 5n - 3n * 125n);
    expect(() => binaryAdd([1n], [1n, 2n])).toThrow(/degrees 0 and 1/);
  });
});
