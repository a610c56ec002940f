// Nine points and cubics: the ninth base point of the pencil of cubics through eight points, and the
// nine-point check (does every cubic through eight of them pass through the ninth?), with the special
// positions that change the answer named in words.
//
// Cayley–Bacharach (Eisenbud, Green, Harris, "Cayley–Bacharach theorems and conjectures", Bull. AMS 33
// (1996), §1, Chasles' theorem): if two cubics meet in nine points, every cubic through eight of them
// passes through the ninth. Eight points in general position impose independent conditions, so the
// cubics through them form a pencil whose base locus is those eight plus one more, the ninth point.
// Four on a line or seven on a conic make that line or conic a fixed component of the pencil; repeated
// points or a net (dimension 2) leave no ninth point at all.
//
// Canonical form: points are primitive triples; `reason` is one sentence for people; the pencil's basis
// is E2's (src/plane/linear-system.ts), primitive and in echelon shape.
//
// Method for the ninth point (MATH.md): in coordinates where the projection centre C = (0:1:0) lies on
// neither generator, Res_Y(F1, F2) is a binary nonic whose roots are the projections of the nine base
// points with multiplicity (Fulton, Algebraic Curves, §5.1; from memory); dividing out the eight known
// linear factors exactly leaves one linear form, the ninth point's projection, and the two generators
// restricted to that line have the ninth point as their only common root unless another base point
// shares the line (then the next coordinates are tried).
import { InvalidInput, NinefoldError } from '../exact/errors.ts';
import { upolyDegree, upolyDivExact, upolyGcd, upolyMul, upolySquarefreePart, type UPoly } from '../exact/upoly.ts';
import { formEval, monomialIndex, type Form } from '../poly/form.ts';
import { formResultant } from '../poly/resultant.ts';
import { formOnLine } from '../poly/substitute.ts';
import { formTransform, mat3Adjugate, pointTransform, unimodularTrial, type Matrix3 } from '../poly/transform.ts';
import { curvesThroughPoints, type LinearSystem } from '../plane/linear-system.ts';
import { tripleIsZero, tripleProportional, type Point } from '../plane/point.ts';

export interface NinthPoint {
  /** The ninth base point, or null when the eight points do not fix one. */
  readonly point: Point | null;
  /** In words: what the point is, or why there is none. */
  readonly reason: string;
  /** 1-based index of the given point the ninth coincides with (a double base point), or null. */
  readonly coincidesWith: number | null;
  /** Projective dimension of the cubics through the eight points (1 in general position). */
  readonly dimension: number;
  /** A basis of those cubics. */
  readonly pencil: Form[];
  /** Special positions found by the linear system, in words. */
  readonly notes: string[];
}

const TRIALS = 40;

function requirePoints(points: readonly Point[], n: number): void {
  if (points.length !== n) throw new InvalidInput(`expected ${n} points, got ${points.length}`, 'points');
  points.forEach((p, i) => {
    if (p.length !== 3 || tripleIsZero(p)) throw new InvalidInput(`point ${i + 1} is not a point of the projective plane`, `point ${i + 1}`);
  });
}

function trimmed(b: readonly bigint[]): UPoly {
  const out = b.slice();
  while (out.length > 0 && out[out.length - 1] === 0n) out.pop();
  return out;
}

/**
 * The ninth base point of the pencil F1, F2 whose base locus contains the eight distinct points `known`.
 * Returns null when the pencil has a fixed component. Assumes F1, F2 independent cubics through `known`.
 */
export function pencilNinthPoint(f1: Form, f2: Form, known: readonly Point[]): Point | null {
  for (let k = 1; k <= TRIALS; k++) {
    const m: Matrix3 = unimodularTrial(k);
    const a = formTransform(f1, m);
    const b = formTransform(f2, m);
    if (a.coeffs[monomialIndex(3, 0, 3)] === 0n || b.coeffs[monomialIndex(3, 0, 3)] === 0n) continue;
    const res = formResultant(a, b, 1);
    if (res.every((c) => c === 0n)) return null; // C on neither curve: a common component
    // Each known point P' = M^-1·P contributes the linear factor z'·X − x'·Z, i.e. [z', −x'] in the
    // coefficient order of binary forms (coefficient i of X^(d−i) Z^i), multiplied as coefficient arrays.
    const inv = mat3Adjugate(m);
    let product: UPoly = [1n];
    for (const p of known) {
      const q = pointTransform(p, inv);
      product = upolyMul(product, trimmed([q[2], -q[0]]));
    }
    const rest = upolyDivExact(trimmed(res), product);
    const lin = [rest[0] ?? 0n, rest[1] ?? 0n];
    if (lin[0] === 0n && lin[1] === 0n) throw new NinefoldError('internal: the ninth projection vanished');
    const base = [-lin[1], 0n, lin[0]]; // (x9 : 0 : z9) with lin[0]·x9 + lin[1]·z9 = 0
    const common = upolySquarefreePart(upolyGcd(trimmed(formOnLine(a, base, [0n, 1n, 0n])), trimmed(formOnLine(b, base, [0n, 1n, 0n]))));
    if (upolyDegree(common) !== 1) continue; // another base point on the same line through C
    const [c0, c1] = common;
    return pointTransform([c1 * base[0], -c0, c1 * base[2]], m);
  }
  throw new NinefoldError(`could not separate the base points of the pencil by projection (${TRIALS} coordinate changes tried)`, 'points');
}

