// Checks on a trace that do not trust the tracer: distance of every vertex to the true curve (Newton
// projection on F in doubles, measured in device pixels), gaps between consecutive vertices, and branches
// that come close away from the singular points (a branch drawn twice, or two branches crossing).
import type { CurveTrace, TraceView } from '../../../shaders-free-render/trace.ts';

export interface Poly2 {
  /** F(x, y) and its gradient, evaluated independently of the tracer. */
  (x: number, y: number): [number, number, number];
}

/** F and ∇F of the affine chart of a ternary form given by float coefficients in form.ts order. */
export function affineEvaluator(degree: number, coeffs: readonly number[]): Poly2 {
  const terms: [number, number, number][] = [];
  let k = 0;
  for (let i = degree; i >= 0; i--) for (let j = degree - i; j >= 0; j--) terms.push([coeffs[k++], i, j]);
  return (x, y) => {
    let f = 0, fx = 0, fy = 0;
    for (const [c, i, j] of terms) {
      if (c === 0) continue;
      f += c * x ** i * y ** j;
      if (i > 0) fx += c * i * x ** (i - 1) * y ** j;
      if (j > 0) fy += c * j * x ** i * y ** (j - 1);
    }
    return [f, fx, fy];
  };
}

export function pixelScale(view: TraceView): [number, number] {
  const dpr = view.dpr ?? 1;
  return [(view.width * dpr) / (view.xmax - view.xmin), (view.height * dpr) / (view.ymax - view.ymin)];
}

/**
 * Distance in device pixels from (x, y) to the curve: Newton projection in screen coordinates, and where
 * that does not settle it (near a singular point, where the gradient vanishes) the smallest of the radii
 * 0.05, 0.1, 0.25 px on whose circle F changes sign (then the disc holds a point of the curve).
 */
export function pixelDistance(F: Poly2, view: TraceView, x: number, y: number): number {
  const d = newtonDistance(F, view, x, y);
  if (d <= 0.25) return d;
  const [kx, ky] = pixelScale(view);
  const s0 = Math.sign(F(x, y)[0]);
  if (s0 === 0) return 0;
  for (const r of [0.05, 0.1, 0.25]) {
    for (let k = 0; k < 64; k++) {
      const t = (2 * Math.PI * k) / 64;
      if (Math.sign(F(x + (r * Math.cos(t)) / kx, y + (r * Math.sin(t)) / ky)[0]) !== s0) return r;
    }
  }
  return d;
}

function newtonDistance(F: Poly2, view: TraceView, x: number, y: number): number {
  const [kx, ky] = pixelScale(view);
  let px = x * kx;
  let py = y * ky;
  const p0x = px;
  const p0y = py;
  for (let it = 0; it < 30; it++) {
    const [f, fx, fy] = F(px / kx, py / ky);
    if (f === 0) break;
    const gx = fx / kx;
    const gy = fy / ky;
    const g2 = gx * gx + gy * gy;
    if (!(g2 > 0)) return f === 0 ? Math.hypot(px - p0x, py - p0y) : Infinity;
    const step = f / g2;
    px -= step * gx;
    py -= step * gy;
    if (Math.abs(step) * Math.sqrt(g2) < 1e-9) break;
  }
  return Math.hypot(px - p0x, py - p0y);
}

export interface TraceFaults {
  worstDistancePx: number;
  worstGapPx: number;
  /** Pairs of vertices on different pieces (or far apart on one piece) closer than 0.5 px, away from singular ends. */
  closeApproaches: number;
}

export function traceFaults(F: Poly2, view: TraceView, tr: CurveTrace, exclusionPx = 4): TraceFaults {
  const [kx, ky] = pixelScale(view);
  let worstDistancePx = 0;
  let worstGapPx = 0;
  const singular: [number, number][] = [];
  for (const p of tr.polylines) for (const e of p.ends ?? []) if (e.kind === 'singular') singular.push([e.x * kx, e.y * ky]);
  const nearSingular = (sx: number, sy: number): boolean => singular.some(([a, b]) => Math.hypot(a - sx, b - sy) < exclusionPx);
  const grid = new Map<string, [number, number, number][]>();
  let closeApproaches = 0;
  tr.polylines.forEach((p, pi) => {
    const n = p.points.length / 2;
    for (let i = 0; i < n; i++) {
      const x = p.points[2 * i];
      const y = p.points[2 * i + 1];
      worstDistancePx = Math.max(worstDistancePx, pixelDistance(F, view, x, y));
      if (i > 0) worstGapPx = Math.max(worstGapPx, Math.hypot((x - p.points[2 * i - 2]) * kx, (y - p.points[2 * i - 1]) * ky));
      const sx = x * kx;
      const sy = y * ky;
      if (nearSingular(sx, sy)) continue;
      const cx = Math.floor(sx / 0.5);
      const cy = Math.floor(sy / 0.5);
      for (let a = -1; a <= 1; a++) {
        for (let b = -1; b <= 1; b++) {
          for (const [qi, qk, qx, qy] of (grid.get(`${cx + a},${cy + b}`) ?? []).map((e) => [e[0], e[1], ...posOf(tr, e)] as const)) {
            if (Math.hypot(qx * kx - sx, qy * ky - sy) >= 0.5) continue;
            const sameNear = qi === pi && (Math.abs(qk - i) <= 3 || (p.closed && n - Math.abs(qk - i) <= 3));
            if (!sameNear) closeApproaches++;
          }
        }
      }
      const key = `${cx},${cy}`;
      const cell = grid.get(key) ?? [];
      cell.push([pi, i, 0]);
      grid.set(key, cell);
    }
  });
  return { worstDistancePx, worstGapPx, closeApproaches };
}

function posOf(tr: CurveTrace, e: [number, number, number]): [number, number] {
  const p = tr.polylines[e[0]].points;
  return [p[2 * e[1]], p[2 * e[1] + 1]];
}

/** Ends of kind 'singular' within `tolPx` of (x, y). */
export function singularEndsAt(view: TraceView, tr: CurveTrace, x: number, y: number, tolPx = 0.5): number {
  const [kx, ky] = pixelScale(view);
  let n = 0;
  for (const p of tr.polylines) {
    for (const e of p.ends ?? []) if (e.kind === 'singular' && Math.hypot((e.x - x) * kx, (e.y - y) * ky) <= tolPx) n++;
  }
  return n;
}
