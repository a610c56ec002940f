// Exact landmarks of a plane curve for the tracer: where the real picture can change, decided in exact
// arithmetic and only then rounded to doubles (the tracer never sees a rational it would have to round).
//
// Canonical form: the shear s = p/q is the first of SHEAR_CANDIDATES (the tracer's list) for which the
// top-degree part F_d does not vanish at (s, 1), so G(u, v) = F(u + s v, v) has a constant non-zero
// coefficient of v^d: over a bounded range of u no branch escapes to infinity (no vertical asymptote in
// the sheared frame). The critical abscissae are the distinct real roots of D(u) = Res_v(G, ∂G/∂v), in
// increasing order, each with its multiplicity in D; a simple root of D is an ordinary fold (vertical
// tangent at a smooth point), while a singular point with non-vertical tangents makes a root of
// multiplicity μ + 1 >= 2 (Teissier's lemma on the polar curve: Brieskorn–Knörrer, Plane Algebraic Curves,
// §8.5, from memory). The abscissae of possible singular points are the real common roots of D and of
// Res_v(∂G/∂u, ∂G/∂v); the tracer locates the points on those lines. Points at infinity are the real
// roots of F_d, with the asymptote (tangent at a simple real point at infinity) when it is an affine line.
import { algebraicRealRoots, algebraicToNumber } from '../exact/algebraic.ts';
import { Degenerate, InvalidInput } from '../exact/errors.ts';
import { upolyGcd, upolySquarefreeFactorisation } from '../exact/upoly-gcd.ts';
import { upolyTrim, type UPoly } from '../exact/upoly.ts';
import { binaryFormRoots } from './binary-roots.ts';
import { formGradientAt, formPartial, formPrimitive, monomialIndex, type Form } from './form.ts';
import { formResultant } from './resultant.ts';
import { formTransform } from './transform.ts';

/** The shears tried, in order, as p/q; shaders-free-render/frame.ts uses the same list in doubles. */
export const LANDMARK_SHEARS: readonly [number, number][] = [
  [1, 7], [-2, 9], [3, 11], [-4, 13], [5, 17], [-6, 19], [7, 23], [-8, 29],
];

export interface PointAtInfinity {
  /** Direction (dx, dy) of the point (dx : dy : 0), unit length, dy >= 0. */
  readonly direction: [number, number];
  /** "X:Y:0" when the point is rational. */
  readonly exact: string | null;
  readonly multiplicity: number;
  /** The asymptote a x + b y + c = 0 as [a, b, c] (exact integers when the point is rational), or null. */
  readonly asymptote: [number, number, number] | null;
}

export interface CurveLandmarks {
  /** The shear as an exact fraction and as a double. */
  readonly shearExact: readonly [bigint, bigint];
  readonly shear: number;
  /** Critical abscissae u = x - s y (doubles), increasing. */
  readonly critical: number[];
  /** Multiplicity of each critical abscissa as a root of D. */
  readonly criticalMultiplicity: number[];
  /** The critical abscissae that can carry a singular point. */
  readonly singularLines: number[];
  readonly atInfinity: PointAtInfinity[];
}

