// The kinds 'curve-weierstrass' and 'point-weierstrass-image' (weierstrass-kinds.ts) over
// src/cubic/weierstrass.ts. C: x^3 + xy^2 - 2y^3 + x^2 - 3y + 2 = 0 is our own (the demo scene's curve),
// with the rational point O = (1, 1), not a flex. Checked: the images agree with weierstrassMap; the
// model curve is smooth with the j-invariant of C (j is an invariant of the curve, so an isomorphism keeps
// it: Silverman, AEC III.1.4); images lie on it; during a drag of P along C the float image stays within
// a small distance of the exact image; bad input fails with a message.
import { describe, expect, it } from 'vitest';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { constructionUpdate } from '../../../src/construct/graph.ts';
import { modelPointTriple, weierstrassImageFloat } from '../../../src/construct/weierstrass-kinds.ts';
import { curveProjectFloat, f3FromBig, f3Normalise, f3Sine, formToFloat } from '../../../src/construct/float.ts';
import { cubicThirdPoint } from '../../../src/cubic/chord.ts';
import { cubicInvariants } from '../../../src/cubic/invariants.ts';
import { weierstrassMap, weierstrassModel } from '../../../src/cubic/weierstrass.ts';
import { ratEq } from '../../../src/exact/rational.ts';
import { formEval } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { pointToString } from '../../../src/plane/parse-point.ts';
import type { Point } from '../../../src/plane/point.ts';
import type { CurveValue, ObjectFailure } from '../../../src/construct/types.ts';
import { approxDistance, approxOf, build, dragStep, pointValue } from './drag-helpers.ts';

const C = 'x^3 + xy^2 - 2y^3 + x^2 - 3y + 2 = 0';
const f = formParse(C).form;
const O: Point = [1n, 1n, 1n];

/** A few rational points of C by chords from O and P = (-1, 1/2) (Silverman–Tate, ch. I). */
function someRationalPoints(): Point[] {
  const p: Point = [2n, -1n, -2n];
  const out: Point[] = [p];
  let a = p;
  let b = cubicThirdPoint(f, O, O);
  out.push(b);
  for (let k = 0; k < 4; k++) {
    const c = cubicThirdPoint(f, a, b);
    out.push(c);
    a = b;
    b = c;
  }
  return out.filter((q) => q.every((x) => (x < 0n ? -x : x) < 10n ** 12n));
}

const scene = () =>
  build([
    ['C', 'curve-equation', [], { equation: C }],
    ['O', 'point-on-curve', ['C'], { at: '1:1:1' }],
    ['P', 'point-on-curve', ['C'], { at: '2:-1:-2' }],
    ['W', 'curve-weierstrass', ['C', 'O']],
    ['WO', 'point-weierstrass-image', ['C', 'O', 'O']],
    ['WP', 'point-weierstrass-image', ['C', 'O', 'P']],
  ]);

