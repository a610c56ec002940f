// The singular points of a plane curve (degree up to 6) that are not rational, exactly, as conjugate
// orbits (src/cubic/conjugate-points.ts): polynomial coordinates over the roots θ of a square-free
// polynomial, verified to be singular modulo that polynomial.
//
// Canonical form: one orbit per kind (double points with two tangents, double points with one tangent,
// points of multiplicity ≥ 3), each { poly, coords } with poly square-free and free of rational roots
// (not necessarily irreducible: it may carry several Galois orbits of one kind).
//
// Method (the shape lemma in general position; Cox, Little, O'Shea, Ideals, Varieties, and Algorithms,
// ch. 3 §5–6 on resultants and subresultants): after a unimodular change of coordinates G = F∘M, the
// singular points with Z ≠ 0 project to the roots x of gcd(Res_Y(A, B), Res_Y(A, C)) for
// A = G_Y, B = G_X + G_Z, C = G_Z − 2G_X; points with Z = 0 project to (1:0), which is rational and
// handled with the rational points. Above a root θ the common root of A and B is simple when the
// coordinates are general, so the first subresultant S1 = α(x)Y + β(x) gives it: the point
// (θα(θ) : −β(θ) : α(θ)). Any failure of general position (α(θ) = 0, or a candidate that is not singular)
// is caught by exact checks mod the polynomial and a further change of coordinates is tried.
import { matDeterminant, matKernel } from '../exact/linalg.ts';
import { upolyRationalRoots } from '../exact/rational-roots.ts';
import {
  upolyAdd, upolyDegree, upolyDivExact, upolyGcd, upolyMul, upolyPrimitive, upolyPseudoRem, upolyScale,
  upolySquarefreePart, upolyTrim, type UPoly,
} from '../exact/upoly.ts';
import { content } from '../exact/integer.ts';
import { binaryToUPolyInS, binaryIsZero } from '../poly/binary.ts';
import { formAdd, formGradient, formMul, formPartial, formScale, type Form } from '../poly/form.ts';
import { formCoefficientsIn, formResultant } from '../poly/resultant.ts';
import { formOnParametrisation } from '../poly/substitute.ts';
import { formTransform, unimodularTrial, type Matrix3 } from '../poly/transform.ts';
import { orbitIsSingular, type ConjugatePoints } from './conjugate-points.ts';

export type OrbitKind = 'node' | 'double point with one tangent' | 'point of multiplicity 3 or more';

export interface SingularOrbit {
  readonly kind: OrbitKind;
  readonly orbit: ConjugatePoints;
}

/**
 * Changes of coordinates to try: the given ones first (small answers), then shears X ↦ X + kY (the
 * parameter becomes x − ky), then the fixed unimodular sequence.
 */
const TRIALS: readonly Matrix3[] = [
  unimodularTrial(0),
  ...[1n, -1n, 2n, -2n, 3n].map((k): Matrix3 => [[1n, k, 0n], [0n, 1n, 0n], [0n, 0n, 1n]]),
  ...[1, 2, 3, 4, 5, 6].map(unimodularTrial),
];

/**
 * w with w·a ≡ c (mod g) for a non-zero integer c, as { num: w, den: c }, by solving the linear system
 * w·a + q·g = c over Z (matKernel); null when a and g are not coprime. Assumes deg g ≥ 1.
 */
function inverseMod(a: UPoly, g: UPoly): { num: UPoly; den: bigint } | null {
  // lead(g)^e·a ≡ r (mod g) for the pseudo-remainder r, so the inverse of a is lead(g)^e·(inverse of r).
  const e = upolyDegree(a) >= upolyDegree(g) ? upolyDegree(a) - upolyDegree(g) + 1 : 0;
  const r = e > 0 ? upolyPseudoRem(a, g) : a;
  if (r.length === 0) return null;
  const n = g.length - 1;
  const k = Math.max(r.length - 1, 0);
  // Unknowns: w_0..w_(n−1), q_0..q_(k−1), and the constant c (last column, entering as −c).
  const rowsCount = n + k;
  const cols = n + k + 1;
  const m: bigint[][] = Array.from({ length: rowsCount }, () => new Array<bigint>(cols).fill(0n));
  for (let i = 0; i < n; i++) for (let j = 0; j < r.length; j++) if (i + j < rowsCount) m[i + j][i] += r[j];
  for (let i = 0; i < k; i++) for (let j = 0; j < g.length; j++) if (i + j < rowsCount) m[i + j][n + i] += g[j];
  m[0][cols - 1] = -1n;
  const ker = matKernel(m, cols);
  const v = ker.find((vec) => vec[cols - 1] !== 0n);
  if (!v) return null;
  return { num: upolyScale(upolyTrim(v.slice(0, n)), g[g.length - 1] ** BigInt(e)), den: v[cols - 1] };
}

