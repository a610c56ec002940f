// Exact evaluators, one per construction kind: parents all exact, answers from the core (src/plane,
// src/poly, src/cubic). Each returns an exact value, or an algebraic one where the answer is a real
// algebraic point; failures are thrown as NinefoldErrors and become the object's message.
// Internal tier: the input passed constructionCheckShape (graph.ts) and no parent failed.
import { Degenerate, InvalidInput, NinefoldError, NotOnCurve } from '../exact/errors.ts';
import type { WeierstrassModel } from '../cubic/weierstrass.ts';
import { conicThroughFive } from '../plane/conic.ts';
import { curvesThroughPoints } from '../plane/linear-system.ts';
import { ninthPoint } from '../cubic/nine.ts';
import { cubicParametrisation, parametrisationAt, type CubicParametrisation } from '../cubic/parametrise.ts';
import { formAdd, formEval, formGradientAt, formPrimitive, formScale, type Form } from '../poly/form.ts';
import { formParse } from '../poly/parse.ts';
import { cross, lineLineMeet, pointPointJoin, triple, tripleIsZero, type Point } from '../plane/point.ts';
import { pointParse, pointToString } from '../plane/parse-point.ts';
import { cubicThirdPoint } from '../cubic/chord.ts';
import { groupAdd, groupMultiple, groupNegate } from '../cubic/group.ts';
import type { EvalInput } from './evaluate.ts';
import { f3FromBig, f3Normalise, f3ToApprox, formToFloat, lineCurveMeetFloat, type F3 } from './float.ts';
import { curveAxisPoint } from './on-curve.ts';
import { curveCurveMeet, lineCurveMeet, type MeetPoint } from '../cubic/meet.ts';
import { upolyToString } from '../exact/upoly.ts';
import { ratToString } from '../exact/rational.ts';
import type { CheckValue, CurveValue, LineValue, ObjectValue, PointValue } from './types.ts';
import type { Line } from '../plane/point.ts';
import { evaluateCheckExact } from './checks.ts';
import { meetPointChoose } from './meet-identity.ts';
import { weierstrassImage, weierstrassModelForm, weierstrassModelOf } from './weierstrass-kinds.ts';

export function exactPoint(p: Point, multiplicity?: number): PointValue {
  return { type: 'point', status: 'exact', exact: p, approx: f3ToApprox(f3FromBig(p)), ...(multiplicity ? { multiplicity } : {}) };
}

export function exactLine(l: Line): LineValue {
  return { type: 'line', status: 'exact', exact: l, approx: f3FromBig(l) };
}

export function exactCurve(f: Form): CurveValue {
  return { type: 'curve', status: 'exact', form: f, approx: formToFloat(f).coeffs };
}

// Assumes the value is an exact point (the caller's status rule).
export function pointOf(v: ObjectValue): Point {
  return (v as PointValue).exact!;
}
export function lineOf(v: ObjectValue): Line {
  return (v as LineValue).exact!;
}
export function curveOf(v: ObjectValue): Form {
  return (v as CurveValue).form!;
}

/** An algebraic meet point in words: its defining polynomial and isolating interval. */
export function meetPointText(q: MeetPoint): string {
  const a = q.algebraic;
  if (!a) return 'a real point, known as a float only';
  const alpha = `α, the root of ${upolyToString(a.alpha.poly, 'α')} in [${ratToString(a.alpha.lo)}, ${ratToString(a.alpha.hi)}]`;
  if (a.kind === 'line') return `α·(${a.p.join(':')}) + (${a.q.join(':')}) with ${alpha}`;
  return `a point over ${alpha} in a changed frame`;
}

/** "s:t" with integers s, t not both zero. */
function memberParse(text: string, where = 'member', what = 'a pencil member'): [bigint, bigint] {
  const m = /^\s*([+-]?\d+)\s*:\s*([+-]?\d+)\s*$/.exec(text);
  if (!m || (BigInt(m[1]) === 0n && BigInt(m[2]) === 0n)) throw new InvalidInput(`${what} is written s:t with integers, not both 0; got "${text}"`, where);
  return [BigInt(m[1]), BigInt(m[2])];
}

const PARAMETRISATIONS = new WeakMap<Form, CubicParametrisation>();

/** The parametrisation through the singular point, made once per curve form. */
export function parametrisationOf(f: Form, label = 'the curve'): CubicParametrisation {
  let p = PARAMETRISATIONS.get(f);
  if (!p) {
    try {
      p = cubicParametrisation(f);
    } catch (e) {
      if (e instanceof InvalidInput) throw new InvalidInput(`${label} has no parametrisation through a singular point: ${e.message}`, e.where);
      throw e;
    }
    PARAMETRISATIONS.set(f, p);
  }
  return p;
}

