// Naive heights of rational points of P^2(Q).
//
// Canonical form: a point is a primitive integer triple (gcd 1, first non-zero entry positive); its height
// is H(P) = max(|X|, |Y|, |Z|) >= 1 and its logarithmic height h(P) = log H(P) (Silverman–Tate, Rational
// Points on Elliptic Curves, ch. III.1, the height of a projective point).
import { InvalidInput } from '../exact/errors.ts';
import { bigAbs, bitLength, primitive } from '../exact/integer.ts';
import type { Point } from '../plane/point.ts';

/** H(P) = max(|X|, |Y|, |Z|) of the primitive representative of P (made primitive first, so any scaling gives the same). */
export function pointHeight(p: readonly bigint[]): bigint {
  if (p.length !== 3 || (p[0] === 0n && p[1] === 0n && p[2] === 0n)) {
    throw new InvalidInput('a height needs a point X:Y:Z that is not 0:0:0');
  }
  const q = primitive(p);
  let h = 0n;
  for (const x of q) {
    const a = bigAbs(x);
    if (a > h) h = a;
  }
  return h;
}

/** h(P) = log H(P) as a double; exact to double precision even when H(P) is far beyond 2^1024. */
export function pointLogHeight(p: readonly bigint[]): number {
  const h = pointHeight(p);
  const bits = bitLength(h);
  if (bits <= 1000) return Math.log(Number(h));
  const shift = bits - 64;
  return Math.log(Number(h >> BigInt(shift))) + shift * Math.LN2;
}

/** Order points by height, then lexicographically by coordinates, so listings are reproducible. */
export function pointHeightCompare(a: Point, b: Point): number {
  const ha = pointHeight(a);
  const hb = pointHeight(b);
  if (ha !== hb) return ha < hb ? -1 : 1;
  for (let k = 0; k < 3; k++) if (a[k] !== b[k]) return a[k] < b[k] ? -1 : 1;
  return 0;
}
