// Intersection multiplicities at the rational meet points against Singular, run live: each point is moved
// to (0:0:1) by a change of coordinates (intersection numbers are projective invariants), and Singular's
// vdim(std(ideal(f, g))) in the local ring (ordering ds) is dim O_P/(f, g), the intersection number
// (Fulton, Algebraic Curves, §3.3, definition and properties; Greuel–Pfister, A Singular Introduction to
// Commutative Algebra, §1.5 and §6.1 for local orderings; from memory). One Singular call for all points.
import { describe, expect, it } from 'vitest';
import { curveCurveMeet } from '../../src/cubic/meet.ts';
import { curvesThroughPoints } from '../../src/plane/linear-system.ts';
import { monomials, type Form } from '../../src/poly/form.ts';
import { formParse } from '../../src/poly/parse.ts';
import { formTransform, type Matrix3 } from '../../src/poly/transform.ts';
import type { Point } from '../../src/plane/point.ts';
import { seededRandom, singular } from './oracles.ts';
import { randomMember, randomPoints } from './pari-cubic-helpers.ts';

/** A matrix whose third column is p and whose columns are independent: it sends (0:0:1) to p. */
function frameAt(p: Point): Matrix3 {
  const k = p[2] !== 0n ? 2 : p[1] !== 0n ? 1 : 0;
  const others = [0, 1, 2].filter((i) => i !== k);
  const col = (i: number): bigint[] => [0, 1, 2].map((r) => (r === i ? 1n : 0n));
  const cols = [col(others[0]), col(others[1]), [...p]];
  return [0, 1, 2].map((r) => [cols[0][r], cols[1][r], cols[2][r]]) as unknown as Matrix3;
}

/** F(x, y, 1) in Singular's syntax. */
function affineSingular(f: Form): string {
  const m = monomials(f.degree);
  const terms = f.coeffs.flatMap((c, k) => (c === 0n ? [] : [`(${c})*x^${m[k][0]}*y^${m[k][1]}`]));
  return terms.length ? terms.join('+') : '0';
}

describe('intersection multiplicities at rational points (Singular vdim in the local ring, live)', () => {
  it('agree on tangencies, shared singular points, flex tangents, curves of degree up to 6 and seeded pencils (seed 4)', () => {
    const pairs: [Form, Form][] = [
      ['y^2 = x^3 - 4x + 4', 'x + 2y = 3'],
      ['Y^2 Z = X^3', 'Y^2 Z + X^2 Z = X^3'],
      ['Y^2 Z + 3XYZ = X^3 - 5XZ^2 + 11Z^3', 'Z = 0'],
      ['(x^2 + y^2 - 1)^3 = x^2 y^3', 'x^2 + y^2 = 1'],
      ['x^2 + y^2 = 1', 'x^2 + 4y^2 = 1'],
      ['y^2 = (x - 1)^2 (x + 2)', 'y = 0'],
      ['y = x^4', 'y = x^2 (x + 1) (x - 1) + x^4'],
    ].map(([a, b]) => [formParse(a).form, formParse(b).form]);
    const rand = seededRandom(4);
    for (let k = 0; k < 4; k++) {
      const sys = curvesThroughPoints(3, randomPoints(rand, 6, 4));
      pairs.push([randomMember(rand, sys.basis, 3), randomMember(rand, sys.basis, 3)]);
    }
    const cases: { ctx: string; ours: number; script: string }[] = [];
    for (const [f, g] of pairs) {
      const meet = curveCurveMeet(f, g);
      expect(meet.commonComponent).toBe(false);
      for (const p of meet.points) {
        if (!p.point) continue;
        const m = frameAt(p.point);
        const fa = affineSingular(formTransform(f, m));
        const ga = affineSingular(formTransform(g, m));
        cases.push({
          ctx: `F = ${f.coeffs.join(',')}, G = ${g.coeffs.join(',')} at ${p.point.join(':')}`,
          ours: p.multiplicity,
          script: `vdim(std(ideal(${fa}, ${ga})));`,
        });
      }
    }
    expect(cases.length).toBeGreaterThan(20);
    const out = singular('ring r = 0, (x, y), ds;\n' + cases.map((c) => c.script).join('\n'));
    expect(out).toHaveLength(cases.length);
    cases.forEach((c, i) => expect(Number(out[i]), c.ctx).toBe(c.ours));
    // the set exercises more than simple points (12: the two quartics y = x^4, y = 2x^4 - x^2 at (0:1:0))
    expect(new Set(cases.map((c) => c.ours))).toEqual(new Set([1, 2, 3, 4, 5, 12]));
  });
});
