// The two large-number gcd kernels against each other and against plain Euclid (common practice): GMP's
// mpz_gcd through WebAssembly (src/exact/gcd-gmp.ts, present in Node) and the BigInt Lehmer loop
// (gcdBigInt, the fallback where GMP cannot load synchronously). Seeded random sizes up to 20,000 digits
// and edge cases; the seed and the failing pair are printed on failure.
import { describe, expect, it } from 'vitest';
import { gcd, gcdBigInt, gcdEuclid, gcdLargeKernel } from '../../../src/exact/gcd.ts';
import { gcdGmpKernel } from '../../../src/exact/gcd-gmp.ts';
import { randomBigInt, seededRandom } from '../../reference/oracles.ts';

describe('GMP gcd kernel', () => {
  it('loads synchronously in Node and is the kernel gcd uses above 2^256', () => {
    expect(gcdGmpKernel()).not.toBeNull();
    expect(gcdLargeKernel()).toBe('gmp');
  });

  it('edge cases: 0, ±1, equal, one divides the other, powers of two, negatives, one limb and many', () => {
    const k = gcdGmpKernel()!;
    const big = 10n ** 900n + 98765432123456789n;
    const values = [0n, 1n, -1n, 2n, 2n ** 63n, 2n ** 64n - 1n, 2n ** 64n, 2n ** 64n + 1n, 2n ** 256n, 2n ** 4000n, 3n ** 700n, big, -big, big * 11n, big * big];
    for (const a of values) {
      for (const b of values) {
        const want = gcdEuclid(a, b);
        expect(k(a, b), `gmp gcd(${a}, ${b})`).toBe(want);
        expect(gcd(a, b), `gcd(${a}, ${b})`).toBe(want);
        expect(gcdBigInt(a, b), `gcdBigInt(${a}, ${b})`).toBe(want);
      }
    }
  });

  it('GMP, Lehmer and Euclid agree on seeded sizes from 1 to 20,000 digits, with and without planted factors', () => {
    const seed = 31415;
    const rand = seededRandom(seed);
    const k = gcdGmpKernel()!;
    const sizes = [...Array.from({ length: 150 }, () => 1 + Math.floor(rand() ** 2 * 3000)), 5000, 12000, 20000];
    sizes.forEach((digits, i) => {
      const g = rand() < 0.7 ? randomBigInt(rand, Math.max(1, digits >> 3)) : 1n;
      const a = randomBigInt(rand, digits) * g;
      const b = (rand() < 0.5 ? -1n : 1n) * randomBigInt(rand, Math.max(1, digits - Math.floor(rand() * 40))) * g;
      const want = gcdEuclid(a, b);
      const got = [k(a, b), gcdBigInt(a, b), gcd(a, b)];
      if (got.some((x) => x !== want)) throw new Error(`seed ${seed}, case ${i} (${digits} digits): gcd(${a}, ${b}) = ${want}, kernels gave ${got.join(', ')}`);
    });
  });
});
