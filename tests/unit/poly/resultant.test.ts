import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formCoefficientsIn, formResultant, otherVariables, type Variable } from '../../../src/poly/resultant.ts';
import { binaryEval, binaryIsZero } from '../../../src/poly/binary.ts';
import { formMul, formEval, monomialCount, type Form } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';

const arbForm = (min: number, max: number): fc.Arbitrary<Form> =>
  fc.integer({ min, max }).chain((d) =>
    fc
      .array(fc.bigInt({ min: -20n, max: 20n }), { minLength: monomialCount(d), maxLength: monomialCount(d) })
      .map((coeffs) => ({ degree: d, coeffs })),
  );
const arbVar = fc.constantFrom<Variable>(0, 1, 2);
const arbPoint = fc.tuple(fc.bigInt({ min: -5n, max: 5n }), fc.bigInt({ min: -5n, max: 5n }), fc.bigInt({ min: -5n, max: 5n }));

describe('formResultant (Fulton, Algebraic Curves §1.6: Res vanishes at projections of common zeros)', () => {
  it('has degree d1·d2 and vanishes at the projection of a common point', () => {
    fc.assert(
      fc.property(arbForm(1, 3), arbForm(1, 3), arbVar, arbPoint, (f0, g0, v, p) => {
        fc.pre(p.some((c) => c !== 0n));
        // F·ℓ1 and G·ℓ2 with two lines through p share the point p (and ℓ1 ∩ ℓ2 is p itself).
        const l1: Form = { degree: 1, coeffs: [p[1], -p[0], 0n] };
        const l2: Form = { degree: 1, coeffs: [p[2], 0n, -p[0]] };
        const l3: Form = { degree: 1, coeffs: [0n, p[2], -p[1]] };
        const lines = [l1, l2, l3].filter((l) => l.coeffs.some((c) => c !== 0n));
        fc.pre(lines.length >= 2);
        const f = formMul(f0, lines[0]);
        const g = formMul(g0, lines[1]);
        const r = formResultant(f, g, v);
        const [a, b] = otherVariables(v);
        expect(r.length).toBe(f.degree * g.degree + 1);
        expect(binaryEval(r, p[a], p[b])).toBe(0n);
      }),
      { numRuns: 40 },
    );
  });
  it('vanishes exactly at the projections of the four meets of two conics (our own pair)', () => {
    // x^2 + y^2 = 25 and x y = 12 meet at (3,4), (4,3), (-3,-4), (-4,-3).
    const f = formParse('x^2 + y^2 = 25').form;
    const g = formParse('xy = 12').form;
    const r = formResultant(f, g, 1); // eliminate Y: a quartic in X, Z
    expect(r.length).toBe(5);
    for (const x of [3n, 4n, -3n, -4n]) expect(binaryEval(r, x, 1n)).toBe(0n);
    expect(binaryEval(r, 1n, 1n)).not.toBe(0n);
    // (x^2 - 9)(x^2 - 16) up to a constant: x^4 - 25 x^2 + 144.
    const c = r[0];
    expect(r).toEqual([c, 0n, -25n * c, 0n, 144n * c]);
  });
  it('is the product formula for a line: Res_Y(F, Y - mX) = ± F(X, mX, Z) (common practice)', () => {
    fc.assert(
      fc.property(arbForm(1, 4), fc.bigInt({ min: -6n, max: 6n }), fc.bigInt({ min: -9n, max: 9n }), fc.bigInt({ min: -9n, max: 9n }), (f, m, x, z) => {
        const line: Form = { degree: 1, coeffs: [-m, 1n, 0n] };
        const r = formResultant(f, line, 1);
        const direct = formEval(f, [x, m * x, z]);
        const value = binaryEval(r, x, z);
        expect(value === direct || value === -direct).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
  it('splits a form into coefficients of powers of v', () => {
    const f = formParse('X^2 Y + 3 Y^2 Z - Z^3 + X Z^2').form;
    // In Z: Z^0: X^2Y, Z^1: 3Y^2, Z^2: X, Z^3: -1.
    expect(formCoefficientsIn(f, 2)).toEqual([[0n, 1n, 0n, 0n], [0n, 0n, 3n], [1n, 0n], [-1n]]);
    expect(otherVariables(0)).toEqual([1, 2]);
    expect(() => formResultant(f, f, 3 as Variable)).toThrow(/variable to eliminate/);
  });
});
