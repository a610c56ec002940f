// Points and lines of P^2(Q) as primitive integer triples.
//
// Canonical form: gcd of the entries 1, first non-zero entry positive, not all zero. A line (a:b:c) is the
// set aX + bY + cZ = 0. Join and meet are both cross products (projective duality).
import { primitive } from '../exact/integer.ts';
import { Degenerate, InvalidInput } from '../exact/errors.ts';

export type Triple = readonly [bigint, bigint, bigint];
export type Point = Triple;
export type Line = Triple;

export function triple(a: bigint, b: bigint, c: bigint): Triple {
  if (a === 0n && b === 0n && c === 0n) throw new InvalidInput('(0:0:0) is not a point of the projective plane');
  const p = primitive([a, b, c]);
  return [p[0], p[1], p[2]];
}

export function tripleIsZero(t: readonly bigint[]): boolean {
  return t[0] === 0n && t[1] === 0n && t[2] === 0n;
}

export function tripleEquals(a: Triple, b: Triple): boolean {
  return a[0] === b[0] && a[1] === b[1] && a[2] === b[2];
}

/** Projective equality of two triples that need not be primitive. */
export function tripleProportional(a: readonly bigint[], b: readonly bigint[]): boolean {
  return tripleIsZero(cross(a, b));
}

export function cross(a: readonly bigint[], b: readonly bigint[]): [bigint, bigint, bigint] {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

export function dot(a: readonly bigint[], b: readonly bigint[]): bigint {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

export function det3(a: readonly bigint[], b: readonly bigint[], c: readonly bigint[]): bigint {
  return dot(a, cross(b, c));
}

/** The line through two distinct points. */
export function pointPointJoin(p: Point, q: Point): Line {
  const l = cross(p, q);
  if (tripleIsZero(l)) throw new Degenerate('the two points are equal, so they do not fix a line');
  return triple(l[0], l[1], l[2]);
}

/** The point where two distinct lines meet (possibly at infinity). */
export function lineLineMeet(l: Line, m: Line): Point {
  const p = cross(l, m);
  if (tripleIsZero(p)) throw new Degenerate('the two lines are equal, so they do not meet in one point');
  return triple(p[0], p[1], p[2]);
}

export function linePointIncident(l: Line, p: Point): boolean {
  return dot(l, p) === 0n;
}

/** Is (X:Y:Z) at infinity (Z = 0)? */
export function pointIsAtInfinity(p: Point): boolean {
  return p[2] === 0n;
}
