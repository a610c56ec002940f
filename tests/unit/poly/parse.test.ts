import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formParse, MAX_FORM_DEGREE } from '../../../src/poly/parse.ts';
import { formToLatex, formToText } from '../../../src/poly/print.ts';
import { formCoeff, formEquals, formPrimitive, monomialCount, monomials, type Form } from '../../../src/poly/form.ts';
import { ParseError } from '../../../src/exact/errors.ts';
import { pointParse } from '../../../src/plane/parse-point.ts';

const coeffsOf = (text: string) => formParse(text).form.coeffs.map(String).join(' ');

describe('formParse: accepted notation', () => {
  it('rational and decimal coefficients give the primitive integer form (DESIGN.md exactness model)', () => {
    const a = formParse('y^2 = x^3 - x/4');
    const b = formParse('4y^2 = 4x^3 - x');
    const c = formParse('y^2 = x^3 - 0.25x');
    expect(formEquals(a.form, b.form)).toBe(true);
    expect(formEquals(a.form, c.form)).toBe(true);
    expect(a.homogeneous).toBe(false);
    // 4X^3 - XZ^2 - 4Y^2Z: first coefficient (X^3) positive.
    expect(formCoeff(a.form, 3, 0)).toBe(4n);
    expect(formCoeff(a.form, 1, 0)).toBe(-1n);
    expect(formCoeff(a.form, 0, 2)).toBe(-4n);
  });
  it('implicit multiplication, powers, parentheses, unary minus, ** and Unicode signs', () => {
    expect(coeffsOf('3xy^2 - x')).toBe(coeffsOf('3*x*y**2 - x'));
    expect(coeffsOf('2(x+1)^2 = y')).toBe(coeffsOf('2x^2 + 4x + 2 - y'));
    expect(coeffsOf('x y + (x-1)(x+2)')).toBe(coeffsOf('x*y + x^2 + x - 2'));
    expect(coeffsOf('-x^2 + y')).toBe(coeffsOf('y - (x^2)'));
    expect(coeffsOf('x*-y + 1')).toBe(coeffsOf('1 - xy'));
    expect(coeffsOf('y² = x³ − 2·x + 5')).toBe(coeffsOf('y^2 = x^3 - 2x + 5'));
    expect(coeffsOf('x^(2) + 3/7 y')).toBe(coeffsOf('7x^2 + 3y'));
    expect(coeffsOf('2^3 x - y')).toBe(coeffsOf('8x - y'));
    expect(coeffsOf('.5x + y')).toBe(coeffsOf('x + 2y'));
  });
  it('homogeneous input in X, Y, Z and the affine equation homogenised with Z agree', () => {
    const h = formParse('Y^2 Z + X Y Z = X^3 - 3 X Z^2 + 7 Z^3');
    const a = formParse('y^2 + xy = x^3 - 3x + 7');
    expect(h.homogeneous).toBe(true);
    expect(formEquals(h.form, a.form)).toBe(true);
    expect(h.form.degree).toBe(3);
  });
  it('keeps thousands of digits exactly and stays fast', () => {
    const big = '9'.repeat(4000) + '7';
    const f = formParse(`${big}x^3 - y^2 + 1/3`).form;
    expect(formCoeff(f, 3, 0)).toBe(3n * BigInt(big));
    expect(formCoeff(f, 0, 0)).toBe(1n);
  });
  it('lines and sextics are curves; the degree limit is stated', () => {
    expect(formParse('x + 2y = 1').form.degree).toBe(1);
    expect(formParse('(x^2 + y^2 - 1)^3 = x^2 y^3').form.degree).toBe(6);
    expect(MAX_FORM_DEGREE).toBe(6);
  });
});

// Malformed input: each row gives the text, a substring of the message and the 1-based column.
const MALFORMED: [string, string | RegExp, number][] = [
  ['2x^^3', "expected an exponent (a whole number) after '^' at column 3, found '^'", 4],
  ['y^2 = ', "expected a term after '=' at column 5, found the end of the equation", 7],
  ['x^3 + q', "unknown symbol 'q'", 7],
  ['', 'empty equation', 1],
  ['   ', 'empty equation', 1],
  ['x = x', 'everything cancels', 3],
  ['x + 1 = x', 'the variables cancel', 7],
  ['1/x', 'not a polynomial: division by an expression containing a variable', 3],
  ['y = 2/(x+1)', 'not a polynomial', 7],
  ['(x + 1', "expected ')' to close the '(' at column 1, found the end of the equation", 7],
  ['x + 1)', "unmatched ')'", 6],
  ['((x)', "expected ')' to close the '(' at column 1", 5],
  ['x = y = 1', "a second '=' (the first is at column 3)", 7],
  ['x^2 + Y', "'Y' mixes affine x, y with homogeneous X, Y, Z ('x' at column 1)", 7],
  ['x^-2 + y', 'a negative exponent', 3],
  ['x^(-2) + y', 'a negative exponent', 4],
  ['x^1.5 + y', 'a fractional exponent', 3],
  ['x^(1/2) + y', 'a fractional exponent', 4],
  ['x^2.0 + y', 'without a decimal point', 3],
  ['x^7 + y', 'degree at most 6', 1],
  ['x^4 y^3 = 1', 'a term of degree 7 here', 5],
  ['(x + y)^1000', 'a term of degree 1000 here', 1],
  ['X^3 + Y^2 = Z^3', 'not homogeneous: this term has degree 2, the equation has degree 3', 7],
  ['X^2 + 1', 'not homogeneous: this term has degree 0', 7],
  ['x + ', "expected a term after '+' at column 3, found the end of the equation", 5],
  ['x * ', "expected a term after '*' at column 3", 5],
  ['x2 + y', 'a number after a factor needs an operator', 2],
  ['2 3x', 'two numbers in a row', 3],
  ['1.2.3x', 'at most one decimal point', 4],
  ['x^y', "expected an exponent (a whole number) after '^' at column 2, found 'y'", 3],
  ['x^(y)', 'an exponent must be a whole number, not an expression with a variable', 4],
  ['x^2^3', 'a power of a power needs parentheses', 4],
  ['y = x / 0', 'division by zero', 9],
  ['y = 3 % x', "unexpected character '%'", 7],
  ['y = x^3 +* 2', "expected a term after '+' at column 9, found '*'", 10],
  ['3 = 4', 'no variable', 1],
  ['y^2 = x^3 z', "unknown symbol 'z'", 11],
  ['() + x', "expected a term after '(' at column 1, found ')'", 2],
  ['('.repeat(500) + 'x' + ')'.repeat(500), 'nested more than 400 levels deep', 401],
  ['-'.repeat(1000) + 'x', 'nested more than 400 levels deep', 402],
];

