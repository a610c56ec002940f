// Real algebraic numbers: a square-free primitive integer polynomial and an isolating interval.
//
// Canonical form: { poly, lo, hi } with poly square-free, primitive (content 1, positive lead), lo <= hi
// rationals. lo == hi means the number is exactly that rational (then poly(lo) = 0). lo < hi means the
// number is the only root of poly in [lo, hi], poly(lo) and poly(hi) non-zero of opposite signs. Values are
// immutable: refinement returns a new number with a narrower interval.
//
// Comparison (common practice, e.g. Cohen, "A Course in Computational Algebraic Number Theory", §4.2, and
// Basu–Pollack–Roy, "Algorithms in Real Algebraic Geometry", §10.4): disjoint intervals decide at once;
// overlapping ones are equal exactly when g = gcd(poly_a, poly_b) changes sign on the overlap (a root of g
// there is the one root of each polynomial in its interval); otherwise refine until they separate.
import { InvalidInput } from './errors.ts';
import { intervalToDecimal, ratToDecimal } from './decimal.ts';
import { rat, ratCmp, ratSign, ratSub, ratToNumber, type Rational } from './rational.ts';
import { upolySquarefreeRationalRoots } from './rational-roots.ts';
import { RootRefiner } from './root-refine.ts';
import { upolyRealRootIntervals } from './root-isolation.ts';
import { upolyDivExact, upolyGcd, upolySignAt, upolySquarefreePart, type UPoly } from './upoly.ts';

export interface RealAlgebraic {
  readonly poly: UPoly;
  readonly lo: Rational;
  readonly hi: Rational;
}

function isExact(a: RealAlgebraic): boolean {
  return ratCmp(a.lo, a.hi) === 0;
}

export function algebraicFromRational(q: Rational): RealAlgebraic {
  return { poly: [-q.num, q.den], lo: q, hi: q };
}

/**
 * A real algebraic number from a polynomial and an interval holding exactly one of its real roots (p may
 * have repeated factors; it is replaced by its square-free part). Refuses an interval without that root.
 */
export function algebraicFromInterval(p: readonly bigint[], lo: Rational, hi: Rational): RealAlgebraic {
  if (p.length < 2) throw new InvalidInput('a real algebraic number needs a polynomial of degree at least 1', 'polynomial');
  const f = upolySquarefreePart(p);
  if (ratCmp(lo, hi) === 0) {
    if (upolySignAt(f, lo) !== 0) throw new InvalidInput('the polynomial does not vanish at the given point', 'interval');
    return { poly: f, lo, hi };
  }
  if (ratCmp(lo, hi) > 0) throw new InvalidInput('the interval has lo > hi', 'interval');
  const sl = upolySignAt(f, lo);
  const sh = upolySignAt(f, hi);
  if (sl === 0 || sh === 0 || sl === sh) {
    throw new InvalidInput('the interval must hold a root of the polynomial with non-zero values of opposite sign at its ends', 'interval');
  }
  return { poly: f, lo, hi };
}

/**
 * The distinct real roots of p in increasing order. Rational roots come back exact (linear poly, lo == hi);
 * the others carry p's square-free part with its rational roots divided out.
 */
export function algebraicRealRoots(p: readonly bigint[]): RealAlgebraic[] {
  if (p.length === 0) throw new InvalidInput('the zero polynomial vanishes everywhere: its roots are not isolated', 'polynomial');
  if (p.length === 1) return [];
  let f: UPoly = upolySquarefreePart(p);
  const out: RealAlgebraic[] = [];
  for (const q of upolySquarefreeRationalRoots(f)) {
    out.push(algebraicFromRational(q));
    f = upolyDivExact(f, [-q.num, q.den]);
  }
  if (f.length > 1) for (const iv of upolyRealRootIntervals(f)) out.push({ poly: f, lo: iv.lo, hi: iv.hi });
  return out.sort(algebraicCmp);
}

/** A narrower interval for the same number, of width <= `width` (> 0). */
export function algebraicRefine(a: RealAlgebraic, width: Rational): RealAlgebraic {
  if (width.num <= 0n) throw new InvalidInput('the target width must be positive', 'width');
  if (isExact(a)) return a;
  const r = new RootRefiner(a.poly, a.lo, a.hi);
  r.refineToWidth(width);
  const iv = r.interval();
  return { poly: a.poly, lo: iv.lo, hi: iv.hi };
}

/** Refine to width <= 2^-bits (internal: assumes a not exact). */
function refineBits(a: RealAlgebraic, bits: number): RealAlgebraic {
  const r = new RootRefiner(a.poly, a.lo, a.hi);
  r.refineToBits(bits);
  const iv = r.interval();
  return { poly: a.poly, lo: iv.lo, hi: iv.hi };
}

export function algebraicSign(a: RealAlgebraic): -1 | 0 | 1 {
  if (isExact(a)) return ratSign(a.lo);
  if (ratSign(a.lo) >= 0) return 1; // lo is not the root, so the root is > lo >= 0
  if (ratSign(a.hi) <= 0) return -1;
  const s0 = upolySignAt(a.poly, rat(0n));
  if (s0 === 0) return 0;
  // On (lo, root) poly has the sign it has at lo.
  return s0 === upolySignAt(a.poly, a.lo) ? 1 : -1;
}

