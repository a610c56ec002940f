// Following one common point of two curves through a drag, in doubles: Newton's method on F = G = 0 from
// the point's last position, so the point kept is the one that moves continuously (types.ts, MEET
// IDENTITY), never "the k-th root". Display only: the exact meet (src/cubic/meet.ts) replaces it after
// the drop.
//
// Canonical form: points are unit triples (float.ts). The chart is the affine one in which the last
// position's largest coordinate is 1, so points at infinity need no special case.
//
// Why Newton and not a float resultant: a pointer move shifts a meet point by a pixel or so, well inside
// Newton's basin, and two evaluations of each curve per step cost far less than a degree-9 resultant with
// all its roots (tens of such points at 60 frames a second). A step is capped so one iteration cannot
// carry the point onto another branch; a point that stops converging (two meets merging into a complex
// pair) gives null, and the caller keeps its last value.
import { f3Normalise, f3Sine, floatFormEval, formGradientFloat, type F3, type FloatForm } from './float.ts';

const MAX_STEPS = 40;
/** Largest move of one Newton step in the chart (coordinates there are at most about 1). */
const STEP_CAP = 0.25;
/** Largest angle (radians, as a sine) between the last and the new position accepted as "the same point". */
const MAX_JUMP = 0.5;

function formScaleOf(f: FloatForm): number {
  let m = 0;
  for (const c of f.coeffs) m = Math.max(m, Math.abs(c));
  return m || 1;
}

/** The common point of F = 0 and G = 0 reached by damped Newton steps from `was`; null when it does not converge. */
export function curveCurveMeetFollow(f: FloatForm, g: FloatForm, was: F3): F3 | null {
  let k = 0;
  for (let i = 1; i < 3; i++) if (Math.abs(was[i]) > Math.abs(was[k])) k = i;
  if (was[k] === 0) return null;
  const [i, j] = k === 0 ? [1, 2] : k === 1 ? [0, 2] : [0, 1];
  const sf = formScaleOf(f);
  const sg = formScaleOf(g);
  const p = [was[0] / was[k], was[1] / was[k], was[2] / was[k]];
  let converged = false;
  for (let step = 0; step < MAX_STEPS; step++) {
    const fv = floatFormEval(f, p[0], p[1], p[2]) / sf;
    const gv = floatFormEval(g, p[0], p[1], p[2]) / sg;
    const df = formGradientFloat(f, p as unknown as F3);
    const dg = formGradientFloat(g, p as unknown as F3);
    const a = df[i] / sf;
    const b = df[j] / sf;
    const c = dg[i] / sg;
    const d = dg[j] / sg;
    const det = a * d - b * c;
    if (!Number.isFinite(det) || det === 0) break;
    let du = (d * fv - b * gv) / det;
    let dv = (a * gv - c * fv) / det;
    const len = Math.hypot(du, dv);
    if (len > STEP_CAP) {
      du *= STEP_CAP / len;
      dv *= STEP_CAP / len;
    }
    p[i] -= du;
    p[j] -= dv;
    if (len <= 1e-13 * (1 + Math.hypot(p[i], p[j]))) {
      converged = true;
      break;
    }
  }
  if (!Number.isFinite(p[i]) || !Number.isFinite(p[j])) return null;
  const q = f3Normalise(p);
  if (!converged) {
    // Slow (linear) convergence at a tangential meet: accept only when both residuals are tiny.
    const rf = Math.abs(floatFormEval(f, q[0], q[1], q[2])) / sf;
    const rg = Math.abs(floatFormEval(g, q[0], q[1], q[2])) / sg;
    if (!(rf < 1e-10 && rg < 1e-10)) return null;
  }
  return f3Sine(q, was) <= MAX_JUMP ? q : null;
}
