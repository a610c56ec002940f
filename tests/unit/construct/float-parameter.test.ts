// Parameter points follow their curve in floats (float-parameter.ts). The family of nodal cubics
//   N_a: 2u^3 - u^2 v + v^3 + u^2 + uv - v^2 = 0,  u = x - a, v = y - 2a   (our own)
// has its node at (a, 2a) (no terms of degree < 2 in u, v; tangent cone u^2 + uv - v^2, disc 5 > 0, a
// crunode: Fulton, Algebraic Curves, ch. 3). As a moves, the float singular point and the point with
// parameter (s:t) must stay within a small distance of the exact ones (src/cubic/parametrise.ts).
import { describe, expect, it } from 'vitest';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { curveSingularFollow, parametrisationAtFloat } from '../../../src/construct/float-parameter.ts';
import { f3FromBig, f3Sine, formToFloat, type F3 } from '../../../src/construct/float.ts';
import { cubicParametrisation, parametrisationAt } from '../../../src/cubic/parametrise.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { approxDistance, approxOf, build, dragStep, pointValue, type Step } from './drag-helpers.ts';

const family = (a: string): string =>
  `2(x - ${a})^3 - (x - ${a})^2 (y - 2*(${a})) + (y - 2*(${a}))^3 + (x - ${a})^2 + (x - ${a})(y - 2*(${a})) - (y - 2*(${a}))^2 = 0`;

describe('parameter points during a drag', () => {
  it('follow the singular point and the parametrisation of a moving nodal cubic', () => {
    const params: [number, number][] = [[1, 0], [0, 1], [3, -2], [-5, 7], [1, 1]];
    let singular: F3 = f3FromBig([1n, 2n, 1n]);
    const start = cubicParametrisation(formParse(family('1')).form);
    for (let k = 1; k <= 40; k++) {
      const a = `${40 + k}/40`;
      const f = formParse(family(a)).form;
      const par = cubicParametrisation(f);
      expect(par.basis, `a = ${a}: the exact basis is the one the drag started with`).toEqual(start.basis);
      const next = curveSingularFollow(formToFloat(f), singular);
      expect(next, `a = ${a}`).not.toBeNull();
      singular = next!;
      expect(f3Sine(singular, f3FromBig(par.singular)), `a = ${a}`).toBeLessThan(1e-10);
      for (const [s, t] of params) {
        const x = parametrisationAtFloat(formToFloat(f), singular, par.basis[0].map(Number), par.basis[1].map(Number), s, t)!;
        const exact = parametrisationAt(par, BigInt(s), BigInt(t));
        expect(f3Sine(x, f3FromBig(exact)), `a = ${a}, (s:t) = (${s}:${t})`).toBeLessThan(1e-9);
      }
    }
  });

  it('are recomputed from their curve through the graph, not kept stale', () => {
    // Nine points on N_1 (eight by parameter, one free and dragged along N_1): the cubic through them is
    // N_1 at every step, and the parameter point T on it must stay where it is exactly.
    const n = cubicParametrisation(formParse(family('1')).form);
    const ts = [[1, 2], [2, 1], [-1, 3], [3, 1], [1, -2], [2, -3], [4, 1], [1, 4]];
    const steps: Step[] = [['N', 'curve-equation', [], { equation: family('1') }]];
    ts.forEach(([s, t], k) => steps.push([`Q${k}`, 'point-parameter', ['N'], { at: `${s}:${t}` }]));
    const z0 = parametrisationAt(n, 5n, 2n);
    steps.push(['Z', 'point-free', [], { at: z0.join(':') }]);
    steps.push(['K', 'cubic-through-nine', [...ts.map((_, k) => `Q${k}`), 'Z']]);
    steps.push(['T', 'point-parameter', ['K'], { at: '3:1' }]);
    const { doc, id } = build(steps);
    let values = constructionEvaluate(doc);
    const exactT = pointValue(values.get(id.T)).exact!;
    expect(exactT).toEqual(parametrisationAt(n, 3n, 1n));
    let pencil = pointValue(values.get(id.T)).pencil;
    expect(pencil).toBeDefined();
    for (let k = 1; k <= 20; k++) {
      const s = 5 + k / 10;
      const p = parametrisationAt(n, BigInt(Math.round(s * 10)), 20n);
      values = dragStep(doc, values, id.Z, approxOf(p));
      const v = pointValue(values.get(id.T), `step ${k}`);
      expect(v.status).toBe('approximate');
      expect(v.pencil, 'a new value from the float version, not the last one kept').not.toBe(pencil);
      pencil = v.pencil;
      expect(approxDistance(v.approx, approxOf(exactT)), `step ${k}`).toBeLessThan(1e-7);
    }
  });

  it('handle the zero form: every point is singular, and no point of it is parametrised', () => {
    const zero = { degree: 3, coeffs: new Array<number>(10).fill(0) };
    expect(curveSingularFollow(zero, [0, 0, 1])).toEqual([0, 0, 1]);
    expect(parametrisationAtFloat(zero, [0, 0, 1], [1, 0, 0], [0, 1, 0], 1, 1)).toBeNull();
  });
});
