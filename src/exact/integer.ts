// Integer helpers on native BigInt. Content and primitive parts of integer vectors are the canonical
// normalisation of projective points, lines and forms (first non-zero entry positive).
import { gcd } from './gcd.ts';

export { gcd };

export function bigAbs(a: bigint): bigint {
  return a < 0n ? -a : a;
}

export function bigSign(a: bigint): -1 | 0 | 1 {
  return a > 0n ? 1 : a < 0n ? -1 : 0;
}

export function lcm(a: bigint, b: bigint): bigint {
  if (a === 0n || b === 0n) return 0n;
  return bigAbs((a / gcd(a, b)) * b);
}

/** gcd of all entries (>= 0); 0 for the zero vector. Stops early once the running gcd is 1. */
export function content(v: readonly bigint[]): bigint {
  let g = 0n;
  for (const x of v) {
    if (x === 0n) continue;
    g = g === 0n ? bigAbs(x) : gcd(g, x);
    if (g === 1n) return 1n;
  }
  return g;
}

/** v divided by its content, with the first non-zero entry made positive. The zero vector is returned as is. */
export function primitive(v: readonly bigint[]): bigint[] {
  const g = content(v);
  if (g === 0n) return v.slice();
  let first = 0n;
  for (const x of v) {
    if (x !== 0n) {
      first = x;
      break;
    }
  }
  const s = first < 0n ? -g : g;
  return g === 1n && s > 0n ? v.slice() : v.map((x) => x / s);
}

/** Number of bits of |a| (0 for 0). */
export function bitLength(a: bigint): number {
  if (a < 0n) a = -a;
  if (a === 0n) return 0;
  const hex = a.toString(16);
  return (hex.length - 1) * 4 + (32 - Math.clz32(parseInt(hex[0], 16)));
}

/** floor(sqrt(n)) for n >= 0 (Newton's method from a float start). */
export function isqrt(n: bigint): bigint {
  if (n < 0n) throw new RangeError('isqrt of a negative number');
  if (n < 2n) return n;
  // A float start when n is inside the double range, else a power of two above the root.
  const approx = Number(n);
  let x = Number.isFinite(approx) ? BigInt(Math.floor(Math.sqrt(approx))) : 0n;
  if (x === 0n) x = 1n << BigInt((bitLength(n) >> 1) + 1);
  for (;;) {
    const y = (x + n / x) >> 1n;
    if (y >= x) {
      // Newton from above converges monotonically; fix a start that was below the root.
      while (x * x > n) x -= 1n;
      while ((x + 1n) * (x + 1n) <= n) x += 1n;
      return x;
    }
    x = y;
  }
}

export function isSquare(n: bigint): boolean {
  if (n < 0n) return false;
  const r = isqrt(n);
  return r * r === n;
}

/** Nearest double to a (possibly huge) integer; ±Infinity past the double range. */
export function bigToNumber(a: bigint): number {
  return Number(a);
}
