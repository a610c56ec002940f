// Real algebraic numbers: comparison consistent with decimal approximations, sign, refinement, exactness.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  algebraicAsRational, algebraicCmp, algebraicFromInterval, algebraicFromRational, algebraicRealRoots,
  algebraicRefine, algebraicSign, algebraicToDecimal, algebraicToNumber, type RealAlgebraic,
} from '../../../src/exact/algebraic.ts';
import { rat, ratCmp, ratSub } from '../../../src/exact/rational.ts';
import { upolyMul, upolySignAt } from '../../../src/exact/upoly.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

const sqrt = (n: bigint): RealAlgebraic => algebraicRealRoots([-n, 0n, 1n]).at(-1)!;

describe('real algebraic numbers', () => {
  it('sqrt 2 to 50 digits (value from memory, confirmed by PARI: sqrt(2) at \\p 60)', () => {
    expect(algebraicToDecimal(sqrt(2n), 50)).toBe('1.4142135623730950488016887242096980785696718753769');
    expect(algebraicToDecimal(algebraicRealRoots([-2n, 0n, 0n, 1n])[0], 20)).toBe('1.2599210498948731648');
  });
  it('rational roots come back exact and as rationals', () => {
    const rs = algebraicRealRoots(upolyMul([-1n, 3n], [-2n, 0n, 1n]));
    expect(rs.length).toBe(3);
    expect(algebraicAsRational(rs[1])).toEqual(rat(1n, 3n));
    expect(algebraicAsRational(rs[2])).toBeNull();
    expect(algebraicToDecimal(rs[1], 5)).toBe('0.33333');
  });
  it('a rational on a rounding boundary, given with a reducible polynomial, rounds exactly', () => {
    const a = algebraicFromInterval(upolyMul([-1n, 8n], [-2n, 0n, 1n]), rat(1n, 10n), rat(1n, 5n)); // 1/8
    expect(algebraicToDecimal(a, 2)).toBe('0.13');
    expect(algebraicCmp(a, algebraicFromRational(rat(1n, 8n)))).toBe(0);
    expect(algebraicCmp(algebraicFromRational(rat(1n, 8n)), a)).toBe(0);
    expect(algebraicAsRational(a)).toEqual(rat(1n, 8n));
  });
  it('sign, including zero inside the interval', () => {
    const a = algebraicFromInterval([0n, -2n, 0n, 1n], rat(-1n), rat(1n)); // root 0 of x^3 - 2x
    expect(algebraicSign(a)).toBe(0);
    expect(algebraicSign(sqrt(3n))).toBe(1);
    expect(algebraicSign(algebraicRealRoots([-3n, 0n, 1n])[0])).toBe(-1);
    expect(algebraicSign(algebraicFromRational(rat(-5n, 2n)))).toBe(-1);
  });
  it('equal numbers with different polynomials compare equal', () => {
    const a = sqrt(2n);
    const b = algebraicRealRoots(upolyMul([-2n, 0n, 1n], [-5n, 1n, 1n])).find((x) => Math.abs(algebraicToNumber(x) - Math.SQRT2) < 1e-9)!;
    expect(algebraicCmp(a, b)).toBe(0);
    expect(algebraicCmp(a, sqrt(3n))).toBe(-1);
    expect(algebraicCmp(sqrt(3n), algebraicFromRational(rat(17n, 10n)))).toBe(1);
  });
  it('comparison agrees with 30-digit decimals on random square roots (property)', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 2n, max: 10n ** 12n }), fc.bigInt({ min: 2n, max: 10n ** 12n }), (m, n) => {
        const a = sqrt(m);
        const b = sqrt(n);
        const c = algebraicCmp(a, b);
        expect(c).toBe(m < n ? -1 : m > n ? 1 : 0);
        const da = Number(algebraicToDecimal(a, 17));
        const db = Number(algebraicToDecimal(b, 17));
        if (c < 0) expect(da).toBeLessThanOrEqual(db);
        if (c > 0) expect(da).toBeGreaterThanOrEqual(db);
        expect(algebraicToNumber(a)).toBeCloseTo(Math.sqrt(Number(m)), 6);
      }),
      { numRuns: 40 },
    );
  });
  it('refinement narrows and keeps the number', () => {
    const a = sqrt(5n);
    const r = algebraicRefine(a, rat(1n, 10n ** 40n));
    expect(ratCmp(ratSub(r.hi, r.lo), rat(1n, 10n ** 40n))).toBeLessThanOrEqual(0);
    expect(algebraicCmp(a, r)).toBe(0);
  });
  it('huge and tiny values in scientific layout', () => {
    const big = algebraicRealRoots([-(10n ** 401n), 0n, 1n]).at(-1)!; // sqrt(10^401) = 3.162...e200
    expect(algebraicToDecimal(big, 6)).toBe('3.16228e+200');
    const tiny = algebraicRealRoots([-1n, 0n, 10n ** 401n]).at(-1)!;
    expect(algebraicToDecimal(tiny, 6)).toBe('3.16228e-201');
  });
  it('doubles beyond range: ±Infinity above, 0 below', () => {
    expect(algebraicToNumber(algebraicRealRoots([-(10n ** 801n), 0n, 1n]).at(-1)!)).toBe(Infinity);
    expect(algebraicToNumber(algebraicRealRoots([-(10n ** 801n), 0n, 1n])[0])).toBe(-Infinity);
    expect(algebraicToNumber(algebraicRealRoots([-1n, 0n, 10n ** 801n]).at(-1)!)).toBe(0);
  });
  it('30-digit decimals of roots spanning 1e-26..1e101 lie within half a unit of the root (exact sign check)', () => {
    // A sextic on which PARI's polrootsreal at realprecision 100 was wrong in the 9th digit (see the reference test).
    const p = [
      70214106703340291453709298207830355886204523844498675215839001389101n, -303206851925816032091321291415148476215n,
      -317538510223520930328963357612386660714599349245686717637674674136296981155509324727842759995482626411238113536398511568n,
      -3627521905146n, -433851945545115n,
      8488233952358437094473541686722174305163275673797455580158579091704509328373098070023968262416155284094818n, 58045n,
    ];
    const roots = algebraicRealRoots(p);
    expect(roots.length).toBe(4);
    for (const a of roots) {
      const text = algebraicToDecimal(a, 30);
      const [mant, ex] = text.includes('e') ? text.split('e') : [text, '0'];
      const digits = mant.replace('-', '').replace('.', '');
      const pointAt = mant.replace('-', '').indexOf('.');
      const exp10 = Number(ex) - (digits.length - (pointAt < 0 ? digits.length : pointAt));
      const sign = mant.startsWith('-') ? -1n : 1n;
      // [D − u/2, D + u/2] with u one unit of the last digit, as exact rationals over 2·10^k.
      const scale = exp10 >= 0 ? [10n ** BigInt(exp10), 1n] : [1n, 10n ** BigInt(-exp10)];
      const D2 = 2n * sign * BigInt(digits);
      const lo = rat((D2 - 1n) * scale[0], 2n * scale[1]);
      const hi = rat((D2 + 1n) * scale[0], 2n * scale[1]);
      expect(upolySignAt(p, lo) * upolySignAt(p, hi), text).toBe(-1);
    }
  });
  it('refuses bad input', () => {
    expect(() => algebraicFromInterval([-2n, 0n, 1n], rat(2n), rat(3n))).toThrow(InvalidInput);
    expect(() => algebraicRealRoots([])).toThrow(InvalidInput);
    expect(() => algebraicToDecimal(sqrt(2n), 0)).toThrow(/digits/);
  });
});

