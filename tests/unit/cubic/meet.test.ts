import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { curveCurveMeet, lineCurveMeet, type MeetResult } from '../../../src/cubic/meet.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formEval, formFromCoeffs, formMul, type Form } from '../../../src/poly/form.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';
import type { Line } from '../../../src/plane/point.ts';

const curve = (text: string): Form => formParse(text).form;
const pts = (m: MeetResult): string[] => m.points.filter((p) => p.point).map((p) => `${p.point!.join(':')}x${p.multiplicity}`).sort();

describe('lineCurveMeet', () => {
  it('three rational points of y^2 = (x - 1)(x - 2)(x + 3) on y = 0 (hand computation)', () => {
    const m = lineCurveMeet(curve('y^2 = (x - 1)(x - 2)(x + 3)'), [0n, 1n, 0n]);
    expect(pts(m)).toEqual(['1:0:1x1', '2:0:1x1', '3:0:-1x1']);
  });
  it('the line at infinity meets a Weierstrass cubic at (0:1:0) three times (it is the flex tangent)', () => {
    const m = lineCurveMeet(curve('y^2 + 3xy = x^3 - 5x + 11'), [0n, 0n, 1n]);
    expect(pts(m)).toEqual(['0:1:0x3']);
    expect(m.total).toBe(3);
  });
  it('a tangent line counts its point twice', () => {
    // y^2 = x^3 - 4x + 4 has the point (0, 2); the tangent there is y = -x + 2 (dy/dx = (3x^2-4)/(2y) = -1)
    const m = lineCurveMeet(curve('y^2 = x^3 - 4x + 4'), [1n, 1n, -2n]);
    expect(pts(m)).toContain('0:2:1x2');
    expect(m.total).toBe(3);
  });
  it('irrational real points carry an isolating interval and a good approximation', () => {
    // x^2 + y^2 = 3 on y = x: x = ±sqrt(3/2)
    const m = lineCurveMeet(curve('x^2 + y^2 = 3'), [1n, -1n, 0n]);
    expect(m.points).toHaveLength(2);
    for (const p of m.points) {
      expect(p.point).toBeNull();
      expect(p.real).toBe(true);
      expect(p.algebraic?.kind).toBe('line');
      const [x, y, z] = p.approx;
      expect(Math.abs(x / z)).toBeCloseTo(Math.sqrt(1.5), 12);
      expect(x / z).toBeCloseTo(y / z, 12);
    }
  });
  it('non-real points are counted and marked real: false', () => {
    const m = lineCurveMeet(curve('x^2 + y^2 + 1 = 0'), [0n, 1n, 0n]);
    expect(m.total).toBe(2);
    expect(m.points.every((p) => !p.real && p.point === null && p.approxImag)).toBe(true);
    // the points (±i : 0 : 1)
    for (const p of m.points) {
      const im = p.approxImag!;
      expect(Math.hypot(p.approx[0], im[0]) / Math.hypot(p.approx[2], im[2])).toBeCloseTo(1, 12);
    }
  });
  it('a line inside the curve is reported, not crashed on', () => {
    const m = lineCurveMeet(curve('x (x^2 + y^2 - 1) = 0'), [1n, 0n, 0n]);
    expect(m.commonComponent).toBe(true);
    expect(m.note).toMatch(/infinitely many/);
  });
  it('refuses the zero line with a message naming it', () => {
    expect(() => lineCurveMeet(curve('y^2 = x^3 + 1'), [0n, 0n, 0n] as unknown as Line)).toThrow(InvalidInput);
  });
});

describe('curveCurveMeet', () => {
  it('three lines against three lines: nine rational points, each simple (hand computation)', () => {
    const m = curveCurveMeet(curve('x (x - 1)(x + 1) = 0'), curve('y (y - 1)(y - 2) = 0'));
    expect(m.total).toBe(9);
    expect(m.points.every((p) => p.point && p.multiplicity === 1)).toBe(true);
    expect(pts(m)).toEqual(
      ['0:0:1', '0:1:1', '0:2:1', '1:0:1', '1:1:1', '1:2:1', '1:0:-1', '1:-1:-1', '1:-2:-1'].map((s) => `${s}x1`).sort(),
    );
  });
  it('a cusp and a node at the same point: multiplicity 4 there, 5 at the shared flex (Fulton, Algebraic Curves, §3.3, I >= m_P(F)·m_P(G) with equality without common tangents; hand computation)', () => {
    const m = curveCurveMeet(curve('Y^2 Z = X^3'), curve('Y^2 Z + X^2 Z = X^3'));
    expect(pts(m)).toEqual(['0:0:1x4', '0:1:0x5']);
  });
  it('two conics tangent at two points', () => {
    // x^2 + y^2 = 1 and x^2 + 4y^2 = 1: subtracting, 3y^2 = 0, so (±1, 0) each with multiplicity 2
    const m = curveCurveMeet(curve('x^2 + y^2 = 1'), curve('x^2 + 4y^2 = 1'));
    expect(pts(m)).toEqual(['1:0:-1x2', '1:0:1x2']);
  });
  it('a common component is reported in words', () => {
    const m = curveCurveMeet(curve('(x + y - 1)(x^2 - y) = 0'), curve('(x + y - 1)(y^2 - x + 3) = 0'));
    expect(m.commonComponent).toBe(true);
    expect(m.total).toBe(0);
  });
  it('irrational real points of a conic and a cubic are real algebraic with approximations on both curves', () => {
    const f = curve('x^2 + y^2 = 5');
    const g = curve('y = x^3 - 2x');
    const m = curveCurveMeet(f, g);
    expect(m.total).toBe(6);
    for (const p of m.points.filter((q) => q.real)) {
      const [x, y, z] = p.approx;
      const fx = x * x + y * y - 5 * z * z;
      const gx = y * z * z - x * x * x + 2 * x * z * z;
      expect(Math.abs(fx)).toBeLessThan(1e-9);
      expect(Math.abs(gx)).toBeLessThan(1e-9);
    }
  });
});

