// The order of a point in the group of a smooth cubic with base point O.
//
// Mazur's theorem (Mazur 1977; Silverman, The Arithmetic of Elliptic Curves, VIII.7.5): a rational torsion
// point of an elliptic curve over Q has order at most 12. The group with base O is isomorphic to the
// Jacobian's group over Q (src/cubic/weierstrass.ts), so nP ≠ O for n = 1..12 proves infinite order.
//
// Canonical form: a positive integer n ≤ 12, or 'infinite'.
import type { Form } from '../poly/form.ts';
import type { Point } from '../plane/point.ts';
import { tripleEquals } from '../plane/point.ts';
import { cubicRequireSmoothPoint } from './chord.ts';
import { groupAddIn, groupMake, type CubicGroup } from './group.ts';
import { cubicInvariants } from './invariants.ts';
import { Degenerate } from '../exact/errors.ts';

export const MAZUR_BOUND = 12;

/** Order of P (internal tier: g built by groupMake on a smooth cubic, P a smooth point). */
export function groupOrderIn(g: CubicGroup, p: Point): number | 'infinite' {
  let q = p;
  for (let n = 1; n <= MAZUR_BOUND; n++) {
    if (tripleEquals(q, g.base)) return n;
    q = groupAddIn(g, q, p);
  }
  return 'infinite';
}

/** The order of P on the smooth cubic f with base point O: 1..12, or 'infinite' (proved by Mazur's bound). */
export function groupOrder(f: Form, o: Point, p: Point): number | 'infinite' {
  const g = groupMake(f, o);
  if (cubicInvariants(f).discriminant.num === 0n) {
    throw new Degenerate('the curve is singular: Mazur\'s bound is for elliptic curves, so the order is not decided here', 'curve');
  }
  cubicRequireSmoothPoint(f, p, 'P');
  return groupOrderIn(g, p);
}
