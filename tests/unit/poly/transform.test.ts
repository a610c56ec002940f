import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  formTransform, lineTransform, mat3Adjugate, mat3Determinant, pointTransform, unimodularTrial, type Matrix3,
} from '../../../src/poly/transform.ts';
import { formEval, monomialCount, type Form } from '../../../src/poly/form.ts';

const arbInt = fc.bigInt({ min: -9n, max: 9n });
const arbRow = fc.tuple(arbInt, arbInt, arbInt);
const arbMatrix: fc.Arbitrary<Matrix3> = fc.tuple(arbRow, arbRow, arbRow);
const arbForm: fc.Arbitrary<Form> = fc.integer({ min: 0, max: 5 }).chain((d) =>
  fc
    .array(fc.bigInt({ min: -100n, max: 100n }), { minLength: monomialCount(d), maxLength: monomialCount(d) })
    .map((coeffs) => ({ degree: d, coeffs })),
);
const mulVec = (m: Matrix3, p: readonly bigint[]) => m.map((r) => r[0] * p[0] + r[1] * p[1] + r[2] * p[2]) as [bigint, bigint, bigint];

describe('formTransform: G = F∘M (definition of composition: common practice)', () => {
  it('G(P) = F(M·P) for every integer P', () => {
    fc.assert(
      fc.property(arbForm, arbMatrix, arbRow, (f, m, p) => {
        expect(formEval(formTransform(f, m), p)).toBe(formEval(f, mulVec(m, p)));
      }),
    );
  });
  it('composes: (F∘M)∘N = F∘(M·N)', () => {
    fc.assert(
      fc.property(arbForm, arbMatrix, arbMatrix, (f, m, n) => {
        const mn = m.map((r) => [0, 1, 2].map((j) => r[0] * n[0][j] + r[1] * n[1][j] + r[2] * n[2][j])) as unknown as Matrix3;
        expect(formTransform(formTransform(f, m), n).coeffs).toEqual(formTransform(f, mn).coeffs);
      }),
      { numRuns: 50 },
    );
  });
  it('adjugate, points and lines', () => {
    fc.assert(
      fc.property(arbMatrix, arbRow, (m, p) => {
        const a = mat3Adjugate(m);
        const d = mat3Determinant(m);
        const ma = m.map((r) => [0, 1, 2].map((j) => r[0] * a[0][j] + r[1] * a[1][j] + r[2] * a[2][j]));
        expect(ma).toEqual([[d, 0n, 0n], [0n, d, 0n], [0n, 0n, d]]);
        fc.pre(d !== 0n && p.some((c) => c !== 0n));
        // A point P lies on the pulled-back line Mᵀℓ exactly when M·P lies on ℓ.
        const l: [bigint, bigint, bigint] = [1n, -2n, 3n];
        const lp = lineTransform(l, m);
        const mp = mulVec(m, p);
        expect(lp[0] * p[0] + lp[1] * p[1] + lp[2] * p[2] === 0n).toBe(l[0] * mp[0] + l[1] * mp[1] + l[2] * mp[2] === 0n);
        const q = pointTransform(p, m);
        expect(q[0] * mp[1] - q[1] * mp[0]).toBe(0n);
      }),
    );
  });
  it('trial matrices are unimodular and distinct', () => {
    const seen = new Set<string>();
    for (let k = 0; k < 30; k++) {
      const m = unimodularTrial(k);
      expect(mat3Determinant(m)).toBe(1n);
      seen.add(JSON.stringify(m, (_k, v) => (typeof v === 'bigint' ? v.toString() : v)));
    }
    expect(seen.size).toBe(30);
    expect(() => pointTransform([1n, 0n, 0n], [[0n, 0n, 0n], [0n, 0n, 0n], [0n, 0n, 0n]])).toThrow(/singular/);
  });
});
