// Floating-point shadows of the constructions, for the live drag and for objects built from algebraic
// points. Nothing here decides anything: values made here carry the status 'approximate' (or 'algebraic'
// when they stand for a real algebraic object), and exact recomputation replaces them after a drop.
//
// Canonical form: a float point or line is a triple scaled to Euclidean length 1 (sign unfixed).
import { monomialIndex, monomials, type Form } from '../poly/form.ts';
import type { PointApprox } from './types.ts';

/** A ternary form with float coefficients, in the monomial order of src/poly/form.ts. */
export interface FloatForm {
  readonly degree: number;
  readonly coeffs: readonly number[];
}

export type F3 = readonly [number, number, number];

export function f3Normalise(v: readonly number[]): F3 {
  const n = Math.hypot(v[0], v[1], v[2]);
  return n === 0 || !Number.isFinite(n) ? [0, 0, 0] : [v[0] / n, v[1] / n, v[2] / n];
}

export function f3Cross(a: F3, b: F3): F3 {
  return f3Normalise([a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]]);
}

export function f3Dot(a: F3, b: F3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

export function f3IsZero(a: F3): boolean {
  return a[0] === 0 && a[1] === 0 && a[2] === 0;
}

/** Relative size below which a float triple counts as zero (two points taken as equal, and so on). */
export const FLOAT_ZERO = 1e-10;

export function f3FromBig(t: readonly bigint[]): F3 {
  // Scale by the largest entry first so that huge integers still give a unit vector.
  const bits = Math.max(...t.map((x) => (x < 0n ? -x : x).toString(2).length));
  const shift = BigInt(Math.max(0, bits - 60));
  return f3Normalise(t.map((x) => Number(x >> shift) || Number(x) / 2 ** Number(shift)));
}

export function f3ToApprox(p: F3): PointApprox {
  const scale = Math.max(Math.abs(p[0]), Math.abs(p[1]), 1e-300);
  if (Math.abs(p[2]) <= 1e-12 * scale) return { x: p[0], y: p[1], finite: false };
  return { x: p[0] / p[2], y: p[1] / p[2], finite: true };
}

export function f3FromApprox(a: PointApprox): F3 {
  return a.finite ? f3Normalise([a.x, a.y, 1]) : f3Normalise([a.x, a.y, 0]);
}

const FLOATS = new WeakMap<Form, FloatForm>();

/** The float shadow of an exact form, made once per form object. */
export function formToFloat(f: Form): FloatForm {
  let g = FLOATS.get(f);
  if (!g) {
    const bits = Math.max(...f.coeffs.map((c) => (c < 0n ? -c : c).toString(2).length));
    const shift = BigInt(Math.max(0, bits - 60)); // keep huge coefficients finite; the curve is unchanged
    g = { degree: f.degree, coeffs: f.coeffs.map((c) => Number(c >> shift)) };
    FLOATS.set(f, g);
  }
  return g;
}

export function floatFormEval(f: FloatForm, x: number, y: number, z: number): number {
  const m = monomials(f.degree);
  let s = 0;
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c !== 0) s += c * x ** m[k][0] * y ** m[k][1] * z ** m[k][2];
  }
  return s;
}

const GRADIENTS = new WeakMap<FloatForm, readonly [FloatForm, FloatForm, FloatForm]>();

/** ∂F/∂(X, Y or Z) of a float form. */
export function floatFormPartial(f: FloatForm, v: 0 | 1 | 2): FloatForm {
  const d = f.degree;
  const out = new Array<number>(((d) * (d + 1)) / 2).fill(0);
  const m = monomials(d);
  for (let k = 0; k < m.length; k++) {
    const e = m[k][v];
    if (f.coeffs[k] === 0 || e === 0) continue;
    out[monomialIndex(d - 1, m[k][0] - (v === 0 ? 1 : 0), m[k][1] - (v === 1 ? 1 : 0))] += f.coeffs[k] * e;
  }
  return { degree: d - 1, coeffs: out };
}

export function formGradientFloat(f: FloatForm, p: F3): F3 {
  let g = GRADIENTS.get(f);
  if (!g) {
    g = [floatFormPartial(f, 0), floatFormPartial(f, 1), floatFormPartial(f, 2)];
    GRADIENTS.set(f, g);
  }
  return [floatFormEval(g[0], p[0], p[1], p[2]), floatFormEval(g[1], p[0], p[1], p[2]), floatFormEval(g[2], p[0], p[1], p[2])];
}

/** Third point of the line through P and Q on a cubic (tangent when P ≈ Q): R = (P·∇F(Q))P − (Q·∇F(P))Q,
 * Silverman–Tate, ch. I (as in src/cubic/chord.ts, here in doubles). */
