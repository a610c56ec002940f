// Following one branch of G = 0 across an open interval of U between two critical abscissae, where the
// branch is the graph of a smooth function V(U) and U moves one way only along it.
//
// Predictor: a step along the tangent, sized in screen pixels (at most `maxStepPx` inside the window,
// larger far outside it). Corrector: Newton in V at fixed U where the branch is flat in the frame, in U at
// fixed V where it is steep (so a fold, where G_V = 0, stays well conditioned). A step is accepted only
// when Smale's alpha test at the predicted point is small (alpha = beta * gamma < ALPHA_MAX), so Newton
// converges to the root next to the prediction rather than to a neighbouring branch, and when the new
// vertex is at most `maxGapPx` from the last one.
import { frameAtU, frameEval, type Frame } from './frame.ts';
import { fpolyRealRoots } from './upoly-float.ts';

const ALPHA_MAX = 0.03;
/** Largest corrector move accepted, as a fraction of the predictor step. */
const CORRECTION_MAX = 0.2;
/** Largest distance of a long chord's midpoint from the curve, as a fraction of the step (about 9 degrees of turn). */
const SAGITTA_MAX = 0.02;

export interface FollowView {
  readonly fr: Frame;
  /** Device pixels per frame unit along X' = U + sV and along V. */
  readonly pxX: number;
  readonly pxY: number;
  /** The window in frame terms: X' in [x0, x1], V in [y0, y1]. */
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
  readonly maxStepPx: number;
  readonly maxGapPx: number;
}

export type FollowEnd =
  /** Reached the line U = uEnd (the branch crosses it, or ends at a point on it): (u, v) is the tangent's
   * meet with the line, (lastU, lastV) the last vertex. */
  | { readonly kind: 'line'; readonly u: number; readonly v: number; readonly lastU: number; readonly lastV: number }
  /** Turned back in U before the line: a fold the critical abscissae did not announce. */
  | { readonly kind: 'fold'; readonly u: number; readonly v: number }
  /** Gave up (step size underflow): the branch is left open here. */
  | { readonly kind: 'stuck'; readonly u: number; readonly v: number };

export function screenLength(fv: FollowView, du: number, dv: number): number {
  const a = fv.pxX * (du + fv.fr.shear * dv);
  const b = fv.pxY * dv;
  return Math.sqrt(a * a + b * b);
}

export function outsidePx(fv: FollowView, u: number, v: number): number {
  const x = u + fv.fr.shear * v;
  const dx = (x < fv.x0 ? fv.x0 - x : x > fv.x1 ? x - fv.x1 : 0) * fv.pxX;
  const dy = (v < fv.y0 ? fv.y0 - v : v > fv.y1 ? v - fv.y1 : 0) * fv.pxY;
  return dx === 0 && dy === 0 ? 0 : Math.sqrt(dx * dx + dy * dy);
}

/**
 * Taylor coefficients at x0 of the fibre polynomial of G: in V at U = fixed (steep false) or in U at
 * V = fixed (steep true), written into buf[0..d]. Returns alpha = beta * gamma of Newton's method there.
 */
function fibreAlpha(fr: Frame, steep: boolean, fixed: number, x0: number, buf: Float64Array): number {
  const n = fr.degree + 1;
  const a = fr.a;
  for (let j = 0; j < n; j++) {
    let acc = 0;
    for (let i = n - 1 - j; i >= 0; i--) acc = acc * fixed + (steep ? a[j * n + i] : a[i * n + j]);
    buf[j] = acc;
  }
  for (let k = 0; k < n; k++) for (let i = n - 2; i >= k; i--) buf[i] += x0 * buf[i + 1];
  const d1 = Math.abs(buf[1]);
  if (d1 === 0) return Infinity;
  let g = 0;
  for (let k = 2; k < n; k++) {
    const r = Math.abs(buf[k]) / d1;
    if (r === 0) continue;
    const v = k === 2 ? r : k === 3 ? Math.sqrt(r) : k === 4 ? Math.cbrt(r) : Math.pow(r, 1 / (k - 1));
    if (v > g) g = v;
  }
  return (Math.abs(buf[0]) / d1) * g;
}

/**
 * True when the chord's midpoint lies near the curve (within SAGITTA_MAX of the step): a long step that
 * skipped a bend of its own branch onto a neighbouring one fails this. `ev` is scratch space.
 */
function chordHugs(fv: FollowView, u: number, v: number, un: number, vn: number, h: number, ev: Float64Array): boolean {
  const mu = 0.5 * (u + un);
  const mv = 0.5 * (v + vn);
  frameEval(fv.fr, mu, mv, ev);
  const g2 = ev[1] * ev[1] + ev[2] * ev[2];
  if (!(g2 > 0)) return false;
  const k = ev[0] / g2;
  return screenLength(fv, k * ev[1], k * ev[2]) <= SAGITTA_MAX * h;
}

