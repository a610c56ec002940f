// Chord and tangent on a plane cubic: the third point where a line through two points of the curve
// meets it again, and the tangent line at a smooth point.
//
// Canonical form: every point returned is a primitive integer triple with first non-zero entry positive
// (src/plane/point.ts), so the same point comes out whatever route computed it. Formulas are fully
// projective (Silverman–Tate, Rational Points on Elliptic Curves, ch. I; Cassels, LMS Student Texts 24,
// ch. 7): expanding F(λP + μQ) = λ³F(P) + λ²μ Q·∇F(P) + λμ² P·∇F(Q) + μ³F(Q) gives the third
// root directly, with no special case for points at infinity.
import { Degenerate, InvalidInput, NotOnCurve, SingularPoint } from '../exact/errors.ts';
import { bigAbs, content, primitive } from '../exact/integer.ts';
import { formEval, formGradient, type Form } from '../poly/form.ts';
import { cross, dot, triple, tripleIsZero, tripleProportional, type Line, type Point } from '../plane/point.ts';

const GRADIENTS = new WeakMap<Form, readonly [Form, Form, Form]>();

/** The three partials of f, computed once per form object (group laws call this thousands of times). */
export function cubicGradientForms(f: Form): readonly [Form, Form, Form] {
  let g = GRADIENTS.get(f);
  if (!g) {
    g = formGradient(f);
    GRADIENTS.set(f, g);
  }
  return g;
}

/**
 * ∇F at an integer triple (no normalisation). For a cubic the six quadratic monomials are formed once
 * and shared by the three partials (the group law's inner loop: a third of the work of three formEvals).
 */
export function cubicGradientAt(f: Form, p: readonly bigint[]): [bigint, bigint, bigint] {
  const [fx, fy, fz] = cubicGradientForms(f);
  if (f.degree !== 3) {
    const q = p as readonly [bigint, bigint, bigint];
    return [formEval(fx, q), formEval(fy, q), formEval(fz, q)];
  }
  // Degree-2 monomial order of form.ts: X², XY, XZ, Y², YZ, Z².
  const [x, y, z] = p;
  const m0 = x * x, m1 = x * y, m2 = x * z, m3 = y * y, m4 = y * z, m5 = z * z;
  const ev = (c: readonly bigint[]) => c[0] * m0 + c[1] * m1 + c[2] * m2 + c[3] * m3 + c[4] * m4 + c[5] * m5;
  return [ev(fx.coeffs), ev(fy.coeffs), ev(fz.coeffs)];
}

/** F at an integer triple for a cubic: Euler's identity 3F(P) = P·∇F(P) reuses the gradient. */
export function cubicEval(f: Form, p: readonly bigint[]): bigint {
  if (f.degree !== 3) return formEval(f, p as readonly [bigint, bigint, bigint]);
  return dot(p, cubicGradientAt(f, p)) / 3n;
}

/** Throws unless f is a ternary cubic. */
export function cubicRequire(f: Form, where = 'curve'): void {
  if (f.degree !== 3) throw new InvalidInput(`expected a cubic, got a curve of degree ${f.degree}`, where);
  if (f.coeffs.every((c) => c === 0n)) throw new InvalidInput('the zero form is not a curve', where);
}

export function cubicContains(f: Form, p: Point): boolean {
  return formEval(f, p) === 0n;
}

/** Throws NotOnCurve / SingularPoint unless p is a smooth point of f. `name` is the argument's name. */
export function cubicRequireSmoothPoint(f: Form, p: Point, name = 'point', where = name): void {
  if (formEval(f, p) !== 0n) {
    throw new NotOnCurve(`${name} = ${p.join(':')} is not on the curve (F = ${formEval(f, p)} there)`, where);
  }
  if (tripleIsZero(cubicGradientAt(f, p))) {
    throw new SingularPoint(`${name} = ${p.join(':')} is a singular point of the curve; a smooth point is needed`, where);
  }
}

/** The tangent line at a smooth point p of f. */
export function cubicTangentAt(f: Form, p: Point, name = 'point'): Line {
  cubicRequire(f);
  cubicRequireSmoothPoint(f, p, name);
  const g = cubicGradientAt(f, p);
  return triple(g[0], g[1], g[2]);
}

/**
 * P * Q: the third point of f on the line PQ (the tangent at P when P = Q). Both points must be smooth
 * points of f. Degenerate when the line lies inside the curve (then the cubic contains that line).
 */
export function cubicThirdPoint(f: Form, p: Point, q: Point, names: readonly [string, string] = ['P', 'Q']): Point {
  cubicRequire(f);
  cubicRequireSmoothPoint(f, p, names[0]);
  cubicRequireSmoothPoint(f, q, names[1]);
  return tripleIsZero(cross(p, q)) ? tangentThird(f, p, names[0]) : chordThird(f, p, q, names);
}

/** The tangential point of a smooth point p: where the tangent at p meets the curve again (p itself at a flex). */
export function cubicTangentialPoint(f: Form, p: Point, name = 'P'): Point {
  cubicRequire(f);
  cubicRequireSmoothPoint(f, p, name);
  return tangentThird(f, p, name);
}