export function cubicThirdFloat(f: FloatForm, p: F3, q: F3): F3 {
  if (f3Sine(p, q) < FLOAT_ZERO) return cubicTangentThirdFloat(f, p);
  const a = f3Dot(p, formGradientFloat(f, q));
  const b = f3Dot(q, formGradientFloat(f, p));
  return f3Normalise([a * p[0] - b * q[0], a * p[1] - b * q[1], a * p[2] - b * q[2]]);
}

function cubicTangentThirdFloat(f: FloatForm, p: F3): F3 {
  const g = f3Normalise(formGradientFloat(f, p));
  let d = f3Cross(g, p);
  if (f3IsZero(d)) d = f3Cross(g, [1, 0, 0]);
  const fd = floatFormEval(f, d[0], d[1], d[2]);
  const pd = f3Dot(p, formGradientFloat(f, d));
  return f3Normalise([fd * p[0] - pd * d[0], fd * p[1] - pd * d[1], fd * p[2] - pd * d[2]]);
}

export function cubicSumFloat(f: FloatForm, o: F3, p: F3, q: F3): F3 {
  return cubicThirdFloat(f, o, cubicThirdFloat(f, p, q));
}

export function cubicNegativeFloat(f: FloatForm, o: F3, p: F3): F3 {
  return cubicThirdFloat(f, p, cubicThirdFloat(f, o, o));
}

/** nP by double-and-add in doubles; |n| is kept small by the callers (drawing only). */
export function cubicMultipleFloat(f: FloatForm, o: F3, p: F3, n: number): F3 {
  let base = n < 0 ? cubicNegativeFloat(f, o, p) : p;
  let k = Math.abs(n);
  let acc: F3 = o;
  while (k > 0) {
    if (k & 1) acc = cubicSumFloat(f, o, acc, base);
    k >>= 1;
    if (k > 0) base = cubicSumFloat(f, o, base, base);
  }
  return acc;
}

/** The real points where a line meets a curve, in doubles (multiplicities not resolved). */
export function lineCurveMeetFloat(f: FloatForm, line: F3): F3[] {
  const [p, q] = lineSpan(line);
  // F(p + u q) as a polynomial in u, coefficient of u^i at index i.
  const poly = new Array<number>(f.degree + 1).fill(0);
  const m = monomials(f.degree);
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c === 0) continue;
    let term = [c];
    for (let v = 0; v < 3; v++) for (let e = 0; e < m[k][v]; e++) term = polyMulLinear(term, p[v], q[v]);
    term.forEach((t, i) => (poly[i] += t));
  }
  const out: F3[] = [];
  const scale = Math.max(...poly.map(Math.abs));
  let deg = poly.length - 1;
  while (deg > 0 && Math.abs(poly[deg]) <= 1e-12 * scale) {
    out.push(q); // a root at u = ∞ is the point q itself
    deg--;
  }
  for (const u of polyRealRoots(poly.slice(0, deg + 1))) out.push(f3Normalise([p[0] + u * q[0], p[1] + u * q[1], p[2] + u * q[2]]));
  return out;
}

function polyMulLinear(a: number[], c0: number, c1: number): number[] {
  const out = new Array<number>(a.length + 1).fill(0);
  a.forEach((x, i) => {
    out[i] += x * c0;
    out[i + 1] += x * c1;
  });
  return out;
}

