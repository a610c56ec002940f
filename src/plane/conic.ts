// The conic through five points, with the degenerate configurations named.
//
// Canonical form: the conic is a primitive form of degree 2 (monomials X^2, XY, XZ, Y^2, YZ, Z^2); its
// kind comes from the rank of the Hessian matrix [[2a, b, c], [b, 2d, e], [c, e, 2f]] (twice the Gram
// matrix of the quadratic form): rank 3 smooth, 2 a line pair, 1 a double line (common practice;
// Fulton, Algebraic Curves, §5.1).
import { Degenerate, InvalidInput } from '../exact/errors.ts';
import { matRank } from '../exact/linalg.ts';
import type { Form } from '../poly/form.ts';
import { curvesThroughPoints } from './linear-system.ts';
import { pointPointJoin, type Line, type Point } from './point.ts';

export type ConicKind = 'smooth' | 'line pair' | 'double line';

export interface ConicThroughFive {
  readonly conic: Form;
  readonly kind: ConicKind;
  /** For a line pair: the two lines, each through at least two of the points. */
  readonly lines: Line[];
  /** Words on the configuration (three collinear points making a line pair, ...). */
  readonly notes: string[];
}

/** Rank of the symmetric matrix of a conic (assumes a degree-2 form). */
export function conicRank(f: Form): number {
  const [a, b, c, d, e, g] = f.coeffs;
  return matRank([
    [2n * a, b, c],
    [b, 2n * d, e],
    [c, e, 2n * g],
  ]);
}

/**
 * The unique conic through five points. Throws Degenerate, in words, when the five do not fix one
 * conic: repeated points or four on a line (then the conics through them form a pencil or more).
 */
export function conicThroughFive(points: readonly Point[]): ConicThroughFive {
  if (points.length !== 5) throw new InvalidInput(`a conic needs exactly five points, got ${points.length}`, 'points');
  const sys = curvesThroughPoints(2, points);
  if (sys.dimension !== 0) {
    const why = sys.notes.join('; ');
    throw new Degenerate(
      `the five points do not fix one conic: the conics through them form a family of dimension ${sys.dimension}` +
        (why ? ` (${why})` : ''),
      'points',
    );
  }
  const conic = sys.basis[0];
  const rank = conicRank(conic);
  const notes = sys.notes.slice();
  if (rank === 3) return { conic, kind: 'smooth', lines: [], notes };
  // Unique and degenerate: five distinct points, no four on a line, so one line holds exactly three
  // (sys.collinear) and the other the remaining two.
  const three = sys.collinear.find((s) => s.length === 3);
  if (rank === 2 && three) {
    const rest = [0, 1, 2, 3, 4].filter((i) => !three.includes(i));
    const lines = [pointPointJoin(points[three[0]], points[three[1]]), pointPointJoin(points[rest[0]], points[rest[1]])];
    notes.push(`so the conic is the pair of lines through points ${three.map((i) => i + 1).join(', ')} and through points ${rest.map((i) => i + 1).join(', ')}`);
    return { conic, kind: 'line pair', lines, notes };
  }
  // Not reachable for five distinct points imposing five conditions; kept as a guarded statement.
  return { conic, kind: rank === 2 ? 'line pair' : 'double line', lines: [], notes };
}