/** The Weierstrass model of parents[0] from parents[1], its failures told with the objects' labels. */
function modelOf(parents: readonly ObjectValue[], labels: readonly string[]): WeierstrassModel {
  try {
    return weierstrassModelOf(curveOf(parents[0]), pointOf(parents[1]));
  } catch (e) {
    if (e instanceof NinefoldError) throw new InvalidInput(`no Weierstrass model of ${labels[0]} from ${labels[1]}: ${e.message}`, e.where === 'base' ? 'parents[1]' : 'parents[0]');
    throw e;
  }
}

type Exact = (input: EvalInput) => ObjectValue;

const EXACT: Partial<Record<string, Exact>> = {
  'curve-equation': ({ params }) => exactCurve(formParse(params.equation, 'equation').form),
  'conic-through-five': ({ parents }) => exactCurve(conicThroughFive(parents.map(pointOf)).conic),
  'cubic-through-nine': ({ parents }) => {
    const sys = curvesThroughPoints(3, parents.map(pointOf));
    if (sys.dimension !== 0) {
      const why = sys.notes.length ? `: ${sys.notes.join('; ')}` : '';
      throw new Degenerate(`the cubics through these nine points form a family of dimension ${sys.dimension}, not one cubic${why}`, 'parents');
    }
    return exactCurve(formPrimitive(sys.basis[0]));
  },
  'pencil-member': ({ parents, params }) => {
    const sys = curvesThroughPoints(3, parents.map(pointOf));
    if (sys.dimension !== 1) {
      const why = sys.notes.length ? `: ${sys.notes.join('; ')}` : '';
      throw new Degenerate(`the cubics through these eight points form a family of dimension ${sys.dimension}, not a pencil${why}`, 'parents');
    }
    const [s, t] = memberParse(params.member);
    const f = formAdd(formScale(sys.basis[0], s), formScale(sys.basis[1], t));
    return exactCurve(formPrimitive(f));
  },
  'point-ninth': ({ parents }) => {
    const n = ninthPoint(parents.map(pointOf));
    if (!n.point) throw new Degenerate(n.reason, 'parents');
    return exactPoint(n.point);
  },
  'point-parameter': ({ parents, params, labels }) => {
    const [s, t] = memberParse(params.at, 'at', 'a parameter value');
    const par = parametrisationOf(curveOf(parents[0]), labels[0]);
    // The basis is kept as small integers (not made unit): s·D1 + t·D2 must mean what it means exactly.
    const pencil = { singular: f3FromBig(par.singular), basis: [par.basis[0].map(Number), par.basis[1].map(Number)] as const };
    return { ...exactPoint(parametrisationAt(par, s, t)), pencil };
  },
  'curve-weierstrass': ({ parents, labels }) => exactCurve(weierstrassModelForm(modelOf(parents, labels))),
  'point-weierstrass-image': ({ parents, labels }) => {
    const model = modelOf(parents, labels);
    return exactPoint(weierstrassImage(model, pointOf(parents[2]), labels[2]));
  },
  'point-free': ({ params }) => exactPoint(pointParse(params.at, 'at')),
  'line-equation': ({ params }) => exactLine(pointParse(params.at, 'at')),
  'point-on-curve': ({ parents, labels, params }) => {
    const f = curveOf(parents[0]);
    if (params.at === undefined) {
      const axis = params.x !== undefined ? 'x' : params.y !== undefined ? 'y' : null;
      if (!axis || params.near === undefined) throw new InvalidInput('a point on a curve needs "at", or "x" (or "y") with "near"', 'params');
      const a = curveAxisPoint(f, axis, params[axis], params.near, labels[0]);
      if (a.point) return exactPoint(a.point);
      return { type: 'point', status: 'algebraic', algebraic: { text: a.text, exact: { poly: a.poly, interval: a.interval, axis } }, approx: { x: a.x, y: a.y, finite: true } };
    }
    const p = pointParse(params.at, 'at');
    const r = formEval(f, p);
    if (r !== 0n) throw new NotOnCurve(`${pointToString(p)} is not on ${labels[0]} (F = ${r})`, 'at');
    return exactPoint(p);
  },
  'line-through-two': ({ parents, labels }) => {
    const p = pointOf(parents[0]);
    const q = pointOf(parents[1]);
    if (tripleIsZero(cross(p, q))) throw new InvalidInput(`${labels[0]} and ${labels[1]} are the same point, so they fix no line`, 'parents');
    return exactLine(pointPointJoin(p, q));
  },
  'line-tangent': ({ parents, labels }) => {
    const f = curveOf(parents[0]);
    const p = pointOf(parents[1]);
    const r = formEval(f, p);
    if (r !== 0n) throw new NotOnCurve(`${labels[1]} is not on ${labels[0]} (F = ${r}), so it has no tangent there`, 'parents[1]');
    const g = formGradientAt(f, p);
    if (tripleIsZero(g)) throw new InvalidInput(`${labels[1]} is a singular point of ${labels[0]}: no single tangent line`, 'parents[1]');
    return exactLine(triple(g[0], g[1], g[2]));
  },
  'point-meet': (input) => {
    const [a, b] = input.parents;
    if (a.type === 'line' && b.type === 'line') {
      if (Number(input.params.index) !== 0) throw new InvalidInput('two lines meet in one point only', 'index');
      if (tripleIsZero(cross(lineOf(a), lineOf(b)))) throw new InvalidInput(`${input.labels[0]} and ${input.labels[1]} are the same line`, 'parents');
      return exactPoint(lineLineMeet(lineOf(a), lineOf(b)), 1);
    }
    const m = a.type === 'line' ? lineCurveMeet(curveOf(b), lineOf(a)) : b.type === 'line' ? lineCurveMeet(curveOf(a), lineOf(b)) : curveCurveMeet(curveOf(a), curveOf(b));
    if (m.commonComponent) throw new InvalidInput(`${input.labels[0]} and ${input.labels[1]} share a component: ${m.note}`, 'parents');
    const real = m.points.filter((q) => q.real);
    // Which of them: the rule of types.ts (MEET IDENTITY), in meet-identity.ts.
    const q = real[meetPointChoose(real, input.params, input.previous)];
    if (!q) {
      const k = Number(input.params.index);
      throw new InvalidInput(`${input.labels[0]} and ${input.labels[1]} have ${real.length} real meet point${real.length === 1 ? '' : 's'} now; this one (number ${k + 1}) is gone`, 'index');
    }
    if (q.point) return exactPoint(q.point, q.multiplicity);
    return {
      type: 'point',
      status: 'algebraic',
      multiplicity: q.multiplicity,
      algebraic: { text: meetPointText(q), exact: q.algebraic },
      approx: f3ToApprox(f3Normalise(q.approx)),
    };
  },
  'point-third': ({ parents, labels }) =>
    exactPoint(cubicThirdPoint(curveOf(parents[0]), pointOf(parents[1]), pointOf(parents[2]), [labels[1], labels[2]])),
  'point-sum': ({ parents }) => exactPoint(groupAdd(curveOf(parents[0]), pointOf(parents[1]), pointOf(parents[2]), pointOf(parents[3]))),
  'point-negative': ({ parents }) => exactPoint(groupNegate(curveOf(parents[0]), pointOf(parents[1]), pointOf(parents[2]))),
  'point-multiple': ({ parents, params }) => {
    if (!/^[+-]?\d+$/.test(params.n.trim())) throw new InvalidInput(`the multiple n must be an integer, got "${params.n}"`, 'n');
    return exactPoint(groupMultiple(curveOf(parents[0]), pointOf(parents[1]), pointOf(parents[2]), BigInt(params.n.trim())));
  },
};

