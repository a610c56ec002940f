// The gcd kernel against the plain Euclidean algorithm and the defining properties (common practice).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { gcd, gcdEuclid } from '../../../src/exact/gcd.ts';
import { seededRandom, randomBigInt } from '../../reference/oracles.ts';

describe('gcd kernel', () => {
  it('table, signs, zero', () => {
    expect(gcd(0n, 0n)).toBe(0n);
    expect(gcd(0n, -7n)).toBe(7n);
    expect(gcd(-12n, 18n)).toBe(6n);
    expect(gcd(2n ** 53n, 2n ** 60n)).toBe(2n ** 53n);
    expect(gcd(2n ** 400n * 3n, 2n ** 300n * 9n)).toBe(2n ** 300n * 3n);
  });
  it('agrees with Euclid on random sizes from 1 to 3000 digits with planted common factors (seeded)', () => {
    const seed = 4242;
    const rand = seededRandom(seed);
    for (let i = 0; i < 300; i++) {
      const digits = 1 + Math.floor(rand() ** 2 * 3000);
      const g = randomBigInt(rand, Math.max(1, digits >> 2));
      const a = randomBigInt(rand, digits) * g;
      const b = randomBigInt(rand, digits) * (rand() < 0.5 ? g : 1n);
      const want = gcdEuclid(a, b);
      if (gcd(a, b) !== want) throw new Error(`seed ${seed}, case ${i}: gcd(${a}, ${b})`);
    }
  });
  it('edge cases against Euclid: 0, ±1, equal, one divides the other, powers of two, negatives, across the 2^53 and 2^72 switches', () => {
    const big = 10n ** 700n + 12345678901234567n;
    const values = [0n, 1n, -1n, 2n, 3n, 2n ** 52n, 2n ** 53n - 1n, 2n ** 53n, 2n ** 53n + 1n, 2n ** 71n, 2n ** 72n - 1n, 2n ** 72n, 2n ** 72n + 1n, 2n ** 1000n, 3n ** 500n, big, big * 7n, big * big];
    for (const a of values) {
      for (const b of values) {
        for (const [x, y] of [[a, b], [-a, b], [a, -b], [-a, -b]]) {
          const want = gcdEuclid(x, y);
          expect(gcd(x, y), `gcd(${x}, ${y})`).toBe(want);
          expect(gcd(y, x), `gcd(${y}, ${x})`).toBe(want);
        }
      }
    }
    expect(gcd(big, big)).toBe(big);
    expect(gcd(-big, big * big)).toBe(big);
    expect(gcd(2n ** 5000n, 2n ** 4999n * 3n)).toBe(2n ** 4999n);
  });
  it('agrees with Euclid on 5,000 to 20,000 digits with planted common factors (seeded)', () => {
    const seed = 20000;
    const rand = seededRandom(seed);
    for (const digits of [5000, 9000, 14000, 20000]) {
      const g = randomBigInt(rand, digits >> 3);
      const a = randomBigInt(rand, digits) * g;
      const b = -randomBigInt(rand, digits) * g;
      if (gcd(a, b) !== gcdEuclid(a, b)) throw new Error(`seed ${seed}, ${digits} digits: gcd(${a}, ${b})`);
    }
  });
  it('divides both and is the largest such (property, Fibonacci-like worst cases included)', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 60n), max: 10n ** 60n }), fc.bigInt({ min: -(10n ** 60n), max: 10n ** 60n }), fc.bigInt({ min: 1n, max: 10n ** 40n }), (a, b, k) => {
        const g = gcd(a * k, b * k);
        expect(g).toBe(gcdEuclid(a * k, b * k));
        if (g !== 0n) {
          expect((a * k) % g).toBe(0n);
          expect(gcd((a * k) / g, (b * k) / g)).toBe(1n);
        }
      }),
    );
    let [f0, f1] = [0n, 1n];
    for (let i = 0; i < 3000; i++) [f0, f1] = [f1, f0 + f1];
    expect(gcd(f1, f0)).toBe(1n);
    expect(gcd(f1 * 12345n, f0 * 12345n)).toBe(12345n);
  });
});