/** Two points spanning a line, chosen away from the coordinate vectors the line nearly contains. */
function lineSpan(l: F3): [F3, F3] {
  const e: F3[] = [
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  const c = e.map((v) => f3Cross(l, v)).map((v, i) => ({ v, n: Math.abs(l[i]) }));
  c.sort((a, b) => a.n - b.n);
  return [c[2].v, f3Cross(l, c[2].v)];
}

/** Real roots of a polynomial (coefficient of u^i at index i) by Durand–Kerner, then one Newton polish.
 * Works in place on typed arrays: it runs for every meet point on every pointer move of a drag. */
export function polyRealRoots(poly: readonly number[]): number[] {
  const n = poly.length - 1;
  if (n < 1) return [];
  const lead = poly[n];
  const a = new Float64Array(n + 1);
  let bound = 1;
  for (let k = 0; k <= n; k++) a[k] = poly[k] / lead;
  for (let k = 0; k < n; k++) bound = Math.max(bound, 1 + Math.abs(a[k]));
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  // Start on a circle, off any symmetry axis (the usual Durand–Kerner start).
  for (let k = 0; k < n; k++) {
    re[k] = 0.5 * bound * Math.cos(0.4 + (2 * Math.PI * k) / n);
    im[k] = 0.5 * bound * Math.sin(0.4 + (2 * Math.PI * k) / n);
  }
  for (let it = 0; it < 200; it++) {
    let moved = 0;
    for (let i = 0; i < n; i++) {
      const zr = re[i];
      const zi = im[i];
      let pr = a[n];
      let pi = 0;
      for (let k = n - 1; k >= 0; k--) {
        const t = pr * zr - pi * zi + a[k];
        pi = pr * zi + pi * zr;
        pr = t;
      }
      let dr = 1;
      let di = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const xr = zr - re[j];
        const xi = zi - im[j];
        const t = dr * xr - di * xi;
        di = dr * xi + di * xr;
        dr = t;
      }
      const dd = dr * dr + di * di || 1e-300;
      const qr = (pr * dr + pi * di) / dd;
      const qi = (pi * dr - pr * di) / dd;
      re[i] = zr - qr;
      im[i] = zi - qi;
      moved = Math.max(moved, Math.abs(qr) + Math.abs(qi));
    }
    if (moved < 1e-14 * bound) break;
  }
  const out: number[] = [];
  for (let k = 0; k < n; k++) {
    if (Math.abs(im[k]) <= 1e-7 * Math.max(1, Math.hypot(re[k], im[k]))) out.push(newtonPolish(poly, re[k]));
  }
  return out;
}

function newtonPolish(poly: readonly number[], x: number): number {
  for (let it = 0; it < 3; it++) {
    let v = 0;
    let d = 0;
    for (let k = poly.length - 1; k >= 0; k--) {
      d = d * x + v;
      v = v * x + poly[k];
    }
    if (d === 0) break;
    x -= v / d;
  }
  return x;
}

/** Move an affine point onto the real curve F = 0 by Newton steps along the gradient (drag preview). */
export function curveProjectFloat(f: FloatForm, x: number, y: number): { x: number; y: number } | null {
  for (let it = 0; it < 12; it++) {
    const v = floatFormEval(f, x, y, 1);
    const g = formGradientFloat(f, [x, y, 1]);
    const n2 = g[0] * g[0] + g[1] * g[1];
    if (n2 === 0 || !Number.isFinite(n2)) return null;
    x -= (v * g[0]) / n2;
    y -= (v * g[1]) / n2;
  }
  const ok = Number.isFinite(x) && Number.isFinite(y);
  return ok ? { x, y } : null;
}

/**
 * The monomial matrix of degree d at float points, reduced to row echelon form by Gaussian elimination with
 * partial pivoting (each pivot row made the only non-zero entry of its column); `pivots[i]` is the column of
 * row i's pivot. Entries below 1e-12 count as zero: drawing only, never a decision.
 */
export function monomialEchelonFloat(d: number, points: readonly F3[]): { rows: number[][]; pivots: number[] } {
  const m = monomials(d);
  const rows = points.map((p) => m.map((e) => p[0] ** e[0] * p[1] ** e[1] * p[2] ** e[2]));
  const n = m.length;
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < n && r < rows.length; c++) {
    let best = r;
    for (let i = r + 1; i < rows.length; i++) if (Math.abs(rows[i][c]) > Math.abs(rows[best][c])) best = i;
    if (Math.abs(rows[best][c]) < 1e-12) continue;
    [rows[r], rows[best]] = [rows[best], rows[r]];
    for (let i = 0; i < rows.length; i++) {
      if (i === r) continue;
      const k = rows[i][c] / rows[r][c];
      if (k !== 0) for (let j = c; j < n; j++) rows[i][j] -= k * rows[r][j];
    }
    pivots.push(c);
    r++;
  }
  return { rows, pivots };
}

/** The curve of degree d through n = (d+1)(d+2)/2 − 1 points in doubles: the kernel vector of the n × (n+1)
 * monomial matrix by Gaussian elimination with partial pivoting. Null when the points are (nearly) special. */
export function curveThroughPointsFloat(d: number, points: readonly F3[]): FloatForm | null {
  const m = monomials(d);
  const n = m.length;
  const { rows, pivots } = monomialEchelonFloat(d, points);
  if (pivots.length !== n - 1) return null;
  const free = m.findIndex((_, c) => !pivots.includes(c));
  const v = new Array<number>(n).fill(0);
  v[free] = 1;
  pivots.forEach((c, i) => (v[c] = -rows[i][free] / rows[i][c]));
  const scale = Math.max(...v.map(Math.abs));
  return { degree: d, coeffs: v.map((x) => x / scale) };
}

/** |a × b| for unit a, b: the sine of the angle between them, 0 when they are the same projective point. */
export function f3Sine(a: F3, b: F3): number {
  return Math.hypot(a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]);
}
