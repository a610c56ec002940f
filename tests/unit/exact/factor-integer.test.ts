// Integer factoring for minimal models: products of known primes come back whole (common practice:
// unique factorisation), perfect powers and large prime cofactors are handled, and the result is checked
// against PARI/GP's factor on seeded random numbers.
import { describe, expect, it } from 'vitest';
import { gp, randomBigInt, seededRandom } from '../../reference/oracles.ts';
import { integerFactor, integerIsProbablePrime, integerRoot, integerValuation } from '../../../src/exact/factor-integer.ts';

const product = (f: { prime: bigint; exponent: number }[]) => f.reduce((acc, { prime, exponent }) => acc * prime ** BigInt(exponent), 1n);

describe('integerFactor', () => {
  it('splits products of small, medium and large primes', () => {
    const p1 = 1000003n;
    const p2 = 998244353n;
    const p3 = 2305843009213693951n; // 2^61 − 1, a Mersenne prime (common practice)
    const n = 2n ** 5n * 3n ** 7n * p1 ** 4n * p2 * p3;
    const f = integerFactor(n);
    expect(f.complete).toBe(true);
    expect(f.factors).toEqual([
      { prime: 2n, exponent: 5 }, { prime: 3n, exponent: 7 }, { prime: p1, exponent: 4 }, { prime: p2, exponent: 1 }, { prime: p3, exponent: 1 },
    ]);
    expect(integerFactor(-(p2 * p2 * p2)).factors).toEqual([{ prime: p2, exponent: 3 }]);
    expect(integerFactor(1n).factors).toEqual([]);
  });
  it('primality, roots and valuations', () => {
    expect(integerIsProbablePrime(2305843009213693951n)).toBe(true);
    expect(integerIsProbablePrime(3215031751n)).toBe(false); // strong pseudoprime to bases 2, 3, 5, 7 (common practice)
    expect(integerRoot(10n ** 40n + 5n, 4)).toBe(10n ** 10n);
    expect(integerValuation(2n ** 9n * 7n, 2n)).toBe(9);
  });
  it('agrees with PARI/GP factor on 40 seeded random numbers of up to 30 digits', () => {
    const seed = 4601;
    const rand = seededRandom(seed);
    const ns = Array.from({ length: 40 }, () => {
      let n = randomBigInt(rand, 30);
      if (n < 0n) n = -n;
      return n < 2n ? 2n : n;
    });
    const out = gp(ns.map((n) => `f=factor(${n}); print(vector(#f~, i, [f[i,1], f[i,2]]))`).join('\n'));
    ns.forEach((n, k) => {
      const f = integerFactor(n);
      expect(f.complete, `seed ${seed}, n = ${n}`).toBe(true);
      expect(product(f.factors)).toBe(n);
      expect(`[${f.factors.map((x) => `[${x.prime}, ${x.exponent}]`).join(', ')}]`, `seed ${seed}, n = ${n}`).toBe(out[k]);
    });
  });
});
