// The Weierstrass model of a smooth cubic from a rational point: the forward map lands on the model, is a
// group isomorphism (base O to the point at infinity), the inverse construction undoes it, and the model's
// j agrees with the invariants of the cubic. Group law on the model: Silverman, AEC III.2.3.
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../reference/oracles.ts';
import { pointPullBack, randomPoint, randomSmoothCubicThrough, randomUnimodular, weierstrassCubic } from './group-samples.ts';
import { weierstrassInverse, weierstrassMap, weierstrassModel } from '../../../src/cubic/weierstrass.ts';
import { groupAdd, groupMultiple, groupNegate } from '../../../src/cubic/group.ts';
import { cubicInvariants } from '../../../src/cubic/invariants.ts';
import { modelAdd, modelContains, modelMultiple, modelNegate, modelQuantities } from '../../../src/cubic/curve-model.ts';
import { cubicIsFlex, cubicTangentialPoint } from '../../../src/cubic/chord.ts';
import { modelMinimal } from '../../../src/cubic/minimal-model.ts';
import { formTransform } from '../../../src/poly/transform.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { Degenerate, NotOnCurve } from '../../../src/exact/errors.ts';

describe('weierstrassModel', () => {
  it('forward map is a homomorphism onto the model and the inverse undoes it (seeded random cubics, non-flex O)', () => {
    const seed = 4301;
    const rand = seededRandom(seed);
    for (let k = 0; k < 25; k++) {
      const [o, p, q] = [randomPoint(rand), randomPoint(rand), randomPoint(rand)];
      const f = randomSmoothCubicThrough(rand, [o, p, q]);
      const info = `seed ${seed}, case ${k}: f = ${f.coeffs.join(',')}, O = ${o}, P = ${p}, Q = ${q}`;
      const m = weierstrassModel(f, o);
      expect(m.j, info).toEqual(cubicInvariants(f).j);
      const fp = weierstrassMap(m, p);
      const fq = weierstrassMap(m, q);
      expect(modelContains(m.a, fp), info).toBe(true);
      expect(weierstrassMap(m, o)).toBe('infinity');
      expect(weierstrassMap(m, groupAdd(f, o, p, q)), info).toEqual(modelAdd(m.a, fp, fq));
      expect(weierstrassMap(m, groupNegate(f, o, p)), info).toEqual(modelNegate(m.a, fp));
      expect(weierstrassMap(m, groupMultiple(f, o, p, 5)), info).toEqual(modelMultiple(m.a, fp, 5n));
      expect(weierstrassInverse(m, fp), info).toEqual(p);
      expect(weierstrassInverse(m, modelMultiple(m.a, fq, -3n)), info).toEqual(groupMultiple(f, o, q, -3));
      // O' = O * O, where the forward forms all vanish, still has its image.
      const o2 = cubicTangentialPoint(f, o);
      expect(weierstrassMap(m, o2), info).toEqual(modelAdd(m.a, weierstrassMap(m, groupAdd(f, o, o2, p)), modelNegate(m.a, fp)));
      expect(weierstrassInverse(m, weierstrassMap(m, o2)), info).toEqual(o2);
      // The minimal model found through the cubic's small ARVT pair equals the one found by factoring
      // the construction model's own gcd(c4, c6).
      if (k < 8) expect(modelMinimal(m.construction.a).a, info).toEqual(m.minimal);
    }
  });

  it('flex base point: the forward map is linear', () => {
    const w = weierstrassCubic([1n, -1n, 0n, -3n, 9n]);
    const mat = randomUnimodular(seededRandom(4302), 6);
    const f = formTransform(w, mat);
    const o = pointPullBack(mat, [0n, 1n, 0n]);
    expect(cubicIsFlex(f, o)).toBe(true);
    const m = weierstrassModel(f, o);
    expect(m.flex).toBe(true);
    expect(m.forward.every((h) => h.degree === 1)).toBe(true);
    expect(m.j).toEqual(modelQuantities([1n, -1n, 0n, -3n, 9n]).j);
    // (0, 3) is on y² + xy = x³ − x² − 3x + 9.
    const p = pointPullBack(mat, [0n, 3n, 1n]);
    expect(weierstrassInverse(m, weierstrassMap(m, p))).toEqual(p);
  });

  it('O\' = O * O a flex (O of order 6 in the law based at a flex): O\' is 2-torsion and still maps', () => {
    // y² = x³ + 1: (2, 3) has order 6 (Silverman–Tate, Rational Points on Elliptic Curves, II.4; from memory).
    const f = weierstrassCubic([0n, 0n, 0n, 0n, 1n]);
    const o: [bigint, bigint, bigint] = [2n, 3n, 1n];
    const o2 = cubicTangentialPoint(f, o);
    expect(cubicIsFlex(f, o2)).toBe(true);
    const m = weierstrassModel(f, o);
    const im = weierstrassMap(m, o2);
    expect(modelAdd(m.a, im, im)).toBe('infinity');
    expect(weierstrassInverse(m, im)).toEqual(o2);
  });

  it('refuses singular curves and points off the model', () => {
    expect(() => weierstrassModel(formParse('3y^2 = x^2 (x + 5)').form, [0n, 1n, 0n])).toThrow(Degenerate);
    const f = weierstrassCubic([0n, 0n, 0n, -2n, 5n]);
    const m = weierstrassModel(f, [0n, 1n, 0n]);
    expect(() => weierstrassInverse(m, { x: { num: 1n, den: 1n }, y: { num: 1n, den: 1n } })).toThrow(NotOnCurve);
  });
});
