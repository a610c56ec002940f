// Univariate polynomials in doubles, for drawing only: coefficient of t^i at index i (trailing zeros
// allowed). Real roots are found by derivative bracketing: between consecutive real roots of p' the
// polynomial is monotone, so each such interval holds at most one root, found by safeguarded Newton.
// This finds close simple roots that sampling would miss; a root of even multiplicity shows up as a
// zero of p' where p is negligible and is reported once, flagged `multiple`.

export type FloatPoly = number[];

export interface FloatRoot {
  readonly t: number;
  /** True when this is (numerically) a root of p and p' together. */
  readonly multiple: boolean;
}

export function fpolyDegree(p: ArrayLike<number>): number {
  let d = p.length - 1;
  while (d >= 0 && p[d] === 0) d--;
  return d;
}

export function fpolyEval(p: ArrayLike<number>, t: number): number {
  let s = 0;
  for (let i = p.length - 1; i >= 0; i--) s = s * t + p[i];
  return s;
}

/** Σ |p_i| |t|^i: the size of the terms, against which a value of p is judged negligible. */
export function fpolyMagnitude(p: ArrayLike<number>, t: number): number {
  const a = Math.abs(t);
  let s = 0;
  for (let i = p.length - 1; i >= 0; i--) s = s * a + Math.abs(p[i]);
  return s;
}

export function fpolyDerivative(p: ArrayLike<number>): FloatPoly {
  const out: number[] = [];
  for (let i = 1; i < p.length; i++) out.push(i * p[i]);
  return out;
}

/** Taylor coefficients of p at t: out[k] = p^(k)(t) / k!. */
export function fpolyTaylor(p: ArrayLike<number>, t: number): FloatPoly {
  const c = Array.from(p);
  const n = c.length;
  for (let k = 0; k < n; k++) for (let i = n - 2; i >= k; i--) c[i] += t * c[i + 1];
  return c;
}

/**
 * Smale's gamma of p at a point t: max over k >= 2 of |p^(k)(t) / (k! p'(t))|^(1/(k-1)). Other roots of
 * p lie at distance of order 1/gamma or more from a simple root, so a Newton step much shorter than
 * 1/gamma stays on the same root (Blum, Cucker, Shub, Smale, Complexity and Real Computation, ch. 8).
 */
export function fpolyGamma(taylor: ArrayLike<number>): number {
  const d1 = Math.abs(taylor[1] ?? 0);
  let g = 0;
  for (let k = 2; k < taylor.length; k++) {
    const c = Math.abs(taylor[k]);
    if (c === 0) continue;
    if (d1 === 0) return Infinity;
    const v = Math.pow(c / d1, 1 / (k - 1));
    if (v > g) g = v;
  }
  return g;
}

/** Cauchy's bound: every complex root has |t| < 1 + max |p_i / p_d|. */
export function fpolyRootBound(p: ArrayLike<number>): number {
  const d = fpolyDegree(p);
  let m = 0;
  for (let i = 0; i < d; i++) m = Math.max(m, Math.abs(p[i] / p[d]));
  return 1 + m;
}

/** The real roots of p in [lo, hi] (the whole line when omitted), ascending. */
export function fpolyRealRoots(p: ArrayLike<number>, lo?: number, hi?: number): FloatRoot[] {
  const d = fpolyDegree(p);
  if (d <= 0) return [];
  const q = Array.from(p).slice(0, d + 1);
  const bound = fpolyRootBound(q);
  const a = lo ?? -bound;
  const b = hi ?? bound;
  if (!(a <= b)) return [];
  return rootsIn(q, a, b);
}

// Assumes p has exact degree >= 1 and a <= b.
function rootsIn(p: FloatPoly, a: number, b: number): FloatRoot[] {
  const d = p.length - 1;
  if (d === 1) {
    const t = -p[0] / p[1];
    return t >= a && t <= b ? [{ t, multiple: false }] : [];
  }
  const dp = fpolyDerivative(p);
  const crit = rootsIn(dp, a, b).map((r) => r.t);
  const knots = [a, ...crit, b];
  const out: FloatRoot[] = [];
  const push = (t: number, multiple: boolean): void => {
    const last = out[out.length - 1];
    if (last && Math.abs(last.t - t) <= 1e-14 * Math.max(1, Math.abs(t))) {
      if (multiple) out[out.length - 1] = { t: last.t, multiple: true };
      return;
    }
    out.push({ t, multiple });
  };
  for (let k = 0; k + 1 < knots.length; k++) {
    const l = knots[k];
    const r = knots[k + 1];
    const fl = fpolyEval(p, l);
    const fr = fpolyEval(p, r);
    if (k > 0 && negligible(p, l, fl)) push(l, true);
    if (fl === 0 && k === 0) push(l, false);
    if ((fl < 0 && fr > 0) || (fl > 0 && fr < 0)) push(monotoneRoot(p, dp, l, r, fl), false);
    if (k + 1 === knots.length - 1 && fr === 0) push(r, false);
  }
  return out;
}

function negligible(p: FloatPoly, t: number, v: number): boolean {
  return Math.abs(v) <= 64 * Number.EPSILON * fpolyMagnitude(p, t);
}

// Assumes p is monotone on [l, r] with a sign change; bisection safeguards Newton.
function monotoneRoot(p: FloatPoly, dp: FloatPoly, l: number, r: number, fl: number): number {
  let lo = l;
  let hi = r;
  const sl = Math.sign(fl);
  let t = 0.5 * (lo + hi);
  for (let it = 0; it < 200; it++) {
    const v = fpolyEval(p, t);
    if (v === 0) return t;
    if (Math.sign(v) === sl) lo = t;
    else hi = t;
    const dv = fpolyEval(dp, t);
    let next = dv !== 0 ? t - v / dv : NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (next === t || hi - lo <= 4 * Number.EPSILON * Math.max(1, Math.abs(t))) return next;
    t = next;
  }
  return t;
}
