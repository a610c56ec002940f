// Aronhold's S and T: Hesse-family values (Salmon, Higher Plane Curves, on the invariants of the cubic;
// values S = m − m⁴, T = 1 − 20m³ − 8m⁶ from memory, which agree with PARI's ellfromeqn normalisation:
// tests/reference/pari-group.test.ts), weights under changes of coordinates, the discriminant test.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cubicInvariants, cubicIsSingular, cubicRealComponents } from '../../../src/cubic/invariants.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formTransform, mat3Determinant, type Matrix3 } from '../../../src/poly/transform.ts';
import { rat, ratEq, ratMul, ratPow } from '../../../src/exact/rational.ts';
import type { Form } from '../../../src/poly/form.ts';
import { weierstrassCubic } from './group-samples.ts';
import { modelQuantities } from '../../../src/cubic/curve-model.ts';

const hesse = (m: bigint): Form => formParse(`X^3 + Y^3 + Z^3 + ${6n * m}XYZ`).form;
const arbCubic = fc.array(fc.bigInt({ min: -30n, max: 30n }), { minLength: 10, maxLength: 10 }).filter((c) => c.some((x) => x !== 0n)).map((c) => ({ degree: 3, coeffs: c }) as Form);
const arbMatrix = fc.array(fc.bigInt({ min: -4n, max: 4n }), { minLength: 9, maxLength: 9 }).map((v) => [[v[0], v[1], v[2]], [v[3], v[4], v[5]], [v[6], v[7], v[8]]] as unknown as Matrix3);

describe('cubicInvariants', () => {
  it('Hesse family: S = m − m⁴, T = 1 − 20m³ − 8m⁶, Δ = (1 + 8m³)³', () => {
    for (const m of [-3n, -1n, 0n, 1n, 2n, 5n]) {
      const inv = cubicInvariants(hesse(m));
      expect(inv.S).toEqual(rat(m - m ** 4n));
      expect(inv.T).toEqual(rat(1n - 20n * m ** 3n - 8n * m ** 6n));
      expect(inv.discriminant).toEqual(rat((1n + 8n * m ** 3n) ** 3n));
    }
    // m = −1/2: 1 + 8m³ = 0, the Hesse cubic is three lines.
    expect(cubicIsSingular(formParse('X^3 + Y^3 + Z^3 - 3XYZ').form)).toBe(true);
    expect(cubicIsSingular(hesse(1n))).toBe(false);
  });

  it('weights 4 and 6: S(F∘M) = det(M)⁴ S(F), T(F∘M) = det(M)⁶ T(F)', () => {
    fc.assert(
      fc.property(arbCubic, arbMatrix, (f, m) => {
        const d = rat(mat3Determinant(m));
        const a = cubicInvariants(f);
        const b = cubicInvariants(formTransform(f, m));
        expect(ratEq(b.S, ratMul(ratPow(d, 4), a.S))).toBe(true);
        expect(ratEq(b.T, ratMul(ratPow(d, 6), a.T))).toBe(true);
      }),
      { numRuns: 60, seed: 4201 },
    );
  });

  it('on a Weierstrass cubic: Δ = −Δ_E/3⁹ and j = c4³/Δ_E (Silverman, AEC III.1)', () => {
    for (const a of [[0n, 0n, 0n, -2n, 5n], [1n, -1n, 0n, -3n, 7n], [0n, 1n, 1n, 4n, -6n]]) {
      const q = modelQuantities(a as unknown as readonly [bigint, bigint, bigint, bigint, bigint]);
      const inv = cubicInvariants(weierstrassCubic(a));
      expect(inv.discriminant).toEqual(rat(-q.discriminant, 3n ** 9n));
      expect(inv.j).toEqual(q.j);
      expect(cubicRealComponents(weierstrassCubic(a))).toBe(q.discriminant > 0n ? 2 : 1);
    }
  });

  it('singular cubics have Δ = 0, j = null and no component count', () => {
    const nodal = formParse('3y^2 = x^2 (x + 5)').form;
    expect(cubicInvariants(nodal).discriminant.num).toBe(0n);
    expect(cubicInvariants(nodal).j).toBe(null);
    expect(cubicRealComponents(nodal)).toBe(null);
  });
});
