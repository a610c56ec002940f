// The group law on a smooth plane cubic with any rational base point O (flex or not).
//
// Canonical form: points are primitive integer triples (src/plane/point.ts), so equal group elements are
// equal arrays whatever path computed them. Law (Silverman–Tate, Rational Points on Elliptic Curves,
// I.2; Cassels, LMS Student Texts 24, ch. 7): P + Q = O * (P * Q), −P = P * (O * O). Associativity
// for a non-flex O is the Cayley–Bacharach theorem, so nothing here needs O to be a flex.
//
// Changing the base point from O to O2: the map P ↦ P + O2 (law with base O) carries the law with base O
// to the law with base O2, because (P + O2) +₂ (Q + O2) = P + Q + O2 where X +₂ Y = X + Y − O2.
import { InvalidInput } from '../exact/errors.ts';
import type { Form } from '../poly/form.ts';
import { cross, triple, tripleIsZero, type Point } from '../plane/point.ts';
import { chordPartnerMake, chordPartnerThirdPoint, chordPartnerThirdRaw, type ChordPartner } from './chord-partner.ts';
import { chordThirdRaw, cubicRequire, cubicRequireSmoothPoint, tangentThird, tangentThirdRaw } from './chord.ts';

/** A cubic with a chosen base point; `oo` is O * O, the point whose chord with P gives −P. */
export interface CubicGroup {
  readonly curve: Form;
  readonly base: Point;
  readonly oo: Point;
}

/** Checks f is a cubic and O a smooth point on it; the group law needs f smooth (not checked here). */
export function groupMake(f: Form, o: Point, name = 'base'): CubicGroup {
  cubicRequire(f);
  cubicRequireSmoothPoint(f, o, name);
  return { curve: f, base: o, oo: tangentThird(f, o, name) };
}

type Raw = readonly bigint[];

const sameRaw = (p: Raw, q: Raw) => tripleIsZero(cross(p, q));
const canonical = (p: Raw): Point => triple(p[0], p[1], p[2]);

// Assumes p, q smooth points of g.curve, as integer triples of any non-zero scale.
function starRaw(g: CubicGroup, p: Raw, q: Raw): Raw {
  return sameRaw(p, q) ? tangentThirdRaw(g.curve, p) : chordThirdRaw(g.curve, p, q);
}

function addRaw(g: CubicGroup, p: Raw, q: Raw): Raw {
  if (sameRaw(p, g.base)) return q;
  if (sameRaw(q, g.base)) return p;
  return starRaw(g, g.base, starRaw(g, p, q));
}

function negateRaw(g: CubicGroup, p: Raw): Raw {
  return sameRaw(p, g.base) ? p : starRaw(g, p, g.oo);
}

/** P + Q in the group (internal tier: points already checked). */
export function groupAddIn(g: CubicGroup, p: Point, q: Point): Point {
  return canonical(addRaw(g, p, q));
}

/** −P in the group (internal tier). */
export function groupNegateIn(g: CubicGroup, p: Point): Point {
  return canonical(negateRaw(g, p));
}

/**
 * nP (internal tier); negative n gives −(|n|P), n = 0 gives O. The chain uses one tangent and one chord
 * per binary digit of n, not the tangent and one or three chords of double-and-add through the law.
 * Why it works: three points of the curve on a line sum to ω = O * O (the tangent at O meets it in O, O,
 * ω), so X * Y = ω − X − Y. For X = mP the tangent gives X * X = ω − 2mP, and its chord with Q gives
 * ω − (ω − 2mP) − Q = 2mP − Q: with Q = O that is 2mP, with Q = −P it is (2m + 1)P. Intermediate points
 * stay at the scale the chord formulas leave (see chordThirdRaw) and only the answer is made primitive.
 * (Measured: double-and-add through groupAddIn, ~1.6 times the chords; computing on the short Weierstrass
 * model in Jacobian coordinates and mapping back was no faster at n ≤ 200 and slower beyond.)
 */
