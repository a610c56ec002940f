// The pencil of cubics through eight points in doubles, for the live drag: its two kernel forms, the ninth
// base point, and a member that moves continuously with the points. Display only; the exact pencil
// (src/plane/linear-system.ts, src/cubic/nine.ts) replaces these values after the drop.
//
// Canonical form: the kernel forms are in reduced echelon shape, K1 with coefficient 1 at the first free
// monomial and 0 at the second, K2 the other way round — the shape of matKernel's basis before it is made
// primitive (src/exact/linalg.ts), so K1, K2 are proportional to the exact basis forms B1, B2.
import { monomials } from '../poly/form.ts';
import { cubicThirdFloat, f3IsZero, f3Sine, FLOAT_ZERO, monomialEchelonFloat, type F3, type FloatForm } from './float.ts';

export interface FloatPencil {
  readonly basis: readonly [FloatForm, FloatForm];
  /** The two free monomial indices (where K1, K2 are 1, 0 and 0, 1). */
  readonly free: readonly [number, number];
}

/** The cubics through eight float points as a pencil; null when the points impose fewer than eight conditions. */
export function pencilThroughPointsFloat(points: readonly F3[]): FloatPencil | null {
  const m = monomials(3);
  const n = m.length;
  const { rows, pivots } = monomialEchelonFloat(3, points);
  if (points.length !== 8 || pivots.length !== 8) return null;
  const free = m.map((_, c) => c).filter((c) => !pivots.includes(c));
  const kernel = free.map((f) => {
    const v = new Array<number>(n).fill(0);
    v[f] = 1;
    pivots.forEach((c, i) => (v[c] = -rows[i][f] / rows[i][c]));
    return { degree: 3, coeffs: v } as FloatForm;
  });
  return { basis: [kernel[0], kernel[1]], free: [free[0], free[1]] };
}

/**
 * The ninth base point by chords on one member E of the pencil: ((p1*p2)*(p3*p4)) * ((p5*p6)*(p7*p8))
 * (MATH.md, nine points). Why it holds: with a flex of E as origin, P*Q = −(P+Q) and the nine base points
 * sum to 0 (they are cut out by a cubic), so the right side is −(p1 + … + p8) = p9 (Silverman–Tate, ch. I).
 * The member K1 + φ·K2 (φ the golden ratio) is generic: smooth at the base points unless the pencil is special.
 */
export function ninthPointFloat(points: readonly F3[]): F3 | null {
  const pencil = pencilThroughPointsFloat(points);
  if (!pencil) return null;
  const phi = (1 + Math.sqrt(5)) / 2;
  const [k1, k2] = pencil.basis;
  const e: FloatForm = { degree: 3, coeffs: k1.coeffs.map((c, i) => c + phi * k2.coeffs[i]) };
  const star = (a: F3 | null, b: F3 | null): F3 | null => {
    if (!a || !b) return null;
    const c = cubicThirdFloat(e, a, b);
    return f3IsZero(c) || c.some((x) => !Number.isFinite(x)) ? null : c;
  };
  const p = points;
  // Two equal points make the chord a tangent; cubicThirdFloat handles that, but a repeated base point
  // leaves no ninth point at all.
  for (let a = 0; a < 8; a++) for (let b = a + 1; b < 8; b++) if (f3Sine(p[a], p[b]) < FLOAT_ZERO) return null;
  return star(star(star(p[0], p[1]), star(p[2], p[3])), star(star(p[4], p[5]), star(p[6], p[7])));
}

/**
 * The member of the float pencil that continues `was` (the member's last coefficients): the orthogonal
 * projection of `was` onto the span of K1, K2, i.e. the member nearest the last one. Why not s·K1 + t·K2:
 * the exact member is s·B1 + t·B2 with B1, B2 made primitive, whose scales jump with the arithmetic of the
 * points; the member nearest the last one moves continuously, starts at the exact member, and the exact
 * scales are taken up again after the drop. Without `was`, s·K1 + t·K2.
 */
export function pencilMemberFloat(points: readonly F3[], s: number, t: number, was?: readonly number[]): FloatForm | null {
  const pencil = pencilThroughPointsFloat(points);
  if (!pencil) return null;
  const [k1, k2] = pencil.basis;
  let a = s;
  let b = t;
  if (was && was.length === k1.coeffs.length && was.every(Number.isFinite)) {
    const w = Math.max(...was.map(Math.abs));
    const dot = (x: readonly number[], y: readonly number[]): number => x.reduce((acc, c, i) => acc + c * y[i], 0);
    const u = was.map((c) => c / (w || 1));
    const g11 = dot(k1.coeffs, k1.coeffs);
    const g12 = dot(k1.coeffs, k2.coeffs);
    const g22 = dot(k2.coeffs, k2.coeffs);
    const r1 = dot(k1.coeffs, u);
    const r2 = dot(k2.coeffs, u);
    const det = g11 * g22 - g12 * g12;
    if (w > 0 && det > 0) {
      a = (g22 * r1 - g12 * r2) / det;
      b = (g11 * r2 - g12 * r1) / det;
    }
  }
  const coeffs = k1.coeffs.map((c, i) => a * c + b * k2.coeffs[i]);
  let scale = 0;
  for (const c of coeffs) scale = Math.max(scale, Math.abs(c));
  if (!(scale > 0) || !Number.isFinite(scale)) return null;
  return { degree: 3, coeffs: coeffs.map((c) => c / scale) };
}
