// Resultants of ternary forms with respect to one variable: eliminate v from F and G, leaving a binary
// form in the other two variables whose roots are the projections of the common points.
//
// Canonical form: Res_v(F, G) is the Sylvester determinant with the FORMAL degrees d1 = deg F, d2 = deg G
// in v (rows of F first, coefficients from v^d down), a binary form of degree d1·d2 in the two remaining
// variables (a, b) taken in X, Y, Z order: b[i] is the coefficient of a^(d1·d2 - i) b^i. With formal
// degrees the result is the projective resultant (Fulton, Algebraic Curves, §1.6; Cox, Little, O'Shea,
// Ideals, Varieties, and Algorithms, ch. 8 §7): it vanishes identically when F and G share a component or
// both pass through the v-vertex (the point where a = b = 0). When F has full degree in v it equals
// PARI's polresultant(F, G, v).
//
// Method: evaluate at (a, b) = (1, t) for d1·d2 + 1 integers t (each value an exact Bareiss determinant),
// then interpolate; specialising the Sylvester matrix commutes with the determinant, so no leading
// coefficient may vanish problematically.
import { InvalidInput, NinefoldError } from '../exact/errors.ts';
import { matDeterminant } from '../exact/linalg.ts';
import { rat, ratAdd, ratDiv, ratMul, ratSub, RAT_ZERO, type Rational } from '../exact/rational.ts';
import { binaryEval, binaryZero } from './binary.ts';
import { monomials, type Form } from './form.ts';

export type Variable = 0 | 1 | 2;

/** The two variables other than v, in X, Y, Z order. */
export function otherVariables(v: Variable): [Variable, Variable] {
  return v === 0 ? [1, 2] : v === 1 ? [0, 2] : [0, 1];
}

/**
 * F as a polynomial in v: entry k is the coefficient of v^k, a binary form of degree d - k in the other
 * two variables (BinaryForm order).
 */
export function formCoefficientsIn(f: Form, v: Variable): bigint[][] {
  const d = f.degree;
  const [a] = otherVariables(v);
  const out = Array.from({ length: d + 1 }, (_, k) => binaryZero(d - k));
  const m = monomials(d);
  for (let idx = 0; idx < m.length; idx++) {
    const c = f.coeffs[idx];
    if (c === 0n) continue;
    const k = m[idx][v];
    // Within the coefficient of v^k (degree d - k in a, b), index i counts the power of b.
    out[k][d - k - m[idx][a]] += c;
  }
  return out;
}

function sylvesterDeterminant(fc: readonly bigint[], gc: readonly bigint[]): bigint {
  // fc[k], gc[k]: values of the coefficients of v^k; formal degrees are fc.length - 1, gc.length - 1.
  const m = fc.length - 1;
  const n = gc.length - 1;
  const size = m + n;
  const rows: bigint[][] = [];
  for (let r = 0; r < n; r++) {
    const row = new Array<bigint>(size).fill(0n);
    for (let k = 0; k <= m; k++) row[r + k] = fc[m - k];
    rows.push(row);
  }
  for (let r = 0; r < m; r++) {
    const row = new Array<bigint>(size).fill(0n);
    for (let k = 0; k <= n; k++) row[r + k] = gc[n - k];
    rows.push(row);
  }
  return matDeterminant(rows);
}

/** Nodes 0, 1, -1, 2, -2, ...: small values keep the determinants small. */
function interpolationNodes(count: number): bigint[] {
  const out: bigint[] = [0n];
  for (let k = 1; out.length < count; k++) {
    out.push(BigInt(k));
    if (out.length < count) out.push(BigInt(-k));
  }
  return out;
}

/** Coefficients (index = power of t) of the polynomial of degree < nodes.length through the values. */
function interpolate(nodes: readonly bigint[], values: readonly bigint[]): Rational[] {
  const n = nodes.length;
  // Newton's divided differences, then expansion of the Newton basis.
  const dd: Rational[] = values.map((v) => rat(v));
  for (let j = 1; j < n; j++) {
    for (let i = n - 1; i >= j; i--) dd[i] = ratDiv(ratSub(dd[i], dd[i - 1]), rat(nodes[i] - nodes[i - j]));
  }
  let poly: Rational[] = [dd[n - 1]];
  for (let i = n - 2; i >= 0; i--) {
    // poly := poly·(t - nodes[i]) + dd[i]
    const next: Rational[] = new Array<Rational>(poly.length + 1).fill(RAT_ZERO);
    for (let k = 0; k < poly.length; k++) {
      next[k + 1] = ratAdd(next[k + 1], poly[k]);
      next[k] = ratSub(next[k], ratMul(poly[k], rat(nodes[i])));
    }
    next[0] = ratAdd(next[0], dd[i]);
    poly = next;
  }
  return poly;
}

/** Res_v(F, G): a binary form of degree deg F · deg G in the two other variables (see the top). */
export function formResultant(f: Form, g: Form, v: Variable): bigint[] {
  if (v !== 0 && v !== 1 && v !== 2) throw new InvalidInput(`the variable to eliminate must be 0 (X), 1 (Y) or 2 (Z), got ${String(v)}`);
  const D = f.degree * g.degree;
  const fcs = formCoefficientsIn(f, v);
  const gcs = formCoefficientsIn(g, v);
  const nodes = interpolationNodes(D + 1);
  const values = nodes.map((t) =>
    sylvesterDeterminant(
      fcs.map((b) => binaryEval(b, 1n, t)),
      gcs.map((b) => binaryEval(b, 1n, t)),
    ),
  );
  const coeffs = interpolate(nodes, values);
  const out = binaryZero(D);
  for (let i = 0; i <= D; i++) {
    const c = coeffs[i] ?? RAT_ZERO;
    // The resultant has integer coefficients, so the interpolant must too.
    if (c.den !== 1n) throw new NinefoldError('internal error: non-integral resultant coefficient', 'resultant');
    out[i] = c.num;
  }
  return out;
}
