// Meets of plane curves: a line with a curve, and two curves (degrees 1..6, so up to 36 points), with
// intersection multiplicities summing to the product of the degrees (Bézout), complex points counted.
//
// Canonical form: a meet is a list of distinct points, each with its multiplicity; rational points are
// primitive triples (exact), irrational real points carry an exact description (an isolating interval of
// one coordinate plus the rule that gives the others) and a float approximation, non-real points a float
// approximation only (approx = real parts, approxImag = imaginary parts, scaled so that the coordinate of
// largest modulus is 1). Order: rational points by height, then real algebraic points, then non-real ones.
//
// Methods (MATH.md, "Intersections"): a line by substituting its parametrisation and finding the binary
// form's roots; two curves by the resultant in Y after a unimodular change of coordinates in general
// position, each root (x:z) of the resultant giving the common points on the line through the projection
// centre C = (0:1:0). When that line carries one common point only, its intersection multiplicity is
// the root's multiplicity in the resultant (Fulton, Algebraic Curves, §5.1, the proof of Bézout's theorem
// via the resultant; from memory). One point per line is certified exactly: for a rational root by the
// gcd of the two curves restricted to the line, for an irrational root by the first subresultant
// (meet-subresultant.ts). A failed check moves to the next change of coordinates.
import { NinefoldError, InvalidInput } from '../exact/errors.ts';
import { ratCmp } from '../exact/rational.ts';
import {
  upolyDegree, upolyGcd, upolySignAt, upolySquarefreePart, type UPoly,
} from '../exact/upoly.ts';
import { algebraicToNumber, type RealAlgebraic } from '../exact/algebraic.ts';
import { binaryFormRoots } from '../poly/binary-roots.ts';
import { formIsZero, formPrimitive, monomialIndex, type Form } from '../poly/form.ts';
import { formResultant } from '../poly/resultant.ts';
import { formOnLine } from '../poly/substitute.ts';
import { formTransform, unimodularTrial, type Matrix3 } from '../poly/transform.ts';
import { cross, triple, tripleIsZero, type Line, type Point } from '../plane/point.ts';
import { pointHeightCompare } from './height.ts';
import { firstSubresultant, formAsYPolynomial } from './meet-subresultant.ts';
import {
  complexDiv, complexEval, complexMul, complexTripleNormalise, realTripleNormalise, upolyComplexRoots, upolyToScaledFloats,
  type Complex,
} from './meet-numeric.ts';

/** An irrational real point, exactly: on a line, α·P + Q; from a projection, M·(α, −s10(α)/s11(α), 1). */
export type AlgebraicMeetPoint =
  | { readonly kind: 'line'; readonly alpha: RealAlgebraic; readonly p: Point; readonly q: Point }
  | { readonly kind: 'projection'; readonly alpha: RealAlgebraic; readonly yNum: UPoly; readonly yDen: UPoly; readonly frame: Matrix3 };

export interface MeetPoint {
  /** The point when it is rational; null otherwise. */
  readonly point: Point | null;
  readonly real: boolean;
  readonly multiplicity: number;
  /** Floats, scaled so the coordinate of largest modulus is 1 (real parts for a non-real point). */
  readonly approx: readonly [number, number, number];
  /** Imaginary parts, for non-real points only. */
  readonly approxImag?: readonly [number, number, number];
  readonly algebraic?: AlgebraicMeetPoint;
}

export interface MeetResult {
  readonly points: MeetPoint[];
  /** Sum of multiplicities: the product of the degrees, or 0 when the curves share a component. */
  readonly total: number;
  readonly commonComponent: boolean;
  /** In words, for people: what kind of meet this was. */
  readonly note: string;
}

const MAX_DEGREE = 6;
const TRIALS = 24;

function requireCurve(f: Form, where: string): void {
  if (!Number.isInteger(f.degree) || f.degree < 1 || f.degree > MAX_DEGREE) {
    throw new InvalidInput(`meets handle curves of degree 1 to ${MAX_DEGREE}, got degree ${f.degree}`, where);
  }
  if (formIsZero(f)) throw new InvalidInput('the zero form is not a curve', where);
}

