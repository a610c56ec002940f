// Float shadows used while dragging: compared with exact values computed by hand.
import { describe, expect, it } from 'vitest';
import { formToFloat, curveThroughPointsFloat, floatFormEval, cubicThirdFloat, lineCurveMeetFloat, polyRealRoots, f3ToApprox, curveProjectFloat } from '../../../src/construct/float.ts';
import { formFromCoeffs, monomialIndex, formZero } from '../../../src/poly/form.ts';

// y^2 z = x^3 - 2 x z^2 + 3 z^3, a curve of our own.
function curve() {
  const c = [...formZero(3).coeffs];
  c[monomialIndex(3, 3, 0)] = 1n;
  c[monomialIndex(3, 0, 2)] = -1n;
  c[monomialIndex(3, 1, 0)] = -2n;
  c[monomialIndex(3, 0, 0)] = 3n;
  return formToFloat(formFromCoeffs(3, c));
}

describe('float shadows', () => {
  it('finds the real roots of (u-1)(u+2)(u^2+1)', () => {
    const r = polyRealRoots([-2, 1, -1, 1, 1]).sort((a, b) => a - b);
    expect(r).toHaveLength(2);
    expect(r[0]).toBeCloseTo(-2, 10);
    expect(r[1]).toBeCloseTo(1, 10);
  });
  it('the vertical chord through (-1, ±2) meets y^2 = x^3 - 2x + 3 again at infinity', () => {
    const f = curve();
    expect(floatFormEval(f, -1, 2, 1)).toBe(0);
    // The vertical chord through (-1, 2) and (-1, -2) meets the curve again at infinity (0:1:0).
    const r = f3ToApprox(cubicThirdFloat(f, [-1, 2, 1], [-1, -2, 1]));
    expect(r.finite).toBe(false);
    expect(Math.abs(r.x)).toBeLessThan(1e-12);
  });
  it('meets a line with the curve at its three real points', () => {
    const f = curve();
    // y = 2 meets where x^3 - 2x - 1 = 0: x = -1, (1 ± √5)/2.
    const pts = lineCurveMeetFloat(f, [0, 1, -2]).map(f3ToApprox).map((p) => p.x).sort((a, b) => a - b);
    expect(pts).toHaveLength(3);
    expect(pts[0]).toBeCloseTo(-1, 9);
    expect(pts[1]).toBeCloseTo((1 - Math.sqrt(5)) / 2, 9);
    expect(pts[2]).toBeCloseTo((1 + Math.sqrt(5)) / 2, 9);
  });
  it('projects a nearby point onto the curve', () => {
    const f = curve();
    const p = curveProjectFloat(f, -1.05, 2.1)!;
    expect(Math.abs(p.y * p.y - (p.x ** 3 - 2 * p.x + 3))).toBeLessThan(1e-9);
  });
  it('puts a conic through five points', () => {
    // x^2 + y^2 = 25 through five of its rational points.
    const pts = [[3, 4, 1], [5, 0, 1], [0, -5, 1], [-4, 3, 1], [-3, -4, 1]] as const;
    const c = curveThroughPointsFloat(2, pts)!;
    const s = c.coeffs[0];
    // order X^2, XY, XZ, Y^2, YZ, Z^2
    expect(c.coeffs.map((x) => x / s)).toEqual([1, 0, 0, 1, 0, -25].map((x) => expect.closeTo(x, 9)));
  });
});
