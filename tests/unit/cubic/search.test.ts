import { describe, expect, it } from 'vitest';
import { cubicRationalPoints } from '../../../src/cubic/search.ts';
import { sievePoints } from '../../../src/cubic/search-sieve.ts';
import { pointHeight, pointHeightCompare } from '../../../src/cubic/height.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formEval, type Form } from '../../../src/poly/form.ts';
import { Cancelled, InvalidInput } from '../../../src/exact/errors.ts';

const curve = (text: string): Form => formParse(text).form;
const keys = (ps: readonly (readonly bigint[])[]): string[] => ps.map((p) => p.join(':'));

describe('cubicRationalPoints', () => {
  it('smooth cubic: the sieve, complete, sorted by height, all on the curve', () => {
    const f = curve('y^2 + y = x^3 - 2x + 1');
    const r = cubicRationalPoints(f, { height: 40 });
    expect(r.method).toBe('sieve');
    expect(r.complete).toBe(true);
    expect(r.points.length).toBeGreaterThan(4);
    for (const p of r.points) {
      expect(formEval(f, p)).toBe(0n);
      expect(pointHeight(p) <= 40n).toBe(true);
    }
    expect(keys(r.points)).toEqual(keys([...r.points].sort(pointHeightCompare)));
  });
  it('singular cubics: the parametrisation and the sieve, both complete, agree exactly (node, acnode, cusp)', () => {
    for (const text of ['y^2 = (x - 1)^2 (x + 2)', 'y^2 = (x + 3)^2 (x - 5)', '(y - x)^2 = (x - 2)^3', 'x^3 + 2y^3 = 7xy']) {
      const f = curve(text);
      const r = cubicRationalPoints(f, { height: 60, method: 'parametrisation' });
      expect(r.method, text).toBe('parametrisation');
      expect(r.complete).toBe(true);
      const sieve = sievePoints(f, 60n).sort(pointHeightCompare);
      expect(keys(r.points), text).toEqual(keys(sieve));
    }
  });
  it('singular cubics past the sieve limit go through the parametrisation, still complete', () => {
    const f = curve('y^2 = (x - 1)^2 (x + 2)');
    const r = cubicRationalPoints(f, { height: 40, sieveLimit: 10 });
    expect([r.method, r.complete, r.completeUpTo]).toEqual(['parametrisation', true, 40n]);
    expect(keys(r.points)).toEqual(keys(sievePoints(f, 40n).sort(pointHeightCompare)));
  });
  it('positive region: only points with x, y > 0, on both routes', () => {
    const f = curve('x^3 + 2y^3 = 7xy');
    const r = cubicRationalPoints(f, { height: 80, region: { kind: 'positive' }, method: 'parametrisation' });
    expect(r.points.length).toBeGreaterThan(0);
    for (const [x, y, z] of r.points) expect(x * z > 0n && y * z > 0n).toBe(true);
    const s = cubicRationalPoints(curve('y^2 = x^3 - 2x + 5'), { height: 50, region: { kind: 'positive' } });
    for (const [x, y, z] of s.points) expect(x * z > 0n && y * z > 0n).toBe(true);
  });
  it('past the sieve limit a smooth cubic gets the chord closure: a superset of the small sieve, inside the big one, marked incomplete', () => {
    const f = curve('y^2 + y = x^3 - 2x + 1');
    const r = cubicRationalPoints(f, { height: 400, sieveLimit: 6 });
    expect(r.method).toBe('sieve and closure');
    expect(r.complete).toBe(false);
    expect(r.completeUpTo).toBe(6n);
    const small = new Set(keys(sievePoints(f, 6n)));
    const big = new Set(keys(sievePoints(f, 400n)));
    for (const k of small) expect(keys(r.points)).toContain(k);
    for (const k of keys(r.points)) expect(big.has(k)).toBe(true);
    expect(r.points.length).toBeGreaterThan(small.size);
  });
  it('reducible cubics are searched by the sieve', () => {
    const r = cubicRationalPoints(curve('(x - y)(x^2 + y^2 - 25) = 0'), { height: 5 });
    expect(r.method).toBe('sieve');
    expect(keys(r.points)).toContain('3:4:1');
    expect(keys(r.points)).toContain('1:1:1');
  });
  it('bad input and cancellation', () => {
    expect(() => cubicRationalPoints(curve('x^2 + y^2 - 1'), { height: 5 })).toThrow(InvalidInput);
    expect(() => cubicRationalPoints(curve('y^2 = x^3 + 3'), { height: 0 })).toThrow(/at least 1/);
    let calls = 0;
    expect(() => cubicRationalPoints(curve('y^2 = x^3 + 3'), { height: 500, isCancelled: () => ++calls > 3 })).toThrow(Cancelled);
    calls = 0;
    expect(() => cubicRationalPoints(curve('y^2 = (x - 1)^2 (x + 2)'), { height: 500, method: 'parametrisation', isCancelled: () => ++calls > 3 })).toThrow(Cancelled);
  });
});
