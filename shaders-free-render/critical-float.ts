// Critical points of the projection (U, V) -> U of the curve G = 0, found in doubles, for input that comes
// without exact landmarks. The critical abscissae are the real zeros of R(U) = Res_V(G, G_V): R is
// interpolated at Chebyshev nodes over the U-range, its real roots and its extrema (a node or a cusp is
// a root of even order, seen as an extremum with R near 0) are candidates, and a candidate is accepted
// only when Newton's method on (G, G_V) = 0 or (G_U, G_V) = 0 converges to a real point there.
// Canonical form of the answer: abscissae ascending without repeats; singular points as frame (U, V).
import { fpolyDerivative, fpolyRealRoots } from './upoly-float.ts';
import { frameAtU, frameEval, frameHessian, type Frame } from './frame.ts';

// Values of G are judged against the size of its terms, but never against less than this: near the
// frame's origin every term is small, and a singular point there must still be recognised.
const MAG_FLOOR = 1e-3;

// Critical abscissae closer than this (in frame units, about 1e-7 pixel) are one event seen twice.
export const ABSCISSA_MERGE = 1e-10;

export interface FrameCritical {
  readonly abscissae: number[];
  readonly singular: [number, number][];
}

export function criticalFloatSearch(fr: Frame, u0: number, u1: number): FrameCritical {
  const d = fr.degree;
  if (d <= 1 || !(u1 > u0)) return { abscissae: [], singular: [] };
  const n = d * (d - 1);
  const mid = 0.5 * (u0 + u1);
  const half = 0.5 * (u1 - u0);
  const values: number[] = [];
  for (let k = 0; k <= n; k++) {
    const t = Math.cos((Math.PI * (k + 0.5)) / (n + 1));
    const p = frameAtU(fr, mid + half * t);
    values.push(sylvesterDet(p, fpolyDerivative(p)));
  }
  const r = chebToMonomial(chebCoefficients(values));
  const cands = new Set<number>();
  for (const root of fpolyRealRoots(r, -1, 1)) cands.add(root.t);
  for (const root of fpolyRealRoots(fpolyDerivative(r), -1, 1)) cands.add(root.t);
  const crit: [number, number][] = [];
  const sing: [number, number][] = [];
  const ev = new Float64Array(4);
  for (const t of cands) {
    const u = mid + half * t;
    const p = frameAtU(fr, u);
    const vs = fpolyRealRoots(fpolyDerivative(p)).map((x) => x.t);
    for (const x of fpolyRealRoots(p)) if (x.multiple) vs.push(x.t);
    for (const v of vs) {
      const s = singularRefine(fr, u, v, ev);
      if (s) {
        pushNew(sing, s);
        pushNew(crit, s);
      }
      const c = foldRefine(fr, u, v, ev);
      if (c) pushNew(crit, c);
    }
  }
  const abscissae = crit.map((c) => c[0]).filter((u) => u > u0 && u < u1).sort((a, b) => a - b);
  const unique: number[] = [];
  for (const u of abscissae) if (!unique.length || u - unique[unique.length - 1] > ABSCISSA_MERGE) unique.push(u);
  return { abscissae: unique, singular: sing };
}

// Newton converges only linearly at a cusp or worse, so one singular point is found several times,
// up to eps^(1/3) apart at a tacnode: points within SAME_POINT (frame units: the view is [-1, 1]^2, so
// this is about a twentieth of a pixel) are one.
const SAME_POINT = 1e-4;

function pushNew(list: [number, number][], p: [number, number]): void {
  for (const q of list) if (Math.abs(q[0] - p[0]) + Math.abs(q[1] - p[1]) < SAME_POINT) return;
  list.push(p);
}

/**
 * Singular points on given vertical lines U = c (the core's exact abscissae of possible singular points):
 * Newton on (G_U, G_V) from every multiple root of G(c, ·) and every real root of G_V(c, ·), kept when it
 * converges to a point of the curve on (or within SAME_POINT of) the line.
 */
export function singularOnLines(fr: Frame, lines: readonly number[]): [number, number][] {
  const ev = new Float64Array(4);
  const out: [number, number][] = [];
  for (const c of lines) {
    const p = frameAtU(fr, c);
    const vs = fpolyRealRoots(fpolyDerivative(p)).map((x) => x.t);
    for (const x of fpolyRealRoots(p)) if (x.multiple) vs.push(x.t);
    for (const v of vs) {
      const sp = singularRefine(fr, c, v, ev);
      if (sp && Math.abs(sp[0] - c) < SAME_POINT) pushNew(out, sp);
    }
  }
  return out;
}

