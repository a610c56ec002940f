// Multiplicity and tangent cone of a plane curve at a rational point, and the kind of a double point read
// off the cone.
//
// Canonical form: the tangent cone of F at a point P of multiplicity m is the primitive form
//   C(X) = Σ_{|α| = m} (m!/α!) ∂^α F(P) X^α            (degree m),
// the lowest-order term of F at P (Fulton, Algebraic Curves, ch. 3 §1). It is a cone with vertex P:
// C(λP + V) = C(V), because every derivative of order < m vanishes at P and Euler's identity turns each
// P·∇ into a multiple of a lower derivative. So C is the product of the tangent lines at P, and its
// restriction to any pencil of lines through P (a line D1D2 not through P) is the binary form of tangent
// directions. For a cubic and m = 2, C(X) ∝ Xᵀ Hess(P) X (MATH.md).
import { InvalidInput } from '../exact/errors.ts';
import { isqrt, isSquare } from '../exact/integer.ts';
import { triple, type Line, type Point } from '../plane/point.ts';
import { formEval, formPartial, formPrimitive, monomials, type Form } from '../poly/form.ts';
import { formOnLine } from '../poly/substitute.ts';

export interface TangentCone {
  /** Multiplicity m of the curve at P (0 when P is not on the curve). */
  readonly multiplicity: number;
  /** The cone C of degree m, primitive (the product of the tangent lines at P). */
  readonly cone: Form;
}

const FACTORIALS = [1n, 1n, 2n, 6n, 24n, 120n, 720n, 5040n];

/** ∂^α F for a multi-index α = (i, j, k). */
function formDerivative(f: Form, i: number, j: number, k: number): Form {
  let g = f;
  for (let a = 0; a < i; a++) g = formPartial(g, 0);
  for (let a = 0; a < j; a++) g = formPartial(g, 1);
  for (let a = 0; a < k; a++) g = formPartial(g, 2);
  return g;
}

/** The form Σ_{|α|=m} (m!/α!) ∂^αF(P) X^α = (X·∇)^m F(P), not normalised; zero when m is below the multiplicity. */
function polarTerm(f: Form, p: Point, m: number): Form {
  const coeffs = monomials(m).map(([i, j, k]) => {
    const c = formEval(formDerivative(f, i, j, k), p);
    return c === 0n ? 0n : (c * FACTORIALS[m]) / (FACTORIALS[i] * FACTORIALS[j] * FACTORIALS[k]);
  });
  return { degree: m, coeffs };
}

/** Multiplicity of the curve f = 0 at P and its tangent cone there. */
export function formTangentCone(f: Form, p: Point): TangentCone {
  if (f.degree > 7) throw new InvalidInput(`curves of degree ${f.degree} are beyond this module (at most 7)`);
  if (formEval(f, p) !== 0n) return { multiplicity: 0, cone: { degree: 0, coeffs: [1n] } };
  for (let m = 1; m <= f.degree; m++) {
    const c = polarTerm(f, p, m);
    if (c.coeffs.some((x) => x !== 0n)) return { multiplicity: m, cone: formPrimitive(c) };
  }
  throw new InvalidInput('the zero form defines no curve');
}

export function formMultiplicityAt(f: Form, p: Point): number {
  return formTangentCone(f, p).multiplicity;
}

/**
 * Two coordinate points D1, D2 spanning a line not through P: the pencil of lines through P is then
 * {P·(sD1 + tD2)}. The line Z = 0 is preferred, so for an affine P the parameter is the slope direction.
 */
export function pencilBasis(p: Point): [Point, Point] {
  const e: Point[] = [
    [1n, 0n, 0n],
    [0n, 1n, 0n],
    [0n, 0n, 1n],
  ];
  if (p[2] !== 0n) return [e[0], e[1]];
  if (p[0] !== 0n) return [e[1], e[2]];
  return [e[0], e[2]];
}