describe('algebraic comparison on roots of random cubics and quintics (property)', () => {
  it('is a total order consistent with 25-digit decimals, and each refinement keeps the number', () => {
    const poly = fc.array(fc.bigInt({ min: -(10n ** 8n), max: 10n ** 8n }), { minLength: 4, maxLength: 6 }).filter((c) => c[c.length - 1] !== 0n);
    fc.assert(
      fc.property(poly, poly, fc.integer({ min: 1, max: 80 }), (p, q, w) => {
        const xs = [...algebraicRealRoots(p), ...algebraicRealRoots(q)];
        const sorted = xs.slice().sort(algebraicCmp);
        for (let i = 1; i < sorted.length; i++) {
          const c = algebraicCmp(sorted[i - 1], sorted[i]);
          expect(c).toBeLessThanOrEqual(0);
          expect(algebraicCmp(sorted[i], sorted[i - 1])).toBe(c === 0 ? 0 : 1);
          const a = Number(algebraicToDecimal(sorted[i - 1], 25));
          const b = Number(algebraicToDecimal(sorted[i], 25));
          expect(a).toBeLessThanOrEqual(b);
        }
        for (const x of xs) expect(algebraicCmp(x, algebraicRefine(x, rat(1n, 2n ** BigInt(w))))).toBe(0);
      }),
      { numRuns: 40 },
    );
  });
});
