// A parameter point of a nodal or cuspidal cubic while its curve moves (a cubic through dragged points),
// in doubles: the singular point followed by Gauss–Newton from its last place, then the same blow-up
// formula as the exact parametrisation (src/cubic/parametrise.ts; MATH.md): for D = s·D1 + t·D2 the line
// PD meets the curve again at X = F(D)·P − (P·∇F(D))·D. The basis D1, D2 is the one the exact
// parametrisation chose, kept in the point's value, so (s:t) keeps its meaning through the drag.
//
// Canonical form: unit triples (float.ts). Display only; the exact value replaces it after the drop.
import { f3Dot, f3IsZero, f3Normalise, f3Sine, floatFormEval, floatFormPartial, formGradientFloat, type F3, type FloatForm } from './float.ts';

/** Largest move (as a sine) of the singular point between two evaluations taken as the same point. */
const MAX_JUMP = 0.5;

/**
 * The point of the float cubic near `was` where the gradient is least (Gauss–Newton on the three partials,
 * in the chart of was's largest coordinate): the singular point when the cubic is singular, its nearest
 * stand-in when rounding has made it smooth. Null when the iteration leaves the neighbourhood.
 */
export function curveSingularFollow(f: FloatForm, was: F3): F3 | null {
  let k = 0;
  for (let i = 1; i < 3; i++) if (Math.abs(was[i]) > Math.abs(was[k])) k = i;
  if (was[k] === 0) return null;
  const [i, j] = k === 0 ? [1, 2] : k === 1 ? [0, 2] : [0, 1];
  const parts = [floatFormPartial(f, 0), floatFormPartial(f, 1), floatFormPartial(f, 2)];
  const p = [was[0] / was[k], was[1] / was[k], was[2] / was[k]];
  for (let step = 0; step < 20; step++) {
    // Residuals r = ∇F(p), Jacobian columns = ∂∇F/∂p_i, ∂∇F/∂p_j (rows of the Hessian).
    const r = parts.map((g) => floatFormEval(g, p[0], p[1], p[2]));
    const ci = parts.map((g) => formGradientFloat(g, p as unknown as F3)[i]);
    const cj = parts.map((g) => formGradientFloat(g, p as unknown as F3)[j]);
    const a = f3Dot(ci as unknown as F3, ci as unknown as F3);
    const b = f3Dot(ci as unknown as F3, cj as unknown as F3);
    const d = f3Dot(cj as unknown as F3, cj as unknown as F3);
    const ri = f3Dot(ci as unknown as F3, r as unknown as F3);
    const rj = f3Dot(cj as unknown as F3, r as unknown as F3);
    const det = a * d - b * b;
    if (!Number.isFinite(det) || det === 0) break;
    const du = (d * ri - b * rj) / det;
    const dv = (a * rj - b * ri) / det;
    p[i] -= du;
    p[j] -= dv;
    if (Math.hypot(du, dv) <= 1e-13 * (1 + Math.hypot(p[i], p[j]))) break;
  }
  const q = f3Normalise(p);
  if (f3IsZero(q) || q.some((x) => !Number.isFinite(x))) return null;
  return f3Sine(q, was) <= MAX_JUMP ? q : null;
}

/** X(s:t) = F(D)·P − (P·∇F(D))·D with D = s·D1 + t·D2, for P (near) the singular point of the cubic. */
export function parametrisationAtFloat(f: FloatForm, singular: F3, d1: readonly number[], d2: readonly number[], s: number, t: number): F3 | null {
  const d: F3 = [s * d1[0] + t * d2[0], s * d1[1] + t * d2[1], s * d1[2] + t * d2[2]];
  const fd = floatFormEval(f, d[0], d[1], d[2]);
  const pd = f3Dot(singular, formGradientFloat(f, d));
  const x = f3Normalise([fd * singular[0] - pd * d[0], fd * singular[1] - pd * d[1], fd * singular[2] - pd * d[2]]);
  return f3IsZero(x) ? null : x;
}
