// The Jacobian ideal J = (F_X, F_Y, F_Z) of a plane curve, by linear algebra in one degree k: the
// functionals on forms of degree k that kill J_k. Their number is the total Tjurina number Σ τ_P over
// the singular points (for k past the regularity of S/J), and it is 0 exactly when the curve is smooth.
// The linear forms ℓ with ℓ·S_(k−1) ⊂ J_k are the degree-1 part of the saturation of J: for a single
// node they are the lines through it, for a single cusp its tangent line.
//
// Canonical form: functionals are integer vectors indexed like `monomials(k)`; λ(g) = Σ g_α λ_α.
// Sources: the Jacobian algebra and its dimension τ (Greuel, Lossen, Shustin, Introduction to
// Singularities and Deformations, I.2); for a smooth curve S/J is a complete-intersection algebra with
// socle in degree 3(d − 2), so J_k = S_k for k > 3(d − 2) (Macaulay; common practice in the trade).
import { matKernel } from '../exact/linalg.ts';
import { formGradient, formMul, monomialCount, monomialIndex, monomials, type Form } from '../poly/form.ts';

export interface JacobianDual {
  readonly degree: number;
  /** A basis of the functionals of degree `degree` vanishing on J. */
  readonly functionals: readonly bigint[][];
}

/** The degree past which J_k = S_k for a smooth curve of degree d: 3(d − 2) + 1. */
export function jacobianDegree(d: number): number {
  return Math.max(3 * (d - 2) + 1, d);
}

/** Functionals on degree-k forms that vanish on J_k (assumes k ≥ d − 1). */
export function jacobianDual(f: Form, k = jacobianDegree(f.degree)): JacobianDual {
  const grads = formGradient(f);
  const rows: bigint[][] = [];
  for (const [i, j, l] of monomials(k - f.degree + 1)) {
    const m: Form = { degree: k - f.degree + 1, coeffs: monomials(k - f.degree + 1).map(([a, b, c]) => (a === i && b === j && c === l ? 1n : 0n)) };
    for (const g of grads) rows.push(formMul(m, g).coeffs.slice());
  }
  return { degree: k, functionals: matKernel(rows, monomialCount(k)) };
}

/** The linear forms ℓ (as integer triples) with λ(ℓ·m) = 0 for every functional λ and monomial m. */
export function jacobianSaturationLines(dual: JacobianDual): bigint[][] {
  const k = dual.degree;
  const rows: bigint[][] = [];
  for (const lam of dual.functionals) {
    for (const [i, j] of monomials(k - 1)) {
      rows.push([lam[monomialIndex(k, i + 1, j)], lam[monomialIndex(k, i, j + 1)], lam[monomialIndex(k, i, j)]]);
    }
  }
  if (rows.length === 0) return [[1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n]];
  return matKernel(rows, 3);
}
