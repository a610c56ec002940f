// Real root isolation and refinement: intervals disjoint, in order, each holding exactly one sign change.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  upolyRealRootCount, upolyRealRootIntervals, upolyRefineRoot,
} from '../../../src/exact/root-isolation.ts';
import { upolyFromRationalRoots } from '../../../src/exact/rational-roots.ts';
import { upolyMul, upolySignAt, upolySquarefreePart, upolyPow, upoly } from '../../../src/exact/upoly.ts';
import { rat, ratCmp, ratSub, ratToNumber } from '../../../src/exact/rational.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

const roots = fc.array(fc.tuple(fc.bigInt({ min: -50n, max: 50n }), fc.bigInt({ min: 1n, max: 40n }), fc.integer({ min: 1, max: 3 })), { minLength: 1, maxLength: 5 });

function checkIntervals(p: bigint[]) {
  const ivs = upolyRealRootIntervals(p);
  const f = upolySquarefreePart(p);
  for (let i = 0; i < ivs.length; i++) {
    const { lo, hi } = ivs[i];
    expect(ratCmp(lo, hi)).toBeLessThanOrEqual(0);
    if (i > 0) expect(ratCmp(ivs[i - 1].hi, lo)).toBeLessThanOrEqual(0);
    if (ratCmp(lo, hi) === 0) expect(upolySignAt(f, lo)).toBe(0);
    else {
      const a = upolySignAt(f, lo);
      const b = upolySignAt(f, hi);
      expect(a * b).toBe(-1);
    }
  }
  return ivs;
}

describe('upolyRealRootIntervals', () => {
  it('isolates x^2 - 2 (roots ±sqrt 2)', () => {
    const ivs = checkIntervals([-2n, 0n, 1n]);
    expect(ivs.length).toBe(2);
    expect(ratToNumber(ivs[0].hi)).toBeLessThanOrEqual(0);
    expect(ratToNumber(ivs[1].lo)).toBeGreaterThanOrEqual(0);
  });
  it('finds exact dyadic roots as points and clears neighbouring ends', () => {
    const p = upolyMul(upolyFromRationalRoots([{ root: rat(1n, 2n), multiplicity: 1 }, { root: rat(0n), multiplicity: 2 }]), [-1n, 0n, 0n, 1n]);
    const ivs = checkIntervals(p);
    expect(ivs.length).toBe(3);
  });
  it('close roots 1000/1001 and 1001/1002 are separated', () => {
    const p = upolyFromRationalRoots([{ root: rat(1000n, 1001n), multiplicity: 1 }, { root: rat(1001n, 1002n), multiplicity: 1 }]);
    expect(checkIntervals(p).length).toBe(2);
  });
  it('counts and orders random products of linear factors and an irreducible quadratic', () => {
    fc.assert(
      fc.property(roots, fc.bigInt({ min: 1n, max: 30n }), (rs, c) => {
        const distinct = new Set(rs.map(([n, d]) => `${rat(n, d).num}/${rat(n, d).den}`));
        const lin = upolyFromRationalRoots(rs.map(([n, d, k]) => ({ root: rat(n, d), multiplicity: k })));
        const p = upolyMul(lin, [c, 0n, 1n]); // x^2 + c has no real root
        const ivs = checkIntervals(p);
        expect(upolyRealRootCount(p)).toBe(distinct.size);
        expect(ivs.length).toBe(distinct.size);
      }),
    );
  });
  it('refuses the zero polynomial; constants have no roots', () => {
    expect(() => upolyRealRootIntervals([])).toThrow(InvalidInput);
    expect(upolyRealRootIntervals([7n])).toEqual([]);
  });
  it('huge and tiny roots', () => {
    const big = 10n ** 80n;
    const p = upoly([-big, 0n, 1n]); // ±10^40
    expect(checkIntervals(p).length).toBe(2);
    const q = upoly([-1n, 0n, big]); // ±10^-40
    expect(checkIntervals(q).length).toBe(2);
  });
});

describe('upolyRefineRoot', () => {
  it('refines sqrt 2 to 10^-100 and keeps the bracket', () => {
    const p = [-2n, 0n, 1n];
    const iv = upolyRealRootIntervals(p)[1];
    const w = rat(1n, 10n ** 100n);
    const r = upolyRefineRoot(p, iv, w);
    expect(ratCmp(ratSub(r.hi, r.lo), w)).toBeLessThanOrEqual(0);
    expect(upolySignAt(p, r.lo) * upolySignAt(p, r.hi)).toBe(-1);
    expect(ratCmp(iv.lo, r.lo)).toBeLessThanOrEqual(0);
    expect(ratCmp(r.hi, iv.hi)).toBeLessThanOrEqual(0);
  });
  it('refines a double root (no sign change in p) through the square-free part', () => {
    const p = upolyPow([-3n, 0n, 1n], 2);
    const iv = upolyRealRootIntervals(p)[1];
    const r = upolyRefineRoot(p, iv, rat(1n, 10n ** 20n));
    expect(Math.abs(ratToNumber(r.lo) - Math.sqrt(3))).toBeLessThan(1e-12);
  });
  it('works from non-dyadic ends and lands on a rational root exactly when it can', () => {
    const p = [-1n, 3n]; // root 1/3
    const r = upolyRefineRoot(p, { lo: rat(1n, 7n), hi: rat(5n, 11n) }, rat(1n, 10n ** 30n));
    expect(ratCmp(r.lo, rat(1n, 3n))).toBeLessThan(0);
    expect(ratCmp(r.hi, rat(1n, 3n))).toBeGreaterThan(0);
    const q = [-1n, 4n]; // root 1/4, dyadic
    const s = upolyRefineRoot(q, { lo: rat(0n), hi: rat(1n) }, rat(1n, 1000n));
    expect(ratCmp(s.lo, rat(1n, 4n))).toBe(0);
  });
  it('refuses an interval without a sign change', () => {
    expect(() => upolyRefineRoot([-2n, 0n, 1n], { lo: rat(2n), hi: rat(3n) }, rat(1n, 10n))).toThrow(/sign/);
  });
});

describe('dyadicRat', () => {
  it('is canonical without a gcd (common practice)', async () => {
    const { dyadicRat } = await import('../../../src/exact/root-refine.ts');
    expect(dyadicRat(12n, 4)).toEqual(rat(12n, 16n));
    expect(dyadicRat(-12n, 1)).toEqual(rat(-6n, 1n));
    expect(dyadicRat(0n, 9)).toEqual(rat(0n));
    expect(dyadicRat(7n << 3000n, 3002)).toEqual(rat(7n, 4n));
  });
});
