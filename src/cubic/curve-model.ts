// Long Weierstrass models y² + a1xy + a3y = x³ + a2x² + a4x + a6 over Q and their standard quantities.
//
// Canonical form: a model is five integers [a1, a2, a3, a4, a6]; changes of coordinates are (u, r, s, t)
// with x = u²x' + r, y = u³y' + su²x' + t (Silverman, The Arithmetic of Elliptic Curves, III.1 and
// Table 3.1), u a positive integer here, r, s, t rational.
import { rat, ratAdd, ratDiv, ratMul, ratNeg, ratPow, ratSub, RAT_ZERO, type Rational } from '../exact/rational.ts';

export type AInvariants = readonly [bigint, bigint, bigint, bigint, bigint];

export interface ModelQuantities {
  readonly b2: bigint;
  readonly b4: bigint;
  readonly b6: bigint;
  readonly b8: bigint;
  readonly c4: bigint;
  readonly c6: bigint;
  readonly discriminant: bigint;
  /** c4³/Δ; null when Δ = 0. */
  readonly j: Rational | null;
}

/** b2..b8, c4, c6, Δ, j (Silverman, AEC III.1). */
export function modelQuantities(a: AInvariants): ModelQuantities {
  const [a1, a2, a3, a4, a6] = a;
  const b2 = a1 * a1 + 4n * a2;
  const b4 = 2n * a4 + a1 * a3;
  const b6 = a3 * a3 + 4n * a6;
  const b8 = a1 * a1 * a6 + 4n * a2 * a6 - a1 * a3 * a4 + a2 * a3 * a3 - a4 * a4;
  const c4 = b2 * b2 - 24n * b4;
  const c6 = -b2 * b2 * b2 + 36n * b2 * b4 - 216n * b6;
  const discriminant = -b2 * b2 * b8 - 8n * b4 * b4 * b4 - 27n * b6 * b6 + 9n * b2 * b4 * b6;
  const j = discriminant === 0n ? null : rat(c4 * c4 * c4, discriminant);
  return { b2, b4, b6, b8, c4, c6, discriminant, j };
}

/** A point of a model: affine rational (x, y), or the point at infinity. */
export type ModelPoint = { readonly x: Rational; readonly y: Rational } | 'infinity';

export function modelContains(a: AInvariants, p: ModelPoint): boolean {
  if (p === 'infinity') return true;
  const [a1, a2, a3, a4, a6] = a.map((v) => rat(v));
  const { x, y } = p;
  const lhs = ratAdd(ratAdd(ratMul(y, y), ratMul(a1, ratMul(x, y))), ratMul(a3, y));
  const rhs = [ratPow(x, 3), ratMul(a2, ratMul(x, x)), ratMul(a4, x), a6].reduce(ratAdd, RAT_ZERO);
  return ratSub(lhs, rhs).num === 0n;
}

/** −P on the model: (x, −y − a1x − a3). */
export function modelNegate(a: AInvariants, p: ModelPoint): ModelPoint {
  if (p === 'infinity') return p;
  return { x: p.x, y: ratSub(ratNeg(p.y), ratAdd(ratMul(rat(a[0]), p.x), rat(a[2]))) };
}

export interface CoordinateChange {
  readonly u: bigint;
  readonly r: Rational;
  readonly s: Rational;
  readonly t: Rational;
}

/** The image of a point of the old model on the new one: x' = (x − r)/u², y' = (y − s(x − r) − t)/u³. */
export function modelChangePoint(ch: CoordinateChange, p: ModelPoint): ModelPoint {
  if (p === 'infinity') return p;
  const dx = ratSub(p.x, ch.r);
  const u = rat(ch.u);
  return {
    x: ratDiv(dx, ratPow(u, 2)),
    y: ratDiv(ratSub(ratSub(p.y, ratMul(ch.s, dx)), ch.t), ratPow(u, 3)),
  };
}

/** The a-invariants after the change ch (Silverman, AEC Table 3.1); null when they are not integers. */
export function modelChange(a: AInvariants, ch: CoordinateChange): AInvariants | null {
  const [a1, a2, a3, a4, a6] = a.map((v) => rat(v));
  const { r, s, t } = ch;
  const u = rat(ch.u);
  const n1 = ratAdd(a1, ratMul(rat(2n), s));
  const n2 = [a2, ratNeg(ratMul(s, a1)), ratMul(rat(3n), r), ratNeg(ratMul(s, s))].reduce(ratAdd);
  const n3 = [a3, ratMul(r, a1), ratMul(rat(2n), t)].reduce(ratAdd);
  const n4 = [
    a4, ratNeg(ratMul(s, a3)), ratMul(rat(2n), ratMul(r, a2)), ratNeg(ratMul(ratAdd(t, ratMul(r, s)), a1)),
    ratMul(rat(3n), ratMul(r, r)), ratNeg(ratMul(rat(2n), ratMul(s, t))),
  ].reduce(ratAdd);
  const n6 = [
    a6, ratMul(r, a4), ratMul(ratMul(r, r), a2), ratPow(r, 3), ratNeg(ratMul(t, a3)), ratNeg(ratMul(t, t)),
    ratNeg(ratMul(ratMul(r, t), a1)),
  ].reduce(ratAdd);
  const out = [ratDiv(n1, u), ratDiv(n2, ratPow(u, 2)), ratDiv(n3, ratPow(u, 3)), ratDiv(n4, ratPow(u, 4)), ratDiv(n6, ratPow(u, 6))];
  if (out.some((q) => q.den !== 1n)) return null;
  return [out[0].num, out[1].num, out[2].num, out[3].num, out[4].num];
}

