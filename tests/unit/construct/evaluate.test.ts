// Recomputing a construction: order, statuses, reuse of unchanged values, failures, checks re-decided.
// The curve y^2 = x^3 - 4x + 4 (our own) has the small points (0, ±2), (1, ±1), (2, ±2), (-2, ±2); sums below
// were worked by hand with the chord construction (Silverman–Tate, Rational Points on Elliptic Curves, I.2).
import { describe, expect, it } from 'vitest';
import { constructionAdd, constructionEmpty, constructionUpdate } from '../../../src/construct/graph.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import type { CheckValue, ConstructionDoc, ObjectValue, PointValue } from '../../../src/construct/types.ts';

function build(steps: [string, string, string[], Record<string, string>][]): { doc: ConstructionDoc; id: Record<string, string> } {
  let doc = constructionEmpty();
  const id: Record<string, string> = {};
  for (const [name, kind, parents, params] of steps) {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents: parents.map((p) => id[p]), params }, label: name });
    doc = r.doc;
    id[name] = r.id;
  }
  return { doc, id };
}

const point = (v: ObjectValue | undefined): PointValue => {
  if (v?.type !== 'point') throw new Error(`expected a point, got ${JSON.stringify(v, (_, x) => (typeof x === 'bigint' ? String(x) : x))}`);
  return v;
};
const chk = (v: ObjectValue | undefined): CheckValue => v as CheckValue;