export function groupMultipleIn(g: CubicGroup, p: Point, n: bigint): Point {
  if (n === 0n) return g.base;
  const q = n < 0n ? groupNegateIn(g, p) : p;
  const digits = (n < 0n ? -n : n).toString(2);
  if (digits.length === 1) return canonical(q);
  const base = basePartner(g);
  const minusQ = chordPartnerMake(g.curve, n < 0n ? p : groupNegateIn(g, p));
  let acc: Raw = q;
  const last = digits.length - 1;
  for (let k = 1; k < last; k++) {
    acc = starPartner(g, tangentThirdRaw(g.curve, acc), digits[k] === '1' ? minusQ : base);
  }
  // The last chord hands back its answer primitive with a gcd a third the size (chordPartnerThirdPoint):
  // making the answer primitive by a full gcd was a sixth of the time at n ≤ 200.
  const x = tangentThirdRaw(g.curve, acc);
  const c = digits[last] === '1' ? minusQ : base;
  return sameRaw(x, c.point) ? canonical(tangentThirdRaw(g.curve, x)) : chordPartnerThirdPoint(c, x);
}

const BASE_PARTNERS = new WeakMap<CubicGroup, ChordPartner>();

/** The chord with O prepared once per group (chord-partner.ts). */
function basePartner(g: CubicGroup): ChordPartner {
  let c = BASE_PARTNERS.get(g);
  if (!c) {
    c = chordPartnerMake(g.curve, g.base);
    BASE_PARTNERS.set(g, c);
  }
  return c;
}

// Assumes x a smooth point of g.curve at any non-zero scale; the same triple as starRaw(g, x, c.point).
function starPartner(g: CubicGroup, x: Raw, c: ChordPartner): Raw {
  return sameRaw(x, c.point) ? tangentThirdRaw(g.curve, x) : chordPartnerThirdRaw(c, x);
}

/** P + Q on the smooth cubic f with base point O. */
export function groupAdd(f: Form, o: Point, p: Point, q: Point): Point {
  const g = groupMake(f, o);
  cubicRequireSmoothPoint(f, p, 'P');
  cubicRequireSmoothPoint(f, q, 'Q');
  return groupAddIn(g, p, q);
}

/** −P on the smooth cubic f with base point O. */
export function groupNegate(f: Form, o: Point, p: Point): Point {
  const g = groupMake(f, o);
  cubicRequireSmoothPoint(f, p, 'P');
  return groupNegateIn(g, p);
}

/** The largest |n| accepted by groupMultiple: heights grow like n², so 10^4 is already tens of millions of digits away from anything useful beyond it. */
export const GROUP_MULTIPLE_LIMIT = 10_000n;

/** nP on the smooth cubic f with base point O, for |n| ≤ 10^4. */
export function groupMultiple(f: Form, o: Point, p: Point, n: bigint | number): Point {
  const m = BigInt(n);
  if (m > GROUP_MULTIPLE_LIMIT || -m > GROUP_MULTIPLE_LIMIT) {
    throw new InvalidInput(`the multiple must be between -${GROUP_MULTIPLE_LIMIT} and ${GROUP_MULTIPLE_LIMIT}, got ${m}`, 'N');
  }
  const g = groupMake(f, o);
  cubicRequireSmoothPoint(f, p, 'P');
  return groupMultipleIn(g, p, m);
}

/**
 * The image of P under the change of base point from O to O2: P ↦ P + O2 (law with base O). It is an
 * isomorphism from the group with base O to the group with base O2 (see the head of this file); its
 * inverse is P ↦ P − O2 in the law with base O.
 */
export function groupRebase(f: Form, o: Point, o2: Point, p: Point): Point {
  const g = groupMake(f, o);
  cubicRequireSmoothPoint(f, o2, 'new base');
  cubicRequireSmoothPoint(f, p, 'P');
  return groupAddIn(g, p, o2);
}
