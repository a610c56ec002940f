// Floating approximations of exact points, for display only ("approx" fields): they never decide anything.
//
// Canonical form: an approximate point is [x, y, z] scaled so that its last non-zero coordinate (of largest
// modulus, for complex points) is 1; complex points carry a second vector of imaginary parts.
import type { Point } from '../plane/point.ts';
import { monomials, formEval, type Form } from '../poly/form.ts';
import { formOnLine } from '../poly/substitute.ts';

export type Approx = [number, number, number];

export interface ComplexApprox {
  readonly re: Approx;
  readonly im: Approx;
}

/** A rational point as doubles: (x/z, y/z, 1) when z ≠ 0, else scaled by the last non-zero entry. */
export function pointApprox(p: readonly bigint[]): Approx {
  const v = [Number(p[0]), Number(p[1]), Number(p[2])];
  const k = v[2] !== 0 ? 2 : v[1] !== 0 ? 1 : 0;
  return [v[0] / v[k], v[1] / v[k], v[2] / v[k]];
}

type C = [number, number];
const cmul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const cdiv = (a: C, b: C): C => {
  const n = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / n, (a[1] * b[0] - a[0] * b[1]) / n];
};

/** Normalise a complex projective vector by its coordinate of largest modulus. */
export function complexNormalise(v: readonly C[]): ComplexApprox {
  // The last coordinate that is not negligibly small, as for real points: (x : y : 1) when z is usable.
  const size = v.map((c) => Math.hypot(...c));
  const big = Math.max(...size);
  let k = 2;
  while (k > 0 && size[k] < 1e-9 * big) k--;
  const w = v.map((c) => cdiv(c, v[k]));
  return { re: [w[0][0], w[1][0], w[2][0]], im: [w[0][1], w[1][1], w[2][1]] };
}

/** The two roots (s:t) of a binary quadratic a s² + b st + c t² with a ≠ 0, as complex s/t. */
export function quadraticRootsApprox(a: bigint, b: bigint, c: bigint): [C, C] {
  const A = Number(a);
  const B = Number(b);
  const disc = Number(b * b - 4n * a * c);
  if (disc >= 0) {
    const r = Math.sqrt(disc);
    // Avoid cancellation: the larger root first, the other from the product c/a.
    const q = -(B + (B >= 0 ? r : -r)) / 2;
    const r1 = q / A;
    const r2 = q !== 0 ? Number(c) / q : -B / (2 * A);
    return [[r1, 0], [r2, 0]];
  }
  const im = Math.sqrt(-disc) / (2 * A);
  return [[-B / (2 * A), im], [-B / (2 * A), -im]];
}

/** The point s·A + t·B for complex s/t = r and t = 1. */
export function pencilPointApprox(a: Point, b: Point, r: C): ComplexApprox {
  const v: C[] = [0, 1, 2].map((i) => [r[0] * Number(a[i]) + Number(b[i]), r[1] * Number(a[i])]);
  return complexNormalise(v);
}

/** All complex roots of a real polynomial (coefficient of x^i at index i, leading non-zero), Durand–Kerner. */
export function polyRootsApprox(coeffs: readonly number[]): C[] {
  const n = coeffs.length - 1;
  const lead = coeffs[n];
  const p = coeffs.map((c) => c / lead);
  const evalAt = (x: C): C => {
    let acc: C = [1, 0];
    for (let i = n - 1; i >= 0; i--) acc = [cmul(acc, x)[0] + p[i], cmul(acc, x)[1]];
    return acc;
  };
  const radius = 1 + Math.max(...p.slice(0, n).map(Math.abs));
  let z: C[] = Array.from({ length: n }, (_, k) => [radius * Math.cos(0.4 + (2 * Math.PI * k) / n), radius * Math.sin(0.4 + (2 * Math.PI * k) / n)]);
  for (let iter = 0; iter < 500; iter++) {
    let moved = 0;
    z = z.map((zi, i) => {
      let den: C = [1, 0];
      for (let j = 0; j < n; j++) if (j !== i) den = cmul(den, [zi[0] - z[j][0], zi[1] - z[j][1]]);
      const step = cdiv(evalAt(zi), den);
      moved = Math.max(moved, Math.hypot(...step) / Math.max(1, Math.hypot(...zi)));
      return [zi[0] - step[0], zi[1] - step[1]];
    });
    if (moved < 1e-15) break;
  }
  return z;
}

