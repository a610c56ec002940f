import { describe, expect, it } from 'vitest';
import { cubicFlexes, cubicHessian } from '../../../src/cubic/flex.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formEval, formPrimitive, type Form } from '../../../src/poly/form.ts';
import { formTransform } from '../../../src/poly/transform.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

const curve = (text: string): Form => formParse(text).form;
const show = (ps: readonly (readonly bigint[])[]): string[] => ps.map((p) => p.join(':'));

describe('cubicHessian', () => {
  it('of the Fermat cubic X^3 + Y^3 + Z^3 is 216·XYZ (hand computation: det diag(6X, 6Y, 6Z))', () => {
    const h = cubicHessian(curve('X^3 + Y^3 + Z^3'));
    const want = curve('216 X Y Z');
    expect(h.coeffs.map(String)).toEqual(want.coeffs.map((c) => String(c * 216n)));
  });
  it('refuses a conic', () => {
    expect(() => cubicHessian(curve('x^2 + y^2 - 1'))).toThrow(InvalidInput);
  });
});

describe('cubicFlexes', () => {
  it('Hesse cubic X^3 + Y^3 + Z^3 + 6XYZ: nine flexes, the three rational base points of the Hesse pencil, three real (Brieskorn–Knörrer, Plane Algebraic Curves, §7.3, the Hesse pencil; from memory)', () => {
    const r = cubicFlexes(curve('X^3 + Y^3 + Z^3 + 6XYZ'));
    expect(r.degenerate).toBeNull();
    expect(r.count).toBe(9);
    expect(show(r.rational)).toEqual(['0:1:-1', '1:-1:0', '1:0:-1']);
    expect(r.real).toBe(3);
    expect(r.points.every((p) => p.multiplicity === 1)).toBe(true);
  });
  it('y^2 = x^3 + 49: (0:1:0) and the 3-torsion points (0, ±7) are the rational flexes (horizontal tangent y = 7 meets x^3 = 0 three times)', () => {
    const r = cubicFlexes(curve('y^2 = x^3 + 49'));
    expect(show(r.rational)).toEqual(['0:1:0', '0:7:-1', '0:7:1']); // (0:-7:1) made primitive with first non-zero entry positive
    expect(r.count).toBe(9);
    expect(r.real).toBe(3);
  });
  it('a smooth cubic with one rational flex only', () => {
    const r = cubicFlexes(curve('y^2 + xy = x^3 - 3x + 7'));
    expect(show(r.rational)).toEqual(['0:1:0']);
    expect(r.count).toBe(9);
    expect(r.real).toBe(3);
  });
  it('the count is the same after a change of coordinates (flexes are projective)', () => {
    const f = curve('y^2 = x^3 - 4x + 9');
    const g = formPrimitive(formTransform(f, [[1n, 2n, 0n], [0n, 1n, -1n], [3n, 0n, 1n]]));
    const a = cubicFlexes(f);
    const b = cubicFlexes(g);
    expect([b.count, b.real, b.rational.length]).toEqual([a.count, a.real, a.rational.length]);
    for (const p of b.rational) expect(formEval(g, p)).toBe(0n);
  });
  it('nodal and cuspidal cubics: 3 and 1 flexes; one real flex beside a crunode, three beside an acnode (Brieskorn–Knörrer §7.3; from memory, checked against PARI in tests/reference/pari-points)', () => {
    const crunode = cubicFlexes(curve('y^2 = (x - 1)^2 (x + 2)'));
    expect([crunode.count, crunode.real]).toEqual([3, 1]);
    const acnode = cubicFlexes(curve('y^2 = (x - 1)^2 (x - 4)'));
    expect([acnode.count, acnode.real]).toEqual([3, 3]);
    const cusp = cubicFlexes(curve('y^2 = (x - 2)^3'));
    expect([cusp.count, cusp.real]).toEqual([1, 1]);
    expect(show(cusp.rational)).toEqual(['0:1:0']);
  });
  it('reducible cubics are described, not refused', () => {
    expect(cubicFlexes(curve('(x + y)(x^2 + y^2 - 1) = 0')).degenerate).toMatch(/line/);
    expect(cubicFlexes(curve('x y (x - y) = 0')).degenerate).toMatch(/Hessian vanishes/);
  });
});
