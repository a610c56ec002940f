// The construction store: commits recompute only what changed, previews make dependents approximate
// without an undo step, undo and redo restore values, and tools build what they say.
import { beforeEach, describe, expect, it } from 'vitest';
import { constructionAdd, constructionEmpty, constructionUpdate } from '../../../src/construct/graph.ts';
import { $canUndo, $doc, $history, $values, docCommit, docPreview, docRedo, docReset, docUndo } from '../../../src/ui/stores/construction.ts';
import { toolBuild, toolSpec, pickRefusal, toolByKey } from '../../../src/ui/tools.ts';
import type { PointValue } from '../../../src/construct/types.ts';

function setup() {
  docReset(constructionEmpty());
  let doc = $doc.get();
  const add = (kind: string, parents: string[], params: Record<string, string>, label?: string) => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params }, ...(label ? { label } : {}) });
    doc = r.doc;
    return r.id;
  };
  const E = add('curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' });
  const O = add('point-on-curve', [E], { at: '0:2:1' }, 'O');
  const P = add('point-on-curve', [E], { at: '1:1:1' }, 'P');
  const Q = add('point-on-curve', [E], { at: '2:2:1' }, 'Q');
  docCommit(doc);
  return { E, O, P, Q };
}

describe('construction store', () => {
  beforeEach(() => docReset(constructionEmpty()));

  it('computes values on commit and keeps unchanged values on the next commit', () => {
    const { O, P, Q, E } = setup();
    const before = $values.get();
    expect((before.get(P) as PointValue).exact).toEqual([1n, 1n, 1n]);
    const built = toolBuild(toolSpec('sum'), [O, P, Q], { doc: $doc.get(), values: before, n: '2' });
    docCommit(built.doc);
    const after = $values.get();
    expect(after.get(O)).toBe(before.get(O));
    expect(after.get(E)).toBe(before.get(E));
    expect((after.get(built.made[0]) as PointValue).exact).toEqual([6n, 14n, 1n]); // worked by hand (evaluate.test.ts)
    // The sum tool drew its helpers: P*Q, the chord PQ and the line through O and P*Q.
    expect(built.made).toHaveLength(4);
    expect($doc.get().objects.filter((o) => o.helperOf === built.made[0])).toHaveLength(3);
  });

  it('previews a drag without an undo step, then commits the drop as one step', () => {
    const { Q } = setup();
    const built = toolBuild(toolSpec('line'), [$doc.get().objects[1].id, Q], { doc: $doc.get(), values: $values.get(), n: '2' });
    docCommit(built.doc);
    const steps = $history.get().past.length;
    docPreview(new Map([[Q, { x: 2.05, y: 2.1, finite: true }]]));
    expect((($values.get().get(Q)) as PointValue).status).toBe('approximate');
    expect($values.get().get(built.made[0])).toMatchObject({ type: 'line', status: 'approximate' });
    expect($history.get().past.length).toBe(steps);
    docCommit(constructionUpdate($doc.get(), Q, { params: { at: '-2:2:1' } }));
    expect((($values.get().get(Q)) as PointValue).status).toBe('exact');
    expect($values.get().get(built.made[0])).toMatchObject({ type: 'line', status: 'exact' });
    expect($history.get().past.length).toBe(steps + 1);
  });

  it('undo and redo restore documents and values', () => {
    const { P } = setup();
    const n = $doc.get().objects.length;
    docCommit(constructionUpdate($doc.get(), P, { params: { at: '1:-1:1' } }));
    expect(($values.get().get(P) as PointValue).exact).toEqual([1n, -1n, 1n]);
    expect(docUndo()).toBe(true);
    expect(($values.get().get(P) as PointValue).exact).toEqual([1n, 1n, 1n]);
    expect(docRedo()).toBe(true);
    expect(($values.get().get(P) as PointValue).exact).toEqual([1n, -1n, 1n]);
    expect($doc.get().objects.length).toBe(n);
    expect($canUndo.get()).toBe(true);
  });

  it('tools refuse the wrong kind of object in words, and have keys', () => {
    expect(pickRefusal(toolSpec('tangent'), 0, 'line', 'l1')).toBe('Tangent needs a point here (the point of tangency), but l1 is a line.');
    expect(pickRefusal(toolSpec('meet'), 1, 'point', 'A')).toMatch(/needs a line or a curve/);
    expect(pickRefusal(toolSpec('meet'), 1, 'curve', 'E1')).toBeNull();
    expect(toolByKey('S')?.id).toBe('sum');
    const keys = new Set(['v', 'p', 'c', 'l', 't', 'm', 'x', 's', 'n', 'i', '9', 'r']);
    expect(new Set(['move', 'point', 'on-curve', 'line', 'tangent', 'meet', 'third', 'sum', 'multiple', 'negative', 'ninth', 'region'].map((t) => toolSpec(t as never).key))).toEqual(keys);
  });

  it('the meet tool makes one point per real meet point', () => {
    const { E } = setup();
    let doc = $doc.get();
    const l = constructionAdd(doc, { construction: { kind: 'line-equation', parents: [], params: { at: '0:1:-2' } } }); // y = 2
    doc = l.doc;
    docCommit(doc);
    const built = toolBuild(toolSpec('meet'), [l.id, E], { doc, values: $values.get(), n: '2' });
    docCommit(built.doc);
    // y = 2 meets y^2 = x^3 - 4x + 4 where x^3 - 4x = 0: x = 0, ±2, all rational.
    const xs = built.made.map((id) => ($values.get().get(id) as PointValue).approx.x).sort((a, b) => a - b);
    expect(xs).toEqual([-2, 0, 2]);
    expect(built.made.every((id) => ($values.get().get(id) as PointValue).status === 'exact')).toBe(true);
  });
});
