// The printer: ternary forms as plain text (which formParse reads back to the same form) and as LaTeX.
//
// Canonical output: terms in descending total degree (affine) or in the form's monomial order
// (homogeneous: descending X power, then descending Y power), signs folded ("x^3 - 2x", never
// "x^3 + -2x"), coefficients ±1 hidden, variables juxtaposed ("3x^2y"), "0" for the zero form.
// Affine printing sets Z = 1: a form divisible by Z (a curve containing the line at infinity) prints
// as the affine equation of the rest, so only forms with a term free of Z print-then-parse back exactly.
import { monomials, type Form } from './form.ts';

export interface PrintOptions {
  /** Print with Z = 1 in x, y instead of homogeneous X, Y, Z. */
  readonly affine?: boolean;
}

interface Term {
  readonly coeff: bigint;
  /** Exponents of the printed variables (x, y) or (X, Y, Z). */
  readonly exps: readonly number[];
}

function formTerms(f: Form, affine: boolean): Term[] {
  const m = monomials(f.degree);
  const terms: Term[] = [];
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c === 0n) continue;
    terms.push({ coeff: c, exps: affine ? [m[k][0], m[k][1]] : [m[k][0], m[k][1], m[k][2]] });
  }
  if (affine) {
    // Descending total degree, then descending x power (the form's order already sorts each degree).
    terms.sort((a, b) => b.exps[0] + b.exps[1] - (a.exps[0] + a.exps[1]) || b.exps[0] - a.exps[0]);
  }
  return terms;
}

function joinTerms(terms: readonly Term[], monomial: (exps: readonly number[]) => string, sep: string): string {
  if (terms.length === 0) return '0';
  let out = '';
  terms.forEach((t, n) => {
    const neg = t.coeff < 0n;
    const abs = neg ? -t.coeff : t.coeff;
    const mono = monomial(t.exps);
    const body = mono === '' ? abs.toString() : abs === 1n ? mono : `${abs}${sep}${mono}`;
    if (n === 0) out = neg ? `-${body}` : body;
    else out += neg ? ` - ${body}` : ` + ${body}`;
  });
  return out;
}

function names(affine: boolean): string[] {
  return affine ? ['x', 'y'] : ['X', 'Y', 'Z'];
}

/** Plain text, e.g. "y^2 + xy - x^3 + 3x - 7" (affine) or "Y^2Z + XYZ - X^3 + 3XZ^2 - 7Z^3". */
export function formToText(f: Form, opts: PrintOptions = {}): string {
  const affine = opts.affine ?? false;
  const v = names(affine);
  const monomial = (exps: readonly number[]) =>
    exps.map((e, i) => (e === 0 ? '' : e === 1 ? v[i] : `${v[i]}^${e}`)).join('');
  return joinTerms(formTerms(f, affine), monomial, '');
}

/** LaTeX (math mode), e.g. "y^{2} + xy - x^{3} + 3x - 7". */
export function formToLatex(f: Form, opts: PrintOptions = {}): string {
  const affine = opts.affine ?? false;
  const v = names(affine);
  const monomial = (exps: readonly number[]) =>
    exps.map((e, i) => (e === 0 ? '' : e === 1 ? v[i] : `${v[i]}^{${e}}`)).join('');
  return joinTerms(formTerms(f, affine), monomial, '');
}
