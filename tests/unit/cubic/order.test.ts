// Orders of points: torsion found by repeated addition, infinite order proved by Mazur's bound (a
// rational torsion point has order ≤ 12: Silverman, The Arithmetic of Elliptic Curves, VIII.7.5).
import { describe, expect, it } from 'vitest';
import { groupOrder } from '../../../src/cubic/order.ts';
import { groupRebase } from '../../../src/cubic/group.ts';
import { weierstrassCubic, randomUnimodular, pointPullBack } from './group-samples.ts';
import { seededRandom } from '../../reference/oracles.ts';
import { formTransform } from '../../../src/poly/transform.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { Degenerate } from '../../../src/exact/errors.ts';

const INF: [bigint, bigint, bigint] = [0n, 1n, 0n];

describe('groupOrder', () => {
  it('y² + y = x³ − x² − 10x − 20: (5, 5) has order 5 (Cremona, Algorithms for Modular Elliptic Curves, table 1, curve 11a1; from memory)', () => {
    const f = weierstrassCubic([0n, -1n, 1n, -10n, -20n]);
    expect(groupOrder(f, INF, [5n, 5n, 1n])).toBe(5);
    expect(groupOrder(f, INF, [16n, -61n, 1n])).toBe(5);
    expect(groupOrder(f, INF, INF)).toBe(1);
  });

  it('keeps the order under a unimodular change of coordinates and a non-flex base point', () => {
    const w = weierstrassCubic([0n, -1n, 1n, -10n, -20n]);
    const rand = seededRandom(5101);
    const m = randomUnimodular(rand, 6);
    const f = formTransform(w, m);
    const o = pointPullBack(m, INF);
    const p = pointPullBack(m, [5n, 5n, 1n]);
    // New base O2 = P (order 5, so not a flex); the image of P under the change of base is P + O2.
    const o2 = p;
    expect(groupOrder(f, o2, groupRebase(f, o, o2, p))).toBe(5);
    expect(groupOrder(f, o2, groupRebase(f, o, o2, o))).toBe(1);
  });

  it('a point of infinite order on a curve of our own', () => {
    const f = formParse('x^3 - x = y^3 - 2y^2 + 3y').form;
    expect(groupOrder(f, [0n, 0n, 1n], [1n, 0n, 1n])).toBe('infinite');
  });

  it('refuses singular curves, where Mazur\'s bound does not apply', () => {
    const f = formParse('2y^2 = 3x^3 + x^2').form;
    expect(() => groupOrder(f, INF, INF)).toThrow(Degenerate);
  });
});
