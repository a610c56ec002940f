// Simplest rationals in an interval, checked against a brute-force search by denominator (the definition).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ratSimplestBetween, ratSnap } from '../../../src/construct/snap.ts';
import { rat, ratCmp, ratToString, type Rational } from '../../../src/exact/rational.ts';

function bruteSimplest(lo: Rational, hi: Rational): Rational {
  for (let d = 1n; ; d++) {
    // least |numerator| first: try n with n/d in [lo, hi], smallest |n|
    const nLo = -((-lo.num * d) / lo.den) + (((-lo.num * d) % lo.den) !== 0n && lo.num > 0n ? 1n : 0n);
    const cands: bigint[] = [];
    for (let n = nLo - 2n; n * hi.den <= hi.num * d; n++) if (ratCmp(rat(n, d), lo) >= 0 && ratCmp(rat(n, d), hi) <= 0) cands.push(n);
    if (cands.length) {
      cands.sort((a, b) => (a < 0n ? -a : a) < (b < 0n ? -b : b) ? -1 : 1);
      return rat(cands[0], d);
    }
  }
}

describe('ratSimplestBetween', () => {
  it('table', () => {
    // Hardy & Wright §10.15 style examples, worked by hand (common practice).
    expect(ratToString(ratSimplestBetween(rat(3, 10), rat(4, 10)))).toBe('1/3');
    expect(ratToString(ratSimplestBetween(rat(-4, 10), rat(-3, 10)))).toBe('-1/3');
    expect(ratToString(ratSimplestBetween(rat(-1, 2), rat(1, 3)))).toBe('0');
    expect(ratToString(ratSimplestBetween(rat(314, 100), rat(3143, 1000)))).toBe('22/7');
    expect(ratToString(ratSimplestBetween(rat(5, 2), rat(5, 2)))).toBe('5/2');
    expect(ratToString(ratSnap(0.6666, 0.001))).toBe('2/3');
  });
  it('agrees with the definition on random intervals (seeded)', () => {
    const seed = 20261201;
    fc.assert(
      fc.property(fc.integer({ min: -300, max: 300 }), fc.integer({ min: 1, max: 60 }), fc.integer({ min: 0, max: 40 }), (n, d, w) => {
        const lo = rat(n, d);
        const hi = rat(n * 7 + w, d * 7);
        const got = ratSimplestBetween(lo, hi);
        const want = bruteSimplest(lo, hi);
        if (got.den !== want.den) throw new Error(`seed ${seed}: [${ratToString(lo)}, ${ratToString(hi)}] gave ${ratToString(got)}, want ${ratToString(want)}`);
        expect(ratCmp(got, lo) >= 0 && ratCmp(got, hi) <= 0).toBe(true);
      }),
      { seed, numRuns: 300 },
    );
  });
});