describe('Weierstrass kinds', () => {
  it('the model curve is the long form of the minimal model, smooth, with the j-invariant of C', () => {
    const { doc, id } = scene();
    const w = constructionEvaluate(doc).get(id.W) as CurveValue;
    expect(w.status).toBe('exact');
    const model = weierstrassModel(f, O);
    const [a1, a2, a3, a4, a6] = model.a;
    // X^3 + a2 X^2 Z + a4 X Z^2 + a6 Z^3 − Y^2 Z − a1 XYZ − a3 YZ^2, in the monomial order of form.ts
    expect(w.form!.coeffs).toEqual([1n, 0n, a2, 0n, -a1, a4, 0n, -1n, -a3, a6]);
    const jw = cubicInvariants(w.form!);
    expect(jw.discriminant.num).not.toBe(0n);
    expect(ratEq(jw.j!, cubicInvariants(f).j!)).toBe(true);
    expect(ratEq(jw.j!, model.j)).toBe(true);
  });

  it('images agree with weierstrassMap, lie on the model, and O goes to (0:1:0)', () => {
    const { doc, id } = scene();
    const model = weierstrassModel(f, O);
    const values = constructionEvaluate(doc);
    const w = (values.get(id.W) as CurveValue).form!;
    expect(pointValue(values.get(id.WO)).exact).toEqual([0n, 1n, 0n]);
    const pts = someRationalPoints();
    expect(pts.length).toBeGreaterThanOrEqual(4);
    for (const p of pts) {
      const v = pointValue(constructionEvaluate(constructionUpdate(doc, id.P, { params: { at: pointToString(p) } })).get(id.WP), pointToString(p));
      expect(v.status).toBe('exact');
      expect(v.exact, pointToString(p)).toEqual(modelPointTriple(weierstrassMap(model, p)));
      expect(formEval(w, v.exact!), pointToString(p)).toBe(0n);
    }
  });

  it('the float image follows a drag of P along C', () => {
    const { doc, id } = scene();
    let values = constructionEvaluate(doc);
    const model = weierstrassModel(f, O);
    let steps = 0;
    for (const p of someRationalPoints()) {
      if (p[2] === 0n) continue;
      values = dragStep(doc, values, id.P, approxOf(p));
      const v = pointValue(values.get(id.WP));
      expect(v.status).toBe('approximate');
      expect(approxDistance(v.approx, approxOf(modelPointTriple(weierstrassMap(model, p)))), pointToString(p)).toBeLessThan(1e-9);
      // W and the image of O do not depend on P: they keep their exact values
      expect((values.get(id.W) as CurveValue).status).toBe('exact');
      steps++;
    }
    expect(steps).toBeGreaterThanOrEqual(3);
  });

  it('the float image is continuous through O and O\' = O * O, where the forward forms all vanish', () => {
    const model = weierstrassModel(f, O);
    const second = model.lines.second!;
    const cf = formToFloat(f);
    for (const [base, label] of [[second, "O'"], [O, 'O']] as const) {
      const exact = f3FromBig(modelPointTriple(weierstrassMap(model, base)));
      const b = f3FromBig(base);
      for (const h of [1e-3, 1e-5, 1e-7, 1e-9, 0]) {
        const near = curveProjectFloat(cf, b[0] / b[2] + h, b[1] / b[2] - h / 2)!;
        const img = weierstrassImageFloat(model, f3Normalise([near.x, near.y, 1]));
        expect(img, `${label}, offset ${h}`).not.toBeNull();
        // the image moves by about the offset times the map's derivative (well under 1000 here)
        expect(f3Sine(img!, exact), `${label}, offset ${h}`).toBeLessThan(1e-9 + 1e3 * h);
      }
    }
  });

  it('a flex base point on a curve already in Weierstrass form gives back the curve', () => {
    // y^2 = x^3 - 4x + 4 (our own) is minimal (Δ = -16·(4·(-4)^3 + 27·16) = -16·176, not divisible by p^12)
    const { doc, id } = build([
      ['E', 'curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' }],
      ['O', 'point-on-curve', ['E'], { at: '0:1:0' }],
      ['P', 'point-on-curve', ['E'], { at: '2:2:1' }],
      ['W', 'curve-weierstrass', ['E', 'O']],
      ['WP', 'point-weierstrass-image', ['E', 'O', 'P']],
    ]);
    const v = constructionEvaluate(doc);
    expect((v.get(id.W) as CurveValue).form!.coeffs).toEqual([1n, 0n, 0n, 0n, 0n, -4n, 0n, -1n, 0n, 4n]);
    expect(pointValue(v.get(id.WP)).exact).toEqual([2n, 2n, 1n]);
  });

  it('bad input fails with a message naming the trouble', () => {
    const singular = build([
      ['N', 'curve-equation', [], { equation: 'y^2 = x^3 - 3x + 2' }], // (x - 1)^2 (x + 2): a node at (1, 0)
      ['O', 'point-on-curve', ['N'], { at: '-2:0:1' }],
      ['W', 'curve-weierstrass', ['N', 'O']],
    ]);
    const w = constructionEvaluate(singular.doc).get(singular.id.W) as ObjectFailure;
    expect(w.type).toBe('failure');
    expect(w.message).toMatch(/no Weierstrass model of N from O: .*singular/);
    const off = build([
      ['C', 'curve-equation', [], { equation: C }],
      ['O', 'point-free', [], { at: '0:0:1' }],
      ['P', 'point-on-curve', ['C'], { at: '1:1:1' }],
      ['W', 'curve-weierstrass', ['C', 'O']],
      ['WP', 'point-weierstrass-image', ['C', 'P', 'O']],
    ]);
    const v = constructionEvaluate(off.doc);
    expect((v.get(off.id.W) as ObjectFailure).message).toMatch(/no Weierstrass model of C from O: .*not on the curve/);
    expect((v.get(off.id.WP) as ObjectFailure).message).toMatch(/O = 0:0:1 is not on the curve/);
  });
});
