// Float shadows of the construction kinds: used while a point is dragged (status 'approximate') and for
// objects built from algebraic points (status 'algebraic', shown by their approximation). A kind without a
// shadow returns null and keeps its last value (evaluate.ts); so does a shadow that cannot follow (a meet
// point whose Newton iteration stops converging). Of the kinds with parents only 'curve-weierstrass' has
// none: the model of a moving curve is not a float computation (it comes from a kernel and a minimal
// model over Q).
// Internal tier: the input passed constructionCheckShape and no parent failed.
import { pointParse } from '../plane/parse-point.ts';
import { evaluateCheckFloat } from './checks.ts';
import type { EvalInput } from './evaluate.ts';
import {
  cubicMultipleFloat,
  cubicNegativeFloat,
  cubicSumFloat,
  cubicThirdFloat,
  curveProjectFloat,
  curveThroughPointsFloat,
  f3Cross,
  f3FromApprox,
  f3FromBig,
  f3IsZero,
  f3Normalise,
  f3ToApprox,
  f3Sine,
  formGradientFloat,
  lineCurveMeetFloat,
  type F3,
  type FloatForm,
} from './float.ts';
import type { CurveValue, ObjectValue, PointApprox, PointValue, Status } from './types.ts';
import { NinefoldError } from '../exact/errors.ts';
import { curveCurveMeetFollow } from './float-meet.ts';
import { ninthPointFloat, pencilMemberFloat } from './float-pencil.ts';
import { curveSingularFollow, parametrisationAtFloat } from './float-parameter.ts';
import { weierstrassImageFloat, weierstrassModelOf } from './weierstrass-kinds.ts';

function curveF(v: ObjectValue): FloatForm {
  const c = v as CurveValue;
  const n = c.approx.length;
  return { degree: Math.round((Math.sqrt(8 * n + 1) - 3) / 2), coeffs: c.approx };
}

function pointF(v: ObjectValue): F3 {
  return v.type === 'point' ? f3FromApprox(v.approx) : [0, 0, 0];
}

function lineF(v: ObjectValue): F3 {
  return v.type === 'line' ? (v.approx as F3) : [0, 0, 0];
}

function point(status: Status, p: F3, multiplicity?: number): ObjectValue | null {
  if (f3IsZero(p) || p.some((x) => !Number.isFinite(x))) return null;
  return { type: 'point', status, approx: f3ToApprox(p), ...(multiplicity ? { multiplicity } : {}) };
}

function line(status: Status, l: F3): ObjectValue | null {
  if (f3IsZero(l) || l.some((x) => !Number.isFinite(x))) return null;
  return { type: 'line', status, approx: l };
}

type Shadow = (input: EvalInput, status: Status) => ObjectValue | null;

const curveThrough = (d: number): Shadow => ({ parents }, status) => {
  const f = curveThroughPointsFloat(d, parents.map(pointF));
  return f ? { type: 'curve', status, approx: f.coeffs } : null;
};

