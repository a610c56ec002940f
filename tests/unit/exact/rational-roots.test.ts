// Complete rational roots: products of known linear factors with an irreducible rest must give back exactly
// the factors (construction: common practice), including 100-digit coefficients and clustered roots.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  ratLastConvergent, upolyFromRationalRoots, upolyRationalRootBound, upolyRationalRoots,
} from '../../../src/exact/rational-roots.ts';
import { upolyMul, upoly } from '../../../src/exact/upoly.ts';
import { rat, ratToString, type Rational } from '../../../src/exact/rational.ts';
import { seededRandom, randomBigInt } from '../../reference/oracles.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

function key(r: Rational) {
  return ratToString(r);
}

function expected(rs: { root: Rational; multiplicity: number }[]) {
  const m = new Map<string, { root: Rational; multiplicity: number }>();
  for (const r of rs) {
    const k = key(r.root);
    const old = m.get(k);
    m.set(k, { root: r.root, multiplicity: (old?.multiplicity ?? 0) + r.multiplicity });
  }
  return [...m.values()].sort((a, b) => (a.root.num * b.root.den < b.root.num * a.root.den ? -1 : 1));
}

describe('upolyRationalRoots', () => {
  it('small table', () => {
    expect(upolyRationalRoots([-2n, 0n, 1n])).toEqual([]);
    expect(upolyRationalRoots([0n, 0n, 1n])).toEqual([{ root: rat(0n), multiplicity: 2 }]);
    expect(upolyRationalRoots([6n, -5n, 1n]).map((r) => key(r.root))).toEqual(['2', '3']);
    expect(upolyRationalRoots([5n])).toEqual([]);
    expect(() => upolyRationalRoots([])).toThrow(InvalidInput);
  });
  it('clustered roots 1000/1001, 1001/1002 with multiplicity and an irreducible quadratic', () => {
    const rs = [
      { root: rat(1000n, 1001n), multiplicity: 2 },
      { root: rat(1001n, 1002n), multiplicity: 1 },
      { root: rat(-7n, 3n), multiplicity: 3 },
    ];
    const p = upolyMul(upolyFromRationalRoots(rs), [-3n, 1n, 5n]);
    expect(upolyRationalRoots(p)).toEqual(expected(rs));
  });
  it('random products with an irreducible rest of large coefficients (seeded)', () => {
    const seed = 20261201;
    const rand = seededRandom(seed);
    for (let t = 0; t < 40; t++) {
      const n = Math.floor(rand() * 4);
      const rs = Array.from({ length: n }, () => ({
        root: rat(randomBigInt(rand, 6), BigInt(1 + Math.floor(rand() * 999))),
        multiplicity: 1 + Math.floor(rand() * 2),
      }));
      // x^2 + 2b·x + 2(2|b| + 1) is Eisenstein at 2, hence irreducible over Q (common practice)
      const big = randomBigInt(rand, 100);
      const rest = upoly([2n * (2n * (big < 0n ? -big : big) + 1n), 2n * big, 1n]);
      const p = upolyMul(upolyFromRationalRoots(rs), rest);
      const got = upolyRationalRoots(p);
      const want = expected(rs);
      if (JSON.stringify(got.map((r) => [key(r.root), r.multiplicity])) !== JSON.stringify(want.map((r) => [key(r.root), r.multiplicity]))) {
        throw new Error(`seed ${seed}, case ${t}: p = [${p.join(', ')}]`);
      }
    }
  });
  it('finds every root of products of random linear factors (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.bigInt({ min: -(10n ** 12n), max: 10n ** 12n }), fc.bigInt({ min: 1n, max: 10n ** 9n }), fc.integer({ min: 1, max: 2 })), { minLength: 1, maxLength: 5 }),
        (xs) => {
          const rs = xs.map(([n, d, k]) => ({ root: rat(n, d), multiplicity: k }));
          const got = upolyRationalRoots(upolyFromRationalRoots(rs));
          expect(got).toEqual(expected(rs));
        },
      ),
      { numRuns: 60 },
    );
  });
  it('a close neighbour that is also a root is not taken for this root (regression: 16/719 and 16000017/719000719)', () => {
    const rs = [
      { root: rat(16n, 719n), multiplicity: 1 },
      { root: rat(16000017n, 719000719n), multiplicity: 1 },
    ];
    const p = upolyMul(upolyFromRationalRoots(rs), [2n, 0n, 1n]);
    expect(upolyRationalRoots(p)).toEqual(expected(rs));
    expect(upolyRationalRoots(p, { floatCandidates: false })).toEqual(expected(rs));
    const q = upolyMul(upolyFromRationalRoots([{ root: rat(16n, 719n), multiplicity: 2 }, rs[1]]), [3n, 0n, 1n]);
    expect(upolyRationalRoots(q, { floatCandidates: false })).toEqual(expected([{ root: rat(16n, 719n), multiplicity: 2 }, rs[1]]));
  });
  it('roots beyond the double range, tiny and huge (found by the exact steps)', () => {
    const tiny = upolyMul([-1n, 10n ** 330n], [1n, 0n, 1n]);
    expect(upolyRationalRoots(tiny)).toEqual([{ root: rat(1n, 10n ** 330n), multiplicity: 1 }]);
    const huge = upolyMul([-(10n ** 330n), 3n], [2n, 0n, 1n]);
    expect(upolyRationalRoots(huge)).toEqual([{ root: rat(10n ** 330n, 3n), multiplicity: 1 }]);
  });
  it('the modular bound never undercounts', () => {
    const p = upolyFromRationalRoots([1n, 2n, 3n].map((n) => ({ root: rat(n, 5n), multiplicity: 1 })));
    expect(upolyRationalRootBound(upolyMul(p, [-2n, 0n, 1n]))).toBeGreaterThanOrEqual(3);
    expect(upolyRationalRootBound([-2n, 0n, 1n])).toBe(0);
  });
  it('last convergent with bounded denominator (convergents 3, 22/7, 333/106, 355/113 of pi: common practice, from memory)', () => {
    // 3.14159265358979 ≈ 314159265358979/10^14; convergents 3, 22/7, 333/106, 355/113, ...
    expect(ratLastConvergent(314159265358979n, 10n ** 14n, 112n)).toEqual(rat(333n, 106n));
    expect(ratLastConvergent(314159265358979n, 10n ** 14n, 113n)).toEqual(rat(355n, 113n));
    expect(ratLastConvergent(-7n, 2n, 1n)).toEqual(rat(-4n));
  });
});
