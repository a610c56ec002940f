// Exact landmarks for the tracer: the shear avoids the points at infinity, folds and singular points
// appear as critical abscissae with the right multiplicity, asymptotes come out exact, and coefficients of
// any length reach the tracer as finite doubles. Expected values are worked by hand beside each case.
import { describe, expect, it } from 'vitest';
import { curveLandmarks, formFloatCoefficients } from '../../../src/poly/curve-landmarks.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { Degenerate } from '../../../src/exact/errors.ts';

const form = (eq: string) => formParse(eq).form;

describe('curveLandmarks', () => {
  it('circle: two folds at u = ±sqrt(1 + s^2), nothing singular', () => {
    // The tangent of x^2 + y^2 = 1 is along (s, 1) at ±(1, -s)/sqrt(1 + s^2), where u = x - s y = ±sqrt(1 + s^2).
    const lm = curveLandmarks(form('x^2 + y^2 = 1'));
    expect(lm.shearExact).toEqual([1n, 7n]);
    const r = Math.sqrt(1 + 1 / 49);
    expect(lm.critical[0]).toBeCloseTo(-r, 14);
    expect(lm.critical[1]).toBeCloseTo(r, 14);
    expect(lm.criticalMultiplicity).toEqual([1, 1]);
    expect(lm.singularLines).toEqual([]);
  });
  it('a node is a double root of the discriminant and a singular line', () => {
    // y^2 = x^3 - 3x + 2 = (x - 1)^2 (x + 2): node at (1, 0), so u = 1.
    const lm = curveLandmarks(form('y^2 = x^3 - 3x + 2'));
    const i = lm.critical.findIndex((u) => Math.abs(u - 1) < 1e-12);
    expect(i).toBeGreaterThanOrEqual(0);
    expect(lm.criticalMultiplicity[i]).toBe(2);
    expect(lm.singularLines).toEqual([1]);
  });
  it('a cusp has multiplicity 3 (Milnor number 2, plus 1)', () => {
    // Besides the cusp at u = 0 the sheared projection has one ordinary fold (simple root).
    const lm = curveLandmarks(form('y^2 = x^3'));
    const i = lm.critical.indexOf(0);
    expect(lm.criticalMultiplicity[i]).toBe(3);
    expect(lm.criticalMultiplicity.filter((m, k) => k !== i)).toEqual([1]);
    expect(lm.singularLines).toEqual([0]);
  });
  it('skips a shear that points at a point at infinity', () => {
    // The top part (7x - y) x vanishes at (1/7, 1), so the first candidate 1/7 is refused.
    const lm = curveLandmarks(form('(7x - y) x + 1 = 0'));
    expect(lm.shearExact).toEqual([-2n, 9n]);
  });
  it('hyperbola xy = 1: points at infinity on the axes, asymptotes exact', () => {
    const lm = curveLandmarks(form('x y = 1'));
    const byDir = lm.atInfinity.map((p) => [p.exact, p.asymptote]);
    expect(byDir).toContainEqual(['1:0:0', [0, 1, 0]]);
    expect(byDir).toContainEqual(['0:1:0', [1, 0, 0]]);
  });
  it('refuses a curve with a repeated component, saying so', () => {
    expect(() => curveLandmarks(form('(x - y)^2 (x + 1) = 0'))).toThrow(Degenerate);
    expect(() => curveLandmarks(form('(x - y)^2 (x + 1) = 0'))).toThrow(/repeated component/);
  });
  it('hands coefficients of any length over as finite doubles in proportion', () => {
    const big = 10n ** 400n;
    const f = { degree: 2, coeffs: [big, 0n, 0n, 3n * big, 0n, -big] };
    const c = formFloatCoefficients(f);
    expect(c.every(Number.isFinite)).toBe(true);
    expect(c[3] / c[0]).toBeCloseTo(3, 12);
    expect(c[5] / c[0]).toBeCloseTo(-1, 12);
  });
});