/** Newton on (G, G_V) = 0 from (u, v): a fold (vertical tangent) of the curve, or null. */
export function foldRefine(fr: Frame, u: number, v: number, ev: Float64Array): [number, number] | null {
  for (let it = 0; it < 60; it++) {
    frameEval(fr, u, v, ev);
    const [g, gu, gv] = [ev[0], ev[1], ev[2]];
    const [, huv, hvv] = frameHessian(fr, u, v);
    const det = gu * hvv - gv * huv;
    if (det === 0 || !Number.isFinite(det)) break;
    const du = (g * hvv - gv * gv) / det;
    const dv = (gu * gv - huv * g) / det;
    u -= du;
    v -= dv;
    if (!Number.isFinite(u) || !Number.isFinite(v) || Math.abs(u) > 1e6 || Math.abs(v) > 1e6) return null;
    if (Math.abs(du) + Math.abs(dv) < 1e-15 * (1 + Math.abs(u) + Math.abs(v))) break;
  }
  frameEval(fr, u, v, ev);
  const mag = Math.max(ev[3], MAG_FLOOR);
  // A point where G_U vanishes too is singular, not a fold: singularRefine reports those.
  return Math.abs(ev[0]) <= 1e-11 * mag && Math.abs(ev[2]) <= 1e-7 * mag && Math.abs(ev[1]) > 1e-6 * mag ? [u, v] : null;
}

/** Newton on (G_U, G_V) = 0 from (u, v), accepted when G vanishes there too: a singular point, or null. */
export function singularRefine(fr: Frame, u: number, v: number, ev: Float64Array): [number, number] | null {
  let best: [number, number] | null = null;
  let bestRes = Infinity;
  for (let it = 0; it < 80; it++) {
    frameEval(fr, u, v, ev);
    const res = Math.abs(ev[1]) + Math.abs(ev[2]);
    if (res < bestRes) {
      bestRes = res;
      best = [u, v];
    }
    const [huu, huv, hvv] = frameHessian(fr, u, v);
    const det = huu * hvv - huv * huv;
    if (det === 0 || !Number.isFinite(det)) break;
    const du = (ev[1] * hvv - ev[2] * huv) / det;
    const dv = (huu * ev[2] - huv * ev[1]) / det;
    u -= du;
    v -= dv;
    if (!Number.isFinite(u) || !Number.isFinite(v) || Math.abs(u) > 1e6 || Math.abs(v) > 1e6) break;
    if (Math.abs(du) + Math.abs(dv) < 1e-16 * (1 + Math.abs(u) + Math.abs(v))) break;
  }
  if (!best) return null;
  frameEval(fr, best[0], best[1], ev);
  const mag = Math.max(ev[3], MAG_FLOOR);
  const ok = Math.abs(ev[0]) <= 1e-10 * mag && Math.abs(ev[1]) + Math.abs(ev[2]) <= 1e-6 * mag;
  return ok ? best : null;
}

// Determinant of the Sylvester matrix of p (degree m) and q (degree m - 1), Gaussian elimination with
// partial pivoting; assumes p has exact degree m >= 2.
function sylvesterDet(p: number[], q: number[]): number {
  const m = p.length - 1;
  const k = q.length - 1;
  const size = m + k;
  const a: number[][] = [];
  for (let r = 0; r < k; r++) {
    const row = new Array<number>(size).fill(0);
    for (let i = 0; i <= m; i++) row[r + i] = p[m - i];
    a.push(row);
  }
  for (let r = 0; r < m; r++) {
    const row = new Array<number>(size).fill(0);
    for (let i = 0; i <= k; i++) row[r + i] = q[k - i];
    a.push(row);
  }
  let det = 1;
  for (let c = 0; c < size; c++) {
    let piv = c;
    for (let r = c + 1; r < size; r++) if (Math.abs(a[r][c]) > Math.abs(a[piv][c])) piv = r;
    if (a[piv][c] === 0) return 0;
    if (piv !== c) {
      [a[piv], a[c]] = [a[c], a[piv]];
      det = -det;
    }
    det *= a[c][c];
    for (let r = c + 1; r < size; r++) {
      const f = a[r][c] / a[c][c];
      if (f !== 0) for (let j = c; j < size; j++) a[r][j] -= f * a[c][j];
    }
  }
  return det;
}

function chebCoefficients(values: number[]): number[] {
  const n = values.length;
  const c: number[] = [];
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let k = 0; k < n; k++) s += values[k] * Math.cos((Math.PI * j * (k + 0.5)) / n);
    c.push(((j === 0 ? 1 : 2) * s) / n);
  }
  return c;
}

function chebToMonomial(c: number[]): number[] {
  const n = c.length;
  const out = new Array<number>(n).fill(0);
  let tPrev = [1];
  let tCur = [0, 1];
  out[0] += c[0];
  if (n > 1) out[1] += c[1];
  for (let j = 2; j < n; j++) {
    const next = new Array<number>(j + 1).fill(0);
    for (let i = 0; i < tCur.length; i++) next[i + 1] += 2 * tCur[i];
    for (let i = 0; i < tPrev.length; i++) next[i] -= tPrev[i];
    for (let i = 0; i <= j; i++) out[i] += c[j] * next[i];
    tPrev = tCur;
    tCur = next;
  }
  return out;
}
