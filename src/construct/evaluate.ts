// Recomputing a construction: one value per object, in construction order, from the parents' values.
//
// Rules (DESIGN.md, exactness model):
//   - all parents exact          -> the exact evaluator (src/cubic, src/plane); its value is exact, or
//                                   algebraic when the answer is a real algebraic point (a meet, a point on a
//                                   curve at an irrational place);
//   - some parent algebraic      -> the float shadow, status 'algebraic' (the object is a real algebraic one;
//                                   we show its approximation and say so);
//   - some parent approximate    -> the float shadow, status 'approximate' (a drag in progress);
//   - a kind with no float shadow (or a shadow that cannot follow this step) keeps its last value, marked
//     approximate, until exact data returns;
//   - a parent that failed makes its children fail with "waits for ...".
// Only objects downstream of `changed` are recomputed when `previous` values are given.
import { NinefoldError } from '../exact/errors.ts';
import { evaluateExact } from './evaluate-exact.ts';
import { evaluateFloat } from './evaluate-float.ts';
import type { ConstructionDoc, ConstructionObject, ObjectId, ObjectValue, PointApprox, Status } from './types.ts';

export interface EvaluateOptions {
  /** Values from the last evaluation; objects not downstream of `changed` keep them. */
  readonly previous?: ReadonlyMap<ObjectId, ObjectValue>;
  /** Objects whose construction or params changed since `previous`; all objects when omitted. */
  readonly changed?: ReadonlySet<ObjectId>;
  /** Points being dragged, at float positions: they and their dependents become approximate. */
  readonly moving?: ReadonlyMap<ObjectId, PointApprox>;
  /** Objects whose exact value is left to someone else (a worker): they keep their last value, marked
   * approximate, or wait, and their dependents follow from that. */
  readonly defer?: (object: ConstructionObject, doc: ConstructionDoc) => boolean;
}

/** The message of a value left to the background. */
export const DEFERRED_MESSAGE = 'being computed in the background';

/** Everything an evaluator sees: the object, its parents' values (none failed) and their labels. */
export interface EvalInput {
  readonly object: ConstructionObject;
  readonly parents: readonly ObjectValue[];
  readonly labels: readonly string[];
  readonly params: Readonly<Record<string, string>>;
  readonly previous?: ObjectValue;
  readonly moving?: PointApprox;
}

export function constructionEvaluate(doc: ConstructionDoc, opts: EvaluateOptions = {}): Map<ObjectId, ObjectValue> {
  const values = new Map<ObjectId, ObjectValue>();
  const labels = new Map(doc.objects.map((o) => [o.id, o.label]));
  const dirty = new Set<ObjectId>();
  for (const object of doc.objects) {
    const id = object.id;
    const parentIds = object.construction.parents;
    const isDirty =
      !opts.previous ||
      !opts.changed ||
      opts.changed.has(id) ||
      opts.moving?.has(id) ||
      parentIds.some((p) => dirty.has(p)) ||
      !opts.previous.has(id);
    if (!isDirty) {
      values.set(id, opts.previous!.get(id)!);
      continue;
    }
    dirty.add(id);
    if (opts.defer?.(object, doc) && !opts.moving?.size) {
      const prev = opts.previous?.get(id);
      values.set(id, prev && prev.type !== 'failure' ? staleValue({ object, parents: [], labels: [], params: {}, previous: prev }, 'approximate') : { type: 'failure', message: DEFERRED_MESSAGE, where: id });
      continue;
    }
    values.set(id, evaluateOne(object, values, labels, opts));
  }
  return values;
}

function evaluateOne(
  object: ConstructionObject,
  values: ReadonlyMap<ObjectId, ObjectValue>,
  labels: ReadonlyMap<ObjectId, string>,
  opts: EvaluateOptions,
): ObjectValue {
  const parentIds = object.construction.parents;
  const parents = parentIds.map((p) => values.get(p)!);
  const failed = parents.findIndex((v) => v.type === 'failure');
  if (failed >= 0) {
    return { type: 'failure', message: `waits for ${labels.get(parentIds[failed])}, which cannot be built now`, where: parentIds[failed] };
  }
  const input: EvalInput = {
    object,
    parents,
    labels: parentIds.map((p) => labels.get(p) ?? p),
    params: object.construction.params,
    previous: opts.previous?.get(object.id),
    moving: opts.moving?.get(object.id),
  };
  const status = weakestStatus(parents.map((v) => (v as { status: Status }).status));
  try {
    if (input.moving || status !== 'exact') {
      const shadow = evaluateFloat(input, input.moving ? 'approximate' : status);
      if (shadow) return shadow;
      return staleValue(input, input.moving ? 'approximate' : status);
    }
    return evaluateExact(input);
  } catch (e) {
    if (e instanceof NinefoldError) return { type: 'failure', message: e.message, where: e.where };
    throw e;
  }
}

/** approximate < algebraic < exact: a value is only as good as its weakest parent. */
export function weakestStatus(statuses: readonly Status[]): Status {
  if (statuses.includes('approximate')) return 'approximate';
  if (statuses.includes('algebraic')) return 'algebraic';
  return 'exact';
}

function staleValue(input: EvalInput, status: Status): ObjectValue {
  const prev = input.previous;
  if (!prev || prev.type === 'failure') {
    return { type: 'failure', message: 'shown again once its parents are exact', where: input.object.id };
  }
  if (prev.type === 'check') return { ...prev, status, verdict: 'undecided', certificate: 'waiting for exact data' };
  // Drop the exact part: it belonged to the old parents.
  if (prev.type === 'curve') return { type: 'curve', status, approx: prev.approx };
  if (prev.type === 'line') return { type: 'line', status, approx: prev.approx };
  return { type: 'point', status, approx: prev.approx, ...(prev.multiplicity ? { multiplicity: prev.multiplicity } : {}), ...(prev.pencil ? { pencil: prev.pencil } : {}) };
}
