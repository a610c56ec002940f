// Chord and tangent: the third point lies on the curve and on the line (Bézout: a line meets a cubic in
// three points counted with multiplicity — common practice), named refusals for degenerate input.
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../reference/oracles.ts';
import { randomPoint, randomSmoothCubicThrough, weierstrassCubic } from './group-samples.ts';
import { cubicIsFlex, cubicTangentAt, cubicTangentialPoint, cubicThirdPoint } from '../../../src/cubic/chord.ts';
import { formEval, formMul, type Form } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { det3, dot, triple } from '../../../src/plane/point.ts';
import { Degenerate, NotOnCurve, SingularPoint } from '../../../src/exact/errors.ts';

const cubic = (text: string): Form => formParse(text).form;

describe('cubicThirdPoint', () => {
  it('the third point is on the curve, on the line, and canonical (seeded random cubics)', () => {
    const seed = 4101;
    const rand = seededRandom(seed);
    for (let k = 0; k < 60; k++) {
      const p = randomPoint(rand, 2);
      const q = randomPoint(rand, 2);
      const f = randomSmoothCubicThrough(rand, [p, q], 2);
      const r = cubicThirdPoint(f, p, q);
      const info = `seed ${seed}, case ${k}: f = ${f.coeffs.join(',')}, P = ${p}, Q = ${q}, R = ${r}`;
      expect(formEval(f, r), info).toBe(0n);
      expect(det3(p, q, r), info).toBe(0n);
      expect(triple(r[0], r[1], r[2]), info).toEqual(r);
      // Symmetric in P and Q.
      expect(cubicThirdPoint(f, q, p), info).toEqual(r);
    }
  });

  it('P * Q = R makes P * R = Q (the three points of one line)', () => {
    const rand = seededRandom(4102);
    for (let k = 0; k < 30; k++) {
      const p = randomPoint(rand, 1);
      const q = randomPoint(rand, 1);
      const f = randomSmoothCubicThrough(rand, [p, q], 1);
      const r = cubicThirdPoint(f, p, q);
      if (r[0] === p[0] && r[1] === p[1] && r[2] === p[2]) continue;
      expect(cubicThirdPoint(f, p, r), `case ${k}`).toEqual(q);
    }
  });

  it('the tangential point lies on the tangent line and on the curve', () => {
    const rand = seededRandom(4103);
    for (let k = 0; k < 40; k++) {
      const p = randomPoint(rand, 2);
      const f = randomSmoothCubicThrough(rand, [p], 2);
      const t = cubicTangentAt(f, p);
      const r = cubicThirdPoint(f, p, p);
      expect(dot(t, r), `case ${k}`).toBe(0n);
      expect(formEval(f, r), `case ${k}`).toBe(0n);
      expect(cubicTangentialPoint(f, p)).toEqual(r);
    }
  });

  it('points at infinity need no special case: on Y²Z = X³ − 2XZ² + 5Z³ the point 0:1:0 is a flex', () => {
    // Weierstrass cubic of our own; (0:1:0) is a flex of every Weierstrass model (Silverman–Tate, I.3).
    const f = weierstrassCubic([0n, 0n, 0n, -2n, 5n]);
    expect(cubicIsFlex(f, [0n, 1n, 0n])).toBe(true);
    // x = 1: y² = 4, so (1, 2) and (1, −2); the vertical line through them meets the curve at infinity.
    expect(cubicThirdPoint(f, [1n, 2n, 1n], [1n, -2n, 1n])).toEqual([0n, 1n, 0n]);
    expect(cubicThirdPoint(f, [1n, 2n, 1n], [0n, 1n, 0n])).toEqual([1n, -2n, 1n]);
  });

  it('names the degenerate cases', () => {
    // A line inside a reducible cubic: (x + y − 1)(x² + 2y² − 9), two smooth points of the line.
    const line = cubic('x + y - 1');
    const f = formMul(line, cubic('x^2 + 2y^2 - 9'));
    expect(() => cubicThirdPoint(f, [2n, -1n, 1n], [3n, -2n, 1n])).toThrow(Degenerate);
    expect(() => cubicThirdPoint(f, [2n, -1n, 1n], [2n, -1n, 1n])).toThrow(Degenerate);
    const g = cubic('y^2 + x y = x^3 - 2x + 5');
    expect(() => cubicThirdPoint(g, [1n, 1n, 1n], [0n, 1n, 0n])).toThrow(NotOnCurve);
    // A cuspidal cubic of our own, 2y² = 3x³, with its cusp at 0:0:1.
    const h = cubic('2y^2 = 3x^3');
    expect(() => cubicThirdPoint(h, [0n, 0n, 1n], [2n, 3n, 1n])).toThrow(SingularPoint);
  });
});
