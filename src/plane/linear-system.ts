// The linear system of plane curves of degree d through given points: its dimension, a basis, and the
// special positions that change it, in words.
//
// Canonical form: the system is the kernel of the k x N evaluation matrix (row i: the monomials of
// degree d at point i, N = (d+1)(d+2)/2). `dimension` is the projective dimension (basis size − 1:
// 0 for a unique curve, 1 for a pencil, 2 for a net; −1 when no curve passes through the points); the
// basis forms are primitive and come from matKernel, so they are in echelon shape. The expected
// dimension is N − 1 − (number of distinct points); the points are in special position when they impose
// fewer conditions than that (Fulton, Algebraic Curves, §5.2; Eisenbud, Green, Harris, "Cayley–Bacharach
// theorems and conjectures", Bull. AMS 33 (1996), §1).
import { InvalidInput } from '../exact/errors.ts';
import { matKernel, matRank } from '../exact/linalg.ts';
import { formEval, formPrimitive, monomialCount, monomials, type Form } from '../poly/form.ts';
import { cross, dot, tripleIsZero, type Point } from './point.ts';

/** Degrees handled; the point count is bounded so the special-position search stays small. */
export const LINEAR_SYSTEM_MAX_DEGREE = 6;
export const LINEAR_SYSTEM_MAX_POINTS = 40;

export interface LinearSystem {
  readonly degree: number;
  /** Projective dimension: basis.length − 1. */
  readonly dimension: number;
  readonly basis: Form[];
  /** Conditions the points impose (rank of the evaluation matrix). */
  readonly conditions: number;
  readonly expectedDimension: number;
  /** True when the distinct points impose fewer conditions than their number. */
  readonly special: boolean;
  /** Groups of input indices (0-based) that name the same projective point. */
  readonly repeated: number[][];
  /** Maximal sets of more than d distinct points on one line: every curve of the system contains it. */
  readonly collinear: number[][];
  /** Maximal sets of more than 2d distinct points on one conic (d >= 3 only, no line of them): likewise. */
  readonly onConic: number[][];
  /** The above in words, for people. */
  readonly notes: string[];
}

/** The row of monomial values at p (assumes p is an integer triple). */
export function monomialRow(d: number, p: readonly bigint[]): bigint[] {
  const pw = [0, 1, 2].map((v) => {
    const a = [1n];
    for (let e = 1; e <= d; e++) a.push(a[e - 1] * p[v]);
    return a;
  });
  return monomials(d).map(([i, j, k]) => pw[0][i] * pw[1][j] * pw[2][k]);
}

const listIndices = (ix: readonly number[]) => ix.map((i) => i + 1).join(', ');

function repeatedGroups(points: readonly Point[]): { groups: number[][]; firsts: number[] } {
  const groups: number[][] = [];
  const firsts: number[] = [];
  const owner = new Array<number>(points.length).fill(-1);
  for (let i = 0; i < points.length; i++) {
    if (owner[i] >= 0) continue;
    const g = [i];
    for (let j = i + 1; j < points.length; j++) {
      if (owner[j] < 0 && tripleIsZero(cross(points[i], points[j]))) {
        owner[j] = i;
        g.push(j);
      }
    }
    firsts.push(i);
    if (g.length > 1) groups.push(g);
  }
  return { groups, firsts };
}

/** Maximal collinear subsets (indices into points, which are distinct) with at least `min` members. */
function collinearSets(points: readonly Point[], ids: readonly number[], min: number): number[][] {
  const found: number[][] = [];
  const seen = new Set<string>();
  for (let a = 0; a < ids.length; a++) {
    for (let b = a + 1; b < ids.length; b++) {
      const l = cross(points[ids[a]], points[ids[b]]);
      const on = ids.filter((id) => dot(l, points[id]) === 0n);
      const key = on.join(',');
      if (on.length >= min && !seen.has(key)) {
        seen.add(key);
        found.push(on);
      }
    }
  }
  return found;
}

/** Maximal subsets of at least `min` distinct points on one conic, found through 5-point subsets. */
function conicSets(points: readonly Point[], ids: readonly number[], min: number): number[][] {
  const found: number[][] = [];
  const seen = new Set<string>();
  const n = ids.length;
  const choose = (start: number, picked: number[]): void => {
    if (picked.length === 5) {
      const rows = picked.map((id) => monomialRow(2, points[id]));
      const ker = matKernel(rows);
      if (ker.length !== 1) return; // four on a line among them: handled by the line search
      const conic = { degree: 2, coeffs: ker[0] };
      const on = ids.filter((id) => formEval(conic, points[id]) === 0n);
      const key = on.join(',');
      if (on.length >= min && !seen.has(key)) {
        seen.add(key);
        found.push(on);
      }
      return;
    }
    for (let i = start; i < n; i++) choose(i + 1, [...picked, ids[i]]);
  };
  choose(0, []);
  return found;
}

/** Curves of degree d through the points (see the top). */
export function curvesThroughPoints(d: number, points: readonly Point[]): LinearSystem {
  if (!Number.isInteger(d) || d < 1 || d > LINEAR_SYSTEM_MAX_DEGREE) {
    throw new InvalidInput(`the degree must be a whole number from 1 to ${LINEAR_SYSTEM_MAX_DEGREE}, got ${d}`, 'degree');
  }
  if (points.length > LINEAR_SYSTEM_MAX_POINTS) {
    throw new InvalidInput(`at most ${LINEAR_SYSTEM_MAX_POINTS} points, got ${points.length}`, 'points');
  }
  points.forEach((p, i) => {
    if (p.length !== 3 || tripleIsZero(p)) throw new InvalidInput(`point ${i + 1} is not a point of the projective plane`, `point ${i + 1}`);
  });
  const N = monomialCount(d);
  const rows = points.map((p) => monomialRow(d, p));
  const kernel = matKernel(rows, N);
  const conditions = matRank(rows);
  const { groups, firsts } = repeatedGroups(points);
  const expectedDimension = Math.max(-1, N - 1 - firsts.length);
  const dimension = kernel.length - 1;
  const special = conditions < firsts.length;
  const notes: string[] = [];
  for (const g of groups) {
    notes.push(`points ${listIndices(g)} are the same point, so they count once`);
  }
  const collinear = collinearSets(points, firsts, Math.max(3, d + 1));
  for (const s of collinear) {
    notes.push(
      `points ${listIndices(s)} lie on one line: ${s.length} > ${d} points, so every curve of degree ${d} through them contains that line`,
    );
  }
  let onConic: number[][] = [];
  if (d >= 3 && firsts.length > 2 * d && firsts.length <= 12) {
    onConic = conicSets(points, firsts, 2 * d + 1).filter((s) => !collinear.some((c) => s.every((i) => c.includes(i))));
    for (const s of onConic) {
      notes.push(
        `points ${listIndices(s)} lie on one conic: ${s.length} > ${2 * d} points, so every curve of degree ${d} through them contains that conic`,
      );
    }
  }
  if (special) {
    notes.push(
      `the ${firsts.length} distinct points impose only ${conditions} conditions on curves of degree ${d}: ` +
        `dimension ${dimension} instead of the expected ${expectedDimension}`,
    );
  }
  if (dimension < 0) notes.push(`no curve of degree ${d} passes through all the points`);
  const basis = kernel.map((v) => formPrimitive({ degree: d, coeffs: v }));
  return { degree: d, dimension, basis, conditions, expectedDimension, special, repeated: groups, collinear, onConic, notes };
}