describe('curveCurveMeet beyond cubics (degrees up to 6)', () => {
  it('four lines against five lines: twenty simple rational points', () => {
    const m = curveCurveMeet(curve('x (x - 1)(x + 1)(x - 2) = 0'), curve('y (y - 1)(y + 2)(y - 3)(y + 4) = 0'));
    expect([m.total, m.points.length, m.points.every((p) => p.point && p.multiplicity === 1)]).toEqual([20, 20, true]);
  });
  it('a sextic and the unit circle: 2 and 3 at the axes, the circular points once each (hand computation: x^2 y^3 = 0 on the circle)', () => {
    const m = curveCurveMeet(curve('(x^2 + y^2 - 1)^3 = x^2 y^3'), curve('x^2 + y^2 = 1'));
    expect(pts(m)).toEqual(['0:1:-1x2', '0:1:1x2', '1:0:-1x3', '1:0:1x3']);
    const circular = m.points.filter((p) => !p.real);
    expect(circular).toHaveLength(2);
    for (const p of circular) {
      // (1 : ±i : 0): z = 0 and |y| = |x|
      expect(Math.hypot(p.approx[2], p.approxImag![2])).toBeLessThan(1e-9);
      expect(Math.hypot(p.approx[1], p.approxImag![1])).toBeCloseTo(Math.hypot(p.approx[0], p.approxImag![0]), 9);
    }
  });
  it('a sextic and a quartic: 24 points counted', () => {
    const m = curveCurveMeet(curve('x^6 + y^6 - 3x^2y^3 + xy - 7 = 0'), curve('x^4 - y^4 + 2xy^2 - x + 5 = 0'));
    expect(m.total).toBe(24);
  });
  it('degree 7 is refused with a message', () => {
    const septic = formFromCoeffs(7, [1n, ...new Array<bigint>(35).fill(0n)]);
    expect(() => curveCurveMeet(septic, curve('x + y = 1'))).toThrow(/degree 1 to 6/);
  });
});

const smallForm = (d: number) => fc.array(fc.bigInt(-4n, 4n), { minLength: ((d + 1) * (d + 2)) / 2, maxLength: ((d + 1) * (d + 2)) / 2 });

describe('Bézout counts (property, fast-check seed 66)', () => {
  it('multiplicities sum to d1·d2 and every rational meet point is on both curves exactly', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 3 }), smallForm(3), smallForm(3), fc.array(fc.bigInt(-3n, 3n), { minLength: 3, maxLength: 3 }), (d1, d2, c1, c2, lin) => {
        const f = formFromCoeffs(d1, c1.slice(0, ((d1 + 1) * (d1 + 2)) / 2));
        let g = formFromCoeffs(d2, c2.slice(0, ((d2 + 1) * (d2 + 2)) / 2));
        fc.pre(f.coeffs.some((c) => c !== 0n) && g.coeffs.some((c) => c !== 0n));
        // A conic times a line for some cubics: more rational and repeated points than random coefficients give.
        if (d2 === 3 && lin.some((c) => c !== 0n) && d1 === 2) g = formMul(formFromCoeffs(2, c2.slice(0, 6)), formFromCoeffs(1, lin));
        fc.pre(g.coeffs.some((c) => c !== 0n));
        const m = curveCurveMeet(f, g);
        if (m.commonComponent) return;
        expect(m.total).toBe(d1 * d2);
        for (const p of m.points) {
          if (!p.point) continue;
          expect(formEval(f, p.point)).toBe(0n);
          expect(formEval(g, p.point)).toBe(0n);
        }
      }),
      { seed: 66, numRuns: 150 },
    );
  });
});
