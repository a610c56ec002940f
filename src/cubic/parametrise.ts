// Rational parametrisation of a nodal or cuspidal cubic through its singular point.
//
// Canonical form: the map is three binary cubics [X(s,t), Y(s,t), Z(s,t)] (BinaryForm order, coefficient
// of s^(3−i) t^i at i) with content 1 taken over all twelve coefficients and the first non-zero one
// positive; the inverse is two lines (a, b) with (s:t) = (a·X : b·X); parameters are primitive pairs.
//
// Method (MATH.md, the blow-up by lines through P; Fulton, Algebraic Curves, ch. 1 §3 and ch. 3): for D =
// sD1 + tD2 on a line missing P, F(λP + μD) = 3λμ²Φ(P,D,D) + μ³F(D) because P is singular, so the line PD
// meets the curve once more at X(s:t) = F(D)·P − (P·∇F(D))·D. P·∇F(D) = 3Φ(P,D,D) is the tangent cone on
// the pencil, so X(s:t) ∝ P exactly at its roots: two (rational or conjugate) for a node, one double for
// a cusp. Writing X = αP + sD1 + tD2 gives the inverse s = (D2×P)·X, t = (P×D1)·X up to det(P,D1,D2).
import { Degenerate, InvalidInput, NotOnCurve } from '../exact/errors.ts';
import { bitLength, isqrt, isSquare, primitive } from '../exact/integer.ts';
import { cross, det3, dot, triple, type Line, type Point } from '../plane/point.ts';
import { binaryIsZero, binaryMul, binaryPrimitive, binaryScale, type BinaryForm } from '../poly/binary.ts';
import { formAdd, formEval, formGradient, formPrimitive, formScale, type Form } from '../poly/form.ts';
import { formOnLine, formOnParametrisation } from '../poly/substitute.ts';
import { cubicSingularPoints } from './singular.ts';

export interface CubicParametrisation {
  readonly curve: Form;
  readonly singular: Point;
  readonly kind: 'node' | 'cusp';
  /** D1, D2: the pencil of lines through the singular point is P·(sD1 + tD2). */
  readonly basis: readonly [Point, Point];
  readonly map: readonly [BinaryForm, BinaryForm, BinaryForm];
  /** (s:t) = (inverse[0]·X : inverse[1]·X) for a point X ≠ P of the curve. */
  readonly inverse: readonly [Line, Line];
  /** The binary quadratic whose roots are the parameters over the singular point. */
  readonly overForm: BinaryForm;
  /** Its rational roots, primitive: two for a split node, one (double) for a cusp, none otherwise. */
  readonly overRational: readonly (readonly [bigint, bigint])[];
}

const E: readonly Point[] = [
  [1n, 0n, 0n],
  [0n, 1n, 0n],
  [0n, 0n, 1n],
];

/** Pencil bases to try, the coordinate ones first (Z = 0 first: the slope parametrisation of an affine P). */
function candidateBases(p: Point): [Point, Point][] {
  const extra: Point[] = [
    [1n, 1n, 0n],
    [1n, -1n, 0n],
    [0n, 1n, 1n],
    [0n, 1n, -1n],
    [1n, 0n, 1n],
    [1n, 0n, -1n],
  ];
  const out: [Point, Point][] = [[E[0], E[1]], [E[1], E[2]], [E[0], E[2]]];
  for (const a of [...E, ...extra]) for (const b of [...E, ...extra]) out.push([a, b]);
  return out.filter(([a, b]) => det3(p, a, b) !== 0n);
}

/** The map through P for one pencil basis (assumes P singular on the irreducible cubic f, det ≠ 0). */
function mapFor(f: Form, p: Point, d1: Point, d2: Point): [bigint[], bigint[], bigint[]] {
  const onLine = formOnLine(f, d1, d2);
  const [fx, fy, fz] = formGradient(f);
  const polar = formAdd(formAdd(formScale(fx, p[0]), formScale(fy, p[1])), formScale(fz, p[2]));
  const q = formOnLine(polar, d1, d2);
  const comps = [0, 1, 2].map((k) => {
    const dk: bigint[] = [d1[k], d2[k]];
    const a = binaryScale(onLine, p[k]);
    const b = binaryMul(q, dk);
    return a.map((c, i) => c - b[i]);
  });
  const flat = primitive(comps.flat());
  return [flat.slice(0, 4), flat.slice(4, 8), flat.slice(8, 12)];
}