export function evaluateExact(input: EvalInput): ObjectValue {
  const kind = input.object.construction.kind;
  if (input.object.type === 'check') return evaluateCheckExact(input) satisfies CheckValue;
  const fn = EXACT[kind];
  if (!fn) throw new InvalidInput(`${kind} cannot be computed in this build yet`, 'kind');
  return fn(input);
}

/** Is the kind computable exactly in this build? (The UI offers only tools that are.) */
export function kindIsAvailable(kind: string): boolean {
  return kind.startsWith('check-') || EXACT[kind] !== undefined;
}


/** How many real points two lines or curves have in common (what the meet tool makes, one object each).
 * Exact when both are exact; counted in floats otherwise (line and curve) or 0 when unknown. */
export function meetRealCount(a: ObjectValue, b: ObjectValue): number {
  if (a.type === 'line' && b.type === 'line') {
    const l = a.exact && b.exact ? !tripleIsZero(cross(a.exact, b.exact)) : true;
    return l ? 1 : 0;
  }
  if ((a.type !== 'line' && a.type !== 'curve') || (b.type !== 'line' && b.type !== 'curve')) return 0;
  const exact = (v: LineValue | CurveValue): boolean => (v.type === 'line' ? v.exact !== undefined : v.form !== undefined);
  if (exact(a) && exact(b)) {
    const m =
      a.type === 'line' ? lineCurveMeet(curveOf(b), lineOf(a)) : b.type === 'line' ? lineCurveMeet(curveOf(a), lineOf(b)) : curveCurveMeet(curveOf(a), curveOf(b));
    return m.commonComponent ? 0 : m.points.filter((q) => q.real).length;
  }
  if (a.type === 'curve' && b.type === 'curve') return 0;
  const [l, c] = a.type === 'line' ? [a as LineValue, b as CurveValue] : [b as LineValue, a as CurveValue];
  const n = c.approx.length;
  const degree = Math.round((Math.sqrt(8 * n + 1) - 3) / 2);
  return lineCurveMeetFloat({ degree, coeffs: c.approx }, l.approx as F3).length;
}
