// Singular points of cubics: seeded families with a known configuration (normal forms of our own moved by
// unimodular changes of coordinates), published examples, and Silverman's node/cusp criterion.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { seededRandom } from '../../reference/oracles.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formToText } from '../../../src/poly/print.ts';
import { triple, tripleEquals } from '../../../src/plane/point.ts';
import { cubicSingularPoints } from '../../../src/cubic/singular.ts';
import { formSingularPoints } from '../../../src/cubic/singular-general.ts';
import { formTangentCone } from '../../../src/cubic/tangent-cone.ts';
import { cubicInvariants } from '../../../src/cubic/invariants.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';
import { SAMPLE_FAMILIES, singularSample } from './singular-samples.ts';

const F = (t: string) => formParse(t).form;

describe('singular points of seeded cubics with a known configuration', () => {
  const seed = 20261201;
  it(`${SAMPLE_FAMILIES * 12} samples, every family (seed ${seed})`, () => {
    const rand = seededRandom(seed);
    for (let n = 0; n < SAMPLE_FAMILIES * 12; n++) {
      const s = singularSample(rand, n);
      const ctx = `seed ${seed}, sample ${n} (${s.family}): ${formToText(s.curve)}`;
      const got = cubicSingularPoints(s.curve);
      expect(got.components.shape, ctx).toBe(s.shape);
      expect(got.smooth, ctx).toBe(false);
      if (s.count < 0) {
        expect(got.lines.length, ctx).toBe(1);
        expect(got.points.length, ctx).toBe(0);
        continue;
      }
      expect(got.points.length, ctx).toBe(s.count);
      // The Jacobian ideal's dimension is Σ τ: the table values must add up to it.
      expect(got.tjurinaTotal, ctx).toBe(got.points.reduce((a, p) => a + p.tjurina, 0));
      for (const r of s.rational) {
        const p = got.points.find((q) => q.point && tripleEquals(q.point, r.point));
        expect(p, `${ctx}: expected ${r.point.join(':')}`).toBeDefined();
        expect(p!.kind, ctx).toBe(r.kind);
        if (r.split !== undefined) expect(p!.split, ctx).toBe(r.split);
        if (r.realKind !== undefined) expect(p!.realKind, ctx).toBe(r.realKind);
      }
      const rationalCount = got.points.filter((p) => p.point).length;
      if (s.family !== 'conic + secant line') expect(rationalCount, ctx).toBe(s.rational.length);
    }
  });
});

describe('published examples', () => {
  // Fulton, Algebraic Curves, ch. 3 §1 (worked examples of multiplicity and tangents; from memory):
  // Y − X² simple; Y² − X³ cusp with tangent Y; Y² − X³ − X² node with tangents Y = ±X;
  // (X² + Y²)² + 3X²Y − Y³ triple point with tangents Y(3X² − Y²); (X² + Y²)³ − 4X²Y² a point of
  // multiplicity 4 with tangents X², Y² (each twice).
  const origin = [0n, 0n, 1n] as const;
  it('multiplicities and tangent cones at the origin (Fulton ch. 3 §1)', () => {
    expect(formTangentCone(F('y - x^2'), origin).multiplicity).toBe(1);
    const cusp = formTangentCone(F('y^2 - x^3'), origin);
    expect([cusp.multiplicity, formToText(cusp.cone)]).toEqual([2, 'Y^2']);
    const node = formTangentCone(F('y^2 - x^3 - x^2'), origin);
    expect([node.multiplicity, formToText(node.cone)]).toEqual([2, 'X^2 - Y^2']);
    const triple = formTangentCone(F('(x^2 + y^2)^2 + 3x^2 y - y^3'), origin);
    expect([triple.multiplicity, formToText(triple.cone)]).toEqual([3, '3X^2Y - Y^3']);
    const quad = formTangentCone(F('(x^2 + y^2)^3 - 4x^2 y^2'), origin);
    expect([quad.multiplicity, formToText(quad.cone)]).toEqual([4, 'X^2Y^2']);
  });
  it('kinds of the Fulton examples, through the general-degree face', () => {
    const t = formSingularPoints(F('(x^2 + y^2)^2 + 3x^2 y - y^3'));
    const at0 = t.points.find((p) => tripleEquals(p.point, origin))!;
    expect([at0.kind, at0.ordinary, at0.milnor]).toEqual(['triple point', true, 4]);
    const q = formSingularPoints(F('(x^2 + y^2)^3 - 4x^2 y^2'));
    const q0 = q.points.find((p) => tripleEquals(p.point, origin))!;
    expect([q0.multiplicity, q0.ordinary]).toEqual([4, false]);
    expect(formSingularPoints(F('x^4 + y^4 = 1')).smooth).toBe(true);
    expect(formSingularPoints(F('x^4 + y^4 = 1')).tjurinaTotal).toBe(0);
  });
  it('Weierstrass curves: node iff Δ = 0 and c4 ≠ 0, cusp iff Δ = c4 = 0 (Silverman AEC III.1, Prop. 1.4)', () => {
    const rand = seededRandom(7);
    for (let n = 0; n < 30; n++) {
      // y² = x³ + a x + b with 4a³ + 27b² = 0: a = −3k², b = 2k³ = (x − k)²(x + 2k), k = 0 the cusp;
      // shifted by x ↦ x − u, so the singular point is (k + u, 0).
      const k = BigInt(Math.floor(rand() * 21) - 10);
      const u = BigInt(Math.floor(rand() * 7) - 3);
      const f = F(`y^2 = (x - ${u})^3 - ${3n * k * k}(x - ${u}) + ${2n * k * k * k}`);
      const inv = cubicInvariants(f);
      const s = cubicSingularPoints(f);
      expect(inv.discriminant.num, `k=${k}, u=${u}`).toBe(0n);
      expect(s.points.length, `k=${k}, u=${u}`).toBe(1);
      expect(s.points[0].kind, `k=${k}, u=${u}`).toBe(inv.c4.num !== 0n ? 'node' : 'cusp');
      expect(s.points[0].point, `k=${k}, u=${u}`).toEqual(triple(k + u, 0n, 1n));
    }
  });
});