/** Is the smooth point p a flex of f (tangent meets with multiplicity 3)? */
export function cubicIsFlex(f: Form, p: Point): boolean {
  return tripleProportional(cubicTangentialPoint(f, p), p);
}

// Assumes p != q projectively, both on f and smooth, both primitive.
export function chordThird(f: Form, p: Point, q: Point, names: readonly [string, string] = ['P', 'Q']): Point {
  const r = chordThirdRaw(f, p, q, names);
  return triple(r[0], r[1], r[2]);
}

/**
 * P * Q as an integer triple that need not be primitive (internal tier: p != q projectively, both smooth
 * points of f, any non-zero scaling). The group law chains these and makes only its answer primitive.
 */
export function chordThirdRaw(f: Form, p: readonly bigint[], q: readonly bigint[], names: readonly [string, string] = ['P', 'Q']): bigint[] {
  const a = dot(p, cubicGradientAt(f, q));
  const b = dot(q, cubicGradientAt(f, p));
  const r = [a * p[0] - b * q[0], a * p[1] - b * q[1], a * p[2] - b * q[2]];
  if (tripleIsZero(r)) {
    throw new Degenerate(
      `the line through ${names[0]} and ${names[1]} lies inside the curve, so it has no third point`,
      `${names[0]}, ${names[1]}`,
    );
  }
  // Measured on random cubics: for primitive P, Q the content of aP − bQ is a multiple of c³, c the
  // content of P × Q (the index of ZP + ZQ in the integer points of the line), and what is left is
  // usually 1 (on curves of small discriminant always, in our runs). The division is checked, so it is
  // only a shortcut: chained steps skip the gcd of the result, and the answer is made primitive once.
  return divideCube(r, content(cross(p, q)));
}

// Assumes p a smooth primitive point of f.
export function tangentThird(f: Form, p: Point, name = 'P'): Point {
  const r = tangentThirdRaw(f, p, name);
  return triple(r[0], r[1], r[2]);
}

/** The tangential point of p as an integer triple that need not be primitive (internal tier, as chordThirdRaw). */
export function tangentThirdRaw(f: Form, p: readonly bigint[], name = 'P'): bigint[] {
  const g = cubicGradientAt(f, p);
  // D = g × e_i is the point of the tangent on the coordinate line X_i = 0; take i with p_i ≠ 0 smallest.
  let i = -1;
  for (let k = 0; k < 3; k++) {
    if (p[k] === 0n) continue;
    const e = [0n, 0n, 0n];
    e[k] = 1n;
    if (tripleIsZero(cross(g, e))) continue;
    if (i < 0 || bigAbs(p[k]) < bigAbs(p[i])) i = k;
  }
  let d: readonly bigint[];
  if (i >= 0) {
    const e = [0n, 0n, 0n];
    e[i] = 1n;
    d = cross(g, e);
  } else {
    d = cross(g, p);
    if (tripleIsZero(d)) d = cross(g, g[0] !== 0n && g[1] === 0n && g[2] === 0n ? [0n, 1n, 0n] : [1n, 0n, 0n]);
  }
  const gd = cubicGradientAt(f, d);
  const fd = dot(d, gd) / 3n;
  const pd = dot(p, gd);
  if (i >= 0 && fd !== 0n) {
    // d_i = 0, so r_i = fd·p_i and r_i/|p_i|³ = ±fd/p_i²: one smaller checked division for that entry.
    const w = bigAbs(p[i]);
    const w2 = w * w;
    const phi = fd / w2;
    if (phi * w2 === fd) {
      const w3 = w2 * w;
      const q: bigint[] = [0n, 0n, 0n];
      let exact = true;
      for (let j = 0; j < 3 && exact; j++) {
        if (j === i) {
          q[j] = p[i] < 0n ? -phi : phi;
          continue;
        }
        const e = fd * p[j] - pd * d[j];
        q[j] = e / w3;
        exact = q[j] * w3 === e;
      }
      if (exact) return q;
    }
  }
  const r = [fd * p[0] - pd * d[0], fd * p[1] - pd * d[1], fd * p[2] - pd * d[2]];
  if (tripleIsZero(r)) {
    throw new Degenerate(`the tangent line at ${name} lies inside the curve, so it has no third point`, name);
  }
  // With D on X_i = 0, p_i³ divides the result (measured on random cubics; checked before use).
  return divideCube(r, i >= 0 ? bigAbs(p[i]) : 1n);
}

/**
 * r divided by c³ when that divides every entry exactly; when it does not (the inputs carried a common
 * factor), r made primitive, so no stray factor outlives one step. The same projective point either way.
 */
export function divideCube(r: bigint[], c: bigint): bigint[] {
  if (c <= 1n) return r;
  const d = c * c * c;
  const q = r.map((x) => x / d);
  return q.every((x, k) => x * d === r[k]) ? q : primitive(r);
}
