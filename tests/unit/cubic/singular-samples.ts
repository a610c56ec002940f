// Seeded singular and reducible cubics with a known configuration: a normal form of our own with random
// parameters, moved by a random unimodular change of coordinates, together with what its singular points
// must be (transported by the inverse matrix). Shared by the unit tests and tests/reference.
import { formPrimitive, type Form } from '../../../src/poly/form.ts';
import { formTransform, mat3Adjugate, pointTransform, type Matrix3 } from '../../../src/poly/transform.ts';
import { formParse } from '../../../src/poly/parse.ts';
import type { Point } from '../../../src/plane/point.ts';

export interface SingularSample {
  readonly family: string;
  readonly curve: Form;
  /** Expected configuration (src/cubic/factor.ts shape). */
  readonly shape: string;
  /** Expected rational singular points with their kind, in no particular order. */
  readonly rational: readonly { point: Point; kind: string; split?: boolean; realKind?: string }[];
  /** Expected number of singular points over C (isolated ones), or -1 for a singular line. */
  readonly count: number;
  readonly matrix: Matrix3;
}

function randInt(rand: () => number, lo: number, hi: number): bigint {
  return BigInt(lo + Math.floor(rand() * (hi - lo + 1)));
}

function nonZero(rand: () => number, lo: number, hi: number): bigint {
  for (;;) {
    const v = randInt(rand, lo, hi);
    if (v !== 0n) return v;
  }
}

/** A unimodular matrix: a product of a lower and an upper unitriangular matrix and a permutation. */
export function randomUnimodular(rand: () => number, size = 3): Matrix3 {
  const r = () => randInt(rand, -size, size);
  const lower = [[1n, 0n, 0n], [r(), 1n, 0n], [r(), r(), 1n]];
  const upper = [[1n, r(), r()], [0n, 1n, r()], [0n, 0n, 1n]];
  const prod = lower.map((row) => [0, 1, 2].map((j) => row[0] * upper[0][j] + row[1] * upper[1][j] + row[2] * upper[2][j]));
  const perm = [[0, 1, 2], [1, 2, 0], [2, 0, 1], [0, 2, 1]][Math.floor(rand() * 4)];
  return perm.map((i) => prod[i]) as unknown as Matrix3;
}

const cubic = (text: string): Form => formParse(text).form;
const lineText = (a: bigint, b: bigint, c: bigint) => `(${a}X + ${b}Y + ${c}Z)`;

function isSquare(n: bigint): boolean {
  if (n < 0n) return false;
  const r = BigInt(Math.round(Math.sqrt(Number(n))));
  return r * r === n;
}