/** Compare a rational with an algebraic number. */
function cmpRational(q: Rational, b: RealAlgebraic): -1 | 0 | 1 {
  if (isExact(b)) return ratCmp(q, b.lo);
  if (ratCmp(q, b.lo) <= 0) return -1;
  if (ratCmp(q, b.hi) >= 0) return 1;
  const s = upolySignAt(b.poly, q);
  if (s === 0) return 0;
  return s === upolySignAt(b.poly, b.lo) ? -1 : 1;
}

export function algebraicCmp(a: RealAlgebraic, b: RealAlgebraic): -1 | 0 | 1 {
  if (isExact(a)) return cmpRational(a.lo, b);
  if (isExact(b)) {
    const c = cmpRational(b.lo, a);
    return c === 0 ? 0 : c === 1 ? -1 : 1;
  }
  if (ratCmp(a.hi, b.lo) <= 0) return -1;
  if (ratCmp(b.hi, a.lo) <= 0) return 1;
  const g = upolyGcd(a.poly, b.poly);
  if (g.length > 1) {
    const lo = ratCmp(a.lo, b.lo) >= 0 ? a.lo : b.lo;
    const hi = ratCmp(a.hi, b.hi) <= 0 ? a.hi : b.hi;
    const sl = upolySignAt(g, lo);
    const sh = upolySignAt(g, hi);
    if (sl !== sh) return 0;
  }
  // Different numbers: refine both until the intervals separate.
  let x = a;
  let y = b;
  for (let bits = 16; ; bits *= 2) {
    x = refineBits(x, bits);
    y = refineBits(y, bits);
    if (isExact(x) || isExact(y)) return algebraicCmp(x, y);
    if (ratCmp(x.hi, y.lo) <= 0) return -1;
    if (ratCmp(y.hi, x.lo) <= 0) return 1;
  }
}

export function algebraicEquals(a: RealAlgebraic, b: RealAlgebraic): boolean {
  return algebraicCmp(a, b) === 0;
}

/** The number itself when it is rational (checked exactly), else null. */
export function algebraicAsRational(a: RealAlgebraic): Rational | null {
  if (isExact(a)) return a.lo;
  for (const q of upolySquarefreeRationalRoots(a.poly)) {
    if (ratCmp(a.lo, q) < 0 && ratCmp(q, a.hi) < 0) return q;
  }
  return null;
}

/** Nearest double, up to one rounding: the interval is refined to relative width 2^-60 first. */
export function algebraicToNumber(a: RealAlgebraic): number {
  if (isExact(a)) return ratToNumber(a.lo);
  if (algebraicSign(a) === 0) return 0;
  let x = a;
  for (let bits = 64; ; bits += 64) {
    x = refineBits(x, bits);
    if (isExact(x)) return ratToNumber(x.lo);
    const lo = ratToNumber(x.lo);
    const hi = ratToNumber(x.hi);
    if (lo === hi) return lo; // includes ±Infinity beyond the double range and 0 below it
    if (Math.sign(lo) === Math.sign(hi) && Math.abs(hi - lo) <= Math.min(Math.abs(lo), Math.abs(hi)) * 2 ** -60) return (lo + hi) / 2;
    if (bits > 4200) return (lo + hi) / 2; // below the double range: every point of the interval rounds alike
  }
}

/**
 * `digits` significant decimal digits, correctly rounded (half away from zero): the interval is refined
 * until both ends round alike; a rational value is rounded exactly.
 */
export function algebraicToDecimal(a: RealAlgebraic, digits: number): string {
  if (isExact(a)) return ratToDecimal(a.lo, digits);
  if (algebraicSign(a) === 0) return ratToDecimal(rat(0n), digits);
  let x = a;
  const rough = Math.ceil(digits * 3.33) + 8;
  for (let bits = rough; ; bits *= 2) {
    x = refineBits(x, bits + magnitudeBits(x));
    if (isExact(x)) return ratToDecimal(x.lo, digits);
    const s = intervalToDecimal(x.lo, x.hi, digits);
    if (s !== null) return s;
    // A value sitting on a rounding boundary is rational: decide it exactly instead of refining forever.
    if (bits > 4 * rough) {
      const q = algebraicAsRational(x);
      if (q) return ratToDecimal(q, digits);
    }
  }
}

/** Bits below 1 of the smaller end's magnitude, so relative precision is asked for (internal). */
function magnitudeBits(x: RealAlgebraic): number {
  const lo = ratToNumber(x.lo);
  const hi = ratToNumber(x.hi);
  const m = Math.min(Math.abs(lo), Math.abs(hi));
  if (!(m > 0) || !Number.isFinite(m)) return 0;
  return Math.max(0, -Math.floor(Math.log2(m)));
}

/** Width of the isolating interval (0 when exact). */
export function algebraicWidth(a: RealAlgebraic): Rational {
  return ratSub(a.hi, a.lo);
}
