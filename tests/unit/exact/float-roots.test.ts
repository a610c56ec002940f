// Floating root approximations (candidates only): residuals small, huge coefficients do not overflow.
import { describe, expect, it } from 'vitest';
import { upolyFloatRoots, upolyScaledFloats } from '../../../src/exact/float-roots.ts';
import { upolyMul } from '../../../src/exact/upoly.ts';

describe('upolyFloatRoots', () => {
  it('finds the roots of (x - 1)(x + 2)(2x - 3)(x^2 + 1) (construction: common practice)', () => {
    const p = upolyMul(upolyMul(upolyMul([-1n, 1n], [2n, 1n]), [-3n, 2n]), [1n, 0n, 1n]);
    const { re, im } = upolyFloatRoots(p);
    const real = [...re].filter((_, i) => Math.abs(im[i]) < 1e-9).sort((a, b) => a - b);
    expect(real.length).toBe(3);
    expect(real[0]).toBeCloseTo(-2, 12);
    expect(real[1]).toBeCloseTo(1, 12);
    expect(real[2]).toBeCloseTo(1.5, 12);
    const nonReal = [...im].filter((y) => Math.abs(y) > 1e-9).map(Math.abs);
    expect(nonReal.every((y) => Math.abs(y - 1) < 1e-12)).toBe(true);
  });
  it('scales 600-digit coefficients without overflow', () => {
    const big = 10n ** 600n;
    const p = upolyMul([-3n * big, big], [5n, 7n]); // roots 3 and -5/7
    expect([...upolyScaledFloats(p)].every(Number.isFinite)).toBe(true);
    const { re } = upolyFloatRoots(p);
    const s = [...re].sort((a, b) => a - b);
    expect(s[0]).toBeCloseTo(-5 / 7, 12);
    expect(s[1]).toBeCloseTo(3, 12);
  });
});
