// Floating approximations for the "approx" field of meet points: complex roots of an integer polynomial
// (Aberth–Ehrlich iteration, polished by Newton) and complex evaluation. Display only: nothing exact is
// decided from these numbers.
//
// Canonical form: a complex number is [re, im]; a polynomial is a UPoly (index i = coefficient of x^i).
import type { UPoly } from '../exact/upoly.ts';
import { bitLength } from '../exact/integer.ts';

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
  let bits = 0;
  for (const c of p) bits = Math.max(bits, bitLength(c));
  const shift = Math.max(0, bits - 60);
  return p.map((c) => Number(c >> BigInt(shift)) * 2 ** (shift - bits + 60) / 2 ** 60);
}

export function complexEval(p: readonly number[], z: Complex): Complex {
  let r: Complex = [0, 0];
  for (let i = p.length - 1; i >= 0; i--) r = [r[0] * z[0] - r[1] * z[1] + p[i], r[0] * z[1] + r[1] * z[0]];
  return r;
}

/** All complex roots of a non-constant integer polynomial with distinct roots (square-free), approximately. */
export function upolyComplexRoots(poly: UPoly): Complex[] {
  const p = upolyToScaledFloats(poly);
  const n = p.length - 1;
  if (n < 1) return [];
  if (n === 1) return [[-p[0] / p[1], 0]];
  const dp = p.slice(1).map((c, i) => c * (i + 1));
  // Start on a circle of the Cauchy-bound radius, rotated off the axes so conjugates separate.
  let radius = 0;
  for (let i = 0; i < n; i++) radius = Math.max(radius, Math.abs(p[i] / p[n]) ** (1 / (n - i)));
  radius = Math.max(radius, 1e-3);
  let z: Complex[] = Array.from({ length: n }, (_, k) => {
    const t = (2 * Math.PI * k) / n + 0.4;
    return [radius * Math.cos(t), radius * Math.sin(t)] as Complex;
  });
  for (let iter = 0; iter < 500; iter++) {
    let moved = 0;
    const next: Complex[] = [];
    for (let k = 0; k < n; k++) {
      const ratio = complexDiv(complexEval(p, z[k]), complexEval(dp, z[k]));
      let s: Complex = [0, 0];
      for (let j = 0; j < n; j++) {
        if (j === k) continue;
        const inv = complexDiv([1, 0], [z[k][0] - z[j][0], z[k][1] - z[j][1]]);
        s = [s[0] + inv[0], s[1] + inv[1]];
      }
      const denom: Complex = [1 - (ratio[0] * s[0] - ratio[1] * s[1]), -(ratio[0] * s[1] + ratio[1] * s[0])];
      const step = complexDiv(ratio, denom);
      if (!Number.isFinite(step[0]) || !Number.isFinite(step[1])) {
        next.push(z[k]);
        continue;
      }
      next.push([z[k][0] - step[0], z[k][1] - step[1]]);
      moved = Math.max(moved, Math.hypot(step[0], step[1]) / Math.max(1, Math.hypot(z[k][0], z[k][1])));
    }
    z = next;
    if (moved < 1e-15) break;
  }
  return z;
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
