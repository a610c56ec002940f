// Ring laws, division, gcd and square-free factorisation of integer polynomials (laws: common practice).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  upoly, upolyAdd, upolyDegree, upolyDerivative, upolyDiscriminant, upolyDivExact, upolyEquals, upolyEval,
  upolyEvalRat, upolyGcd, upolyMul, upolyPrimitive, upolyPseudoDivision, upolyPseudoRem, upolyResultant,
  upolyScale, upolySquarefreeFactorisation, upolyGcdSubresultant, upolySquarefreePart, upolySub, upolyTaylorShift, upolyPow,
} from '../../../src/exact/upoly.ts';
import { rat, ratEq } from '../../../src/exact/rational.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';
import { seededRandom, randomBigInt } from '../../reference/oracles.ts';

const coeff = fc.bigInt({ min: -(10n ** 25n), max: 10n ** 25n });
const arbPoly = fc.array(coeff, { maxLength: 8 }).map((c) => upoly(c));
const arbNonZero = arbPoly.filter((p) => p.length > 0);
const small = fc.array(fc.bigInt({ min: -9n, max: 9n }), { minLength: 2, maxLength: 4 }).map((c) => upoly(c)).filter((p) => p.length >= 2);

describe('upoly arithmetic', () => {
  it('is trimmed and canonical', () => {
    expect(upoly([1, 2, 0, 0])).toEqual([1n, 2n]);
    expect(upoly([0, 0])).toEqual([]);
    expect(upolyDegree([])).toBe(-1);
    expect(upolySub([1n, 2n], [1n, 2n])).toEqual([]);
    expect(upolyScale([1n, 2n], 0n)).toEqual([]);
  });
  it('ring laws on random polynomials', () => {
    fc.assert(
      fc.property(arbPoly, arbPoly, arbPoly, (a, b, c) => {
        expect(upolyAdd(a, b)).toEqual(upolyAdd(b, a));
        expect(upolyMul(a, b)).toEqual(upolyMul(b, a));
        expect(upolyMul(a, upolyAdd(b, c))).toEqual(upolyAdd(upolyMul(a, b), upolyMul(a, c)));
        expect(upolyMul(upolyMul(a, b), c)).toEqual(upolyMul(a, upolyMul(b, c)));
        expect(upolySub(upolyAdd(a, b), b)).toEqual(a);
        // evaluation is a ring homomorphism
        expect(upolyEval(upolyMul(a, b), 7n)).toBe(upolyEval(a, 7n) * upolyEval(b, 7n));
      }),
    );
  });
  it('derivative obeys the product rule', () => {
    fc.assert(
      fc.property(arbPoly, arbPoly, (a, b) => {
        expect(upolyDerivative(upolyMul(a, b))).toEqual(
          upolyAdd(upolyMul(upolyDerivative(a), b), upolyMul(a, upolyDerivative(b))),
        );
      }),
    );
  });
  it('exact division undoes multiplication and refuses a non-divisor', () => {
    fc.assert(
      fc.property(arbPoly, arbNonZero, (a, b) => {
        expect(upolyDivExact(upolyMul(a, b), b)).toEqual(a);
      }),
    );
    expect(() => upolyDivExact([1n, 0n, 1n], [1n, 1n])).toThrow(/does not divide/);
    expect(() => upolyDivExact([1n], [])).toThrow(InvalidInput);
  });
  it('pseudo-division: lead^k p = quo q + rem with deg rem < deg q', () => {
    fc.assert(
      fc.property(arbPoly, arbNonZero, (p, q) => {
        const { quo, rem } = upolyPseudoDivision(p, q);
        const k = Math.max(p.length - q.length + 1, 0);
        const lhs = upolyScale(p, q[q.length - 1] ** BigInt(k));
        if (p.length >= q.length) expect(upolyAdd(upolyMul(quo, q), rem)).toEqual(lhs);
        expect(rem.length).toBeLessThan(Math.max(q.length, p.length + 1));
        if (p.length >= q.length) expect(upolyPseudoRem(p, q)).toEqual(rem);
      }),
    );
  });
  it('evaluates at rationals exactly', () => {
    expect(ratEq(upolyEvalRat([-2n, 0n, 3n], rat(2n, 3n)), rat(-2n, 3n))).toBe(true);
    expect(upolyTaylorShift([1n, 2n, 1n], -1n)).toEqual([0n, 0n, 1n]);
    expect(upolyPow([1n, 1n], 3)).toEqual([1n, 3n, 3n, 1n]);
  });
});