/** The cone restricted to the pencil sD1 + tD2 (a binary form of degree m: the tangent directions). */
export function coneOnPencil(cone: Form, d1: Point, d2: Point): bigint[] {
  return formOnLine(cone, d1, d2);
}

export type DoublePointShape =
  | { readonly shape: 'node'; readonly split: boolean; readonly real: 'crunode' | 'acnode'; readonly discriminant: bigint }
  | { readonly shape: 'one tangent'; readonly tangent: Line };

/**
 * The shape of a double point from its cone (multiplicity 2): two distinct tangents (a node: split over Q
 * when the discriminant of the tangent directions is a square; crunode when they are real, acnode when
 * complex conjugate) or one double tangent line (a cusp or worse: the caller decides with more of F).
 */
export function doublePointShape(p: Point, cone: Form): DoublePointShape {
  if (cone.degree !== 2) throw new InvalidInput(`a double point has a tangent cone of degree 2, got ${cone.degree}`);
  const [d1, d2] = pencilBasis(p);
  const [a, b, c] = coneOnPencil(cone, d1, d2);
  const disc = b * b - 4n * a * c;
  if (disc !== 0n) return { shape: 'node', split: isSquare(disc), real: disc > 0n ? 'crunode' : 'acnode', discriminant: disc };
  // A square a s² + b st + c t² = (αs + βt)²/…: its root (s:t) = (−b : 2a), or (1 : 0) when a = 0.
  const root: [bigint, bigint] = a !== 0n ? [-b, 2n * a] : [1n, 0n];
  const d = [0, 1, 2].map((i) => root[0] * d1[i] + root[1] * d2[i]);
  const l = crossLine(p, d);
  return { shape: 'one tangent', tangent: l };
}

function crossLine(p: readonly bigint[], q: readonly bigint[]): Line {
  return triple(p[1] * q[2] - p[2] * q[1], p[2] * q[0] - p[0] * q[2], p[0] * q[1] - p[1] * q[0]);
}

/**
 * The tangent lines of a split node (both rational), from the square discriminant of the cone on the
 * pencil. Assumes `doublePointShape` said split.
 */
export function splitNodeTangents(p: Point, cone: Form): [Line, Line] {
  const [d1, d2] = pencilBasis(p);
  const [a, b, c] = coneOnPencil(cone, d1, d2);
  const r = isqrt(b * b - 4n * a * c);
  const roots: [bigint, bigint][] = a !== 0n ? [[-b + r, 2n * a], [-b - r, 2n * a]] : [[1n, 0n], [-c, b]];
  const lines = roots.map(([s, t]) => crossLine(p, [0, 1, 2].map((i) => s * d1[i] + t * d2[i])));
  return [lines[0], lines[1]];
}

/**
 * An ordinary cusp (A2) at a double point with one tangent ℓ: the third directional derivative along ℓ
 * is non-zero, i.e. in local coordinates with cone y² the term x³ is present. For a cubic this says
 * F(D) ≠ 0 for D ≠ P on ℓ: ℓ is not a component (MATH.md).
 */
export function tangentIsOrdinaryCusp(f: Form, p: Point, tangent: Line): boolean {
  const [d1, d2] = pencilBasis(p);
  // A point D ≠ P on the tangent: the meet of ℓ with the line D1D2.
  const base = crossLine(d1, d2);
  const d = crossLineRaw(tangent, base);
  const third = polarTerm(f, p, 3);
  return formEval(third, [d[0], d[1], d[2]]) !== 0n;
}

function crossLineRaw(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Discriminant of a binary cubic a s³ + b s²t + c st² + d t³ (zero exactly when two roots meet). */
export function binaryCubicDiscriminant([a, b, c, d]: readonly bigint[]): bigint {
  return b * b * c * c - 4n * a * c * c * c - 4n * b * b * b * d - 27n * a * a * d * d + 18n * a * b * c * d;
}