describe('smoothness against the discriminant (an independent method: Aronhold invariants, src/cubic/invariants.ts)', () => {
  it('smooth exactly when T² + 64S³ ≠ 0, on random cubics with small coefficients and on the samples (fast-check)', () => {
    const small = fc.bigInt({ min: -3n, max: 3n });
    fc.assert(
      fc.property(fc.array(small, { minLength: 10, maxLength: 10 }), (c) => {
        fc.pre(c.some((x) => x !== 0n));
        const f = { degree: 3, coeffs: c };
        const smooth = cubicSingularPoints(f).smooth;
        expect(smooth, formToText(f)).toBe(cubicInvariants(f).discriminant.num !== 0n);
      }),
      { numRuns: 400 },
    );
    const rand = seededRandom(11);
    for (let n = 0; n < SAMPLE_FAMILIES * 2; n++) {
      const s = singularSample(rand, n);
      expect(cubicInvariants(s.curve).discriminant.num, `seed 11, sample ${n} (${s.family})`).toBe(0n);
    }
  });
});

describe('three lines over a totally real cubic field', () => {
  it('the norm form of X + θY + θ²Z for θ³ − 3θ + 1 = 0 (three real roots): three real vertices, crunodes', () => {
    // N(X + θY + θ²Z) = det(X·I + Y·A + Z·A²), A the companion matrix of θ³ − 3θ + 1 (common practice:
    // the norm as the determinant of the regular representation; the determinant was expanded with
    // PARI/GP matdet once, as input data).
    const f = F('X^3 + 6X^2Z - 3XY^2 + 3XYZ + 9XZ^2 - Y^3 + 3YZ^2 + Z^3');
    const s = cubicSingularPoints(f);
    expect(s.components.shape).toBe('three conjugate lines');
    expect(s.points.length).toBe(3);
    expect(s.points.every((p) => p.real && p.realKind === 'crunode')).toBe(true);
  });
});

describe('smooth and degenerate input', () => {
  it('a smooth cubic has no singular point and Σ τ = 0', () => {
    const s = cubicSingularPoints(F('y^2 + 3xy = x^3 - 7x + 11'));
    expect([s.smooth, s.points.length, s.tjurinaTotal]).toEqual([true, 0, 0]);
  });
  it('curves with a repeated component are reported as not reduced (singular along a curve), lines named', () => {
    const conic2 = formSingularPoints(F('(x^2 + y^2 - 1)^2 = 0'));
    expect([conic2.smooth, conic2.reduced, conic2.tjurinaTotal]).toEqual([false, false, null]);
    const lines = formSingularPoints(F('x^2 y^2 (x + y - 1) = 0'));
    expect(lines.reduced).toBe(false);
    expect(lines.repeatedLines.map((l) => [l.line.join(':'), l.multiplicity])).toEqual([['1:0:0', 2], ['0:1:0', 2]]);
    expect(formSingularPoints(F('y = 3x + 1')).smooth).toBe(true);
  });
  it('refuses a curve that is not a cubic, saying so', () => {
    expect(() => cubicSingularPoints(F('x^2 + y^2 = 5'))).toThrow(InvalidInput);
  });
  it('three lines conjugate over a cubic field: three nodes, one real, with approximations on the curve', () => {
    // X³ + 3Y³ + 9Z³ − 9XYZ is the norm form of X + αY + α²Z for α³ = 3 (common practice: a norm form).
    const f = F('X^3 + 3Y^3 + 9Z^3 - 9XYZ');
    const s = cubicSingularPoints(f);
    expect(s.components.shape).toBe('three conjugate lines');
    expect(s.points.length).toBe(3);
    expect(s.points.filter((p) => p.real).length).toBe(1);
    // The real vertex is the meet of the two complex conjugate lines: an isolated real point.
    expect(s.points.find((p) => p.real)!.realKind).toBe('acnode');
    expect(s.tjurinaTotal).toBe(3);
  });
});
