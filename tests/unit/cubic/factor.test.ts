// Components of cubics over Q: exact division by lines, the factorisation multiplies back, and each
// configuration is named (seeded samples of src/cubic tests; property tests with fast-check).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { seededRandom } from '../../reference/oracles.ts';
import { formMul, formPrimitive, formEquals, type Form } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formToText } from '../../../src/poly/print.ts';
import { cubicComponents } from '../../../src/cubic/factor.ts';
import { formDivideLinear, formLinearFactors, lineForm } from '../../../src/cubic/linear-factors.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';
import { gcd as gcdBig } from '../../../src/exact/gcd.ts';
import { SAMPLE_FAMILIES, singularSample } from './singular-samples.ts';

const F = (t: string) => formParse(t).form;
const small = fc.bigInt({ min: -9n, max: 9n });
const arbLine = fc.tuple(small, small, small).filter(([a, b, c]) => a !== 0n || b !== 0n || c !== 0n);
const arbConic = fc.array(small, { minLength: 6, maxLength: 6 }).filter((c) => c.some((x) => x !== 0n));

function multiplyBack(parts: readonly { form: Form; multiplicity: number }[]): Form {
  let acc: Form = { degree: 0, coeffs: [1n] };
  for (const p of parts) for (let k = 0; k < p.multiplicity; k++) acc = formMul(acc, p.form);
  return formPrimitive(acc);
}

describe('exact division by a line', () => {
  it('(line · conic) / line = conic, and a line not dividing gives null (fast-check)', () => {
    fc.assert(
      fc.property(arbLine, arbConic, arbLine, (l, q, m) => {
        const conic: Form = { degree: 2, coeffs: q };
        const prod = formMul(lineForm(l), conic);
        const quo = formDivideLinear(prod, l);
        const g = l.reduce((a, b) => (b === 0n ? a : a === 0n ? (b < 0n ? -b : b) : gcdBig(a, b)), 0n);
        expect(quo && formEquals(formMul(lineForm(l.map((x) => x / g)), quo), prod)).toBe(true);
        const r = formDivideLinear(prod, m);
        const gm = m.reduce((a, b) => (b === 0n ? a : a === 0n ? (b < 0n ? -b : b) : gcdBig(a, b)), 0n);
        if (r) expect(formEquals(formMul(lineForm(m.map((x) => x / gm)), r), prod)).toBe(true);
      }),
    );
  });
  it('finds every rational line of a product of lines and a conic, with multiplicity (fast-check)', () => {
    fc.assert(
      fc.property(arbLine, arbLine, arbConic, (l, m, q) => {
        const f = formMul(formMul(lineForm(l), lineForm(m)), { degree: 2, coeffs: q });
        const { lines, rest } = formLinearFactors(f);
        const back = multiplyBack([...lines.map((x) => ({ form: lineForm(x.line), multiplicity: x.multiplicity })), { form: rest, multiplicity: 1 }]);
        expect(formEquals(back, formPrimitive(f))).toBe(true);
        expect(lines.reduce((s, x) => s + x.multiplicity, 0)).toBeGreaterThanOrEqual(2);
        expect(formLinearFactors(rest).lines.length).toBe(0);
      }),
    );
  });
});

describe('cubic components', () => {
  it('multiply back to the cubic and name the configuration on seeded samples (seed 99)', () => {
    const rand = seededRandom(99);
    for (let n = 0; n < SAMPLE_FAMILIES * 6; n++) {
      const s = singularSample(rand, n);
      const c = cubicComponents(s.curve);
      const ctx = `seed 99, sample ${n} (${s.family}): ${formToText(s.curve)}`;
      expect(c.shape, ctx).toBe(s.shape);
      expect(formEquals(multiplyBack(c.components), s.curve), ctx).toBe(true);
      expect(c.reducible, ctx).toBe(!['irreducible', 'three conjugate concurrent lines', 'three conjugate lines'].includes(s.shape));
    }
  });
  it('random line × conic is reducible and multiplies back (fast-check)', () => {
    fc.assert(
      fc.property(arbLine, arbConic, (l, q) => {
        const f = formMul(lineForm(l), { degree: 2, coeffs: q });
        const c = cubicComponents(f);
        expect(c.reducible).toBe(true);
        expect(formEquals(multiplyBack(c.components), formPrimitive(f))).toBe(true);
      }),
    );
  });
  it('the norm form of X + αY + α²Z (α³ = 2) is irreducible over Q and three lines over Q̄ (common practice)', () => {
    const c = cubicComponents(F('X^3 + 2Y^3 + 4Z^3 - 6XYZ'));
    expect([c.reducible, c.shape]).toEqual([false, 'three conjugate lines']);
  });
  it('smooth and nodal cubics of our own are irreducible', () => {
    expect(cubicComponents(F('y^2 + xy = x^3 - 5x + 8')).shape).toBe('irreducible');
    expect(cubicComponents(F('y^2 = x^3 + 6x^2')).shape).toBe('irreducible');
  });
  it('a conic and a line tangent to it; three concurrent lines with a conjugate pair', () => {
    expect(cubicComponents(F('(y - 3)(x^2 + y^2 - 9) = 0')).shape).toBe('line and tangent conic');
    expect(cubicComponents(F('(x - 2y)(x^2 - 7y^2) = 0')).shape).toBe('three concurrent lines');
  });
  it('refuses the zero form and other degrees', () => {
    expect(() => cubicComponents({ degree: 3, coeffs: new Array(10).fill(0n) })).toThrow(InvalidInput);
    expect(() => cubicComponents(F('x^2 + y^2 = 1'))).toThrow(InvalidInput);
  });
});
