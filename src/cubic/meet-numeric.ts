// Floating approximations for the "approx" field of meet points: complex roots of an integer polynomial
// (the Aberth–Ehrlich iteration of src/exact/float-roots.ts) and complex evaluation. Display only: nothing exact is
// decided from these numbers.
//
// Canonical form: a complex number is [re, im]; a polynomial is a UPoly (index i = coefficient of x^i).
import type { UPoly } from '../exact/upoly.ts';
import { upolyFloatRoots, upolyScaledFloats } from '../exact/float-roots.ts';

export type Complex = readonly [number, number];

function cmul(a: Complex, b: Complex): Complex {
  return [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
}

export function complexDiv(a: Complex, b: Complex): Complex {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
}

/** Coefficients scaled by a common power of two so the largest is about 1 (no overflow for huge integers). */
export function upolyToScaledFloats(p: UPoly): number[] {
  return Array.from(upolyScaledFloats(p));
}

export function complexEval(p: readonly number[], z: Complex): Complex {
  let r: Complex = [0, 0];
  for (let i = p.length - 1; i >= 0; i--) r = [r[0] * z[0] - r[1] * z[1] + p[i], r[0] * z[1] + r[1] * z[0]];
  return r;
}

/** All complex roots of a non-constant integer polynomial with distinct roots (square-free), approximately. */
export function upolyComplexRoots(poly: UPoly): Complex[] {
  const { re, im } = upolyFloatRoots(poly, 500);
  return Array.from(re, (x, k) => [x, im[k]] as Complex);
}

/** Normalise a complex triple so its coordinate of largest modulus is 1. */
export function complexTripleNormalise(v: readonly Complex[]): { re: [number, number, number]; im: [number, number, number] } {
  let k = 0;
  for (let i = 1; i < 3; i++) if (Math.hypot(...v[i]) > Math.hypot(...v[k])) k = i;
  const w = v.map((c) => complexDiv(c, v[k]));
  return { re: [w[0][0], w[1][0], w[2][0]], im: [w[0][1], w[1][1], w[2][1]] };
}

/** Normalise a real triple so its coordinate of largest absolute value is 1. */
export function realTripleNormalise(v: readonly number[]): [number, number, number] {
  let k = 0;
  for (let i = 1; i < 3; i++) if (Math.abs(v[i]) > Math.abs(v[k])) k = i;
  return [v[0] / v[k], v[1] / v[k], v[2] / v[k]];
}

export { cmul as complexMul };
