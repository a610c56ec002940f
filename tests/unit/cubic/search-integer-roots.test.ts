import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { integerRootsInRange } from '../../../src/cubic/integer-roots.ts';

function evalAt(p: bigint[], y: bigint): bigint {
  let s = 0n;
  for (let i = p.length - 1; i >= 0; i--) s = s * y + p[i];
  return s;
}

describe('integerRootsInRange (exact monotone bisection)', () => {
  it('finds the roots of products of linear factors (common practice: scan comparison)', () => {
    // (y - 3)(y + 5)(2y - 7): integer roots 3 and -5 only
    const p = [105n, -44n, -3n, 2n];
    expect(integerRootsInRange(p, -100n, 100n)).toEqual([-5n, 3n]);
    expect(integerRootsInRange(p, 0n, 100n)).toEqual([3n]);
    expect(integerRootsInRange([0n, 0n, 0n, 1n], -3n, 3n)).toEqual([0n]); // y^3, triple root
    expect(integerRootsInRange([-4n, 0n, 1n], -9n, 9n)).toEqual([-2n, 2n]);
    expect(integerRootsInRange([6n, 3n], -9n, 9n)).toEqual([-2n]);
    expect(integerRootsInRange([5n], -9n, 9n)).toEqual([]);
  });
  it('agrees with a direct scan on random cubics with planted roots (property, seed 6)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.bigInt(-40n, 40n), { minLength: 1, maxLength: 3 }),
        fc.bigInt(-9n, 9n),
        fc.bigInt(-3000n, 3000n),
        (planted, lead, shift) => {
          fc.pre(lead !== 0n);
          // lead * prod (y - r) + shift * [planted.length < 3 ? y^0 : 0]
          let p: bigint[] = [lead];
          for (const r of planted) {
            const q = new Array<bigint>(p.length + 1).fill(0n);
            for (let i = 0; i < p.length; i++) {
              q[i + 1] += p[i];
              q[i] -= r * p[i];
            }
            p = q;
          }
          if (shift % 7n === 0n) p[0] += shift;
          const want: bigint[] = [];
          for (let y = -60n; y <= 60n; y++) if (evalAt(p, y) === 0n) want.push(y);
          expect(integerRootsInRange(p, -60n, 60n)).toEqual(want);
        },
      ),
      { seed: 6, numRuns: 400 },
    );
  });
  it('refuses the zero polynomial', () => {
    expect(() => integerRootsInRange([0n, 0n], -1n, 1n)).toThrow(/zero polynomial/);
  });
});