function requireLine(l: readonly bigint[], where: string): void {
  if (l.length !== 3 || tripleIsZero(l)) throw new InvalidInput('a line needs coefficients a:b:c, not all zero', where);
}

/** Two points spanning the line l (assumes l != 0). */
function lineSpan(l: Line): [Point, Point] {
  const c = [cross(l, [1n, 0n, 0n]), cross(l, [0n, 1n, 0n]), cross(l, [0n, 0n, 1n])];
  for (let i = 0; i < 3; i++)
    for (let j = i + 1; j < 3; j++) {
      if (!tripleIsZero(c[i]) && !tripleIsZero(c[j]) && !tripleIsZero(cross(c[i], c[j]))) {
        return [triple(...c[i]), triple(...c[j])];
      }
    }
  throw new NinefoldError('internal: a non-zero line has two independent points');
}

function numberTriple(p: readonly bigint[]): [number, number, number] {
  const big = p.reduce((m, x) => (x < 0n ? (-x > m ? -x : m) : x > m ? x : m), 0n);
  const shift = big.toString(2).length > 1000 ? big.toString(2).length - 60 : 0;
  const s = BigInt(shift);
  return realTripleNormalise(p.map((x) => Number(x >> s)));
}

function exactPoint(p: Point, multiplicity: number): MeetPoint {
  return { point: p, real: true, multiplicity, approx: numberTriple(p) };
}

function orderPoints(points: MeetPoint[]): MeetPoint[] {
  const rank = (m: MeetPoint): number => (m.point ? 0 : m.real ? 1 : 2);
  return points.sort((a, b) => {
    const r = rank(a) - rank(b);
    if (r !== 0) return r;
    if (a.point && b.point) return pointHeightCompare(a.point, b.point);
    for (let k = 0; k < 3; k++) if (a.approx[k] !== b.approx[k]) return a.approx[k] - b.approx[k];
    return 0;
  });
}

/**
 * The meet of the curve F = 0 with the line l: every point with its multiplicity (summing to deg F), or
 * commonComponent when the line lies on the curve.
 */
export function lineCurveMeet(f: Form, l: Line): MeetResult {
  requireCurve(f, 'curve');
  requireLine(l, 'line');
  const [p, q] = lineSpan(triple(l[0], l[1], l[2]));
  const b = formOnLine(f, p, q);
  if (b.every((c) => c === 0n)) {
    return { points: [], total: 0, commonComponent: true, note: 'the line lies on the curve, so they meet in infinitely many points' };
  }
  const found = binaryFormRoots(b);
  const points: MeetPoint[] = [];
  for (const r of found.roots) {
    if (r.point) {
      const [s, t] = r.point;
      points.push(exactPoint(triple(s * p[0] + t * q[0], s * p[1] + t * q[1], s * p[2] + t * q[2]), r.multiplicity));
    } else if (r.real) {
      const a = algebraicToNumber(r.real);
      points.push({
        point: null,
        real: true,
        multiplicity: r.multiplicity,
        approx: realTripleNormalise([0, 1, 2].map((k) => a * Number(p[k]) + Number(q[k]))),
        algebraic: { kind: 'line', alpha: r.real, p, q },
      });
    }
  }
  for (const c of found.complex) {
    for (const z of nonRealRoots(c.poly, c.nonReal)) {
      const v = [0, 1, 2].map((k) => [z[0] * Number(p[k]) + Number(q[k]), z[1] * Number(p[k])] as Complex);
      const n = complexTripleNormalise(v);
      points.push({ point: null, real: false, multiplicity: c.multiplicity, approx: n.re, approxImag: n.im });
    }
  }
  const total = points.reduce((s, m) => s + m.multiplicity, 0);
  if (total !== f.degree) throw new NinefoldError(`internal: the meet of a line and a curve of degree ${f.degree} counted ${total} points`);
  return { points: orderPoints(points), total, commonComponent: false, note: describe(points) };
}

