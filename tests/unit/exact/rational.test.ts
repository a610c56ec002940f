import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  rat, ratAdd, ratCmp, ratDiv, ratEq, ratFloor, ratMul, ratNeg, ratParse, ratSub, ratToNumber, ratToString,
  type Rational,
} from '../../../src/exact/rational.ts';
import { ParseError } from '../../../src/exact/errors.ts';

const arbRat = fc
  .tuple(fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }), fc.bigInt({ min: 1n, max: 10n ** 20n }))
  .map(([n, d]) => rat(n, d));
const canonical = (q: Rational) => q.den > 0n && (q.num === 0n ? q.den === 1n : true);

describe('rationals (field laws: common practice)', () => {
  it('canonical form: positive denominator, reduced', () => {
    expect(rat(6n, -4n)).toEqual({ num: -3n, den: 2n });
    expect(rat(0n, -7n)).toEqual({ num: 0n, den: 1n });
  });
  it('field laws hold on random values', () => {
    fc.assert(
      fc.property(arbRat, arbRat, arbRat, (a, b, c) => {
        expect(ratEq(ratAdd(a, b), ratAdd(b, a))).toBe(true);
        expect(ratEq(ratMul(a, ratAdd(b, c)), ratAdd(ratMul(a, b), ratMul(a, c)))).toBe(true);
        expect(ratEq(ratSub(ratAdd(a, b), b), a)).toBe(true);
        if (b.num !== 0n) expect(ratEq(ratMul(ratDiv(a, b), b), a)).toBe(true);
        expect(canonical(ratMul(a, b)) && canonical(ratAdd(a, c))).toBe(true);
        expect(ratCmp(a, b)).toBe(-ratCmp(b, a) as -1 | 0 | 1);
      }),
    );
  });
  it('floor rounds towards minus infinity', () => {
    expect(ratFloor(rat(-7n, 2n))).toBe(-4n);
    expect(ratFloor(rat(7n, 2n))).toBe(3n);
    expect(ratFloor(rat(-6n, 2n))).toBe(-3n);
  });
  it('parses fractions and exact decimals', () => {
    expect(ratParse('-17/4')).toEqual({ num: -17n, den: 4n });
    expect(ratParse('2.25')).toEqual({ num: 9n, den: 4n });
    expect(ratToString(ratNeg(ratParse('3/6')))).toBe('-1/2');
    expect(() => ratParse('3/x')).toThrow(ParseError);
    expect(() => ratParse('1/0')).toThrow(/zero denominator/);
  });
  it('converts huge values to the nearest double', () => {
    const big = rat(10n ** 400n + 1n, 3n * 10n ** 399n);
    expect(ratToNumber(big)).toBeCloseTo(10 / 3, 12);
  });
});
