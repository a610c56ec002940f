// Roots of binary forms over P^1: multiplicities sum to the degree; the root at (1:0) is counted.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { binaryFormRoots } from '../../../src/poly/binary-roots.ts';
import { Degenerate } from '../../../src/exact/errors.ts';
import { algebraicToNumber } from '../../../src/exact/algebraic.ts';

/** Coefficients (s^d first) of a product of binary linear forms (a s + b t). */
function product(lin: [bigint, bigint][], extra: bigint[] = [1n]): bigint[] {
  let r = extra.slice();
  for (const [a, b] of lin) {
    const next = new Array<bigint>(r.length + 1).fill(0n);
    for (let i = 0; i < r.length; i++) {
      next[i] += a * r[i];
      next[i + 1] += b * r[i];
    }
    r = next;
  }
  return r;
}

describe('binaryFormRoots', () => {
  it('s^2 t - 2 t^3 = t (s^2 - 2t^2): roots (1:0) and s/t = ±sqrt 2', () => {
    const r = binaryFormRoots([0n, 1n, 0n, -2n]);
    // b[i] is the coefficient of s^(3-i) t^i: [0, 1, 0, -2] = s^2 t − 2 t^3
    expect(r.roots.at(-1)).toEqual({ point: [1n, 0n], real: null, multiplicity: 1 });
    const reals = r.roots.filter((x) => x.real).map((x) => algebraicToNumber(x.real!));
    expect(reals[0]).toBeCloseTo(-Math.SQRT2, 12);
    expect(reals[1]).toBeCloseTo(Math.SQRT2, 12);
    expect(r.complex).toEqual([]);
  });
  it('rational roots as primitive (s:t) with first entry positive; multiplicities', () => {
    // (2s + 3t)^2 (s - t) t
    const b = product([[2n, 3n], [2n, 3n], [1n, -1n], [0n, 1n]]);
    const r = binaryFormRoots(b);
    expect(r.roots).toEqual([
      { point: [3n, -2n], real: null, multiplicity: 2 },
      { point: [1n, 1n], real: null, multiplicity: 1 },
      { point: [1n, 0n], real: null, multiplicity: 1 },
    ]);
  });
  it('non-real roots are counted', () => {
    const r = binaryFormRoots(product([[1n, 0n]], [1n, 0n, 1n])); // s (s^2 + t^2)
    expect(r.roots).toEqual([{ point: [0n, 1n], real: null, multiplicity: 1 }]);
    expect(r.complex).toEqual([{ poly: [1n, 0n, 1n], multiplicity: 1, nonReal: 2 }]);
  });
  it('multiplicities sum to the degree (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.bigInt({ min: -20n, max: 20n }), { minLength: 1, maxLength: 8 }), (b) => {
        if (b.every((c) => c === 0n)) return;
        const r = binaryFormRoots(b);
        const total = r.roots.reduce((s, x) => s + x.multiplicity, 0) + r.complex.reduce((s, c) => s + c.nonReal * c.multiplicity, 0);
        expect(total).toBe(b.length - 1);
      }),
    );
  });
  it('refuses the zero form', () => {
    expect(() => binaryFormRoots([0n, 0n])).toThrow(Degenerate);
  });
});
