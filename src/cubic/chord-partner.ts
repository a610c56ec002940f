// The chord with a fixed point S of a cubic, prepared once for many partners X (the group law's chains
// meet the same two or three points over and over).
//
// Canonical form: the triple returned is exactly chordThirdRaw(f, X, S) — the same integer triple, not
// only the same projective point — so a chain may mix the two freely.
//
// What is prepared: ∇F(S) (so X·∇F(S) is three products), the quadratic form q_S(X) = S·∇F(X) =
// Σ S_i ∂_iF(X) (six products with the squares of X instead of eighteen and a dot), and a basis ℓ2, ℓ3 of
// the integer linear forms vanishing at S, with ℓ1·S = 1. For S primitive, M = (ℓ1; ℓ2; ℓ3) is
// unimodular and carries S to e1, and a unimodular M keeps contents of cross products (MS × MX = M^{-T}(S × X) up to
// sign), so content(S × X) = content(e1 × MX) = gcd(ℓ2(X), ℓ3(X)): one gcd where content(S × X) may take two.
// M and M⁻¹ are kept too, so the division of the chord's triple by k³ runs on MX (see partnerThird).
import { gcd } from '../exact/gcd.ts';
import type { Form } from '../poly/form.ts';
import { cross, dot, type Point } from '../plane/point.ts';
import { Degenerate } from '../exact/errors.ts';
import { content } from '../exact/integer.ts';
import { cubicGradientAt, cubicGradientForms, divideCube } from './chord.ts';

export interface ChordPartner {
  readonly curve: Form;
  readonly point: Point;
  readonly gradient: readonly bigint[];
  /** Coefficients of S·∇F(X) on X², XY, XZ, Y², YZ, Z² (form.ts order). */
  readonly quadratic: readonly bigint[];
  readonly l1: readonly bigint[];
  readonly l2: readonly bigint[];
  readonly l3: readonly bigint[];
  /** Columns of M⁻¹ for M = (ℓ1; ℓ2; ℓ3): M⁻¹ carries (t, u, v) back to t·w1 + u·w2 + v·w3. */
  readonly inverse: readonly (readonly bigint[])[];
}

/** Integer x, y with x·a + y·b = gcd(a, b) >= 0. Assumes a, b not both zero. */
function extendedGcd(a: bigint, b: bigint): [bigint, bigint, bigint] {
  let [r0, r1, x0, x1, y0, y1] = [a, b, 1n, 0n, 0n, 1n];
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [x0, x1] = [x1, x0 - q * x1];
    [y0, y1] = [y1, y0 - q * y1];
  }
  return r0 < 0n ? [-r0, -x0, -y0] : [r0, x0, y0];
}

/**
 * A basis ℓ2, ℓ3 of {ℓ ∈ Z³ : ℓ·S = 0} for a primitive S, and ℓ1 with ℓ1·S = 1: with g = gcd(s0, s1) =
 * x·s0 + y·s1 and u·g + v·s2 = 1, ℓ1 = (u·x, u·y, v), ℓ2 = (s1/g, −s0/g, 0), ℓ3 = (x·s2, y·s2, −g);
 * ℓ2 × ℓ3 = ±S, so they span the whole lattice and (ℓ1, ℓ2, ℓ3) is unimodular.
 */
function unimodularBasis(s: Point): [bigint[], bigint[], bigint[]] {
  if (s[0] === 0n && s[1] === 0n) return [[0n, 0n, s[2]], [1n, 0n, 0n], [0n, 1n, 0n]];
  const [g, x, y] = extendedGcd(s[0], s[1]);
  const [, u, v] = extendedGcd(g, s[2]);
  return [[u * x, u * y, v], [s[1] / g, -s[0] / g, 0n], [x * s[2], y * s[2], -g]];
}