export function curveLandmarks(f0: Form): CurveLandmarks {
  const d = f0.degree;
  if (d < 1) throw new InvalidInput('a curve needs degree 1 or more', 'equation');
  const f = formPrimitive(f0);
  const [p, q] = shearPick(f);
  // G(U, V, W) = F(qU + pV, qV, qW) = q^d F(U + sV, V, W).
  const g = formTransform(f, [[BigInt(q), BigInt(p), 0n], [0n, BigInt(q), 0n], [0n, 0n, BigInt(q)]]);
  const critical: number[] = [];
  const criticalMultiplicity: number[] = [];
  const singularLines: number[] = [];
  if (d >= 2) {
    const gv = formPartial(g, 1);
    const disc = dehomogenise(formResultant(g, gv, 1));
    if (disc.length === 0) {
      throw new Degenerate('the curve has a repeated component (its discriminant vanishes identically); enter it without the repeated factor', 'equation');
    }
    for (const { factor, multiplicity } of upolySquarefreeFactorisation(disc)) {
      for (const r of algebraicRealRoots(factor)) {
        critical.push(algebraicToNumber(r));
        criticalMultiplicity.push(multiplicity);
      }
    }
    const order = critical.map((_, i) => i).sort((a, b) => critical[a] - critical[b]);
    const c2 = order.map((i) => critical[i]);
    const m2 = order.map((i) => criticalMultiplicity[i]);
    critical.splice(0, critical.length, ...c2);
    criticalMultiplicity.splice(0, criticalMultiplicity.length, ...m2);
    const polar = dehomogenise(formResultant(formPartial(g, 0), gv, 1));
    const common = polar.length === 0 ? disc : upolyGcd(disc, polar);
    if (common.length > 1) for (const r of algebraicRealRoots(common)) singularLines.push(algebraicToNumber(r));
  }
  return {
    shearExact: [BigInt(p), BigInt(q)],
    shear: p / q,
    critical,
    criticalMultiplicity,
    singularLines,
    atInfinity: pointsAtInfinity(f),
  };
}

function shearPick(f: Form): [number, number] {
  const d = f.degree;
  for (const [p, q] of LANDMARK_SHEARS) {
    // q^d F_d(p/q, 1) = Σ c_i p^i q^(d-i) over the monomials x^i y^(d-i).
    let v = 0n;
    for (let i = 0; i <= d; i++) v += f.coeffs[monomialIndex(d, i, d - i)] * BigInt(p) ** BigInt(i) * BigInt(q) ** BigInt(d - i);
    if (v !== 0n) return [p, q];
  }
  // F_d has at most d roots and the list is longer than the highest degree handled.
  throw new Degenerate('no shear in the list avoids the points at infinity of this curve', 'equation');
}

// A binary form in (U, W) (coefficient of U^(n-i) W^i at index i) at W = 1, as a UPoly in u.
function dehomogenise(b: readonly bigint[]): UPoly {
  const n = b.length - 1;
  const out: bigint[] = [];
  for (let k = 0; k <= n; k++) out.push(b[n - k]);
  return upolyTrim(out);
}

function pointsAtInfinity(f: Form): PointAtInfinity[] {
  const d = f.degree;
  // F_d(x, y) as a binary form in (x, y): coefficient of x^(d-i) y^i.
  const top: bigint[] = [];
  for (let i = 0; i <= d; i++) top.push(f.coeffs[monomialIndex(d, d - i, i)]);
  if (top.every((c) => c === 0n)) return []; // the line at infinity itself is a component: no finite data
  const out: PointAtInfinity[] = [];
  for (const r of binaryFormRoots(top).roots) {
    let dx: number;
    let dy: number;
    let exact: string | null = null;
    let asymptote: [number, number, number] | null = null;
    if (r.point) {
      const [s, t] = r.point;
      exact = `${s}:${t}:0`;
      dx = Number(s);
      dy = Number(t);
      if (r.multiplicity === 1) {
        const [a, b, c] = formGradientAt(f, [s, t, 0n]);
        if (a !== 0n || b !== 0n) asymptote = [Number(a), Number(b), Number(c)];
      }
    } else if (r.real) {
      dx = algebraicToNumber(r.real);
      dy = 1;
    } else continue;
    const n = Math.hypot(dx, dy);
    const sgn = dy < 0 || (dy === 0 && dx < 0) ? -1 : 1;
    out.push({ direction: [(sgn * dx) / n, (sgn * dy) / n], exact, multiplicity: r.multiplicity, asymptote });
  }
  return out;
}

/**
 * The curve's coefficients as doubles for drawing, in the order of form.ts, scaled by a power of two so
 * that coefficients of any length stay finite (the curve is the same).
 */
export function formFloatCoefficients(f: Form): number[] {
  let bits = 0;
  for (const c of f.coeffs) bits = Math.max(bits, (c < 0n ? -c : c).toString(2).length);
  const shift = BigInt(Math.max(0, bits - 64));
  return f.coeffs.map((c) => Number(c >> shift) || (c === 0n ? 0 : Number(c) / 2 ** Number(shift)));
}