const SHADOWS: Partial<Record<string, Shadow>> = {
  'point-free': ({ moving, params }, status) => point(status, moving ? f3FromApprox(moving) : f3FromBig(pointParse(params.at, 'at'))),
  'point-on-curve': ({ moving, parents, previous }, status) => {
    const at: PointApprox | undefined = moving ?? (previous?.type === 'point' ? previous.approx : undefined);
    if (!at || !at.finite) return null;
    const p = curveProjectFloat(curveF(parents[0]), at.x, at.y);
    return p ? point(status, f3Normalise([p.x, p.y, 1])) : null;
  },
  'line-through-two': ({ parents }, status) => line(status, f3Cross(pointF(parents[0]), pointF(parents[1]))),
  'line-tangent': ({ parents }, status) => line(status, f3Normalise(formGradientFloat(curveF(parents[0]), pointF(parents[1])))),
  'point-meet': ({ parents, previous }, status) => {
    const [a, b] = parents;
    if (a.type === 'line' && b.type === 'line') return point(status, f3Cross(lineF(a), lineF(b)), 1);
    // Follow the point continuously from its last value (types.ts, MEET IDENTITY), never by index.
    if (!previous || previous.type !== 'point') return null;
    if (a.type === 'curve' && b.type === 'curve') {
      const q = curveCurveMeetFollow(curveF(a), curveF(b), f3FromApprox(previous.approx));
      return q ? point(status, q, previous.multiplicity) : null;
    }
    const [l, c] = a.type === 'line' ? [a, b] : [b, a];
    const was = f3FromApprox(previous.approx);
    const pts = lineCurveMeetFloat(curveF(c), lineF(l));
    let best: F3 | null = null;
    for (const p of pts) if (!best || f3Sine(p, was) < f3Sine(best, was)) best = p;
    return best ? point(status, best, previous.multiplicity) : null;
  },
  'point-third': ({ parents }, status) => point(status, cubicThirdFloat(curveF(parents[0]), pointF(parents[1]), pointF(parents[2]))),
  'point-sum': ({ parents }, status) =>
    point(status, cubicSumFloat(curveF(parents[0]), pointF(parents[1]), pointF(parents[2]), pointF(parents[3]))),
  'point-negative': ({ parents }, status) => point(status, cubicNegativeFloat(curveF(parents[0]), pointF(parents[1]), pointF(parents[2]))),
  'point-multiple': ({ parents, params }, status) => {
    const n = Number(params.n);
    if (!Number.isInteger(n) || Math.abs(n) > 64) return null; // beyond that doubles say nothing useful
    return point(status, cubicMultipleFloat(curveF(parents[0]), pointF(parents[1]), pointF(parents[2]), n));
  },
  'point-ninth': ({ parents }, status) => {
    const q = ninthPointFloat(parents.map(pointF));
    return q ? point(status, q) : null;
  },
  'pencil-member': ({ parents, params, previous }, status) => {
    const m = /^\s*([+-]?\d+)\s*:\s*([+-]?\d+)\s*$/.exec(params.member);
    if (!m) return null;
    const was = previous?.type === 'curve' && previous.approx.length === 10 ? previous.approx : undefined;
    const f = pencilMemberFloat(parents.map(pointF), Number(m[1]), Number(m[2]), was);
    return f ? { type: 'curve', status, approx: f.coeffs } : null;
  },
  'point-parameter': ({ parents, params, previous }, status) => {
    // Follows from the last value's singular point and pencil basis (set by the exact evaluation).
    const m = /^\s*([+-]?\d+)\s*:\s*([+-]?\d+)\s*$/.exec(params.at);
    const pencil = previous?.type === 'point' ? previous.pencil : undefined;
    if (!m || !pencil) return null;
    const f = curveF(parents[0]);
    if (f.degree !== 3) return null;
    const singular = curveSingularFollow(f, pencil.singular as F3);
    if (!singular) return null;
    const q = parametrisationAtFloat(f, singular, pencil.basis[0], pencil.basis[1], Number(m[1]), Number(m[2]));
    if (!q) return null;
    const v = point(status, q);
    return v ? { ...(v as PointValue), pencil: { singular, basis: pencil.basis } } : null;
  },
  'point-weierstrass-image': ({ parents }, status) => {
    // The map is known exactly only for an exact curve and base point; then the forward forms are
    // evaluated at the moving point in doubles. Otherwise the image keeps its last value.
    const c = parents[0] as CurveValue;
    const o = parents[1] as PointValue;
    if (!c.form || !o.exact) return null;
    let model;
    try {
      model = weierstrassModelOf(c.form, o.exact);
    } catch (e) {
      if (e instanceof NinefoldError) return null;
      throw e;
    }
    const q = weierstrassImageFloat(model, pointF(parents[2]));
    return q ? point(status, q) : null;
  },
  'conic-through-five': curveThrough(2),
  'cubic-through-nine': curveThrough(3),
};

export function evaluateFloat(input: EvalInput, status: Status): ObjectValue | null {
  if (input.object.type === 'check') return evaluateCheckFloat(input, status);
  const fn = SHADOWS[input.object.construction.kind];
  return fn ? fn(input, status) : null;
}
