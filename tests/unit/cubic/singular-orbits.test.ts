// Non-rational singular points of curves of degree 4 to 6 as exact orbits: two conics meeting in four
// points give four nodes (Bézout, common practice), rational ones listed as points and the rest as orbits
// whose members satisfy ∇F = 0 numerically at their approximations (the exact check is mod the orbit's
// polynomial, in the code and, independently, in Singular: tests/reference/singular-cubics.test.ts).
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../reference/oracles.ts';
import { formGradient, formMul, formPrimitive, monomials, type Form } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formToText } from '../../../src/poly/print.ts';
import { formSingularPoints } from '../../../src/cubic/singular-general.ts';
import { conjugateMembers } from '../../../src/cubic/conjugate-points.ts';

function evalComplex(f: Form, re: readonly number[], im: readonly number[]): number {
  let sr = 0;
  let si = 0;
  monomials(f.degree).forEach(([i, j, k], n) => {
    let tr = Number(f.coeffs[n]);
    let ti = 0;
    for (const [v, e] of [[0, i], [1, j], [2, k]] as const) {
      for (let a = 0; a < e; a++) [tr, ti] = [tr * re[v] - ti * im[v], tr * im[v] + ti * re[v]];
    }
    sr += tr;
    si += ti;
  });
  return Math.hypot(sr, si);
}

function gradientResidual(f: Form, re: readonly number[], im: readonly number[]): number {
  const size = Math.max(1, ...f.coeffs.map((c) => Math.abs(Number(c))));
  return Math.max(...formGradient(f).map((g) => evalComplex(g, re, im))) / size;
}

describe('singular orbits of quartics', () => {
  const seed = 606;
  it(`two random conics: four singular points over C, every one accounted for (seed ${seed})`, () => {
    const rand = seededRandom(seed);
    const r = () => BigInt(Math.floor(rand() * 11) - 5);
    let checked = 0;
    for (let n = 0; n < 40; n++) {
      const q1: Form = { degree: 2, coeffs: Array.from({ length: 6 }, r) };
      const q2: Form = { degree: 2, coeffs: Array.from({ length: 6 }, r) };
      const f = formPrimitive(formMul(q1, q2));
      if (f.coeffs.every((c) => c === 0n)) continue;
      const s = formSingularPoints(f);
      // Transversal meets of two smooth conics: four nodes, Σ τ = 4.
      if (!s.reduced || s.tjurinaTotal !== 4) continue;
      const ctx = `seed ${seed}, case ${n}: ${formToText(f)}`;
      expect(s.orbits, ctx).not.toBeNull();
      const orbitPoints = s.orbits!.reduce((a, o) => a + o.orbit.poly.length - 1, 0);
      expect(s.points.length + orbitPoints, ctx).toBe(4);
      for (const o of s.orbits!) {
        expect(o.kind, ctx).toBe('node');
        for (const m of conjugateMembers(o.orbit)) {
          expect(gradientResidual(f, m.approx.re, m.approx.im), ctx).toBeLessThan(1e-6);
        }
      }
      checked++;
    }
    expect(checked).toBeGreaterThan(20);
  });
  it('a curve of our own: the conic x² + 2y² = 3 and the parabola y = x² + 1 meet in (u : u² + 1 : 1), 2u⁴ + 5u² = 1', () => {
    const s = formSingularPoints(formParse('(x^2 + 2y^2 - 3)(y - x^2 - 1) = 0').form);
    expect(s.points.length).toBe(0);
    expect(s.orbits!.map((o) => [o.kind, o.orbit.poly, o.orbit.coords])).toEqual([['node', [-1n, 0n, 5n, 0n, 2n], [[0n, 1n], [1n, 0n, 1n], [1n]]]]);
    expect(conjugateMembers(s.orbits![0].orbit).filter((m) => m.real).length).toBe(2);
  });
});