/** Coefficients in Y of G as polynomials in x = X/Z (Z = 1), index = power of Y. */
function coefficientsInY(g: Form): UPoly[] {
  return formCoefficientsIn(g, 1).map((b) => binaryToUPolyInS(b));
}

/**
 * The first subresultant S1 = α·Y + β of A, B ∈ Z[x][Y] (coefficient lists by power of Y, both of degree
 * ≥ 2): α and β are the determinants of the Sylvester submatrix of Y^(n−2)A..A, Y^(m−2)B..B on the
 * columns Y^(m+n−2)..Y^2 and then Y^1 (for α) or Y^0 (for β) (Cox, Little, O'Shea, ch. 3 §5, Exercise 14
 * on subresultants; common practice).
 */
function firstSubresultant(a: readonly UPoly[], b: readonly UPoly[]): [UPoly, UPoly] {
  const m = a.length - 1;
  const n = b.length - 1;
  const size = m + n - 2;
  // Rows: Y^(n−2)A .. A, Y^(m−2)B .. B in the basis Y^(m+n−2) .. Y^0.
  const rows: UPoly[][] = [];
  for (let s = n - 2; s >= 0; s--) rows.push(Array.from({ length: m + n - 1 }, (_, c) => a[m + n - 2 - c - s] ?? []));
  for (let s = m - 2; s >= 0; s--) rows.push(Array.from({ length: m + n - 1 }, (_, c) => b[m + n - 2 - c - s] ?? []));
  // Columns Y^(m+n−2) .. Y^2 are the first size − 1; the last is Y^1 (for α) or Y^0 (for β).
  const pick = (last: number) => rows.map((r) => [...r.slice(0, size - 1), r[m + n - 2 - last]]);
  return [polyDeterminant(pick(1)), polyDeterminant(pick(0))];
}

/** Determinant of a square matrix over Z[x]: evaluate at 0, 1, …, (degree bound) and interpolate exactly. */
function polyDeterminant(m: readonly (readonly UPoly[])[]): UPoly {
  const n = m.length;
  if (n === 0) return [1n];
  // Degree bound: the sum over rows of the largest entry degree.
  const bound = m.reduce((s, row) => s + Math.max(0, ...row.map((e) => e.length - 1)), 0);
  const xs: bigint[] = [];
  const ys: bigint[] = [];
  for (let k = 0; k <= bound; k++) {
    const x = BigInt(k);
    xs.push(x);
    ys.push(matDeterminant(m.map((row) => row.map((e) => evalAt(e, x)))));
  }
  return interpolate(xs, ys);
}

function evalAt(p: readonly bigint[], x: bigint): bigint {
  let acc = 0n;
  for (let i = p.length - 1; i >= 0; i--) acc = acc * x + p[i];
  return acc;
}

/** The integer polynomial through (xs[i], ys[i]) with xs = 0, 1, 2, ... (Newton's divided differences, exact). */
function interpolate(xs: readonly bigint[], ys: readonly bigint[]): UPoly {
  const n = xs.length;
  // Divided differences over Q kept as numerators over k!: with unit spacing, Δ^k y / k! is the Newton
  // coefficient; the result has integer coefficients because the determinant is an integer polynomial.
  const diff = ys.slice();
  const coef: bigint[] = [];
  const fact: bigint[] = [1n];
  for (let k = 1; k < n; k++) fact.push(fact[k - 1] * BigInt(k));
  for (let k = 0; k < n; k++) {
    coef.push(diff[0]);
    for (let i = 0; i < n - k - 1; i++) diff[i] = diff[i + 1] - diff[i];
  }
  // p(x) = Σ coef[k]/k! · x(x−1)…(x−k+1); accumulate with denominator n!.
  const scale = fact[n - 1];
  let acc: UPoly = [];
  let falling: UPoly = [1n];
  for (let k = 0; k < n; k++) {
    acc = upolyAdd(acc, upolyScale(falling, (coef[k] * scale) / fact[k]));
    falling = upolyMul(falling, [-xs[k], 1n]);
  }
  return upolyTrim(acc.map((c) => c / scale));
}

