// Exact linear algebra over Z (and Q, by clearing each row): rank, determinant and kernel by
// fraction-free elimination (Bareiss, "Sylvester's identity and multistep integer-preserving Gaussian
// elimination", Math. Comp. 22 (1968)).
//
// Canonical form: a matrix is an array of rows of bigints, all rows of one length (`cols`). A kernel
// basis is a list of primitive integer vectors (content 1, first non-zero entry positive), one per free
// column of the reduced echelon form, in increasing order of that column; the vector for free column f
// has a non-zero entry at f and zeros at every other free column.
//
// Why fraction-free: in Bareiss's scheme every entry after step k is a (k+1)x(k+1) minor of the input, so
// the divisions by the previous pivot are exact and the entries never grow beyond Hadamard's bound. The
// Gauss-Jordan variant used for kernels keeps the same property (every entry is again a minor).
import { InvalidInput, NinefoldError } from './errors.ts';
import { lcm, primitive } from './integer.ts';
import { rat, type Rational } from './rational.ts';

export type IntMatrix = readonly (readonly bigint[])[];

/** The reduced echelon form d·[I | R] (up to column order) of a matrix, computed fraction-free. */
export interface Echelon {
  /** rows[0..rank-1] are the non-zero rows; rows[i][pivots[i]] = pivotValue for every i. */
  readonly rows: bigint[][];
  readonly pivots: number[];
  readonly rank: number;
  /** The common value of the pivots: ± the leading rank x rank minor on the pivot rows and columns. */
  readonly pivotValue: bigint;
  readonly cols: number;
}

/** Number of columns, checking that the rows agree. `cols` is required when there are no rows. */
function matShape(m: IntMatrix, cols?: number): number {
  const c = cols ?? (m.length > 0 ? m[0].length : 0);
  for (let i = 0; i < m.length; i++) {
    if (m[i].length !== c) {
      throw new InvalidInput(`matrix row ${i + 1} has ${m[i].length} entries, expected ${c}`, `row ${i + 1}`);
    }
  }
  return c;
}

function exactDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  // Guards the Bareiss invariant; a failure here is a bug in this module, not bad input.
  if (q * b !== a) throw new NinefoldError('internal error: inexact Bareiss division', 'linalg');
  return q;
}

/**
 * Fraction-free Gauss-Jordan elimination. Pivots are chosen as the first non-zero entry in the column
 * (smallest absolute value among candidates, to keep entries small in practice).
 */
export function matEchelon(m: IntMatrix, cols?: number): Echelon {
  const n = matShape(m, cols);
  const a = m.map((r) => r.slice());
  const pivots: number[] = [];
  let prev = 1n;
  let r = 0;
  for (let c = 0; c < n && r < a.length; c++) {
    let best = -1;
    let bestAbs = 0n;
    for (let i = r; i < a.length; i++) {
      const v = a[i][c];
      if (v === 0n) continue;
      const av = v < 0n ? -v : v;
      if (best < 0 || av < bestAbs) {
        best = i;
        bestAbs = av;
      }
    }
    if (best < 0) continue;
    if (best !== r) [a[best], a[r]] = [a[r], a[best]];
    const pr = a[r];
    const p = pr[c];
    for (let i = 0; i < a.length; i++) {
      if (i === r) continue;
      const row = a[i];
      const f = row[c];
      if (f === 0n) {
        if (p !== prev) for (let j = 0; j < n; j++) if (row[j] !== 0n) row[j] = exactDiv(p * row[j], prev);
        continue;
      }
      for (let j = 0; j < n; j++) row[j] = exactDiv(p * row[j] - f * pr[j], prev);
    }
    pivots.push(c);
    prev = p;
    r++;
  }
  return { rows: a.slice(0, r), pivots, rank: r, pivotValue: r > 0 ? prev : 1n, cols: n };
}

/** Rank over Q of an integer matrix (Bareiss forward elimination). */
export function matRank(m: IntMatrix): number {
  const n = matShape(m);
  const a = m.map((r) => r.slice());
  let prev = 1n;
  let r = 0;
  for (let c = 0; c < n && r < a.length; c++) {
    let piv = -1;
    for (let i = r; i < a.length; i++) {
      if (a[i][c] !== 0n) {
        piv = i;
        break;
      }
    }
    if (piv < 0) continue;
    if (piv !== r) [a[piv], a[r]] = [a[r], a[piv]];
    const pr = a[r];
    const p = pr[c];
    for (let i = r + 1; i < a.length; i++) {
      const row = a[i];
      const f = row[c];
      for (let j = c + 1; j < n; j++) row[j] = exactDiv(p * row[j] - f * pr[j], prev);
      row[c] = 0n;
    }
    prev = p;
    r++;
  }
  return r;
}

