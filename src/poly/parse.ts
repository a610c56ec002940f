// The equation parser: ordinary notation to a primitive integer ternary form.
//
// Canonical form of the result: `formPrimitive` of (left side − right side), homogenised with Z to its
// total degree when written affinely in x, y; so `y^2 = x^3 - x/4` and `4y^2 = 4x^3 - x` give the same form.
//
// Notation accepted (documented for users in the README):
//   variables   x, y (affine) or X, Y, Z (homogeneous; every term must then have the same degree);
//               the two alphabets cannot be mixed
//   numbers     integers of any length, decimals (0.25 is exactly 1/4), fractions via division by a
//               constant (x/4, 3/7 x)
//   operators   + - * / ^ and ** (same as ^), parentheses, unary minus, one optional "=";
//               implicit multiplication by juxtaposition (3xy^2, 2(x+1)^2, x y, (x-1)(x+2))
//   exponents   non-negative whole numbers (also superscripts ² ³ ...); ^ binds tighter than unary
//               minus, so -x^2 is -(x^2)
//   also        the Unicode minus sign − and the multiplication signs · and ×
// The degree of every term is limited to MAX_FORM_DEGREE, which also keeps (x+y)^1000 from running away.
// Every error is a ParseError whose 1-based column points at the offending character.
import { ParseError } from '../exact/errors.ts';
import { bitLength, lcm } from '../exact/integer.ts';
import {
  RAT_ONE, RAT_ZERO, ratAdd, ratDiv, ratMul, ratNeg, ratPow, type Rational,
} from '../exact/rational.ts';
import { formPrimitive, monomialCount, monomialIndex, type Form } from './form.ts';
import { tokenise, type Token } from './parse-tokens.ts';

/** The highest degree of curve Ninefold handles. */
export const MAX_FORM_DEGREE = 6;

/** Parentheses and unary signs nested deeper than this are refused (a guard for the recursion). */
const MAX_NESTING = 400;

/** Bits allowed in a constant raised to a power (10^5000 is fine, 10^(10^9) is refused). */
const MAX_POWER_BITS = 1 << 22;

export interface ParsedForm {
  readonly form: Form;
  /** True when the equation was written in X, Y, Z. */
  readonly homogeneous: boolean;
}

// Polynomials during parsing: monomial X^i Y^j Z^k (i, j, k <= MAX_FORM_DEGREE) packed as i*49 + j*7 + k,
// rational coefficients, no zero entries.
type Poly = Map<number, Rational>;
const B = MAX_FORM_DEGREE + 1;
const keyOf = (i: number, j: number, k: number) => (i * B + j) * B + k;
const expOf = (key: number): [number, number, number] => [Math.floor(key / (B * B)), Math.floor(key / B) % B, key % B];
const keyDegree = (key: number) => {
  const [i, j, k] = expOf(key);
  return i + j + k;
};

function polyDegree(p: Poly): number {
  let d = -1;
  for (const key of p.keys()) d = Math.max(d, keyDegree(key));
  return d;
}

function polyConstant(p: Poly): Rational | null {
  if (p.size === 0) return RAT_ZERO;
  if (p.size === 1 && p.has(0)) return p.get(0)!;
  return null;
}

function polyAdd(a: Poly, b: Poly, sign: 1 | -1): Poly {
  const out = new Map(a);
  for (const [key, c] of b) {
    const s = ratAdd(out.get(key) ?? RAT_ZERO, sign === 1 ? c : ratNeg(c));
    if (s.num === 0n) out.delete(key);
    else out.set(key, s);
  }
  return out;
}

function polyScale(a: Poly, q: Rational): Poly {
  const out: Poly = new Map();
  if (q.num === 0n) return out;
  for (const [key, c] of a) out.set(key, ratMul(c, q));
  return out;
}

const VARIABLE_INDEX: Record<string, 0 | 1 | 2> = { x: 0, y: 1, X: 0, Y: 1, Z: 2 };