/** p mod g over Q, scaled to integers; the scale is a positive power of lead(g) (assumes g non-constant). */
function reduceMod(p: UPoly, g: UPoly, target: number): UPoly {
  // Pseudo-remainders scale by lead(g)^(deg p − deg g + 1); bring every result to lead(g)^target.
  const lead = g[g.length - 1];
  const dp = p.length - 1;
  const dg = g.length - 1;
  if (dp < dg) return upolyScale(p, lead ** BigInt(target));
  const r = upolyPseudoRem(p, g);
  const used = dp - dg + 1;
  return upolyScale(r, lead ** BigInt(target - used));
}

function orbitAt(coords: readonly UPoly[], g: UPoly, m: Matrix3): ConjugatePoints {
  const target = Math.max(...coords.map((c) => c.length)) + 1;
  const red = coords.map((c) => reduceMod(c, g, target));
  // Back to F's coordinates: a point p of G = F∘M is M·p on F.
  const back = [0, 1, 2].map((i) => upolyAdd(upolyAdd(upolyScale(red[0], m[i][0]), upolyScale(red[1], m[i][1])), upolyScale(red[2], m[i][2])));
  const c = content(back.flat());
  const prim = c > 1n ? back.map((x) => x.map((v) => v / c)) : back;
  return { poly: g, coords: [upolyTrim(prim[0]), upolyTrim(prim[1]), upolyTrim(prim[2])] };
}

/** The values at the orbit of a form (as a polynomial in θ, not reduced). */
function formAtOrbit(f: Form, orbit: ConjugatePoints): UPoly {
  const e = Math.max(...orbit.coords.map((c) => c.length - 1), 0);
  const asBinary = orbit.coords.map((c) => Array.from({ length: e + 1 }, (_, i) => c[e - i] ?? 0n));
  return binaryToUPolyInS(formOnParametrisation(f, asBinary[0], asBinary[1], asBinary[2]));
}

/** The factor of g whose roots make every form in `fs` vanish at the orbit. */
function commonVanishing(fs: readonly Form[], orbit: ConjugatePoints): UPoly {
  let h = orbit.poly;
  for (const f of fs) {
    if (upolyDegree(h) < 1) break;
    const v = formAtOrbit(f, orbit);
    if (v.length > 0) h = upolyGcd(h, v);
  }
  return upolyPrimitive(h);
}

function splitOrbit(orbit: ConjugatePoints, h: UPoly): [ConjugatePoints | null, ConjugatePoints | null] {
  if (upolyDegree(h) < 1) return [null, orbit];
  if (upolyDegree(h) === upolyDegree(orbit.poly)) return [orbit, null];
  return [{ poly: h, coords: orbit.coords }, { poly: upolyPrimitive(upolyDivExact(orbit.poly, h)), coords: orbit.coords }];
}

/** Second partials (the Hessian matrix entries) and their 2x2 minors, for the kind of each point. */
function hessianForms(f: Form): { entries: Form[]; minors: Form[] } {
  const h = [0, 1, 2].map((i) => [0, 1, 2].map((j) => formPartial(formPartial(f, i as 0 | 1 | 2), j as 0 | 1 | 2)));
  const entries = [h[0][0], h[0][1], h[0][2], h[1][1], h[1][2], h[2][2]];
  const minors: Form[] = [];
  const pairs: [number, number][] = [[0, 1], [0, 2], [1, 2]];
  for (const [r1, r2] of pairs) {
    for (const [c1, c2] of pairs) {
      const p = formMul(h[r1][c1], h[r2][c2]);
      const q = formMul(h[r1][c2], h[r2][c1]);
      minors.push(formAdd(p, formScale(q, -1n)));
    }
  }
  return { entries, minors };
}

/**
 * The singular points of f that are not rational, as orbits by kind; null when general position could
 * not be reached in the trials (then only a count is known elsewhere). Assumes f reduced, degree 2..6.
 */
