// Group axioms on random smooth cubics through random points, with random (mostly non-flex) base points
// (property tests: the group law of Silverman–Tate, Rational Points on Elliptic Curves, I.2, associativity
// being Cayley–Bacharach for any base point).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { seededRandom } from '../../reference/oracles.ts';
import { randomPoint, randomSmoothCubicThrough } from './group-samples.ts';
import {
  groupAdd, groupAddIn, groupMake, groupMultiple, groupMultipleIn, groupNegate, groupNegateIn, groupRebase,
} from '../../../src/cubic/group.ts';
import { formEval } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { InvalidInput, NotOnCurve } from '../../../src/exact/errors.ts';

// A curve through four random small points O, P, Q, R (seeded by fast-check's integer).
function sample(seed: number) {
  const rand = seededRandom(seed);
  const pts = [randomPoint(rand, 1), randomPoint(rand, 1), randomPoint(rand, 1), randomPoint(rand, 1)];
  const f = randomSmoothCubicThrough(rand, pts, 1);
  return { f, o: pts[0], p: pts[1], q: pts[2], r: pts[3] };
}

describe('group law with any base point', () => {
  it('identity, inverse, commutativity, associativity', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 - 1 }), (seed) => {
        const { f, o, p, q, r } = sample(seed);
        const g = groupMake(f, o);
        const info = `seed ${seed}: f = ${f.coeffs.join(',')}, O = ${o}, P = ${p}, Q = ${q}, R = ${r}`;
        expect(groupAddIn(g, p, o), info).toEqual(p);
        expect(groupAddIn(g, p, groupNegateIn(g, p)), info).toEqual(o);
        expect(groupAddIn(g, p, q), info).toEqual(groupAddIn(g, q, p));
        const left = groupAddIn(g, groupAddIn(g, p, q), r);
        const right = groupAddIn(g, p, groupAddIn(g, q, r));
        expect(left, info).toEqual(right);
        expect(formEval(f, left), info).toBe(0n);
      }),
      { numRuns: 60, seed: 20261201 },
    );
  });

  it('multiples agree with repeated addition, negative multiples with negation', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 - 1 }), fc.integer({ min: -9, max: 9 }), (seed, n) => {
        const { f, o, p } = sample(seed);
        const g = groupMake(f, o);
        let acc = o;
        for (let k = 0; k < Math.abs(n); k++) acc = groupAddIn(g, acc, p);
        if (n < 0) acc = groupNegateIn(g, acc);
        expect(groupMultipleIn(g, p, BigInt(n)), `seed ${seed}, n ${n}`).toEqual(acc);
      }),
      { numRuns: 40, seed: 20261202 },
    );
  });

  it('(m + n)P = mP + nP and m(nP) = (mn)P on one curve', () => {
    const { f, o, p } = sample(77);
    const g = groupMake(f, o);
    for (const [m, n] of [[3n, 5n], [7n, -2n], [-4n, -6n]]) {
      expect(groupMultipleIn(g, p, m + n)).toEqual(groupAddIn(g, groupMultipleIn(g, p, m), groupMultipleIn(g, p, n)));
      expect(groupMultipleIn(g, groupMultipleIn(g, p, n), m)).toEqual(groupMultipleIn(g, p, m * n));
    }
  });

  it('changing the base point is a homomorphism: φ(P + Q) = φ(P) +₂ φ(Q), φ(O) = O2', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 - 1 }), (seed) => {
        const { f, o, p, q, r: o2 } = sample(seed);
        const phi = (x: readonly [bigint, bigint, bigint]) => groupRebase(f, o, o2, x);
        expect(phi(o)).toEqual(o2);
        expect(phi(groupAdd(f, o, p, q)), `seed ${seed}`).toEqual(groupAdd(f, o2, phi(p), phi(q)));
      }),
      { numRuns: 25, seed: 20261203 },
    );
  });

  it('exported functions check their input and name it', () => {
    const f = formParse('y^2 + x y = x^3 - 2x + 5').form;
    const o: [bigint, bigint, bigint] = [0n, 1n, 0n];
    expect(() => groupAdd(f, o, [1n, 1n, 1n], o)).toThrow(NotOnCurve);
    expect(() => groupNegate(f, [1n, 1n, 1n], o)).toThrow(NotOnCurve);
    expect(() => groupMultiple(f, o, o, 10001)).toThrow(InvalidInput);
    expect(groupMultiple(f, o, o, -10000)).toEqual(o);
  });
});