class Parser {
  private pos = 0;
  /** Nesting of parentheses and unary signs, bounded so that no input can exhaust the stack. */
  private depth = 0;
  private alphabet: { upper: boolean; col: number; letter: string } | null = null;
  /** The top-level summands of both sides (signs dropped), with their columns, for naming a term that is not homogeneous. */
  readonly summands: { col: number; poly: Poly }[] = [];

  constructor(
    private readonly tokens: Token[],
    private readonly fail: (msg: string, col: number) => never,
  ) {}

  get sawVariable(): boolean {
    return this.alphabet !== null;
  }

  get isHomogeneous(): boolean {
    return this.alphabet?.upper ?? false;
  }

  private peek(): Token {
    return this.tokens[this.pos];
  }

  private isOp(t: Token, op: string): boolean {
    return t.kind === 'op' && t.text === op;
  }

  private describe(t: Token): string {
    return t.kind === 'end' ? 'the end of the equation' : `'${t.text}'`;
  }

  /** equation := sum ('=' sum)? end; returns (left − right) and the column of '=' (0 if none). */
  equation(): { poly: Poly; eqCol: number } {
    const left = this.sum(true);
    let eqCol = 0;
    let poly = left;
    let t = this.peek();
    if (this.isOp(t, '=')) {
      eqCol = t.col;
      this.pos++;
      const right = this.sum(true, `after '=' at column ${eqCol}`);
      poly = polyAdd(left, right, -1);
      t = this.peek();
      if (this.isOp(t, '=')) this.fail(`a second '=' (the first is at column ${eqCol}); an equation has one`, t.col);
    }
    if (t.kind !== 'end') {
      if (this.isOp(t, ')')) this.fail(`unmatched ')': no '(' opens it`, t.col);
      this.fail(`expected an operator or the end of the equation, found ${this.describe(t)}`, t.col);
    }
    return { poly, eqCol };
  }

  /** sum := ('+'|'-')? term (('+'|'-') term)* */
  private sum(top: boolean, context = ''): Poly {
    let acc: Poly = new Map();
    let sign: 1 | -1 = 1;
    let t = this.peek();
    if (this.isOp(t, '+') || this.isOp(t, '-')) {
      sign = t.text === '-' ? -1 : 1;
      this.pos++;
    }
    for (;;) {
      const col = this.peek().col;
      const term = this.term(context);
      if (top) this.summands.push({ col, poly: term });
      acc = polyAdd(acc, term, sign);
      t = this.peek();
      if (this.isOp(t, '+') || this.isOp(t, '-')) {
        sign = t.text === '-' ? -1 : 1;
        this.pos++;
        context = `after '${t.text}' at column ${t.col}`;
      } else {
        return acc;
      }
    }
  }

  private startsAtom(t: Token): boolean {
    return t.kind === 'num' || t.kind === 'var' || this.isOp(t, '(');
  }

  /** term := factor (('*' | '/' | juxtaposition) factor)* */
  private term(context: string): Poly {
    let acc = this.factor(context);
    for (;;) {
      const t = this.peek();
      if (this.isOp(t, '*')) {
        this.pos++;
        acc = this.multiply(acc, this.factor(`after '*' at column ${t.col}`), t.col);
      } else if (this.isOp(t, '/')) {
        this.pos++;
        const divCol = this.peek().col;
        const d = this.factor(`after '/' at column ${t.col}`);
        const q = polyConstant(d);
        if (q === null) this.fail(`not a polynomial: division by an expression containing a variable`, divCol);
        if (q.num === 0n) this.fail(`division by zero`, divCol);
        acc = polyScale(acc, ratDiv(RAT_ONE, q));
      } else if (this.startsAtom(t)) {
        if (t.kind === 'num') {
          this.fail(`a number after a factor needs an operator: write the number first (2x) or use '*'`, t.col);
        }
        acc = this.multiply(acc, this.factor(''), t.col);
      } else {
        return acc;
      }
    }
  }