/** Prepares the chord with S, a primitive smooth point of the cubic f (internal tier: not checked). */
export function chordPartnerMake(f: Form, s: Point): ChordPartner {
  const [fx, fy, fz] = cubicGradientForms(f);
  const quadratic = [0, 1, 2, 3, 4, 5].map((k) => s[0] * fx.coeffs[k] + s[1] * fy.coeffs[k] + s[2] * fz.coeffs[k]);
  const [l1, l2, l3] = unimodularBasis(s);
  // M = (ℓ1; ℓ2; ℓ3) has det ±1, so M⁻¹ = det·adj(M), whose columns are ℓ2 × ℓ3, ℓ3 × ℓ1, ℓ1 × ℓ2.
  const det = dot(l1, cross(l2, l3));
  const inverse = [cross(l2, l3), cross(l3, l1), cross(l1, l2)].map((w) => w.map((e) => e * det));
  return { curve: f, point: s, gradient: cubicGradientAt(f, s), quadratic, l1, l2, l3, inverse };
}

/**
 * X * S as chordThirdRaw(f, X, S) computes it (internal tier: f a cubic, X ≠ S projectively, X any
 * non-zero integer triple on f). Degenerate when the line XS lies inside the curve.
 */
export function chordPartnerThirdRaw(c: ChordPartner, x: readonly bigint[]): bigint[] {
  return partnerThird(c, x).r;
}

/**
 * X * S as the canonical primitive triple, the same as triple() of chordPartnerThirdRaw(c, x) (internal
 * tier, as chordPartnerThirdRaw), with a small gcd in place of a full one. Why: with R = aX − bS = k³r
 * and k = content(S × X), S × r = (a/k²)·m with m = (S × X)/k primitive, so content(r) divides
 * content(S × r) = |a/k²|, about a third the size of r: content(r) = gcd(a/k², r).
 */
export function chordPartnerThirdPoint(c: ChordPartner, x: readonly bigint[]): Point {
  const { r, h } = partnerThird(c, x);
  const g = content([h, r[0], r[1], r[2]]);
  const first = r[0] !== 0n ? r[0] : r[1] !== 0n ? r[1] : r[2];
  const s = first < 0n ? -g : g;
  return s === 1n ? [r[0], r[1], r[2]] : [r[0] / s, r[1] / s, r[2] / s];
}

/**
 * Assumes as chordPartnerThirdRaw. r is the triple chordThirdRaw gives; h a multiple of content(r) (0 when
 * none is known). The division by k³ runs in the coordinates MX = (t, u, v), where MS = e1 and
 * k = gcd(u, v): MR = (a·t − b, a·u, a·v), and with gcd(u/k, v/k) = 1, k³ divides it exactly when
 * k² | a and k³ | a·t − b. Then r = M⁻¹((a·t − b)/k³, (a/k²)(u/k), (a/k²)(v/k)): two checked divisions
 * and one big product where dividing R took three of each and three products.
 */
function partnerThird(c: ChordPartner, x: readonly bigint[]): { r: bigint[]; h: bigint } {
  const [x0, x1, x2] = x;
  const q = c.quadratic;
  // Horner in the rows of the quadratic form: three products of big coordinates instead of six (the
  // q_k are small, so the inner sums cost little).
  const b = x0 * (q[0] * x0 + q[1] * x1 + q[2] * x2) + x1 * (q[3] * x1 + q[4] * x2) + x2 * (q[5] * x2);
  const a = dot(x, c.gradient);
  // R = aX − bS vanishes only when a = b = 0, X and S being independent.
  if (a === 0n && b === 0n) {
    throw new Degenerate('the line through the two points lies inside the curve, so it has no third point', 'P, Q');
  }
  const u = dot(c.l2, x);
  const v = dot(c.l3, x);
  const k = gcd(u, v);
  if (k > 1n) {
    const k2 = k * k;
    const h = a / k2;
    if (h * k2 === a) {
      const e = a * dot(c.l1, x) - b;
      const k3 = k2 * k;
      const rho = e / k3;
      if (rho * k3 === e) {
        const hu = h * (u / k);
        const hv = h * (v / k);
        const [w1, w2, w3] = c.inverse;
        return { r: [0, 1, 2].map((j) => rho * w1[j] + hu * w2[j] + hv * w3[j]), h };
      }
    }
  }
  const s = c.point;
  const r = [a * x0 - b * s[0], a * x1 - b * s[1], a * x2 - b * s[2]];
  // k = 1: r = R and content(R) | a (the argument above with k = 1); otherwise divideCube made r primitive.
  return { r: divideCube(r, k), h: k === 1n ? a : 1n };
}