describe('upoly gcd, square-free factorisation, resultant', () => {
  it('the gcd divides both and the cofactors are coprime', () => {
    fc.assert(
      fc.property(small, small, small, (a, b, c) => {
        const p = upolyMul(a, c);
        const q = upolyMul(b, c);
        const g = upolyGcd(p, q);
        expect(upolyDivExact(p, g).length).toBeGreaterThan(0);
        expect(upolyDivExact(q, g).length).toBeGreaterThan(0);
        // c divides the gcd
        expect(() => upolyDivExact(g, upolyPrimitive(c))).not.toThrow();
        const h = upolyGcd(upolyDivExact(p, g), upolyDivExact(q, g));
        expect(h.length).toBe(1);
      }),
    );
  });
  it('modular gcd agrees with the sub-resultant PRS, 60-digit coefficients and planted factors (seeded)', () => {
    const seed = 777;
    const rand = seededRandom(seed);
    for (let i = 0; i < 60; i++) {
      const rp = (deg: number, digits: number) => upoly(Array.from({ length: deg + 1 }, () => randomBigInt(rand, digits) || 1n));
      const common = upolyPow(rp(1 + Math.floor(rand() * 3), 60), 1 + Math.floor(rand() * 2));
      const p = upolyMul(common, rp(Math.floor(rand() * 6), 60));
      const q = upolyMul(upolyScale(common, randomBigInt(rand, 5) || 3n), rp(Math.floor(rand() * 6), 60));
      const want = upolyGcdSubresultant(p, q);
      if (!upolyEquals(upolyGcd(p, q), want)) throw new Error(`seed ${seed}, case ${i}: p = [${p}], q = [${q}]`);
    }
  });
  it('gcd handles zero and constants', () => {
    expect(upolyGcd([], [])).toEqual([]);
    expect(upolyGcd([], [-2n, -4n])).toEqual([1n, 2n]);
    expect(upolyGcd([6n], [4n, 2n])).toEqual([2n]);
    expect(upolyGcd([6n, 12n], [4n, 8n])).toEqual([2n, 4n]);
  });
  it('square-free part has no repeated root, factorisation multiplies back', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(small, fc.integer({ min: 1, max: 3 })), { minLength: 1, maxLength: 3 }), (parts) => {
        let p: bigint[] = [3n];
        for (const [f, k] of parts) p = upolyMul(p, upolyPow(f, k));
        const s = upolySquarefreePart(p);
        expect(upolyGcd(s, upolyDerivative(s)).length).toBe(1);
        const fac = upolySquarefreeFactorisation(p);
        let back: bigint[] = [1n];
        for (const { factor, multiplicity } of fac) {
          expect(upolyGcd(factor, upolyDerivative(factor)).length).toBe(1);
          back = upolyMul(back, upolyPow(factor, multiplicity));
        }
        expect(back).toEqual(upolyPrimitive(p));
      }),
    );
    expect(() => upolySquarefreeFactorisation([])).toThrow(InvalidInput);
    expect(upolySquarefreeFactorisation([5n])).toEqual([]);
  });
  it('resultant: multiplicative, vanishes on a common factor, matches the product formula', () => {
    // Res(x − a, x − b) = a·(-1)... : Res(x-2, x-5) = (2 - 5) = -3 (product formula, common practice)
    expect(upolyResultant([-2n, 1n], [-5n, 1n])).toBe(-3n);
    // Res(x^2 - 2, x + 1) = (-1)^2 - 2 = -1
    expect(upolyResultant([-2n, 0n, 1n], [1n, 1n])).toBe(-1n);
    expect(upolyResultant([], [1n, 1n])).toBe(0n);
    expect(upolyResultant([3n], [1n, 1n, 1n])).toBe(9n);
    fc.assert(
      fc.property(small, small, small, (a, b, c) => {
        expect(upolyResultant(upolyMul(a, b), c)).toBe(upolyResultant(a, c) * upolyResultant(b, c));
        const da = a.length - 1;
        const dc = c.length - 1;
        expect(upolyResultant(c, a)).toBe(((da * dc) % 2 ? -1n : 1n) * upolyResultant(a, c));
        expect(upolyResultant(upolyMul(a, c), upolyMul(b, c))).toBe(0n);
      }),
    );
    expect(upolyDiscriminant([1n, 1n, 1n])).toBe(-3n);
    expect(upolyEquals(upolyDerivative([5n]), [])).toBe(true);
  });
});
