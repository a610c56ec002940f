// Points dropped on a curve: snapped to a nearby rational point of small height when one exists, else the
// real point of the curve on a vertical (or horizontal) line through a simple rational, which is exact as a
// real algebraic point (a root of an integer polynomial with an isolating interval).
//
// Canonical form: a placement is `{ at: "X:Y:Z" }` (rational point) or `{ x: "a/b", near: "c/d" }` (the
// point (a/b, y) of the curve with the real root y nearest c/d) or `{ y: "a/b", near: "c/d" }` (the same
// with the roles of x and y swapped). These are the params of a 'point-on-curve' object.
import { InvalidInput, NotOnCurve } from '../exact/errors.ts';
import { rat, ratCmp, ratParse, ratSub, ratAbs, ratToString, ratMid, ratToNumber, type Rational } from '../exact/rational.ts';
import { upolyRationalRoots } from '../exact/rational-roots.ts';
import { upolyRealRootIntervals, upolyRefineRoot } from '../exact/root-isolation.ts';
import { upolyTrim, upolyToString, type UPoly } from '../exact/upoly.ts';
import { monomials, type Form } from '../poly/form.ts';
import { triple, type Point } from '../plane/point.ts';
import { pointToString } from '../plane/parse-point.ts';
import { ratSimplestBetween, ratFromNumber } from './snap.ts';

/** F restricted to the line {coordinate `axis` = n/d}: a polynomial in the other affine coordinate t. */
function formOnAxisLine(f: Form, axis: 'x' | 'y', value: Rational): UPoly {
  const out = new Array<bigint>(f.degree + 1).fill(0n);
  const m = monomials(f.degree);
  // Homogeneous: X = n, Z = d, Y = t (axis x); Y = n, Z = d, X = t (axis y). Then F(n, t, d) = d^deg F(n/d, t/d, 1).
  for (let k = 0; k < m.length; k++) {
    const c = f.coeffs[k];
    if (c === 0n) continue;
    const [i, j, l] = m[k];
    const fixedPow = axis === 'x' ? i : j;
    const freePow = axis === 'x' ? j : i;
    out[freePow] += c * value.num ** BigInt(fixedPow) * value.den ** BigInt(l);
  }
  return upolyTrim(out);
}

function pointOnAxis(axis: 'x' | 'y', value: Rational, t: Rational): Point {
  // The point (value, t/value.den) in the chart: (n·t.den : t.num : d·t.den) for axis x.
  const a = value.num * t.den;
  const b = t.num;
  const z = value.den * t.den;
  return axis === 'x' ? triple(a, b, z) : triple(b, a, z);
}

export interface RationalSnap {
  readonly point: Point;
  /** max(|X|, |Y|, |Z|), the naive height. */
  readonly height: bigint;
}

/**
 * The rational point of F = 0 of least height within `radius` of (x, y) (in both coordinates), among points
 * with a coordinate of denominator at most `maxDen`; null when none. Exhaustive over those lines.
 */
export function curveRationalNear(f: Form, x: number, y: number, radius: number, maxDen = 48): RationalSnap | null {
  let best: RationalSnap | null = null;
  for (const axis of ['x', 'y'] as const) {
    const c = axis === 'x' ? x : y;
    const other = axis === 'x' ? y : x;
    for (let d = 1; d <= maxDen; d++) {
      const lo = Math.ceil((c - radius) * d);
      const hi = Math.floor((c + radius) * d);
      for (let n = lo; n <= hi; n++) {
        const value = rat(BigInt(n), BigInt(d));
        if (value.den !== BigInt(d)) continue; // seen with a smaller denominator
        const p = formOnAxisLine(f, axis, value);
        if (p.length === 0) continue; // the line lies on the curve: any point would do, none is singled out
        for (const { root } of upolyRationalRoots(p)) {
          const t = ratToNumber(root) / d;
          if (Math.abs(t - other) > radius) continue;
          const point = pointOnAxis(axis, value, root);
          const h = point.reduce((m, v) => (v < 0n ? -v : v) > m ? (v < 0n ? -v : v) : m, 0n);
          if (!best || h < best.height) best = { point, height: h };
        }
      }
    }
  }
  return best;
}