function mapSize(m: readonly bigint[][]): number {
  return Math.max(...m.flat().map(bitLength));
}

/** The parametrisation of an irreducible nodal or cuspidal cubic through its singular point. */
export function cubicParametrisation(f0: Form): CubicParametrisation {
  if (f0.degree !== 3) throw new InvalidInput(`only cubics are parametrised here; this curve has degree ${f0.degree}`, 'curve');
  const f = formPrimitive(f0);
  const sing = cubicSingularPoints(f);
  if (sing.components.shape !== 'irreducible') {
    throw new InvalidInput(`the cubic is not irreducible (${sing.components.description}): parametrise its components instead`, 'curve');
  }
  if (sing.smooth) {
    throw new InvalidInput('the cubic is smooth (genus 1): it has no rational parametrisation; try the weierstrass verb', 'curve');
  }
  const sp = sing.points[0];
  const p = sp.point as Point;
  // The coordinate pencils keep the familiar slope shape (x = m² − c, y = m(m² − c) for y² = x³ + cx²):
  // the first usable one wins ties among them; another pencil is taken only when its map is at least
  // four times smaller (2 bits), so a curve in normal form keeps its standard parametrisation.
  let best: { basis: [Point, Point]; map: [bigint[], bigint[], bigint[]]; size: number } | null = null;
  for (const [a, b] of candidateBases(p)) {
    const map = mapFor(f, p, a, b);
    const size = mapSize(map);
    const coordinate = [a, b].every((v) => v.filter((x) => x !== 0n).length === 1);
    if (!best || size + (coordinate ? 0 : 2) < best.size) best = { basis: [a, b], map, size };
  }
  const { basis, map } = best as NonNullable<typeof best>;
  const check = formOnParametrisation(f, map[0], map[1], map[2]);
  if (!binaryIsZero(check)) throw new Degenerate('internal error: the parametrisation does not land on the curve', 'curve');
  const [d1, d2] = basis;
  const inv0 = cross(d2, p);
  const inv1 = cross(p, d1);
  const [fx, fy, fz] = formGradient(f);
  const polar = formAdd(formAdd(formScale(fx, p[0]), formScale(fy, p[1])), formScale(fz, p[2]));
  const overForm = binaryPrimitive(formOnLine(polar, d1, d2));
  return {
    curve: f,
    singular: p,
    kind: sp.kind === 'cusp' ? 'cusp' : 'node',
    basis,
    map,
    inverse: [inv0, inv1],
    overForm,
    overRational: quadraticRationalRoots(overForm),
  };
}

/** Rational roots (s:t) of a binary quadratic, primitive; a double root is listed once. */
function quadraticRationalRoots([a, b, c]: BinaryForm): [bigint, bigint][] {
  const disc = b * b - 4n * a * c;
  if (!isSquare(disc)) return [];
  const r = isqrt(disc);
  const raw: [bigint, bigint][] = a !== 0n ? [[-b + r, 2n * a], [-b - r, 2n * a]] : [[1n, 0n], [-c, b]];
  const roots = raw.map(([s, t]) => {
    const v = primitive([s, t]);
    return [v[0], v[1]] as [bigint, bigint];
  });
  return disc === 0n ? [roots[0]] : roots;
}

/** The point of the curve with parameter (s:t). */
export function parametrisationAt(par: CubicParametrisation, s: bigint, t: bigint): Point {
  if (s === 0n && t === 0n) throw new InvalidInput('0:0 is not a parameter', 'parameter');
  const v = par.map.map((b) => {
    let acc = 0n;
    for (let i = 0; i < 4; i++) acc += b[i] * s ** BigInt(3 - i) * t ** BigInt(i);
    return acc;
  });
  return triple(v[0], v[1], v[2]);
}

/** The parameter (s:t) of a point X ≠ P of the curve: the line PX in the pencil. */
export function parametrisationInverse(par: CubicParametrisation, x: Point, where = 'point'): [bigint, bigint] {
  if (formEval(par.curve, x) !== 0n) throw new NotOnCurve(`the point ${x.join(':')} is not on the curve`, where);
  const s = dot(par.inverse[0], x);
  const t = dot(par.inverse[1], x);
  if (s === 0n && t === 0n) {
    throw new Degenerate('the singular point has no single parameter: see the parameters over it', where);
  }
  const v = primitive([s, t]);
  return [v[0], v[1]];
}