function describeSystem(sys: LinearSystem): string {
  const words = sys.notes.filter((n) => !n.startsWith('the '));
  return words.length > 0 ? ` (${words.join('; ')})` : '';
}

/** The ninth point of the pencil of cubics through eight points, or the reason there is none. */
export function ninthPoint(points8: readonly Point[]): NinthPoint {
  requirePoints(points8, 8);
  const sys = curvesThroughPoints(3, points8);
  const base = { dimension: sys.dimension, pencil: sys.basis, notes: sys.notes };
  if (sys.repeated.length > 0) {
    return { ...base, point: null, coincidesWith: null, reason: `the eight points are not distinct${describeSystem(sys)}, so they do not fix a pencil of cubics` };
  }
  if (sys.dimension !== 1) {
    return {
      ...base, point: null, coincidesWith: null,
      reason: `the cubics through the eight points form a family of dimension ${sys.dimension}, not a pencil${describeSystem(sys)}, so there is no ninth base point`,
    };
  }
  const p = pencilNinthPoint(sys.basis[0], sys.basis[1], points8);
  if (!p) {
    return {
      ...base, point: null, coincidesWith: null,
      reason: `every cubic through the eight points contains a common component${describeSystem(sys)}, so the base locus is a curve, not nine points`,
    };
  }
  const same = points8.findIndex((q) => tripleProportional(p, q));
  if (same >= 0) {
    return {
      ...base, point: p, coincidesWith: same + 1,
      reason: `the ninth base point coincides with point ${same + 1}: every cubic through the eight is tangent there to one line, so it counts twice`,
    };
  }
  return { ...base, point: p, coincidesWith: null, reason: 'the ninth base point of the pencil of cubics through the eight points (Cayley–Bacharach)' };
}

export interface NineCheck {
  /** Projective dimension of the cubics through all nine points. */
  readonly dimension: number;
  /** Does every cubic through the first eight pass through the ninth? */
  readonly holds: boolean;
  /** For each i (0-based), does every cubic through the other eight pass through point i + 1? */
  readonly each: boolean[];
  readonly reason: string;
  readonly notes: string[];
}

/** Through all of `others`, does every cubic pass through p? (Every basis form vanishes at p.) */
function forcedThrough(sys: LinearSystem, p: Point): boolean {
  return sys.basis.every((f) => formEval(f, p) === 0n);
}

/** The nine-point check of Cayley–Bacharach on nine given points, with special positions in words. */
export function nineCheck(points9: readonly Point[]): NineCheck {
  requirePoints(points9, 9);
  const all = curvesThroughPoints(3, points9);
  const each = points9.map((p, i) => forcedThrough(curvesThroughPoints(3, points9.filter((_q, j) => j !== i)), p));
  const eight = curvesThroughPoints(3, points9.slice(0, 8));
  const holds = each[8];
  const notes = all.notes.slice();
  let reason: string;
  if (all.repeated.length > 0) {
    reason = `the nine points are not distinct${describeSystem(all)}`;
  } else if (eight.dimension === 1 && holds) {
    reason = each.every((e) => e)
      ? 'every cubic through any eight of the points passes through the remaining one: the nine are the base points of a pencil (Cayley–Bacharach)'
      : 'point 9 is the ninth base point of the pencil of cubics through points 1–8 (Cayley–Bacharach)';
  } else if (eight.dimension === 1) {
    const ninth = ninthPoint(points9.slice(0, 8));
    reason = ninth.point
      ? `the pencil of cubics through points 1–8 has its ninth base point at ${ninth.point.join(':')}, not at point 9`
      : `the cubics through points 1–8 form a pencil with no ninth base point: ${ninth.reason}`;
  } else {
    reason =
      `points 1–8 are in special position: the cubics through them form a family of dimension ${eight.dimension}${describeSystem(eight)}` +
      (holds ? ', and every one of them passes through point 9' : ', and not all of them pass through point 9');
  }
  return { dimension: all.dimension, holds, each, reason, notes };
}