const csub = (a: C, b: C): C => [a[0] - b[0], a[1] - b[1]];
const ccross = (a: readonly C[], b: readonly C[]): C[] => [
  csub(cmul(a[1], b[2]), cmul(a[2], b[1])),
  csub(cmul(a[2], b[0]), cmul(a[0], b[2])),
  csub(cmul(a[0], b[1]), cmul(a[1], b[0])),
];

/** F at a complex point, relative to the size of the point (a residual for matching, never a verdict). */
function formEvalComplexRelative(f: Form, v: readonly C[]): number {
  const scale = Math.max(...v.map((c) => Math.hypot(...c)));
  const w = v.map((c) => [c[0] / scale, c[1] / scale] as C);
  let acc: C = [0, 0];
  for (const [k, [i, j, l]] of monomials(f.degree).entries()) {
    const c = Number(f.coeffs[k]);
    if (c === 0) continue;
    let t: C = [c, 0];
    for (let a = 0; a < i; a++) t = cmul(t, w[0]);
    for (let a = 0; a < j; a++) t = cmul(t, w[1]);
    for (let a = 0; a < l; a++) t = cmul(t, w[2]);
    acc = [acc[0] + t[0], acc[1] + t[1]];
  }
  return Math.hypot(...acc);
}

/** Complex points where the curve meets the line AB (assumes F(A) ≠ 0 and simple roots). */
function lineMeetsApprox(f: Form, a: Point, b: Point): C[][] {
  const bin = formOnLine(f, a, b).map(Number);
  const roots = polyRootsApprox(bin.slice().reverse());
  return roots.map((r) => [0, 1, 2].map((i) => [r[0] * Number(a[i]) + Number(b[i]), r[1] * Number(a[i])] as C));
}

/**
 * The three vertices of a triangle of lines given only as a cubic F = L1·L2·L3 (the lines conjugate over a
 * cubic field): find each line through its meets with two rational lines, pair the meets by the residual of
 * F along the joining line, and cross the lines. Approximations for display; the exactness lies elsewhere.
 */
export function triangleVerticesApprox(f: Form): ComplexApprox[] {
  const lines: Point[][] = [
    [[1n, 0n, 0n], [0n, 1n, 0n]],
    [[0n, 1n, 0n], [0n, 0n, 1n]],
    [[1n, 0n, 0n], [0n, 0n, 1n]],
    [[1n, 1n, 0n], [0n, 1n, 1n]],
    [[1n, 2n, 3n], [3n, -1n, 2n]],
    [[2n, -3n, 1n], [1n, 1n, -2n]],
  ];
  const usable = lines.filter(([a, b]) => {
    if (formEval(f, a as [bigint, bigint, bigint]) === 0n) return false;
    const [p, q, r, s] = formOnLine(f, a, b);
    return q * q * r * r - 4n * p * r * r * r - 4n * q * q * q * s - 27n * p * p * s * s + 18n * p * q * r * s !== 0n;
  });
  const [r, s] = [lineMeetsApprox(f, usable[0][0], usable[0][1]), lineMeetsApprox(f, usable[1][0], usable[1][1])];
  const sides = r.map((ri) => {
    let best = s[0];
    let bestRes = Infinity;
    for (const sj of s) {
      const mid = [0, 1, 2].map((k) => [ri[k][0] + 0.7 * sj[k][0], ri[k][1] + 0.7 * sj[k][1]] as C);
      const res = formEvalComplexRelative(f, mid);
      if (res < bestRes) {
        bestRes = res;
        best = sj;
      }
    }
    return ccross(ri, best);
  });
  return [complexNormalise(ccross(sides[1], sides[2])), complexNormalise(ccross(sides[0], sides[2])), complexNormalise(ccross(sides[0], sides[1]))];
}

export { cmul, cdiv };
export type { C as ComplexNumber };