/**
 * The change (u, r, s, t) taking model a to model b, given u (b's c4 = a's c4/u⁴): s, r, t are read off
 * the first three rows of Table 3.1 and then the whole table is checked. null when b is not that image.
 */
export function modelChangeBetween(a: AInvariants, b: AInvariants, u: bigint): CoordinateChange | null {
  const U = rat(u);
  const s = ratDiv(ratSub(ratMul(U, rat(b[0])), rat(a[0])), rat(2n));
  const r = ratDiv(ratSub(ratAdd(ratSub(ratMul(ratPow(U, 2), rat(b[1])), rat(a[1])), ratMul(s, rat(a[0]))), ratNeg(ratMul(s, s))), rat(3n));
  const t = ratDiv(ratSub(ratSub(ratMul(ratPow(U, 3), rat(b[2])), rat(a[2])), ratMul(r, rat(a[0]))), rat(2n));
  const ch = { u, r, s, t };
  const image = modelChange(a, ch);
  return image && image.every((v, k) => v === b[k]) ? ch : null;
}

/** The inverse of modelChangePoint: x = u²x' + r, y = u³y' + su²x' + t. */
export function modelChangePointBack(ch: CoordinateChange, p: ModelPoint): ModelPoint {
  if (p === 'infinity') return p;
  const u2 = rat(ch.u * ch.u);
  const u3 = rat(ch.u * ch.u * ch.u);
  return {
    x: ratAdd(ratMul(u2, p.x), ch.r),
    y: ratAdd(ratAdd(ratMul(u3, p.y), ratMul(ch.s, ratMul(u2, p.x))), ch.t),
  };
}

/** A point of the long model on the short one y² = x³ − 27c4x − 54c6: (36x + 3b2, 108(2y + a1x + a3)) (AEC III.1). */
export function modelToShort(a: AInvariants, p: ModelPoint): ModelPoint {
  if (p === 'infinity') return p;
  const b2 = a[0] * a[0] + 4n * a[1];
  return {
    x: ratAdd(ratMul(rat(36n), p.x), rat(3n * b2)),
    y: ratMul(rat(108n), ratAdd(ratAdd(ratMul(rat(2n), p.y), ratMul(rat(a[0]), p.x)), rat(a[2]))),
  };
}

/** P + Q on the model by the chord-and-tangent formulas (Silverman, AEC III.2.3). */
export function modelAdd(a: AInvariants, p: ModelPoint, q: ModelPoint): ModelPoint {
  if (p === 'infinity') return q;
  if (q === 'infinity') return p;
  const [a1, a2, a3, a4, a6] = a.map((v) => rat(v));
  let lambda: Rational;
  let nu: Rational;
  if (p.x.num * q.x.den !== q.x.num * p.x.den) {
    const dx = ratSub(q.x, p.x);
    lambda = ratDiv(ratSub(q.y, p.y), dx);
    nu = ratDiv(ratSub(ratMul(p.y, q.x), ratMul(q.y, p.x)), dx);
  } else {
    const s = ratAdd(ratAdd(p.y, q.y), ratAdd(ratMul(a1, q.x), a3));
    if (s.num === 0n) return 'infinity';
    const x = p.x;
    const x2 = ratMul(x, x);
    lambda = ratDiv([ratMul(rat(3n), x2), ratMul(rat(2n), ratMul(a2, x)), a4, ratNeg(ratMul(a1, p.y))].reduce(ratAdd), ratAdd(ratAdd(ratMul(rat(2n), p.y), ratMul(a1, x)), a3));
    nu = ratDiv([ratNeg(ratMul(x2, x)), ratMul(a4, x), ratMul(rat(2n), a6), ratNeg(ratMul(a3, p.y))].reduce(ratAdd), ratAdd(ratAdd(ratMul(rat(2n), p.y), ratMul(a1, x)), a3));
  }
  const x3 = [ratMul(lambda, lambda), ratMul(a1, lambda), ratNeg(a2), ratNeg(p.x), ratNeg(q.x)].reduce(ratAdd);
  const y3 = [ratNeg(ratMul(ratAdd(lambda, a1), x3)), ratNeg(nu), ratNeg(a3)].reduce(ratAdd);
  return { x: x3, y: y3 };
}

/** nP on the model by double-and-add. */
export function modelMultiple(a: AInvariants, p: ModelPoint, n: bigint): ModelPoint {
  if (n < 0n) return modelNegate(a, modelMultiple(a, p, -n));
  let acc: ModelPoint = 'infinity';
  for (const b of n.toString(2)) {
    acc = modelAdd(a, acc, acc);
    if (b === '1') acc = modelAdd(a, acc, p);
  }
  return acc;
}
