import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formOnLine, formOnParametrisation } from '../../../src/poly/substitute.ts';
import { binaryEval } from '../../../src/poly/binary.ts';
import { formEval, monomialCount, type Form } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';

const arbInt = fc.bigInt({ min: -30n, max: 30n });
const arbTriple = fc.tuple(arbInt, arbInt, arbInt);
const arbForm: fc.Arbitrary<Form> = fc.integer({ min: 0, max: 6 }).chain((d) =>
  fc
    .array(fc.bigInt({ min: -(10n ** 6n), max: 10n ** 6n }), { minLength: monomialCount(d), maxLength: monomialCount(d) })
    .map((coeffs) => ({ degree: d, coeffs })),
);

describe('formOnLine: F(sP + tQ) (definition of substitution: common practice)', () => {
  it('evaluates to F at sP + tQ for every (s, t)', () => {
    fc.assert(
      fc.property(arbForm, arbTriple, arbTriple, arbInt, arbInt, (f, p, q, s, t) => {
        const b = formOnLine(f, p, q);
        expect(b.length).toBe(f.degree + 1);
        const pt = [s * p[0] + t * q[0], s * p[1] + t * q[1], s * p[2] + t * q[2]] as const;
        expect(binaryEval(b, s, t)).toBe(formEval(f, pt));
        expect(b[0]).toBe(formEval(f, p));
        expect(b[f.degree]).toBe(formEval(f, q));
      }),
    );
  });
  it('a line through a node of a cubic meets it doubly there', () => {
    // y^2 = x^2 (x + 3): a node at the origin (our own example).
    const f = formParse('y^2 = x^3 + 3x^2').form;
    const b = formOnLine(f, [0n, 0n, 1n], [1n, 2n, 0n]);
    expect(b.slice(0, 2)).toEqual([0n, 0n]);
  });
  it('the rational parametrisation of a nodal cubic lies on it', () => {
    // y^2 = x^2(x+3): x = u^2 - 3, y = u(u^2 - 3) with u = s/t, homogenised to degree 3.
    const f = formParse('y^2 = x^3 + 3x^2').form;
    const x = [0n, 1n, 0n, -3n]; // s^2 t - 3 t^3
    const y = [1n, 0n, -3n, 0n]; // s^3 - 3 s t^2
    const z = [0n, 0n, 0n, 1n]; // t^3
    expect(formOnParametrisation(f, x, y, z).every((c) => c === 0n)).toBe(true);
    expect(() => formOnParametrisation(f, x, y, [1n])).toThrow(/one degree/);
  });
});