// poly's real roots are listed exactly elsewhere (binary-roots.ts): keep the nonReal roots of largest |imaginary part|.
function nonRealRoots(poly: UPoly, nonReal: number): Complex[] {
  return upolyComplexRoots(poly)
    .sort((a, b) => Math.abs(b[1]) - Math.abs(a[1]))
    .slice(0, nonReal);
}

function describe(points: readonly MeetPoint[]): string {
  const rational = points.filter((m) => m.point).length;
  const real = points.filter((m) => m.real && !m.point).length;
  const complex = points.filter((m) => !m.real).length;
  return `${points.length} distinct points: ${rational} rational, ${real} real irrational, ${complex} non-real`;
}

// Is α (a root of the square-free p, isolated in [lo, hi] with p non-zero at both ends) a root of q?
// Assumes q divides p, so q is non-zero at the ends too and has at most the one simple root α inside.
function rootOfFactor(alpha: RealAlgebraic, q: UPoly): boolean {
  if (upolyDegree(q) < 1) return false;
  if (ratCmp(alpha.lo, alpha.hi) === 0) return upolySignAt(q, alpha.lo) === 0;
  return upolySignAt(q, alpha.lo) * upolySignAt(q, alpha.hi) < 0;
}

interface Trial {
  readonly points: MeetPoint[];
  readonly ok: boolean;
}

// Assumes f, g primitive of degrees >= 2 with no common component; m a unimodular matrix.
function meetInFrame(f: Form, g: Form, m: Matrix3): Trial | null {
  const ft = formTransform(f, m);
  const gt = formTransform(g, m);
  const yIndexF = monomialIndex(ft.degree, 0, ft.degree);
  const yIndexG = monomialIndex(gt.degree, 0, gt.degree);
  if (ft.coeffs[yIndexF] === 0n || gt.coeffs[yIndexG] === 0n) return null; // C on a curve
  const res = formResultant(ft, gt, 1);
  if (res.every((c) => c === 0n)) throw new NinefoldError('internal: resultant vanished after the component check');
  if (res[0] === 0n) return null; // a common point on the line Z = 0 of this frame: keep the chart z = 1
  const { s11, s10 } = firstSubresultant(formAsYPolynomial(ft), formAsYPolynomial(gt));
  const found = binaryFormRoots(res);
  const toOld = (v: readonly bigint[]): Point => {
    const w = m.map((r) => r[0] * v[0] + r[1] * v[1] + r[2] * v[2]);
    return triple(w[0], w[1], w[2]);
  };
  const points: MeetPoint[] = [];
  for (const r of found.roots) {
    if (r.point) {
      const [x0, z0] = r.point;
      if (z0 === 0n) return null;
      const base = [x0, 0n, z0];
      const pf = formOnLine(ft, base, [0n, 1n, 0n]);
      const pg = formOnLine(gt, base, [0n, 1n, 0n]);
      // s = 1 chart (s = 0 is C, on neither curve): coefficient i of t^i is b[i].
      const common = upolySquarefreePart(upolyGcd(trimmed(pf), trimmed(pg)));
      if (upolyDegree(common) !== 1) return { points, ok: false };
      const [c0, c1] = common;
      points.push(exactPoint(toOld([c1 * x0, -c0, c1 * z0]), r.multiplicity));
    } else if (r.real) {
      const alpha = r.real;
      const q = upolyGcd(alpha.poly, s11);
      if (rootOfFactor(alpha, q)) return { points, ok: false };
      const a = algebraicToNumber(alpha);
      const [n10, n11] = scaledPair(s10, s11);
      const y = -realEval(n10, a) / realEval(n11, a);
      const approx = realTripleNormalise([0, 1, 2].map((k) => Number(m[k][0]) * a + Number(m[k][1]) * y + Number(m[k][2])));
      points.push({
        point: null,
        real: true,
        multiplicity: r.multiplicity,
        approx,
        algebraic: { kind: 'projection', alpha, yNum: s10.map((c) => -c), yDen: s11, frame: m },
      });
    }
  }
  for (const c of found.complex) {
    if (upolyDegree(upolyGcd(c.poly, s11)) >= 1) return { points, ok: false };
    const [n10, n11] = scaledPair(s10, s11);
    for (const z of nonRealRoots(c.poly, c.nonReal)) {
      const y = complexDiv(complexEval(n10, z), complexEval(n11, z));
      const yy: Complex = [-y[0], -y[1]];
      const v = [0, 1, 2].map((k) => {
        const a = complexMul([Number(m[k][0]), 0], z);
        const b = complexMul([Number(m[k][1]), 0], yy);
        return [a[0] + b[0] + Number(m[k][2]), a[1] + b[1]] as Complex;
      });
      const n = complexTripleNormalise(v);
      points.push({ point: null, real: false, multiplicity: c.multiplicity, approx: n.re, approxImag: n.im });
    }
  }
  return { points, ok: true };
}

