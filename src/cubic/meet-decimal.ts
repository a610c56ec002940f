// Correctly rounded decimals of an irrational real meet point, to any number of significant digits: the
// coordinates are rational functions of the real algebraic α that describes the point (meet.ts), so
// refining α's isolating interval and evaluating in rational interval arithmetic decides the digits.
// A digit string is printed only once both ends of the coordinate's interval round to it
// (src/exact/decimal.ts, intervalToDecimal), and a coordinate that is exactly zero is decided exactly.
//
// Canonical form: ratios to one coordinate — affine (x, y) = (X/Z, Y/Z) when Z != 0, and always the
// projective triple scaled so that its coordinate of largest size is 1.
import { NinefoldError, InvalidInput } from '../exact/errors.ts';
import { algebraicRefine, type RealAlgebraic } from '../exact/algebraic.ts';
import { intervalToDecimal } from '../exact/decimal.ts';
import { rat, ratAdd, ratCmp, ratDiv, ratMul, type Rational } from '../exact/rational.ts';
import { upolyAdd, upolyGcd, upolyMul, upolyScale, upolySignAt, upolyDegree, type UPoly } from '../exact/upoly.ts';
import type { AlgebraicMeetPoint } from './meet.ts';

export interface MeetPointDecimals {
  /** (X/Z, Y/Z) to the digits asked for, or null when the point is at infinity (Z = 0 exactly). */
  readonly affine: readonly [string, string] | null;
  /** (X : Y : Z) divided by its largest coordinate (that one printed as "1"). */
  readonly projective: readonly [string, string, string];
}

type Interval = readonly [Rational, Rational];

function iMul(a: Interval, b: Interval): Interval {
  const p = [ratMul(a[0], b[0]), ratMul(a[0], b[1]), ratMul(a[1], b[0]), ratMul(a[1], b[1])];
  let lo = p[0];
  let hi = p[0];
  for (const x of p) {
    if (ratCmp(x, lo) < 0) lo = x;
    if (ratCmp(x, hi) > 0) hi = x;
  }
  return [lo, hi];
}

// Horner in interval arithmetic: an enclosure of p over [lo, hi].
function iEval(p: UPoly, x: Interval): Interval {
  let r: Interval = [rat(0), rat(0)];
  for (let i = p.length - 1; i >= 0; i--) {
    const m = iMul(r, x);
    const c = rat(p[i]);
    r = [ratAdd(m[0], c), ratAdd(m[1], c)];
  }
  return r;
}

function iDiv(a: Interval, b: Interval): Interval | null {
  if (ratCmp(b[0], rat(0)) <= 0 && ratCmp(b[1], rat(0)) >= 0) return null;
  return iMul(a, [ratDiv(rat(1), b[1]), ratDiv(rat(1), b[0])]);
}

// Is q(α) = 0? Exactly, through g = gcd(α.poly, q), which divides the square-free α.poly (so g is non-zero
// at α's interval ends and has at most the simple root α inside).
function vanishesAt(alpha: RealAlgebraic, q: UPoly): boolean {
  if (q.length === 0) return true;
  const g = upolyGcd(alpha.poly, q);
  if (upolyDegree(g) < 1) return false;
  if (ratCmp(alpha.lo, alpha.hi) === 0) return upolySignAt(g, alpha.lo) === 0;
  return upolySignAt(g, alpha.lo) * upolySignAt(g, alpha.hi) < 0;
}

/** Coordinates as polynomials N_k(α) over a common denominator (which cancels in every ratio). */
function numerators(ap: AlgebraicMeetPoint): UPoly[] {
  if (ap.kind === 'line') return [0, 1, 2].map((k) => trim([ap.q[k], ap.p[k]]));
  const m = ap.frame;
  return [0, 1, 2].map((k) => upolyAdd(upolyMul(trim([m[k][2], m[k][0]]), ap.yDen), upolyScale(ap.yNum, m[k][1])));
}

function trim(p: bigint[]): UPoly {
  while (p.length > 0 && p[p.length - 1] === 0n) p.pop();
  return p;
}

/** The point's coordinates to `digits` significant digits, correctly rounded. */
export function algebraicMeetPointDecimals(ap: AlgebraicMeetPoint, digits: number): MeetPointDecimals {
  if (!Number.isInteger(digits) || digits < 1 || digits > 1000) throw new InvalidInput(`digits must be a whole number from 1 to 1000, got ${digits}`, 'digits');
  const num = numerators(ap);
  const zero = num.map((p) => vanishesAt(ap.alpha, p));
  if (zero.every((z) => z)) throw new NinefoldError('internal: a meet point with all coordinates zero');
  let alpha = ap.alpha;
  let bits = 4 * digits + 64;
  for (let round = 0; round < 6; round++, bits *= 2) {
    alpha = algebraicRefine(alpha, { num: 1n, den: 1n << BigInt(bits) });
    const box: Interval = [alpha.lo, alpha.hi];
    const vals = num.map((p) => iEval(p, box));
    // The chart: the non-zero coordinate whose enclosure is farthest from 0.
    const size = (v: Interval): Rational => (ratCmp(v[0], rat(0)) > 0 ? v[0] : ratCmp(v[1], rat(0)) < 0 ? rat(-v[1].num, v[1].den) : rat(0));
    let k = -1;
    for (let j = 0; j < 3; j++) if (!zero[j] && (k < 0 || ratCmp(size(vals[j]), size(vals[k])) > 0)) k = j;
    const ratio = (j: number, over: number): string | null => {
      if (j === over) return '1';
      if (zero[j]) return '0';
      const q = iDiv(vals[j], vals[over]);
      return q ? intervalToDecimal(q[0], q[1], digits) : null;
    };
    const projective = [ratio(0, k), ratio(1, k), ratio(2, k)];
    const affine = zero[2] ? null : [ratio(0, 2), ratio(1, 2)];
    if (projective.every((s) => s !== null) && (affine === null || affine.every((s) => s !== null))) {
      return {
        affine: affine ? [affine[0] as string, affine[1] as string] : null,
        projective: [projective[0] as string, projective[1] as string, projective[2] as string],
      };
    }
  }
  throw new NinefoldError(`could not decide ${digits} digits of the point (the coordinates may sit on a rounding boundary)`, 'digits');
}
