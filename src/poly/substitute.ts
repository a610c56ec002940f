// Substitution into ternary forms: a form restricted to a parametrised line, or to any parametrisation
// by binary forms.
//
// Canonical form: the result is the binary form in BinaryForm order (coefficient of s^(d-i) t^i at i),
// not made primitive, so that F(sP + tQ) evaluated at (s, t) is exactly F(sP + tQ).
import { InvalidInput } from '../exact/errors.ts';
import { binaryMul, binaryZero, type BinaryForm } from './binary.ts';
import { monomials, type Form } from './form.ts';

/**
 * F(X(s,t), Y(s,t), Z(s,t)) for three binary forms of one degree e: a binary form of degree d·e.
 * Used for lines (e = 1) and for the parametrisations of singular cubics (e = 3).
 */
export function formOnParametrisation(f: Form, x: BinaryForm, y: BinaryForm, z: BinaryForm): bigint[] {
  const e = x.length - 1;
  if (y.length - 1 !== e || z.length - 1 !== e) {
    throw new InvalidInput(`a parametrisation needs three binary forms of one degree, got ${x.length - 1}, ${y.length - 1}, ${z.length - 1}`);
  }
  const d = f.degree;
  const pw = [x, y, z].map((b) => {
    const p: bigint[][] = [[1n]];
    for (let k = 1; k <= d; k++) p.push(binaryMul(p[k - 1], b));
    return p;
  });
  const out = binaryZero(d * e);
  const m = monomials(d);
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c === 0n) continue;
    const [i, j, l] = m[k];
    const term = binaryMul(binaryMul(pw[0][i], pw[1][j]), pw[2][l]);
    for (let r = 0; r < term.length; r++) out[r] += c * term[r];
  }
  return out;
}

/**
 * F(sP + tQ): the form on the line through P and Q, parametrised so that (1:0) is P and (0:1) is Q.
 * Coefficient 0 is F(P), coefficient d is F(Q); the roots (s:t) are the meets of the line with the curve.
 * P and Q may be equal or any integer triples (the caller decides whether a line is meant).
 */
export function formOnLine(f: Form, p: readonly bigint[], q: readonly bigint[]): bigint[] {
  if (p.length !== 3 || q.length !== 3) throw new InvalidInput('formOnLine needs two points with three coordinates');
  return formOnParametrisation(f, [p[0], q[0]], [p[1], q[1]], [p[2], q[2]]);
}
