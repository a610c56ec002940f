// Incidence checks of P^2(Q) with their exact certificates: are n points collinear, are n lines
// concurrent?
//
// Canonical answer: `holds` with, when it fails, the lexicographically first triple of indices
// (i < j < k) whose 3x3 determinant is non-zero, and that determinant (the certificate: a non-zero
// integer, so the verdict needs no tolerance); when it holds, the common line (or point) if the input
// fixes one. Points and lines are canonical triples (src/plane/point.ts); indices are 0-based.
import { InvalidInput } from '../exact/errors.ts';
import { cross, det3, dot, triple, tripleIsZero, type Line, type Point, type Triple } from './point.ts';

export interface IncidenceVerdict {
  readonly holds: boolean;
  /** When it fails: the first non-zero 3x3 minor, as indices into the input and its value. */
  readonly minor: { readonly indices: readonly [number, number, number]; readonly determinant: bigint } | null;
  /**
   * When it holds and the input has two distinct members: the common line (for points) or the common
   * point (for lines). Null when every member is the same (then there are infinitely many).
   */
  readonly common: Triple | null;
  /** Number of distinct members (projectively). */
  readonly distinct: number;
}

function checkTriples(items: readonly (readonly bigint[])[], what: string): void {
  items.forEach((t, i) => {
    if (t.length !== 3) throw new InvalidInput(`${what} ${i + 1} must have three coordinates`, `${what} ${i + 1}`);
    if (tripleIsZero(t)) throw new InvalidInput(`${what} ${i + 1} is (0:0:0), which is not in the projective plane`, `${what} ${i + 1}`);
  });
}

/** Shared by both checks (projective duality): does the rank of the n x 3 matrix stay below 3? */
function rankBelowThree(items: readonly Triple[]): IncidenceVerdict {
  const distinct: Triple[] = [];
  for (const t of items) if (!distinct.some((u) => tripleIsZero(cross(t, u)))) distinct.push(t);
  if (items.length === 0) return { holds: true, minor: null, common: null, distinct: 0 };
  // The lexicographically first non-zero minor uses index 0 (a non-zero row extends to a basis),
  // then the first row not proportional to row 0, then the first row off their join.
  const j = items.findIndex((t) => !tripleIsZero(cross(items[0], t)));
  if (j < 0) return { holds: true, minor: null, common: null, distinct: distinct.length };
  const join = cross(items[0], items[j]);
  const k = items.findIndex((t, idx) => idx > j && dot(join, t) !== 0n);
  if (k < 0) return { holds: true, minor: null, common: triple(join[0], join[1], join[2]), distinct: distinct.length };
  // No k' < j can complete (0, j') for j' < j, since those rows are proportional to row 0; and rows
  // between j and k lie on the join. So (0, j, k) is the first non-zero minor.
  return {
    holds: false,
    minor: { indices: [0, j, k], determinant: det3(items[0], items[j], items[k]) },
    common: null,
    distinct: distinct.length,
  };
}

/** Do all the points lie on one line? Fewer than three points always do. */
export function pointsCollinear(points: readonly Point[]): IncidenceVerdict {
  checkTriples(points, 'point');
  return rankBelowThree(points);
}

/** Do all the lines pass through one point? Fewer than three lines always do. */
export function linesConcurrent(lines: readonly Line[]): IncidenceVerdict {
  checkTriples(lines, 'line');
  return rankBelowThree(lines);
}
