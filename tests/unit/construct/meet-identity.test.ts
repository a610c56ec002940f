// A meet point keeps its identity through a drag and across the drop (types.ts, MEET IDENTITY).
// The curve y^2 = x^3 - 4x + 4 is our own. The line through B = (0, 2) with slope m meets it again where
// x^2 - m^2·x - (4 + 4m) = 0 (substitute y = mx + 2; worked by hand): at m = 1 in x = (1 ± √33)/2, at
// m = 2 in x = 6 and x = -2, i.e. (6, 14) and (-2, -2). The root with the + sign moves continuously from
// (1 + √33)/2 to 6 as m goes from 1 to 2; by meet.ts's order it is number 1 at m = 1 but (-2, -2) is
// number 1 at m = 2, so "the k-th meet point" would jump at the drop.
import { describe, expect, it } from 'vitest';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { constructionMeetsSettle, meetNearest, meetPointChoose, pointNear } from '../../../src/construct/meet-identity.ts';
import { constructionUpdate } from '../../../src/construct/graph.ts';
import { pointParse } from '../../../src/plane/parse-point.ts';
import { build, dragDrop, dragStep, pointValue } from './drag-helpers.ts';

const setup = () =>
  build([
    ['E', 'curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' }],
    ['B', 'point-free', [], { at: '0:2:1' }],
    ['A', 'point-free', [], { at: '1:3:1' }],
    ['l', 'line-through-two', ['A', 'B']],
    ['M', 'point-meet', ['l', 'E'], { index: '1' }],
  ]);

const plusRoot = (m: number): number => (m * m + Math.sqrt(m ** 4 + 16 + 16 * m)) / 2;

describe('meet identity', () => {
  it('premise: by index alone the meet point changes between m = 1 and m = 2', () => {
    const { doc, id } = setup();
    const before = pointValue(constructionEvaluate(doc).get(id.M));
    expect(before.approx.x).toBeCloseTo(plusRoot(1), 12);
    const after = pointValue(constructionEvaluate(constructionUpdate(doc, id.A, { params: { at: '1:4:1' } })).get(id.M));
    expect(after.exact).toEqual([2n, 2n, -1n]); // (-2, -2), not the continuation (6, 14)
  });

  it('follows the same point through the drag and keeps it after the drop', () => {
    const { doc, id } = setup();
    let values = constructionEvaluate(doc);
    for (let k = 1; k <= 40; k++) {
      const m = 1 + k / 40;
      values = dragStep(doc, values, id.A, { x: 1, y: 2 + m, finite: true });
      const v = pointValue(values.get(id.M), `step ${k}`);
      expect(v.status).toBe('approximate');
      expect(Math.abs(v.approx.x - plusRoot(m)), `step ${k}, m = ${m}`).toBeLessThan(1e-9);
    }
    const drop = dragDrop(doc, values, id.A, '1:4:1');
    const v = pointValue(drop.values.get(id.M));
    expect(v).toMatchObject({ status: 'exact', exact: [6n, 14n, 1n] });
    // Written back into the params, the choice survives a recomputation without the drag (a reload,
    // the worker), while the old index stays for files read by older code.
    const settled = constructionMeetsSettle(drop.doc, drop.values);
    const params = settled.objects.find((o) => o.id === id.M)!.construction.params;
    expect(params).toEqual({ index: '1', near: '6:14:1' });
    expect(pointValue(constructionEvaluate(settled).get(id.M)).exact).toEqual([6n, 14n, 1n]);
  });

  it('settles a float position as a nearby rational point, and leaves unchanged documents alone', () => {
    const { doc, id } = setup();
    let values = constructionEvaluate(doc);
    values = dragStep(doc, values, id.A, { x: 1, y: 3.5, finite: true });
    const settled = constructionMeetsSettle(doc, values);
    const near = pointParse(settled.objects.find((o) => o.id === id.M)!.construction.params.near);
    const x = Number(near[0]) / Number(near[2]);
    expect(Math.abs(x - plusRoot(1.5))).toBeLessThan(1e-8 * plusRoot(1.5));
    expect(constructionMeetsSettle(settled, values)).toBe(settled);
    const p = pointNear({ x: 0.6, y: -1, finite: false });
    expect(p[2]).toBe(0n);
    expect(Number(p[1]) / Number(p[0])).toBeCloseTo(-1 / 0.6, 8);
  });

  it('an old file without "near" loads as before: the index decides', () => {
    const { doc, id } = setup();
    const v = pointValue(constructionEvaluate(doc).get(id.M));
    expect(v.approx.x).toBeCloseTo(plusRoot(1), 12);
    const named = constructionUpdate(doc, id.M, { params: { index: '1', near: '-12:-2:5' } });
    // near (-2.4, -0.4), next to (-2.37…, -0.37…), picks that point, whatever the index says
    expect(pointValue(constructionEvaluate(named).get(id.M)).approx.x).toBeCloseTo((1 - Math.sqrt(33)) / 2, 12);
    // a near far from every meet point (a stale place in a new instance) names none: the index decides
    const stale = constructionUpdate(doc, id.M, { params: { index: '1', near: '-1:-1:1' } });
    expect(pointValue(constructionEvaluate(stale).get(id.M)).approx.x).toBeCloseTo(plusRoot(1), 12);
  });

  it('chooses by the rule order and refuses a bad index', () => {
    const cands = [{ approx: [1, 0, 0] as const }, { approx: [0, 1, 0] as const }, { approx: [0, 0, 1] as const }];
    expect(meetNearest(cands, [0.1, 0.2, 0.97])).toBe(2);
    expect(meetPointChoose(cands, { index: '1' })).toBe(1);
    expect(meetPointChoose(cands, { index: '7' })).toBe(-1);
    expect(meetPointChoose(cands, { index: '0', near: '0:5:1' })).toBe(1);
    expect(meetPointChoose(cands, { index: '0', near: '1:1:1' })).toBe(0); // equidistant: names none
    const dragged = { type: 'point', status: 'approximate', approx: { x: 5, y: 0.1, finite: false } } as const;
    expect(meetPointChoose(cands, { index: '2', near: '0:5:1' }, dragged)).toBe(0);
    const exactBefore = { ...dragged, status: 'exact' } as const;
    expect(meetPointChoose(cands, { index: '2' }, exactBefore)).toBe(2);
    expect(() => meetPointChoose(cands, { index: 'two' })).toThrow(/whole number/);
    expect(() => meetPointChoose(cands, { index: '0', near: '1:2' })).toThrow();
  });
});