  private multiply(a: Poly, b: Poly, col: number): Poly {
    const out: Poly = new Map();
    for (const [ka, ca] of a) {
      const [ia, ja, za] = expOf(ka);
      for (const [kb, cb] of b) {
        const [ib, jb, zb] = expOf(kb);
        const i = ia + ib;
        const j = ja + jb;
        const k = za + zb;
        if (i + j + k > MAX_FORM_DEGREE) this.degreeTooHigh(i + j + k, col);
        const key = keyOf(i, j, k);
        const s = ratAdd(out.get(key) ?? RAT_ZERO, ratMul(ca, cb));
        if (s.num === 0n) out.delete(key);
        else out.set(key, s);
      }
    }
    return out;
  }

  private degreeTooHigh(d: number, col: number): never {
    this.fail(`a term of degree ${d} here: Ninefold handles curves of degree at most ${MAX_FORM_DEGREE}`, col);
  }

  /** factor := ('-'|'+') factor | power */
  private factor(context: string): Poly {
    const t = this.peek();
    if (this.isOp(t, '-') || this.isOp(t, '+')) {
      this.pos++;
      this.enter(t.col);
      const f = this.factor(`after '${t.text}' at column ${t.col}`);
      this.depth--;
      return t.text === '-' ? polyScale(f, ratNeg(RAT_ONE)) : f;
    }
    return this.power(context);
  }

  /** power := atom ('^' exponent)? */
  private power(context: string): Poly {
    const baseCol = this.peek().col;
    const base = this.atom(context);
    const t = this.peek();
    if (!this.isOp(t, '^')) return base;
    this.pos++;
    const e = this.exponent(t.col);
    const next = this.peek();
    if (this.isOp(next, '^')) this.fail(`a power of a power needs parentheses, e.g. (x^2)^3`, next.col);
    const q = polyConstant(base);
    if (q !== null) {
      if (bitLength(q.num) * e > MAX_POWER_BITS || bitLength(q.den) * e > MAX_POWER_BITS) {
        this.fail(`the power ${e} of this number is too large to write out`, baseCol);
      }
      const v = ratPow(q, e);
      return v.num === 0n && e > 0 ? new Map() : new Map([[0, v]]);
    }
    const d = polyDegree(base);
    if (d * e > MAX_FORM_DEGREE) this.degreeTooHigh(d * e, baseCol);
    let acc: Poly = new Map([[0, RAT_ONE]]);
    for (let k = 0; k < e; k++) acc = this.multiply(acc, base, baseCol);
    return acc;
  }

  /** exponent := whole number | '(' whole number ')' */
  private exponent(caretCol: number): number {
    const t = this.peek();
    if (this.isOp(t, '-')) this.fail(`a negative exponent: exponents are whole numbers 0, 1, 2, ...`, t.col);
    let value: Rational;
    let col = t.col;
    let decimal = false;
    if (t.kind === 'num') {
      this.pos++;
      value = t.value!;
      decimal = t.decimal ?? false;
    } else if (this.isOp(t, '(')) {
      this.pos++;
      col = this.peek().col;
      const inner = this.sum(false, `after '(' at column ${t.col}`);
      this.closeParen(t);
      const q = polyConstant(inner);
      if (q === null) this.fail(`an exponent must be a whole number, not an expression with a variable`, col);
      value = q;
    } else {
      this.fail(`expected an exponent (a whole number) after '^' at column ${caretCol}, found ${this.describe(t)}`, t.col);
    }
    if (value.num < 0n) this.fail(`a negative exponent: exponents are whole numbers 0, 1, 2, ...`, col);
    if (value.den !== 1n) this.fail(`a fractional exponent: exponents are whole numbers 0, 1, 2, ...`, col);
    if (decimal) this.fail(`write the exponent as a whole number, without a decimal point`, col);
    if (value.num > 1_000_000n) this.fail(`the exponent ${value.num} is too large`, col);
    return Number(value.num);
  }

  private enter(col: number): void {
    if (++this.depth > MAX_NESTING) this.fail(`nested more than ${MAX_NESTING} levels deep`, col);
  }

  private closeParen(open: Token): void {
    const t = this.peek();
    if (!this.isOp(t, ')')) {
      this.fail(`expected ')' to close the '(' at column ${open.col}, found ${this.describe(t)}`, t.col);
    }
    this.pos++;
  }