export interface CurvePlacement {
  readonly params: Record<string, string>;
  readonly exact: boolean;
}

/**
 * Where a point dropped at (x, y) within `radius` of the curve goes: a rational point of small height if one
 * is near, else the real point on the vertical (or, where the curve is steep, horizontal) line through the
 * simplest rational in reach. `slope` is dy/dx of the curve there (from floats), choosing the line.
 */
export function curvePlace(f: Form, x: number, y: number, radius: number, slope: number): CurvePlacement {
  const snap = curveRationalNear(f, x, y, radius);
  if (snap) return { params: { at: pointToString(snap.point) }, exact: true };
  const axis = Math.abs(slope) <= 1 ? 'x' : 'y';
  const c = axis === 'x' ? x : y;
  const other = axis === 'x' ? y : x;
  const value = ratSimplestBetween(ratFromNumber(c - radius / 4), ratFromNumber(c + radius / 4));
  const near = ratSimplestBetween(ratFromNumber(other - radius / 4), ratFromNumber(other + radius / 4));
  return { params: { [axis]: ratToString(value), near: ratToString(near) }, exact: false };
}

export interface AxisPoint {
  /** The point when the root is rational. */
  readonly point: Point | null;
  /** Description: the polynomial in the free coordinate and the isolating interval. */
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly poly: UPoly;
  readonly interval: { lo: Rational; hi: Rational };
}

/** The real point of F = 0 on {axis = value} whose free coordinate is nearest `near`. */
export function curveAxisPoint(f: Form, axis: 'x' | 'y', valueText: string, nearText: string, label = 'the curve'): AxisPoint {
  const value = ratParse(valueText, axis);
  const near = ratParse(nearText, 'near');
  const p = formOnAxisLine(f, axis, value);
  if (p.length === 0) throw new InvalidInput(`the line ${axis} = ${valueText} lies on ${label}; place the point by its coordinates instead`, axis);
  // Roots t of p are value.den × the free coordinate; compare in those units.
  const nearScaled = rat(near.num * value.den, near.den);
  const roots = upolyRealRootIntervals(p);
  if (roots.length === 0) throw new NotOnCurve(`the line ${axis} = ${valueText} does not meet ${label} in a real point`, axis);
  const tiny = rat(1n, 1n << 60n);
  const refined = roots.map((iv) => upolyRefineRoot(p, iv, tiny));
  let best = refined[0];
  for (const iv of refined) if (ratCmp(ratAbs(ratSub(ratMid(iv.lo, iv.hi), nearScaled)), ratAbs(ratSub(ratMid(best.lo, best.hi), nearScaled))) < 0) best = iv;
  const exactRoot = ratCmp(best.lo, best.hi) === 0;
  const tNum = ratToNumber(ratMid(best.lo, best.hi)) / Number(value.den);
  const v = ratToNumber(value);
  const free = axis === 'x' ? 'y' : 'x';
  const scaledName = value.den === 1n ? free : `${value.den}·${free}`;
  const coarse = roots[refined.indexOf(best)];
  const text = exactRoot
    ? `${free} = ${ratToString(rat(best.lo.num, best.lo.den * value.den))} on ${axis} = ${valueText}`
    : `${axis} = ${valueText}; ${scaledName} is the root of ${upolyToString(p, 't')} in [${ratToString(coarse.lo)}, ${ratToString(coarse.hi)}]`;
  return {
    point: exactRoot ? pointOnAxis(axis, value, best.lo) : null,
    text,
    x: axis === 'x' ? v : tNum,
    y: axis === 'x' ? tNum : v,
    poly: p,
    interval: coarse,
  };
}
