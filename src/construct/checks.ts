// Checks: claims about objects that stay in the construction and are re-decided after every change.
//
// On exact data a check holds or fails with its certificate: the determinants or residuals that decide
// it, exactly. On algebraic or approximate data it is 'undecided' and says what was seen in floats and at
// what precision (53-bit doubles): never a verdict from a tolerance.
// Internal tier: the input passed constructionCheckShape and no parent failed.
import { InvalidInput } from '../exact/errors.ts';
import { formEval } from '../poly/form.ts';
import { cross, tripleIsZero, type Point } from '../plane/point.ts';
import { linesConcurrent, pointsCollinear } from '../plane/incidence.ts';
import { nineCheck } from '../cubic/nine.ts';
import { pointToString } from '../plane/parse-point.ts';
import { groupAdd } from '../cubic/group.ts';
import type { EvalInput } from './evaluate.ts';
import { f3Cross, f3Dot, f3FromApprox, floatFormEval, type F3 } from './float.ts';
import type { CheckValue, CurveValue, LineValue, ObjectValue, PointValue, Status } from './types.ts';

function check(status: Status, holds: boolean | null, claim: string, certificate: string, remark?: string): CheckValue {
  return { type: 'check', status, verdict: holds === null ? 'undecided' : holds ? 'holds' : 'fails', claim, certificate, ...(remark ? { remark } : {}) };
}

const list = (labels: readonly string[]): string => (labels.length <= 2 ? labels.join(' and ') : `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`);

function rankTwoCheck(ts: readonly Point[], labels: readonly string[], what: 'points' | 'lines'): CheckValue {
  const claim = what === 'points' ? `${list(labels)} are collinear` : `${list(labels)} are concurrent`;
  const v = what === 'points' ? pointsCollinear(ts) : linesConcurrent(ts);
  if (v.minor) {
    const [i, j, k] = v.minor.indices;
    return check('exact', false, claim, `det(${labels[i]}, ${labels[j]}, ${labels[k]}) = ${v.minor.determinant}`);
  }
  if (!v.common) return check('exact', true, claim, `all ${what} are the same`);
  const common = what === 'points' ? `all on the line ${pointToString(v.common)}` : `all through the point ${pointToString(v.common)}`;
  return check('exact', true, claim, `every 3×3 determinant is 0: ${common}`);
}

export function evaluateCheckExact(input: EvalInput): CheckValue {
  const { parents, labels } = input;
  const pts = (): Point[] => parents.map((v) => (v as PointValue).exact!);
  switch (input.object.construction.kind) {
    case 'check-collinear':
      return rankTwoCheck(pts(), labels, 'points');
    case 'check-concurrent':
      return rankTwoCheck(parents.map((v) => (v as LineValue).exact!), labels, 'lines');
    case 'check-on-curve': {
      const p = (parents[0] as PointValue).exact!;
      const r = formEval((parents[1] as CurveValue).form!, p);
      return check('exact', r === 0n, `${labels[0]} lies on ${labels[1]}`, `F(${pointToString(p)}) = ${r}`);
    }
    case 'check-equal': {
      const [p, q] = pts();
      const c = cross(p, q);
      return check('exact', tripleIsZero(c), `${labels[0]} = ${labels[1]}`, `${labels[0]} × ${labels[1]} = (${c.join(', ')})`);
    }
    case 'check-associative': {
      const f = (parents[0] as CurveValue).form!;
      const [o, p, q, r] = pts().slice(1);
      const [, lp, lq, lr] = labels.slice(1);
      const left = groupAdd(f, o, groupAdd(f, o, p, q), r);
      const right = groupAdd(f, o, p, groupAdd(f, o, q, r));
      const c = cross(left, right);
      return check(
        'exact',
        tripleIsZero(c),
        `(${lp} + ${lq}) + ${lr} = ${lp} + (${lq} + ${lr}) with base point ${labels[1]}`,
        `left = ${pointToString(left)}, right = ${pointToString(right)}`,
      );
    }
    case 'check-nine': {
      const n = nineCheck(pts());
      const remark = n.notes.length ? n.notes.join('; ') : undefined;
      return check('exact', n.holds, `${list(labels)} are the base points of a pencil of cubics`, `${n.reason} (cubics through all nine: dimension ${n.dimension})`, remark);
    }
    default:
      throw new InvalidInput(`${input.object.construction.kind} is not a check`, 'kind');
  }
}

function f3Of(v: ObjectValue): F3 {
  if (v.type === 'point') return f3FromApprox(v.approx);
  if (v.type === 'line') return v.approx as F3;
  return [0, 0, 0];
}

/** The float look at a check on algebraic or approximate data: what doubles show, never a verdict. */
export function evaluateCheckFloat(input: EvalInput, status: Status): CheckValue | null {
  const { parents, labels } = input;
  const seen = (size: number): string => `seen in 53-bit doubles: residual ${size.toExponential(2)}; not decided exactly (${status} data)`;
  switch (input.object.construction.kind) {
    case 'check-collinear':
    case 'check-concurrent': {
      const ts = parents.map(f3Of);
      let worst = 0;
      for (let k = 2; k < ts.length; k++) worst = Math.max(worst, Math.abs(f3Dot(f3Cross(ts[0], ts[1]), ts[k])));
      const what = input.object.construction.kind === 'check-collinear' ? 'collinear' : 'concurrent';
      return check(status, null, `${list(labels)} are ${what}`, seen(worst));
    }
    case 'check-on-curve': {
      const p = f3Of(parents[0]);
      const c = parents[1] as CurveValue;
      const r = floatFormEval({ degree: Math.round((Math.sqrt(8 * c.approx.length + 1) - 3) / 2), coeffs: c.approx }, p[0], p[1], p[2]);
      return check(status, null, `${labels[0]} lies on ${labels[1]}`, seen(Math.abs(r)));
    }
    case 'check-equal': {
      const [a, b] = [f3Of(parents[0]), f3Of(parents[1])];
      const c = [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
      return check(status, null, `${labels[0]} = ${labels[1]}`, seen(Math.hypot(c[0], c[1], c[2])));
    }
    default:
      return null;
  }
}