describe('formParse: malformed equations name the column and what was expected', () => {
  it.each(MALFORMED)('%j', (text, message, column) => {
    let err: unknown;
    try {
      formParse(text);
    } catch (e) {
      err = e;
    }
    expect(err, `no error for ${JSON.stringify(text)}`).toBeInstanceOf(ParseError);
    const pe = err as ParseError;
    if (typeof message === 'string') expect(pe.message).toContain(message);
    else expect(pe.message).toMatch(message);
    expect(pe.column).toBe(column);
    expect(pe.where).toBe(`column ${column}`);
  });
  it('a caller-given place is kept in where', () => {
    expect(() => formParse('x^3 + q', 'argument 1')).toThrow(expect.objectContaining({ where: 'argument 1, column 7' }));
  });
});

// Malformed points (src/plane/parse-point.ts, read by the `through` verb).
const BAD_POINTS: [string, string, string][] = [
  ['1:2', 'expected a point as X:Y:Z or x,y', 'point'],
  ['0:0:0', 'not a point of the projective plane', 'point'],
  ['1,q', 'expected a rational coordinate at column 3', 'point, column 3'],
  ['1/0,2', 'expected a rational coordinate at column 1', 'point, column 1'],
];

describe('pointParse: malformed points', () => {
  it.each(BAD_POINTS)('%j', (text, message, where) => {
    expect(() => pointParse(text)).toThrow(expect.objectContaining({ where }));
    expect(() => pointParse(text)).toThrow(message);
  });
});

const arbForm: fc.Arbitrary<Form> = fc.integer({ min: 1, max: 6 }).chain((d) =>
  fc
    .array(
      fc.oneof(
        fc.constant(0n),
        fc.constant(1n),
        fc.constant(-1n),
        fc.bigInt({ min: -(10n ** 40n), max: 10n ** 40n }),
      ),
      { minLength: monomialCount(d), maxLength: monomialCount(d) },
    )
    .filter((c) => c.some((x) => x !== 0n))
    .map((coeffs) => ({ degree: d, coeffs })),
);

describe('print then parse (property, fast-check)', () => {
  it('homogeneous text reads back to the primitive form', () => {
    fc.assert(
      fc.property(arbForm, (f) => {
        const text = formToText(f);
        const back = formParse(text);
        expect(back.homogeneous).toBe(true);
        expect(formEquals(back.form, formPrimitive(f)), text).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
  it('affine text reads back when the form has a term free of Z', () => {
    fc.assert(
      fc.property(arbForm, (f) => {
        const hasZFree = f.coeffs.some((c, k) => c !== 0n && monomials(f.degree)[k][2] === 0);
        fc.pre(hasZFree);
        const text = formToText(f, { affine: true });
        const back = formParse(text);
        expect(back.homogeneous).toBe(false);
        expect(formEquals(back.form, formPrimitive(f)), text).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});

describe('formParse never crashes (property, fast-check)', () => {
  it('any string over the notation alphabet either parses or gives a ParseError with a column inside it', () => {
    const alphabet = 'xyXYZzq0123456789.+-*/^()= ²·−%';
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...alphabet.split('')), { maxLength: 30 }).map((a) => a.join('')), (text) => {
        try {
          const { form } = formParse(text);
          expect(form.degree).toBeGreaterThanOrEqual(1);
          expect(form.degree).toBeLessThanOrEqual(MAX_FORM_DEGREE);
        } catch (e) {
          expect(e).toBeInstanceOf(ParseError);
          const col = (e as ParseError).column;
          expect(col).toBeGreaterThanOrEqual(1);
          expect(col).toBeLessThanOrEqual(text.length + 1);
        }
      }),
      { numRuns: 3000 },
    );
  });
});

describe('printer layout', () => {
  it('folds signs, hides unit coefficients, descends in degree', () => {
    const f = formParse('y^2 + xy = x^3 - 3x + 7').form;
    expect(formToText(f, { affine: true })).toBe('x^3 - xy - y^2 - 3x + 7');
    expect(formToText(f)).toBe('X^3 - XYZ - 3XZ^2 - Y^2Z + 7Z^3');
    expect(formToLatex(f, { affine: true })).toBe('x^{3} - xy - y^{2} - 3x + 7');
    expect(formToText(formParse('x^3 - 2x = 0').form, { affine: true })).toBe('x^3 - 2x');
    expect(formToText({ degree: 2, coeffs: [0n, 0n, 0n, 0n, 0n, 0n] })).toBe('0');
  });
});
