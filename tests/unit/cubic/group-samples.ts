// Seeded sample cubics for the group-law, Weierstrass and invariant tests and the benchmark: random
// cubics through chosen rational points (the kernel of the point-evaluation matrix), random unimodular
// changes of coordinates, and Weierstrass models carried to general cubics by them.
import { randomBigInt } from '../../reference/oracles.ts';
import { matKernel } from '../../../src/exact/linalg.ts';
import { formEval, formPrimitive, monomials, type Form } from '../../../src/poly/form.ts';
import { triple, type Point } from '../../../src/plane/point.ts';
import { mat3Adjugate, pointTransform, type Matrix3 } from '../../../src/poly/transform.ts';

export type { Matrix3 };
import { cubicInvariants } from '../../../src/cubic/invariants.ts';


export function randomPoint(rand: () => number, digits = 1): Point {
  for (;;) {
    const v = [randomBigInt(rand, digits), randomBigInt(rand, digits), randomBigInt(rand, digits)];
    if (v.some((x) => x !== 0n)) return triple(v[0], v[1], v[2]);
  }
}

/** A random cubic through the given points (a random integer combination of the kernel basis). */
export function randomCubicThrough(rand: () => number, points: readonly Point[], digits = 1): Form {
  const ms = monomials(3);
  const rows = points.map((p) => ms.map((m) => p[0] ** BigInt(m[0]) * p[1] ** BigInt(m[1]) * p[2] ** BigInt(m[2])));
  const basis = rows.length === 0 ? ms.map((_, k) => ms.map((__, i) => (i === k ? 1n : 0n))) : matKernel(rows, 10);
  for (;;) {
    const c = new Array<bigint>(10).fill(0n);
    for (const b of basis) {
      const s = randomBigInt(rand, digits);
      for (let k = 0; k < 10; k++) c[k] += s * b[k];
    }
    if (c.some((x) => x !== 0n)) return formPrimitive({ degree: 3, coeffs: c });
  }
}

/** A random smooth cubic through the given points. */
export function randomSmoothCubicThrough(rand: () => number, points: readonly Point[], digits = 1): Form {
  for (;;) {
    const f = randomCubicThrough(rand, points, digits);
    if (cubicInvariants(f).discriminant.num !== 0n && points.every((p) => formEval(f, p) === 0n)) return f;
  }
}

/** A random matrix of determinant 1: a product of elementary matrices with small entries. */
export function randomUnimodular(rand: () => number, steps = 4, size = 3): Matrix3 {
  let m: bigint[][] = [[1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n]];
  for (let k = 0; k < steps; k++) {
    const i = Math.floor(rand() * 3);
    let j = Math.floor(rand() * 2);
    if (j >= i) j++;
    const c = BigInt(Math.floor(rand() * (2 * size + 1)) - size);
    m = m.map((row, r) => (r === i ? row.map((x, col) => x + c * m[j][col]) : row));
  }
  return m as unknown as Matrix3;
}

/** The point of F∘M that M carries to p on F: adj(M)·p made primitive (M invertible). */
export function pointPullBack(m: Matrix3, p: Point): Point {
  const [a, b, c] = pointTransform(p, mat3Adjugate(m));
  return [a, b, c];
}

/** The homogeneous Weierstrass cubic Y²Z + a1XYZ + a3YZ² − X³ − a2X²Z − a4XZ² − a6Z³. */
export function weierstrassCubic(a: readonly bigint[]): Form {
  const [a1, a2, a3, a4, a6] = a;
  const c = new Array<bigint>(10).fill(0n);
  const idx = (i: number, j: number) => monomials(3).findIndex((m) => m[0] === i && m[1] === j);
  c[idx(0, 2)] += 1n;
  c[idx(1, 1)] += a1;
  c[idx(0, 1)] += a3;
  c[idx(3, 0)] -= 1n;
  c[idx(2, 0)] -= a2;
  c[idx(1, 0)] -= a4;
  c[idx(0, 0)] -= a6;
  return { degree: 3, coeffs: c };
}

/** F as a GP polynomial in x, y (Z = 1), for ellfromeqn. */
export function cubicToGp(f: Form): string {
  return monomials(3).map((m, k) => `(${f.coeffs[k]})*x^${m[0]}*y^${m[1]}`).join('+');
}
