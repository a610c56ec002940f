// Placing points on a curve: snapping to rational points of small height, else an exact algebraic point.
// Curve y^2 = x^3 - 4x + 4 (our own); its small points were found by hand.
import { describe, expect, it } from 'vitest';
import { curveAxisPoint, curvePlace, curveRationalNear } from '../../../src/construct/on-curve.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';

const f = formParse('y^2 = x^3 - 4x + 4').form;

describe('curveRationalNear', () => {
  it('finds the point of least height in reach', () => {
    expect(curveRationalNear(f, 1.03, 0.97, 0.1)?.point).toEqual([1n, 1n, 1n]);
    expect(curveRationalNear(f, -2.02, -2.03, 0.1)?.point).toEqual([2n, 2n, -1n]);
  });
  it('finds a point with denominators: the tangent at (1, 1) meets again at (-7/4, 19/8)', () => {
    // Worked by hand: slope (3 - 4)/2 = -1/2, x = 1/4 - 1 - 1 = -7/4, y = 1 + 11/8 (Silverman–Tate I.4 formulas).
    expect(curveRationalNear(f, -1.76, 2.37, 0.05, 8)?.point).toEqual([14n, -19n, -8n]);
  });
  it('returns null far from rational points of small height', () => {
    // Near x = 3 the curve has y = ±√19: no rational point of denominator ≤ 8 within 0.01.
    expect(curveRationalNear(f, 3, Math.sqrt(19), 0.01, 8)).toBeNull();
  });
});

describe('curveAxisPoint and curvePlace', () => {
  it('gives the algebraic point (3, √19) nearest the pointer', () => {
    const a = curveAxisPoint(f, 'x', '3', '4');
    expect(a.point).toBeNull();
    expect(a.y).toBeCloseTo(Math.sqrt(19), 12);
    expect(a.text).toMatch(/root of/);
    const b = curveAxisPoint(f, 'x', '3', '-4');
    expect(b.y).toBeCloseTo(-Math.sqrt(19), 12);
  });
  it('recognises a rational root on the line', () => {
    expect(curveAxisPoint(f, 'x', '2', '1.9').point).toEqual([2n, 2n, 1n]);
  });
  it('says so when the line misses the real curve', () => {
    expect(() => curveAxisPoint(f, 'x', '-5', '0')).toThrow(/does not meet/);
  });
  it('places exactly when a rational point is near, else algebraically', () => {
    expect(curvePlace(f, 0.01, 2.01, 0.1, -1).params).toEqual({ at: '0:2:1' });
    const p = curvePlace(f, 3.001, 4.36, 0.02, 2.6);
    expect(p.exact).toBe(false);
    expect(Object.keys(p.params).sort()).toEqual(['near', 'y']);
  });
  it('evaluates an algebraic placement with status algebraic', () => {
    let doc = constructionEmpty();
    const e = constructionAdd(doc, { construction: { kind: 'curve-equation', parents: [], params: { equation: 'y^2 = x^3 - 4x + 4' } } });
    const p = constructionAdd(e.doc, { construction: { kind: 'point-on-curve', parents: [e.id], params: { x: '3', near: '4' } } });
    doc = p.doc;
    const v = constructionEvaluate(doc).get(p.id);
    expect(v).toMatchObject({ type: 'point', status: 'algebraic' });
    if (v?.type === 'point') expect(v.approx.y).toBeCloseTo(Math.sqrt(19), 12);
  });
});