export function formSingularOrbits(f: Form): SingularOrbit[] | null {
  for (const m of TRIALS) {
    const g = m === TRIALS[0] ? f : formTransform(f, m);
    const [gx, gy, gz] = formGradient(g);
    const A = gy;
    const B = formAdd(gx, gz);
    const C = formAdd(gz, formScale(gx, -2n));
    const r1 = formResultant(A, B, 1);
    const r2 = formResultant(A, C, 1);
    if (binaryIsZero(r1) || binaryIsZero(r2)) continue;
    let x = upolyGcd(binaryToUPolyInS(r1), binaryToUPolyInS(r2));
    if (upolyDegree(x) < 1) return [];
    x = upolyPrimitive(upolySquarefreePart(x));
    // Above a rational x = r the singular points are the common roots in Y of the partials there: the
    // rational ones are found elsewhere; the rest form an orbit (r : u : 1) over the remaining factor.
    const found: ConjugatePoints[] = [];
    for (const r of distinctRationalRoots(x)) {
      x = upolyDivExact(x, [-r.num, r.den]);
      const rest = irrationalCommonRoots(g, r);
      if (rest) found.push(orbitAt([[r.num], upolyScale([0n, 1n], r.den), [r.den]], rest, m));
    }
    x = upolyPrimitive(x);
    if (upolyDegree(x) >= 1) {
      const ca = coefficientsInY(A);
      const cb = coefficientsInY(B);
      while (ca.length > 0 && ca[ca.length - 1].length === 0) ca.pop();
      while (cb.length > 0 && cb[cb.length - 1].length === 0) cb.pop();
      if (ca.length < 3 || cb.length < 3) continue;
      const [alpha, beta] = firstSubresultant(ca, cb);
      // α must not vanish at any root: otherwise the common root is not simple there.
      if (alpha.length === 0 || upolyDegree(upolyGcd(x, alpha)) >= 1) continue;
      // With w = 1/α mod x(θ): the point is (θ : −βw : 1), cleared of denominators (the shape lemma form).
      const inv = inverseMod(alpha, x);
      if (!inv) continue;
      found.push(orbitAt([upolyScale([0n, 1n], inv.den), upolyScale(upolyMul(beta, inv.num), -1n), [inv.den]], x, m));
    }
    if (!found.every((o) => orbitIsSingular(f, o))) continue;
    return found.flatMap((o) => orbitKinds(f, o));
  }
  return null;
}

/** Rational roots of a square-free polynomial, each once (the root finder's list is read as a set). */
function distinctRationalRoots(p: UPoly): { num: bigint; den: bigint }[] {
  const out: { num: bigint; den: bigint }[] = [];
  for (const { root } of upolyRationalRoots(p)) if (!out.some((q) => q.num === root.num && q.den === root.den)) out.push(root);
  return out;
}

/** The common roots in Y of the partials of g at x = r (Z = 1) that are not rational, as one factor. */
function irrationalCommonRoots(g: Form, r: { num: bigint; den: bigint }): UPoly | null {
  let h: UPoly | null = null;
  for (const p of formGradient(g)) {
    // p(r, Y, 1)·den^deg as a polynomial in Y.
    const coeffs = formCoefficientsIn(p, 1).map((b) => {
      let acc = 0n;
      const e = b.length - 1;
      for (let i = 0; i <= e; i++) acc += b[i] * r.num ** BigInt(e - i) * r.den ** BigInt(i);
      return acc * r.den ** BigInt(p.degree - e);
    });
    const q = upolyTrim(coeffs);
    if (q.length === 0) continue;
    h = h === null ? upolyPrimitive(q) : upolyGcd(h, q);
  }
  if (h === null || upolyDegree(h) < 1) return null;
  let rest = upolyPrimitive(upolySquarefreePart(h));
  for (const q of distinctRationalRoots(rest)) rest = upolyDivExact(rest, [-q.num, q.den]);
  rest = upolyPrimitive(rest);
  return upolyDegree(rest) >= 1 ? rest : null;
}

/** An orbit split by kind: multiplicity ≥ 3 (every second partial vanishes), one tangent, two tangents. */
function orbitKinds(f: Form, orbit: ConjugatePoints): SingularOrbit[] {
  const { entries, minors } = hessianForms(f);
  const [triple, doubles] = splitOrbit(orbit, commonVanishing(entries, orbit));
  const out: SingularOrbit[] = [];
  if (triple) out.push({ kind: 'point of multiplicity 3 or more', orbit: triple });
  if (doubles) {
    const [cusps, nodes] = splitOrbit(doubles, commonVanishing(minors, doubles));
    if (nodes) out.push({ kind: 'node', orbit: nodes });
    if (cusps) out.push({ kind: 'double point with one tangent', orbit: cusps });
  }
  return out;
}

