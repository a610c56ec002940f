import { describe, expect, it } from 'vitest';
import { nineCheck, ninthPoint } from '../../../src/cubic/nine.ts';
import { curveCurveMeet } from '../../../src/cubic/meet.ts';
import { formAdd, formEval, formScale } from '../../../src/poly/form.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';
import { triple, tripleProportional, type Point } from '../../../src/plane/point.ts';
import { seededRandom } from '../../reference/oracles.ts';
import { randomPoints } from '../../reference/pari-cubic-helpers.ts';

const P = (x: number, y: number, z = 1): Point => triple(BigInt(x), BigInt(y), BigInt(z));

describe('ninthPoint', () => {
  it('is a base point of the pencil: on both generators, on random members, and the ninth meet point (seed 9, 25 sets)', () => {
    const seed = 9;
    const rand = seededRandom(seed);
    let checked = 0;
    for (let trial = 0; trial < 25; trial++) {
      const eight = randomPoints(rand, 8);
      const r = ninthPoint(eight);
      const ctx = `seed ${seed}, trial ${trial}, points ${eight.map((p) => p.join(':')).join(' ')}`;
      if (r.dimension !== 1 || !r.point) continue; // special position by chance: covered below
      const [f1, f2] = r.pencil;
      expect(formEval(f1, r.point), ctx).toBe(0n);
      expect(formEval(f2, r.point), ctx).toBe(0n);
      const member = formAdd(formScale(f1, BigInt(trial + 2)), formScale(f2, -3n));
      expect(formEval(member, r.point), ctx).toBe(0n);
      // Independent route: the full meet of the generators, minus the eight given points.
      const meet = curveCurveMeet(f1, f2);
      expect(meet.total, ctx).toBe(9);
      const left = meet.points.flatMap((m) => {
        const given = m.point && eight.some((q) => tripleProportional(q, m.point!)) ? 1 : 0;
        return m.multiplicity - given > 0 ? [m] : [];
      });
      expect(left.length, ctx).toBe(1);
      expect(left[0].point && tripleProportional(left[0].point, r.point), ctx).toBe(true);
      checked++;
    }
    expect(checked).toBeGreaterThanOrEqual(20);
  });
  it('finds a ninth point that coincides with a given one (tangency: y^2 = x^3 - 4x + 4 against its tangent at (1,1) times y = ±2; hand computation)', () => {
    const eight = [P(1, 1), P(-14, 19, 8), P(0, 2), P(2, 2), P(-2, 2), P(0, -2), P(2, -2), P(-2, -2)];
    const r = ninthPoint(eight);
    expect(r.dimension).toBe(1);
    expect(r.point).toEqual(P(1, 1));
    expect(r.coincidesWith).toBe(1);
  });
  it('four on a line: a fixed line in the pencil, no ninth point, said in words', () => {
    const eight = [P(0, 0), P(1, 0), P(2, 0), P(5, 0), P(1, 3), P(-2, 7), P(4, -5), P(3, 11)];
    const r = ninthPoint(eight);
    expect(r.point).toBeNull();
    expect(r.reason).toMatch(/common component/);
    expect(r.reason).toMatch(/line/);
  });
  it('seven on a conic: a fixed conic in the pencil (x^2 + y^2 = 25 through seven rational points)', () => {
    const eight = [P(5, 0), P(0, 5), P(3, 4), P(4, -3), P(-3, 4), P(-4, -3), P(-5, 0), P(2, 9)];
    const r = ninthPoint(eight);
    expect(r.point).toBeNull();
    expect(r.reason).toMatch(/conic/);
  });
  it('five on a line: the cubics through the eight form a net, not a pencil', () => {
    const eight = [P(0, 0), P(1, 0), P(2, 0), P(3, 0), P(4, 0), P(1, 3), P(-2, 7), P(4, -5)];
    const r = ninthPoint(eight);
    expect(r.dimension).toBe(2);
    expect(r.point).toBeNull();
    expect(r.reason).toMatch(/dimension 2/);
  });
  it('repeated points and wrong counts are refused or explained', () => {
    const eight = [P(0, 0), P(0, 0), P(2, 0), P(3, 1), P(4, 7), P(1, 3), P(-2, 7), P(4, -5)];
    expect(ninthPoint(eight).reason).toMatch(/not distinct/);
    expect(() => ninthPoint(eight.slice(0, 7))).toThrow(InvalidInput);
  });
});

describe('nineCheck', () => {
  it('the nine base points of a pencil pass the check in every direction (Eisenbud–Green–Harris, Bull. AMS 1996, §1)', () => {
    const rand = seededRandom(99);
    const eight = randomPoints(rand, 8);
    const ninth = ninthPoint(eight);
    expect(ninth.point).not.toBeNull();
    const r = nineCheck([...eight, ninth.point!]);
    expect(r.holds).toBe(true);
    expect(r.each.every((e) => e)).toBe(true);
    expect(r.dimension).toBe(1);
  });
  it('nine points in general position fail it: one cubic through them, and the reason names the true ninth point', () => {
    const rand = seededRandom(98);
    const nine = randomPoints(rand, 9);
    const r = nineCheck(nine);
    expect(r.dimension).toBe(0);
    expect(r.holds).toBe(false);
    expect(r.reason).toMatch(/ninth base point at/);
  });
  it('the grid of three lines by three lines (hand computation)', () => {
    const nine: Point[] = [];
    for (const x of [0, 1, -1]) for (const y of [0, 1, 2]) nine.push(P(x, y));
    const r = nineCheck(nine);
    expect(r.holds).toBe(true);
    expect(r.dimension).toBe(1);
  });
});
