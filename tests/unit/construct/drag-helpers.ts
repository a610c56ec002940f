// Shared by the drag tests: build a construction from named steps, and replay a drag the way the page
// does (src/ui/stores/construction.ts): each pointer move evaluates with `moving` and the last values as
// `previous`; the drop commits the new place and evaluates with the drag's last values as `previous`.
import { constructionAdd, constructionEmpty, constructionUpdate } from '../../../src/construct/graph.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import type { ConstructionDoc, ObjectId, ObjectValue, PointApprox, PointValue } from '../../../src/construct/types.ts';

export type Step = [name: string, kind: string, parents: string[], params?: Record<string, string>];

export function build(steps: readonly Step[]): { doc: ConstructionDoc; id: Record<string, string> } {
  let doc = constructionEmpty();
  const id: Record<string, string> = {};
  for (const [name, kind, parents, params] of steps) {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents: parents.map((p) => id[p]), params: params ?? {} }, label: name });
    doc = r.doc;
    id[name] = r.id;
  }
  return { doc, id };
}

export type Values = Map<ObjectId, ObjectValue>;

/** One pointer move of a drag of `id` to `at`. */
export function dragStep(doc: ConstructionDoc, previous: Values, id: ObjectId, at: PointApprox): Values {
  return constructionEvaluate(doc, { previous, changed: new Set([id]), moving: new Map([[id, at]]) });
}

/** The drop: `id` placed at the exact point `at` ("X:Y:Z"), evaluated from the drag's last values. */
export function dragDrop(doc: ConstructionDoc, previous: Values, id: ObjectId, at: string): { doc: ConstructionDoc; values: Values } {
  const next = constructionUpdate(doc, id, { params: { at } });
  return { doc: next, values: constructionEvaluate(next, { previous, changed: new Set([id]) }) };
}

export function pointValue(v: ObjectValue | undefined, what = 'value'): PointValue {
  if (v?.type !== 'point') throw new Error(`${what}: expected a point, got ${JSON.stringify(v, (_, x) => (typeof x === 'bigint' ? String(x) : x))}`);
  return v;
}

/** sin of the angle between two projective points given as float approximations (0 = the same point). */
export function approxDistance(a: PointApprox, b: PointApprox): number {
  const u = a.finite ? [a.x, a.y, 1] : [a.x, a.y, 0];
  const v = b.finite ? [b.x, b.y, 1] : [b.x, b.y, 0];
  const nu = Math.hypot(u[0], u[1], u[2]);
  const nv = Math.hypot(v[0], v[1], v[2]);
  const c = [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
  return Math.hypot(c[0], c[1], c[2]) / (nu * nv);
}

/** A point (X:Y:Z) of integers as a float approximation. */
export function approxOf(p: readonly bigint[]): PointApprox {
  return p[2] === 0n ? { x: Number(p[0]), y: Number(p[1]), finite: false } : { x: Number(p[0]) / Number(p[2]), y: Number(p[1]) / Number(p[2]), finite: true };
}