describe('constructionEvaluate', () => {
  const { doc, id } = build([
    ['E', 'curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' }],
    ['O', 'point-on-curve', ['E'], { at: '0:2:1' }],
    ['P', 'point-on-curve', ['E'], { at: '1:1:1' }],
    ['Q', 'point-on-curve', ['E'], { at: '2:2:1' }],
    ['R', 'point-on-curve', ['E'], { at: '-2:2:1' }],
    ['S', 'point-sum', ['E', 'O', 'P', 'Q'], {}],
    ['T', 'point-third', ['E', 'P', 'Q'], {}],
    ['l', 'line-through-two', ['P', 'Q'], {}],
    ['k', 'check-collinear', ['P', 'Q', 'T'], {}],
    ['a', 'check-associative', ['E', 'O', 'P', 'Q', 'R'], {}],
  ]);

  it('computes exact values from the core', () => {
    const v = constructionEvaluate(doc);
    expect(point(v.get(id.T)).exact).toEqual([2n, 2n, -1n]); // y = x meets again at (-2, -2), primitive with first entry positive
    expect(point(v.get(id.S)).exact).toEqual([6n, 14n, 1n]); // O * (-2, -2) on y = 2x + 2: x = 6
    expect(point(v.get(id.S)).status).toBe('exact');
    expect(v.get(id.l)).toMatchObject({ type: 'line', status: 'exact', exact: [1n, -1n, 0n] });
    expect(chk(v.get(id.k))).toMatchObject({ verdict: 'holds', status: 'exact', certificate: 'every 3×3 determinant is 0: all on the line 1:-1:0' });
    expect(chk(v.get(id.a)).verdict).toBe('holds');
  });

  it('recomputes only what depends on a change, and re-decides checks', () => {
    const v1 = constructionEvaluate(doc);
    // Move Q to another rational point: (-2, -2). Then T = P*Q is (2, 2) and the check still holds.
    const doc2 = constructionUpdate(doc, id.Q, { params: { at: '-2:-2:1' } });
    const v2 = constructionEvaluate(doc2, { previous: v1, changed: new Set([id.Q]) });
    expect(v2.get(id.O)).toBe(v1.get(id.O)); // untouched objects keep their value objects
    expect(v2.get(id.P)).toBe(v1.get(id.P));
    expect(point(v2.get(id.T)).exact).toEqual([2n, 2n, 1n]);
    // Replace the third point's check by P, Q, O: not collinear, with the determinant as certificate.
    const doc3 = build([
      ['A', 'point-free', [], { at: '0:0:1' }],
      ['B', 'point-free', [], { at: '1:0:1' }],
      ['C', 'point-free', [], { at: '2:0:1' }],
      ['k', 'check-collinear', ['A', 'B', 'C'], {}],
    ]);
    const w1 = constructionEvaluate(doc3.doc);
    expect(chk(w1.get(doc3.id.k)).verdict).toBe('holds');
    const moved = constructionUpdate(doc3.doc, doc3.id.C, { params: { at: '2:1:1' } });
    const w2 = constructionEvaluate(moved, { previous: w1, changed: new Set([doc3.id.C]) });
    expect(chk(w2.get(doc3.id.k))).toMatchObject({ verdict: 'fails', certificate: 'det(A, B, C) = 1' });
  });

  it('makes dependents of a moving point approximate, and keeps the rest exact', () => {
    const v1 = constructionEvaluate(doc);
    const moving = new Map([[id.Q, { x: 2.01, y: 2.0, finite: true }]]);
    const v2 = constructionEvaluate(doc, { previous: v1, changed: new Set([id.Q]), moving });
    const q = point(v2.get(id.Q));
    expect(q.status).toBe('approximate');
    expect(q.approx.y * q.approx.y - (q.approx.x ** 3 - 4 * q.approx.x + 4)).toBeCloseTo(0, 9); // projected onto E
    expect(point(v2.get(id.S)).status).toBe('approximate');
    expect(point(v2.get(id.S)).exact).toBeUndefined();
    expect(chk(v2.get(id.k))).toMatchObject({ verdict: 'undecided', status: 'approximate' });
    expect(point(v2.get(id.P)).status).toBe('exact');
    // The float sum stays near the exact sum for a small move.
    expect(point(v2.get(id.S)).approx.x).toBeCloseTo(6, 0);
  });

  it('turns a failed construction into a message and makes its children wait', () => {
    const { doc: d, id: i } = build([
      ['A', 'point-free', [], { at: '1:2:1' }],
      ['B', 'point-free', [], { at: '2:4:2' }],
      ['l', 'line-through-two', ['A', 'B'], {}],
      ['m', 'line-through-two', ['A', 'A'], {}],
      ['X', 'point-meet', ['l', 'm'], { index: '0' }],
      ['E', 'curve-equation', [], { equation: 'y^2 = x^^3' }],
    ]);
    const v = constructionEvaluate(d);
    expect(v.get(i.l)).toMatchObject({ type: 'failure', message: 'A and B are the same point, so they fix no line' });
    expect(v.get(i.X)).toMatchObject({ type: 'failure', message: 'waits for l, which cannot be built now' });
    expect(v.get(i.E)).toMatchObject({ type: 'failure', where: expect.stringMatching(/column \d+/) });
  });

  it('refuses a point that is not on its curve, in words', () => {
    const { doc: d, id: i } = build([
      ['E', 'curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' }],
      ['P', 'point-on-curve', ['E'], { at: '1:2:1' }],
    ]);
    expect(constructionEvaluate(d).get(i.P)).toMatchObject({ type: 'failure', message: '1:2:1 is not on E (F = -3)' });
  });

  it('builds the ninth point of eight and decides the nine-point check (Cayley–Bacharach)', () => {
    // Eight points of y^2 = x^3 - 4x + 4: E is a cubic through them, so it must contain the ninth base point
    // of their pencil (Eisenbud–Green–Harris, Bull. AMS 1996, §1) — decided by F(ninth) = 0 exactly.
    const pts: [string, string, string[], Record<string, string>][] = ['0:2:1', '0:-2:1', '1:1:1', '1:-1:1', '2:2:1', '2:-2:1', '-2:2:1', '-2:-2:1'].map(
      (at, i) => [`P${i}`, 'point-free', [], { at }],
    );
    const names = pts.map((p) => p[0]);
    const { doc: d, id: i } = build([
      ['E', 'curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' }],
      ...pts,
      ['N', 'point-ninth', names, {}],
      ['on', 'check-on-curve', ['N', 'E'], {}],
      ['nine', 'check-nine', [...names, 'N'], {}],
      ['C', 'conic-through-five', names.slice(0, 5), {}],
      ['M', 'pencil-member', names, { member: '1:1' }],
      ['onM', 'check-on-curve', ['N', 'M'], {}],
    ]);
    const v = constructionEvaluate(d);
    expect(point(v.get(i.N)).status).toBe('exact');
    expect(chk(v.get(i.on))).toMatchObject({ verdict: 'holds', certificate: expect.stringMatching(/= 0$/) });
    expect(chk(v.get(i.nine)).verdict).toBe('holds');
    expect(chk(v.get(i.onM)).verdict).toBe('holds');
    // Five of the points, (0, ±2), (1, ±1), (2, 2), lie on one conic; it must contain all five.
    const c = v.get(i.C);
    expect(c?.type).toBe('curve');
  });
});