/** Determinant of a square integer matrix (Bareiss; the last pivot is the determinant). det of 0x0 is 1. */
export function matDeterminant(m: IntMatrix): bigint {
  const n = matShape(m);
  if (m.length !== n) throw new InvalidInput(`a determinant needs a square matrix, got ${m.length} x ${n}`, 'matrix');
  if (n === 0) return 1n;
  const a = m.map((r) => r.slice());
  let prev = 1n;
  let sign = 1n;
  for (let k = 0; k < n; k++) {
    let piv = -1;
    for (let i = k; i < n; i++) {
      if (a[i][k] !== 0n) {
        piv = i;
        break;
      }
    }
    if (piv < 0) return 0n;
    if (piv !== k) {
      [a[piv], a[k]] = [a[k], a[piv]];
      sign = -sign;
    }
    const pr = a[k];
    const p = pr[k];
    for (let i = k + 1; i < n; i++) {
      const row = a[i];
      const f = row[k];
      for (let j = k + 1; j < n; j++) row[j] = exactDiv(p * row[j] - f * pr[j], prev);
      row[k] = 0n;
    }
    prev = p;
  }
  return sign * a[n - 1][n - 1];
}

/**
 * A basis of the right kernel {x in Q^cols : M x = 0} as primitive integer vectors (see the canonical
 * form above). `cols` is needed only for a matrix with no rows (whose kernel is all of Q^cols).
 */
export function matKernel(m: IntMatrix, cols?: number): bigint[][] {
  const e = matEchelon(m, cols);
  const isPivot = new Array<number>(e.cols).fill(-1);
  e.pivots.forEach((c, i) => (isPivot[c] = i));
  const basis: bigint[][] = [];
  for (let f = 0; f < e.cols; f++) {
    if (isPivot[f] >= 0) continue;
    // Row i reads d·x_{p_i} + sum_free R[i][g] x_g = 0; set x_f = d and the other free values to 0.
    const v = new Array<bigint>(e.cols).fill(0n);
    v[f] = e.pivotValue;
    for (let i = 0; i < e.rank; i++) v[e.pivots[i]] = -e.rows[i][f];
    basis.push(primitive(v));
  }
  return basis;
}

/** M·v for an integer matrix and vector. */
export function matMulVec(m: IntMatrix, v: readonly bigint[]): bigint[] {
  return m.map((row, i) => {
    if (row.length !== v.length) {
      throw new InvalidInput(`matrix row ${i + 1} has ${row.length} entries, the vector ${v.length}`, `row ${i + 1}`);
    }
    let s = 0n;
    for (let j = 0; j < row.length; j++) s += row[j] * v[j];
    return s;
  });
}

/** M·N for integer matrices. */
export function matMul(m: IntMatrix, n: IntMatrix): bigint[][] {
  const inner = matShape(n);
  return m.map((row, i) => {
    if (row.length !== n.length) throw new InvalidInput(`matrix product: row ${i + 1} has ${row.length} entries, expected ${n.length}`, `row ${i + 1}`);
    const out = new Array<bigint>(inner).fill(0n);
    for (let k = 0; k < row.length; k++) {
      const a = row[k];
      if (a === 0n) continue;
      const nk = n[k];
      for (let j = 0; j < inner; j++) out[j] += a * nk[j];
    }
    return out;
  });
}

/**
 * Clear a rational matrix row by row: row i is multiplied by the lcm of its denominators. Rank and kernel
 * are unchanged; `scales[i]` is that lcm, so det(M) = det(result) / prod(scales).
 */
export function matClearRows(m: readonly (readonly Rational[])[]): { matrix: bigint[][]; scales: bigint[] } {
  const scales: bigint[] = [];
  const matrix = m.map((row) => {
    const l = row.reduce((acc, q) => lcm(acc, q.den), 1n);
    scales.push(l);
    return row.map((q) => (q.num * l) / q.den);
  });
  return { matrix, scales };
}

/** Rank over Q of a rational matrix (rows cleared first; clearing a row does not change the rank). */
export function matRankRational(m: readonly (readonly Rational[])[]): number {
  return matRank(matClearRows(m).matrix);
}

/** Kernel of a rational matrix as primitive integer vectors (clearing rows keeps the kernel). */
export function matKernelRational(m: readonly (readonly Rational[])[], cols?: number): bigint[][] {
  return matKernel(matClearRows(m).matrix, cols);
}

/** Determinant of a square rational matrix: det of the cleared matrix divided by the row scales. */
export function matDeterminantRational(m: readonly (readonly Rational[])[]): Rational {
  const { matrix, scales } = matClearRows(m);
  return rat(matDeterminant(matrix), scales.reduce((a, b) => a * b, 1n));
}
