// Snapping a dropped point to exact values: the simplest rational inside the pixel.
//
// The simplest rational of an interval [lo, hi] is the one with the least denominator (and then the least
// absolute numerator); it is found from the continued fractions of the endpoints (the Stern–Brocot
// descent; Hardy & Wright, An Introduction to the Theory of Numbers, §10.15, on best approximations).
import { InvalidInput } from '../exact/errors.ts';
import { rat, ratCmp, ratFloor, ratNeg, ratSub, ratInv, ratAdd, ratFromInt, type Rational } from '../exact/rational.ts';

/** The simplest rational in the closed interval [lo, hi] (lo ≤ hi). */
export function ratSimplestBetween(lo: Rational, hi: Rational): Rational {
  if (ratCmp(lo, hi) > 0) throw new InvalidInput('the interval is empty (lo > hi)', 'interval');
  if (lo.num <= 0n && hi.num >= 0n) return rat(0n);
  if (hi.num < 0n) return ratNeg(simplestPositive(ratNeg(hi), ratNeg(lo)));
  return simplestPositive(lo, hi);
}

// Assumes 0 < lo ≤ hi.
function simplestPositive(lo: Rational, hi: Rational): Rational {
  const fl = ratFloor(lo);
  if (ratCmp(ratFromInt(fl), lo) === 0) return lo; // lo is an integer
  if (ratCmp(ratFromInt(fl + 1n), hi) <= 0) return ratFromInt(fl + 1n); // an integer lies inside
  // lo and hi share the integer part fl: recurse on the reciprocals of the fractional parts.
  const a = ratSub(lo, ratFromInt(fl));
  const b = ratSub(hi, ratFromInt(fl));
  const inner = simplestPositive(ratInv(b), ratInv(a));
  return ratAdd(ratFromInt(fl), ratInv(inner));
}

/** A double as an exact rational (every finite double is one). */
export function ratFromNumber(x: number, where = 'value'): Rational {
  if (!Number.isFinite(x)) throw new InvalidInput(`${x} is not a finite number`, where);
  if (Number.isInteger(x)) return rat(BigInt(x));
  let den = 1n;
  let y = x;
  while (!Number.isInteger(y)) {
    y *= 2;
    den *= 2n;
  }
  return rat(BigInt(y), den);
}

/** The simplest rational within `radius` of x. */
export function ratSnap(x: number, radius: number): Rational {
  return ratSimplestBetween(ratFromNumber(x - radius), ratFromNumber(x + radius));
}
