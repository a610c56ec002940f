// Changes of coordinates of P^2 by 3x3 integer matrices.
//
// Convention: formTransform(F, M) is G = F∘M, G(X) = F(M·X) for the column vector X = (X, Y, Z). A point
// P lies on G exactly when M·P lies on F (pointTransform); a line ℓ of F's plane pulls back to Mᵀℓ
// (lineTransform). Results are not made primitive unless stated: S and T of a cubic change by det(M)^4
// and det(M)^6, which a primitive normalisation would hide.
import { InvalidInput } from '../exact/errors.ts';
import { matDeterminant } from '../exact/linalg.ts';
import { primitive } from '../exact/integer.ts';
import { formMul, monomials, type Form } from './form.ts';

/** A point or line as an integer triple (src/plane/point.ts builds on the same shape). */
export type Triple3 = readonly [bigint, bigint, bigint];

export type Matrix3 = readonly [readonly [bigint, bigint, bigint], readonly [bigint, bigint, bigint], readonly [bigint, bigint, bigint]];

function checkMatrix3(m: readonly (readonly bigint[])[]): void {
  if (m.length !== 3 || m.some((r) => r.length !== 3)) throw new InvalidInput('a change of coordinates is a 3x3 matrix');
}

/** G(X) = F(M·X). */
export function formTransform(f: Form, m: Matrix3): Form {
  checkMatrix3(m);
  const d = f.degree;
  const linear: Form[] = m.map((row) => ({ degree: 1, coeffs: [row[0], row[1], row[2]] }));
  const pw = linear.map((l) => {
    const p: Form[] = [{ degree: 0, coeffs: [1n] }];
    for (let k = 1; k <= d; k++) p.push(formMul(p[k - 1], l));
    return p;
  });
  const out = new Array<bigint>(monomials(d).length).fill(0n);
  const mons = monomials(d);
  for (let k = 0; k < mons.length; k++) {
    const c = f.coeffs[k];
    if (c === 0n) continue;
    const [i, j, l] = mons[k];
    const term = formMul(formMul(pw[0][i], pw[1][j]), pw[2][l]);
    for (let r = 0; r < out.length; r++) out[r] += c * term.coeffs[r];
  }
  return { degree: d, coeffs: out };
}

export function mat3Determinant(m: Matrix3): bigint {
  checkMatrix3(m);
  return matDeterminant(m);
}

/** adj(M), so that M·adj(M) = det(M)·I; the inverse change of coordinates up to a scalar. */
export function mat3Adjugate(m: Matrix3): Matrix3 {
  checkMatrix3(m);
  const c = (i: number, j: number) => {
    const r = [0, 1, 2].filter((k) => k !== i);
    const s = [0, 1, 2].filter((k) => k !== j);
    const minor = m[r[0]][s[0]] * m[r[1]][s[1]] - m[r[0]][s[1]] * m[r[1]][s[0]];
    return (i + j) % 2 === 0 ? minor : -minor;
  };
  // adj(M)[i][j] is the cofactor of entry (j, i).
  return [
    [c(0, 0), c(1, 0), c(2, 0)],
    [c(0, 1), c(1, 1), c(2, 1)],
    [c(0, 2), c(1, 2), c(2, 2)],
  ];
}

/** M·P made primitive: the point of F's plane corresponding to P on F∘M. M must be invertible. */
export function pointTransform(p: Triple3, m: Matrix3): [bigint, bigint, bigint] {
  checkMatrix3(m);
  const v = m.map((r) => r[0] * p[0] + r[1] * p[1] + r[2] * p[2]);
  if (v.every((x) => x === 0n)) throw new InvalidInput('the matrix is singular: it sends this point to (0:0:0)');
  const [a, b, c] = primitive(v);
  return [a, b, c];
}

/** Mᵀ·ℓ made primitive: the line of F∘M's plane whose points M sends onto ℓ. M must be invertible. */
export function lineTransform(l: Triple3, m: Matrix3): [bigint, bigint, bigint] {
  checkMatrix3(m);
  const v = [0, 1, 2].map((j) => m[0][j] * l[0] + m[1][j] * l[1] + m[2][j] * l[2]);
  if (v.every((x) => x === 0n)) throw new InvalidInput('the matrix is singular: it sends this line to zero');
  const [a, b, c] = primitive(v);
  return [a, b, c];
}

/**
 * The k-th of a fixed sequence of integer matrices of determinant 1 with small entries (k = 0 is the
 * identity): callers who need coordinates in general position (no two common points with one
 * projection, no point at the v-vertex) try k = 1, 2, ... until the check they need passes.
 */
export function unimodularTrial(k: number): Matrix3 {
  if (!Number.isInteger(k) || k < 0) throw new InvalidInput(`unimodularTrial needs a whole number, got ${k}`);
  if (k === 0) return [[1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n]];
  // Lower unitriangular × upper unitriangular: det 1, entries growing slowly with k.
  const a = BigInt(k);
  const b = BigInt((k * 7 + 3) % 11) - 5n;
  const c = BigInt((k * 5 + 1) % 7) - 3n;
  const lower: Matrix3 = [[1n, 0n, 0n], [a, 1n, 0n], [b, c, 1n]];
  const upper: Matrix3 = [[1n, c, b + 1n], [0n, 1n, a - 1n], [0n, 0n, 1n]];
  return lower.map((row) => [0, 1, 2].map((j) => row[0] * upper[0][j] + row[1] * upper[1][j] + row[2] * upper[2][j])) as unknown as Matrix3;
}