/** One sample of each family in turn; `k` picks the family. */
export function singularSample(rand: () => number, k: number): SingularSample {
  const families = [
    () => {
      // y² = x²(x + c) shifted: a node at (h, 0); split iff c is a square, acnode iff c < 0.
      const c = nonZero(rand, -30, 30);
      const h = randInt(rand, -5, 5);
      const f = cubic(`Y^2 Z = (X - ${h}Z)^2 (X - ${h}Z + ${c}Z)`);
      return { family: 'node', f, shape: 'irreducible', rational: [{ point: [h, 0n, 1n] as Point, kind: 'node', split: isSquare(c), realKind: c > 0n ? 'crunode' : 'acnode' }], count: 1 };
    },
    () => {
      // A node with the mixed term: y² + a xy = x³ + b x² (node at the origin, cone y² + axy − bx²).
      const a = randInt(rand, -6, 6);
      let b = nonZero(rand, -20, 20);
      while (a * a + 4n * b === 0n) b += 1n;
      const disc = a * a + 4n * b;
      const f = cubic(`Y^2 Z + ${a} X Y Z = X^3 + ${b} X^2 Z`);
      return { family: 'node (mixed)', f, shape: 'irreducible', rational: [{ point: [0n, 0n, 1n] as Point, kind: 'node', split: isSquare(disc), realKind: disc > 0n ? 'crunode' : 'acnode' }], count: 1 };
    },
    () => {
      // a y² = b (x − h)³: a cusp at (h, 0).
      const a = nonZero(rand, -9, 9);
      const b = nonZero(rand, -9, 9);
      const h = randInt(rand, -4, 4);
      const f = cubic(`${a} Y^2 Z = ${b} (X - ${h}Z)^3`);
      return { family: 'cusp', f, shape: 'irreducible', rational: [{ point: [h, 0n, 1n] as Point, kind: 'cusp' }], count: 1 };
    },
    () => {
      // Conic x² + p y² = q z² (q > 0, p > 0) and the line y = 0: meets at x² = q z².
      const p = nonZero(rand, 1, 9);
      const q = nonZero(rand, 1, 30);
      const f = cubic(`Y (X^2 + ${p} Y^2 - ${q} Z^2)`);
      const split = isSquare(q);
      const r = BigInt(Math.round(Math.sqrt(Number(q))));
      return {
        family: 'conic + secant line', f, shape: 'line and conic',
        rational: split ? [{ point: [r, 0n, 1n] as Point, kind: 'node' }, { point: [r, 0n, -1n] as Point, kind: 'node' }] : [],
        count: 2,
      };
    },
    () => {
      // The conic yz = x² + a xz and its tangent y = 0 at (0:0:1)... tangent at the origin is y = a x.
      const a = randInt(rand, -5, 5);
      const f = cubic(`(Y - ${a} X) (Y Z - X^2 - ${a} X Z)`);
      return { family: 'conic + tangent line', f, shape: 'line and tangent conic', rational: [{ point: [0n, 0n, 1n] as Point, kind: 'tacnode' }], count: 1 };
    },
    () => {
      // Three general lines: X, Y and a third through neither (0:0:1) nor the other two vertices.
      const a = nonZero(rand, -7, 7);
      const b = nonZero(rand, -7, 7);
      const c = nonZero(rand, -7, 7);
      const f = cubic(`X Y ${lineText(a, b, c)}`);
      const pts: Point[] = [[0n, 0n, 1n], [0n, c, -b], [c, 0n, -a]];
      return { family: 'three lines', f, shape: 'three lines', rational: pts.map((point) => ({ point, kind: 'node', split: true })), count: 3 };
    },
    () => {
      // Three concurrent rational lines through the origin.
      const a = nonZero(rand, -7, 7);
      const b = nonZero(rand, -7, 7);
      const f = cubic(`X Y (${a} X + ${b} Y)`);
      return { family: 'three concurrent lines', f, shape: 'three concurrent lines', rational: [{ point: [0n, 0n, 1n] as Point, kind: 'triple point' }], count: 1 };
    },
    () => {
      // Line and a conjugate pair x² = d y² (d not a square), the line missing the vertex.
      let d = nonZero(rand, -12, 12);
      while (isSquare(d)) d += 1n;
      const c = nonZero(rand, 1, 6);
      const f = cubic(`(X^2 - ${d} Y^2) (Z - ${c} X)`);
      return { family: 'line + conjugate pair', f, shape: 'line and conjugate line pair', rational: [{ point: [0n, 0n, 1n] as Point, kind: 'node', split: false, realKind: d > 0n ? 'crunode' : 'acnode' }], count: 3 };
    },
    () => {
      // Double line and line.
      const a = nonZero(rand, -7, 7);
      const f = cubic(`(X - ${a} Z)^2 (Y + X)`);
      return { family: 'double line + line', f, shape: 'double line and line', rational: [], count: -1 };
    },
    () => {
      const a = nonZero(rand, -7, 7);
      const b = randInt(rand, -7, 7);
      const f = cubic(`(X + ${a} Y + ${b} Z)^3`);
      return { family: 'triple line', f, shape: 'triple line', rational: [], count: -1 };
    },
    () => {
      // Three lines conjugate over a cubic field, concurrent: x³ = d y³ with d not a cube.
      const d = [2n, 3n, 5n, 6n, 7n, 10n, -2n, -3n][Math.floor(rand() * 8)];
      const f = cubic(`X^3 - ${d} Y^3`);
      return { family: 'conjugate concurrent lines', f, shape: 'three conjugate concurrent lines', rational: [{ point: [0n, 0n, 1n] as Point, kind: 'triple point' }], count: 1 };
    },
    () => {
      // Three lines conjugate over Q(∛d), not concurrent: the norm of X + αY + α²Z for α³ = d is
      // X³ + dY³ + d²Z³ − 3dXYZ (common practice: the norm form of a pure cubic field).
      const d = [2n, 3n, 5n, 6n, 7n, 10n, -2n, -3n][Math.floor(rand() * 8)];
      const f = cubic(`X^3 + ${d} Y^3 + ${d * d} Z^3 - ${3n * d} X Y Z`);
      return { family: 'conjugate triangle', f, shape: 'three conjugate lines', rational: [], count: 3 };
    },
  ];
  const fam = families[k % families.length]();
  const m = randomUnimodular(rand);
  const adj = mat3Adjugate(m);
  const curve = formPrimitive(formTransform(fam.f, m));
  const rational = fam.rational.map((r) => ({ ...r, point: pointTransform(r.point, adj) as Point }));
  return { family: fam.family, curve, shape: fam.shape, rational, count: fam.count, matrix: m };
}

export const SAMPLE_FAMILIES = 12;