  /** atom := number | variable | '(' sum ')' */
  private atom(context: string): Poly {
    const t = this.peek();
    if (t.kind === 'num') {
      this.pos++;
      const next = this.peek();
      if (next.kind === 'num') this.fail(`two numbers in a row; use '*' between them`, next.col);
      return t.value!.num === 0n ? new Map() : new Map([[0, t.value!]]);
    }
    if (t.kind === 'var') {
      this.pos++;
      return new Map([[this.variableKey(t), RAT_ONE]]);
    }
    if (this.isOp(t, '(')) {
      this.pos++;
      this.enter(t.col);
      const inner = this.sum(false, `after '(' at column ${t.col}`);
      this.closeParen(t);
      this.depth--;
      return inner;
    }
    const where = context ? ` ${context}` : '';
    if (t.kind === 'end') this.fail(`expected a term${where}, found the end of the equation`, t.col);
    if (this.isOp(t, ')')) this.fail(`expected a term${where}, found ')'`, t.col);
    this.fail(`expected a term${where}, found ${this.describe(t)}`, t.col);
  }

  private variableKey(t: Token): number {
    const v = VARIABLE_INDEX[t.text];
    if (v === undefined) {
      this.fail(`unknown symbol '${t.text}': the variables are x, y (affine) or X, Y, Z (homogeneous)`, t.col);
    }
    const upper = t.text === t.text.toUpperCase();
    if (this.alphabet === null) {
      this.alphabet = { upper, col: t.col, letter: t.text };
    } else if (this.alphabet.upper !== upper) {
      this.fail(
        `'${t.text}' mixes affine x, y with homogeneous X, Y, Z ('${this.alphabet.letter}' at column ${this.alphabet.col}); use one alphabet`,
        t.col,
      );
    }
    return keyOf(v === 0 ? 1 : 0, v === 1 ? 1 : 0, v === 2 ? 1 : 0);
  }
}

/**
 * Parse an equation in ordinary notation into a primitive integer form (see the notation at the top).
 * `where` (e.g. "argument 1") is prefixed to the error's place.
 */
export function formParse(text: string, where = ''): ParsedForm {
  const fail = (msg: string, col: number): never => {
    throw new ParseError(msg, col, where ? `${where}, column ${col}` : `column ${col}`);
  };
  if (text.trim() === '') fail('empty equation: expected a polynomial equation in x, y such as y^2 = x^3 - 3x + 7', 1);
  const tokens = tokenise(text, fail);
  const parser = new Parser(tokens, fail);
  const { poly, eqCol } = parser.equation();
  const degree = polyDegree(poly);
  const whereEq = eqCol > 0 ? eqCol : 1;
  if (!parser.sawVariable) fail('no variable: expected an equation in x, y (or X, Y, Z), such as y^2 = x^3 - 3x + 7', 1);
  if (degree < 0) fail('everything cancels: the equation holds identically and defines no curve', whereEq);
  if (degree === 0) fail('the variables cancel: what is left is a non-zero constant, which defines no curve', whereEq);
  const homogeneous = parser.isHomogeneous;
  if (homogeneous) {
    const bad = [...poly.keys()].find((k) => keyDegree(k) !== degree);
    if (bad !== undefined) {
      // Name the first written term that carries a monomial of the wrong degree.
      const wrong = (s: { poly: Poly }) => [...s.poly.keys()].find((k) => keyDegree(k) !== degree);
      const culprit = parser.summands.find((s) => wrong(s) !== undefined);
      const d = keyDegree(culprit ? wrong(culprit)! : bad);
      fail(
        `not homogeneous: this term has degree ${d}, the equation has degree ${degree} ` +
          `(write it in x, y to have it homogenised with Z)`,
        culprit?.col ?? 1,
      );
    }
  }
  const denominators = [...poly.values()].reduce((acc, q) => lcm(acc, q.den), 1n);
  const coeffs = new Array<bigint>(monomialCount(degree)).fill(0n);
  for (const [key, q] of poly) {
    const [i, j] = expOf(key);
    coeffs[monomialIndex(degree, i, j)] = (q.num * denominators) / q.den;
  }
  return { form: formPrimitive({ degree, coeffs }), homogeneous };
}