/** Index of the real root of G(u, ·) nearest to v, counted from below (the branch's place in its fibre). */
export function fibreIndex(fr: Frame, u: number, v: number): number {
  const roots = fpolyRealRoots(frameAtU(fr, u));
  let best = -1;
  let bestD = Infinity;
  for (let i = 0; i < roots.length; i++) {
    const d = Math.abs(roots[i].t - v);
    if (d < bestD) {
      bestD = d;
      best = i;
    }
  }
  return best;
}

/**
 * Follow the branch through (u, v) in direction dir (+1 or -1 in U) up to the line U = uEnd, appending
 * vertices (frame coordinates, the start excluded) to `out`. `index` is the branch's place among the real
 * roots of G(U, ·) (from below), used to check long steps.
 */
export function branchFollow(fv: FollowView, u: number, v: number, dir: 1 | -1, uEnd: number, out: number[], index = -1): FollowEnd {
  const fr = fv.fr;
  const ev = new Float64Array(4);
  const buf = new Float64Array(fr.degree + 1);
  const scratch = new Float64Array(4);
  // Newton stops once its step is below a ten-thousandth of a pixel: vertices need 0.25 px.
  const tolU = 1e-4 / Math.max(fv.pxX, fv.pxY);
  frameEval(fr, u, v, ev);
  let tu = -ev[2];
  let tv = ev[1];
  if (tu * dir < 0) {
    tu = -tu;
    tv = -tv;
  }
  let h = fv.maxStepPx;
  for (let iter = 0; iter < 1_000_000; iter++) {
    const sigma = screenLength(fv, tu, tv);
    if (!(sigma > 0)) return { kind: 'stuck', u, v };
    const away = outsidePx(fv, u, v);
    const hMax = away > 0 ? Math.max(fv.maxStepPx, 0.5 * away) : fv.maxStepPx;
    h = Math.min(hMax, 2 * h);
    const steep = Math.abs(ev[2]) < Math.abs(ev[1]);
    let accepted = false;
    for (let tries = 0; tries < 60 && !accepted; tries++) {
      const k = h / sigma;
      const up = u + tu * k;
      const vp = v + tv * k;
      if ((up - uEnd) * dir >= 0) {
        // The line is within one step: land on it along the tangent and let the junction settle it.
        const t = (uEnd - u) / tu;
        return { kind: 'line', u: uEnd, v: v + tv * t, lastU: u, lastV: v };
      }
      if (!(fibreAlpha(fr, steep, steep ? vp : up, steep ? up : vp, buf) < ALPHA_MAX)) {
        h *= 0.5;
        if (h * 1e12 < fv.maxStepPx) return { kind: 'stuck', u, v };
        continue;
      }
      let x = (steep ? up : vp) - buf[0] / buf[1];
      let un = steep ? x : up;
      let vn = steep ? vp : x;
      for (let it = 0; it < 8; it++) {
        frameEval(fr, un, vn, ev);
        const dx = ev[0] / (steep ? ev[1] : ev[2]);
        if (!(Math.abs(dx) > tolU)) break;
        x -= dx;
        if (steep) un = x;
        else vn = x;
      }
      let nu = -ev[2];
      let nv = ev[1];
      if (nu * tu + nv * tv < 0) {
        nu = -nu;
        nv = -nv;
      }
      // A corrector that moves the point by a sizeable part of the step has found another branch
      // (possible on long steps far outside the window even when Newton itself converges): shorten.
      if (screenLength(fv, un - up, vn - vp) > CORRECTION_MAX * h) {
        h *= 0.5;
        frameEval(fr, u, v, ev);
        continue;
      }
      // Between critical abscissae the roots of G(U, ·) keep their order, so a long step (far outside
      // the window, where nothing else guards it) must land on the branch's own index in the fibre.
      if (h > 4 * fv.maxStepPx && (!chordHugs(fv, u, v, un, vn, h, scratch) || (index >= 0 && fibreIndex(fr, un, vn) !== index))) {
        h *= 0.5;
        frameEval(fr, u, v, ev);
        continue;
      }
      if ((un - uEnd) * dir >= 0) {
        // The corrector (in U, on a steep stretch) carried the point over the line: stop at the line.
        const t = (uEnd - u) / tu;
        return { kind: 'line', u: uEnd, v: v + tv * t, lastU: u, lastV: v };
      }
      if (nu * dir <= 0 || (un - u) * dir <= 0) {
        // The tangent turned back in U: a fold inside the interval (or at its end, reached early).
        return { kind: 'fold', u, v };
      }
      const gap = screenLength(fv, un - u, vn - v);
      if (gap > fv.maxGapPx && (away === 0 || outsidePx(fv, un, vn) === 0)) {
        h *= 0.5;
        frameEval(fr, u, v, ev);
        continue;
      }
      u = un;
      v = vn;
      tu = nu;
      tv = nv;
      out.push(u, v);
      accepted = true;
    }
    if (!accepted) return { kind: 'stuck', u, v };
  }
  return { kind: 'stuck', u, v };
}
