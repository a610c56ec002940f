// Ternary forms F(X, Y, Z) with integer coefficients: the curves of Ninefold and everything derived
// from them (partials, Hessians, products).
//
// Representation: `coeffs[monomialIndex(d, i, j)]` is the coefficient of X^i Y^j Z^(d-i-j). Monomials are
// ordered by descending power of X, then descending power of Y: X^d, X^(d-1)Y, X^(d-1)Z, X^(d-2)Y^2, ...
// A curve is a primitive form (`formPrimitive`): content 1, first non-zero coefficient in that order
// positive. Derived forms (partials, Hessian) are not normalised unless a caller asks.
import { primitive } from '../exact/integer.ts';
import { InvalidInput } from '../exact/errors.ts';

export interface Form {
  readonly degree: number;
  readonly coeffs: readonly bigint[];
}

export type Exponent = readonly [number, number, number];

const MONOMIALS: Exponent[][] = [];

/** The monomials of degree d in the order of `coeffs`. */
export function monomials(d: number): readonly Exponent[] {
  let m = MONOMIALS[d];
  if (!m) {
    m = [];
    for (let i = d; i >= 0; i--) for (let j = d - i; j >= 0; j--) m.push([i, j, d - i - j]);
    MONOMIALS[d] = m;
  }
  return m;
}

export function monomialCount(d: number): number {
  return ((d + 1) * (d + 2)) / 2;
}

/** Index of X^i Y^j Z^(d-i-j) in `coeffs`. */
export function monomialIndex(d: number, i: number, j: number): number {
  const a = d - i; // monomials with a higher X power come first: sum_{t<a} (t+1)
  return (a * (a + 1)) / 2 + (a - j);
}

export function formZero(d: number): Form {
  return { degree: d, coeffs: new Array<bigint>(monomialCount(d)).fill(0n) };
}

export function formFromCoeffs(d: number, coeffs: readonly bigint[]): Form {
  if (coeffs.length !== monomialCount(d)) {
    throw new InvalidInput(`a form of degree ${d} has ${monomialCount(d)} coefficients, got ${coeffs.length}`);
  }
  return { degree: d, coeffs: coeffs.slice() };
}

export function formIsZero(f: Form): boolean {
  return f.coeffs.every((c) => c === 0n);
}

export function formEquals(f: Form, g: Form): boolean {
  return f.degree === g.degree && f.coeffs.every((c, k) => c === g.coeffs[k]);
}

export function formPrimitive(f: Form): Form {
  return { degree: f.degree, coeffs: primitive(f.coeffs) };
}

export function formCoeff(f: Form, i: number, j: number): bigint {
  return f.coeffs[monomialIndex(f.degree, i, j)];
}

export function formAdd(f: Form, g: Form): Form {
  if (f.degree !== g.degree) throw new InvalidInput('forms of different degrees cannot be added');
  return { degree: f.degree, coeffs: f.coeffs.map((c, k) => c + g.coeffs[k]) };
}

export function formScale(f: Form, s: bigint): Form {
  return { degree: f.degree, coeffs: f.coeffs.map((c) => c * s) };
}

export function formMul(f: Form, g: Form): Form {
  const d = f.degree + g.degree;
  const out = new Array<bigint>(monomialCount(d)).fill(0n);
  const mf = monomials(f.degree);
  const mg = monomials(g.degree);
  for (let a = 0; a < mf.length; a++) {
    const ca = f.coeffs[a];
    if (ca === 0n) continue;
    for (let b = 0; b < mg.length; b++) {
      const cb = g.coeffs[b];
      if (cb === 0n) continue;
      out[monomialIndex(d, mf[a][0] + mg[b][0], mf[a][1] + mg[b][1])] += ca * cb;
    }
  }
  return { degree: d, coeffs: out };
}

/** F(P) for an integer point P = (X, Y, Z). */
export function formEval(f: Form, p: readonly [bigint, bigint, bigint]): bigint {
  const [x, y, z] = p;
  const d = f.degree;
  const px = powers(x, d);
  const py = powers(y, d);
  const pz = powers(z, d);
  let s = 0n;
  const m = monomials(d);
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c !== 0n) s += c * px[m[k][0]] * py[m[k][1]] * pz[m[k][2]];
  }
  return s;
}

/** F(P) in doubles (drawing only; never decides anything). */
export function formEvalFloat(f: Form, x: number, y: number, z: number): number {
  const m = monomials(f.degree);
  let s = 0;
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c !== 0n) s += Number(c) * x ** m[k][0] * y ** m[k][1] * z ** m[k][2];
  }
  return s;
}

/** Partial derivative with respect to variable v (0 = X, 1 = Y, 2 = Z); degree d - 1. */
export function formPartial(f: Form, v: 0 | 1 | 2): Form {
  const d = f.degree;
  if (d === 0) return formZero(0);
  const out = new Array<bigint>(monomialCount(d - 1)).fill(0n);
  const m = monomials(d);
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    const e = m[k][v];
    if (c === 0n || e === 0) continue;
    const i = m[k][0] - (v === 0 ? 1 : 0);
    const j = m[k][1] - (v === 1 ? 1 : 0);
    out[monomialIndex(d - 1, i, j)] += c * BigInt(e);
  }
  return { degree: d - 1, coeffs: out };
}

export function formGradient(f: Form): [Form, Form, Form] {
  return [formPartial(f, 0), formPartial(f, 1), formPartial(f, 2)];
}

/** ∇F(P) as an integer vector. */
export function formGradientAt(f: Form, p: readonly [bigint, bigint, bigint]): [bigint, bigint, bigint] {
  const [fx, fy, fz] = formGradient(f);
  return [formEval(fx, p), formEval(fy, p), formEval(fz, p)];
}

/** The 3x3 matrix of second partials, row-major. */
export function formHessianMatrix(f: Form): Form[][] {
  const g = formGradient(f);
  return g.map((gi) => [formPartial(gi, 0), formPartial(gi, 1), formPartial(gi, 2)]);
}

function powers(x: bigint, d: number): bigint[] {
  const p = [1n];
  for (let e = 1; e <= d; e++) p.push(p[e - 1] * x);
  return p;
}
