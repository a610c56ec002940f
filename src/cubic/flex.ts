// Flexes of a plane cubic: the smooth points where the tangent meets the curve three times, which are
// the smooth points of F = 0 on its Hessian H = det(∂²F/∂Xi∂Xj) (Fulton, Algebraic Curves, §5.3 and
// Problem 5.23; Brieskorn–Knörrer, Plane Algebraic Curves, §7.3). A smooth cubic has nine distinct flexes,
// each a simple meet of F and H; over Q there are 0, 1 or 3 and over R exactly 3 (counted here, not
// assumed). A nodal cubic has 3 (the node takes multiplicity 6 of the meet), a cuspidal one 1 (the cusp
// takes 8).
//
// Canonical form: cubicHessian returns the exact determinant, not made primitive (its scale is the
// covariant's); flexes are listed as meet points (src/cubic/meet.ts), rational ones primitive and sorted
// by height.
import { InvalidInput } from '../exact/errors.ts';
import { tripleIsZero, type Point } from '../plane/point.ts';
import { formAdd, formGradientAt, formHessianMatrix, formIsZero, formMul, formScale, type Form } from '../poly/form.ts';
import { curveCurveMeet, type MeetPoint } from './meet.ts';

/** H = det of the matrix of second partials: a cubic form (zero exactly for cones: concurrent lines). */
export function cubicHessian(f: Form): Form {
  if (f.degree !== 3) throw new InvalidInput(`the Hessian here is for cubics, got degree ${f.degree}`, 'curve');
  const h = formHessianMatrix(f);
  const minor = (a: Form, b: Form, c: Form, d: Form): Form => formAdd(formMul(a, d), formScale(formMul(b, c), -1n));
  const t0 = formMul(h[0][0], minor(h[1][1], h[1][2], h[2][1], h[2][2]));
  const t1 = formMul(h[0][1], minor(h[1][0], h[1][2], h[2][0], h[2][2]));
  const t2 = formMul(h[0][2], minor(h[1][0], h[1][1], h[2][0], h[2][1]));
  return formAdd(formAdd(t0, formScale(t1, -1n)), t2);
}

export interface CubicFlexes {
  /** The rational flexes, by height. */
  readonly rational: Point[];
  /** How many distinct flexes are real (rational ones included). */
  readonly real: number;
  /** How many distinct flexes there are over C (9 smooth, 3 nodal, 1 cuspidal). */
  readonly count: number;
  /** Every flex as a meet point (exact, real algebraic, or non-real with an approximation). */
  readonly points: MeetPoint[];
  /** Null for an irreducible cubic; otherwise why "the flexes" are not a finite set, in words. */
  readonly degenerate: string | null;
}

/** The flexes of the cubic F = 0. Reducible cubics are reported in words (`degenerate`), not refused. */
export function cubicFlexes(f: Form): CubicFlexes {
  if (f.degree !== 3) throw new InvalidInput(`flexes are computed for cubics, got degree ${f.degree}`, 'curve');
  if (formIsZero(f)) throw new InvalidInput('the zero form is not a curve', 'curve');
  const h = cubicHessian(f);
  if (formIsZero(h)) {
    return {
      rational: [], real: 0, count: 0, points: [],
      degenerate: 'the Hessian vanishes identically: the cubic is three concurrent lines (or a multiple line), every point of which has a tangent meeting it three times',
    };
  }
  const meet = curveCurveMeet(f, h);
  if (meet.commonComponent) {
    return {
      rational: [], real: 0, count: 0, points: [],
      degenerate: 'the cubic contains a line (over Q or over a field extension), and every point of that line lies on the Hessian',
    };
  }
  // Without a line component the cubic is absolutely irreducible, so its one singular point (if any) is
  // rational; irrational meet points are smooth.
  const flexes = meet.points.filter((m) => !m.point || !tripleIsZero(formGradientAt(f, m.point)));
  return {
    rational: flexes.filter((m) => m.point).map((m) => m.point as Point),
    real: flexes.filter((m) => m.real).length,
    count: flexes.length,
    points: flexes,
    degenerate: null,
  };
}
