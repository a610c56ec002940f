// The one-tangent-one-chord-per-digit chain of groupMultipleIn against the law itself (repeated
// groupAddIn, each step made primitive): the same canonical triple whatever path computed it. Seeded
// random cubics with random (mostly non-flex) base points, long multiples, negative multiples, and points
// of finite order, where the chain passes through O and ω = O * O.
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../reference/oracles.ts';
import { randomPoint, randomSmoothCubicThrough } from './group-samples.ts';
import { groupAddIn, groupMake, groupMultipleIn, groupNegateIn, type CubicGroup } from '../../../src/cubic/group.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { cross, dot, type Point } from '../../../src/plane/point.ts';
import { tangentThirdRaw } from '../../../src/cubic/chord.ts';
import { formEval, formGradient } from '../../../src/poly/form.ts';
import { bigAbs, primitive } from '../../../src/exact/integer.ts';

/** nP by repeated addition through the law (the slow, obviously right path). */
function multipleByAddition(g: CubicGroup, p: Point, n: number): Point {
  let acc = g.base;
  for (let k = 0; k < Math.abs(n); k++) acc = groupAddIn(g, acc, p);
  return n < 0 ? groupNegateIn(g, acc) : acc;
}

describe('groupMultipleIn chain', () => {
  it('equals repeated addition for n = -25..40 on seeded random cubics', () => {
    for (const seed of [11, 12, 13, 14]) {
      const rand = seededRandom(seed);
      const pts = [randomPoint(rand, 1), randomPoint(rand, 1)];
      const f = randomSmoothCubicThrough(rand, pts, 1);
      const g = groupMake(f, pts[0]);
      const info = `seed ${seed}: f = ${f.coeffs.join(',')}, O = ${pts[0]}, P = ${pts[1]}`;
      let acc = g.base;
      for (let n = 0; n <= 40; n++) {
        expect(groupMultipleIn(g, pts[1], BigInt(n)), `${info}, n = ${n}`).toEqual(acc);
        if (n <= 25) expect(groupMultipleIn(g, pts[1], BigInt(-n)), `${info}, n = -${n}`).toEqual(groupNegateIn(g, acc));
        acc = groupAddIn(g, acc, pts[1]);
      }
    }
  });

  it('multiples around powers of two agree with sums of smaller multiples', () => {
    const rand = seededRandom(21);
    const pts = [randomPoint(rand, 1), randomPoint(rand, 1)];
    const f = randomSmoothCubicThrough(rand, pts, 1);
    const g = groupMake(f, pts[0]);
    const p = pts[1];
    const m = (n: number) => groupMultipleIn(g, p, BigInt(n));
    for (const [a, b] of [[32, 1], [32, -1], [16, 15], [21, -34]]) {
      expect(m(a + b), `seed 21: ${a} + ${b}`).toEqual(groupAddIn(g, m(a), m(b)));
    }
  });

  it('points of finite order: the chain passes through O and its tangential point', () => {
    // y^2 = x^3 + 5x^2 + 6x has the 2-torsion points (0,0), (-2,0), (-3,0) (its right side is
    // x(x + 2)(x + 3)); base point at infinity (a flex), and also a non-flex base point.
    const f = formParse('y^2 = x^3 + 5x^2 + 6x').form;
    const t: Point = [0n, 0n, 1n];
    const g = groupMake(f, [0n, 1n, 0n]);
    for (let n = -9; n <= 9; n++) expect(groupMultipleIn(g, t, BigInt(n)), `O = 0:1:0, n = ${n}`).toEqual(multipleByAddition(g, t, n));
    // Non-flex base point: O = (-2, 0), P = (0, 0); every point of the 2-torsion subgroup in turn.
    const g2 = groupMake(f, [2n, 0n, -1n]);
    for (const p of [[0n, 0n, 1n], [3n, 0n, -1n], [0n, 1n, 0n], [2n, 0n, -1n]] as Point[]) {
      for (let n = -9; n <= 9; n++) expect(groupMultipleIn(g2, p, BigInt(n)), `O = 2:0:-1, P = ${p}, n = ${n}`).toEqual(multipleByAddition(g2, p, n));
    }
  });

  it('tangentThirdRaw is the tangent formula divided by |p_i|³ (when exact), p primitive, scaled or negated', () => {
    // Reference: F(λP + μD) with D = ∇F(P) × e_i on the tangent gives F(D)·P − (P·∇F(D))·D (Silverman–Tate,
    // Rational Points on Elliptic Curves, I.2, in projective form), computed here with formEval and formGradient.
    let checked = 0;
    for (const seed of [21, 22, 23, 24, 25, 26]) {
      const rand = seededRandom(seed);
      const pts = [randomPoint(rand, 1), randomPoint(rand, 1)];
      const f = randomSmoothCubicThrough(rand, pts, 1);
      const g = groupMake(f, pts[0]);
      const grad = formGradient(f);
      for (let n = 1; n <= 12; n++) {
        const x0 = groupMultipleIn(g, pts[1], BigInt(n));
        for (const x of [x0, x0.map((v) => -v), x0.map((v) => v * 6n)]) {
          const gx = grad.map((h) => formEval(h, x as Point));
          let i = -1;
          for (let k = 0; k < 3; k++) {
            if (x[k] === 0n || (k === 0 ? gx[1] === 0n && gx[2] === 0n : k === 1 ? gx[0] === 0n && gx[2] === 0n : gx[0] === 0n && gx[1] === 0n)) continue;
            if (i < 0 || bigAbs(x[k]) < bigAbs(x[i])) i = k;
          }
          if (i < 0) continue;
          const e = [0n, 0n, 0n];
          e[i] = 1n;
          const d: Point = cross(gx, e);
          const gd = grad.map((h) => formEval(h, d));
          const fd = formEval(f, d);
          const pd = dot(x, gd);
          const r = [0, 1, 2].map((k) => fd * x[k] - pd * d[k]);
          const w3 = bigAbs(x[i]) ** 3n;
          const want = r.every((v) => v % w3 === 0n) ? r.map((v) => v / w3) : primitive(r);
          expect(tangentThirdRaw(f, x), `seed ${seed}, n ${n}, f = ${f.coeffs.join(',')}, X = ${x}`).toEqual(want);
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(150);
  });
});