function trimmed(b: readonly bigint[]): UPoly {
  const out = b.slice();
  while (out.length > 0 && out[out.length - 1] === 0n) out.pop();
  return out;
}

// Both polynomials scaled by one power of two, so their ratio survives huge coefficients.
function scaledPair(a: UPoly, b: UPoly): [number[], number[]] {
  const both = upolyToScaledFloats([...a, ...b]);
  return [both.slice(0, a.length), both.slice(a.length)];
}

function realEval(p: readonly number[], x: number): number {
  let r = 0;
  for (let i = p.length - 1; i >= 0; i--) r = r * x + p[i];
  return r;
}

/** Do F and G share a component? (The resultant in one variable vanishes identically in every frame.) */
function shareComponent(f: Form, g: Form): boolean {
  for (let k = 0; k < TRIALS; k++) {
    const m = unimodularTrial(k);
    const ft = formTransform(f, m);
    const gt = formTransform(g, m);
    if (ft.coeffs[monomialIndex(ft.degree, 0, ft.degree)] === 0n || gt.coeffs[monomialIndex(gt.degree, 0, gt.degree)] === 0n) continue;
    // With C on neither curve, Res_Y vanishes identically exactly when F and G share a component.
    return formResultant(ft, gt, 1).every((c) => c === 0n);
  }
  throw new NinefoldError('internal: no frame put the projection centre off both curves');
}

/**
 * The meet of the curves F = 0 and G = 0 (degrees 1..6): every common point with its intersection
 * multiplicity, summing to deg F · deg G, or commonComponent when they share a component.
 */
export function curveCurveMeet(f: Form, g: Form): MeetResult {
  requireCurve(f, 'first curve');
  requireCurve(g, 'second curve');
  if (f.degree === 1) return lineCurveMeet(g, f.coeffs as unknown as Line);
  if (g.degree === 1) return lineCurveMeet(f, g.coeffs as unknown as Line);
  const fp = formPrimitive(f);
  const gp = formPrimitive(g);
  if (shareComponent(fp, gp)) {
    return { points: [], total: 0, commonComponent: true, note: 'the curves share a component, so they meet in infinitely many points' };
  }
  const want = f.degree * g.degree;
  for (let k = 1; k <= TRIALS; k++) {
    const trial = meetInFrame(fp, gp, unimodularTrial(k));
    if (!trial || !trial.ok) continue;
    const total = trial.points.reduce((s, m) => s + m.multiplicity, 0);
    if (total !== want) throw new NinefoldError(`internal: Bézout count ${total} instead of ${want}`);
    return { points: orderPoints(trial.points), total, commonComponent: false, note: describe(trial.points) };
  }
  throw new NinefoldError(
    `could not find coordinates in which the common points of the two curves have distinct projections (${TRIALS} tried)`,
    'curves',
  );
}
