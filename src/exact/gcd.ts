// The integer gcd kernel. Everything exact calls `gcd` from here and nowhere else, so the kernel can be
// swapped by measurement (tests/bench/roots.bench.ts, suite "gcd kernel", prints Euclid, the kernels and
// PARI side by side) without touching callers.
//
// Canonical form: gcd(a, b) >= 0, gcd(0, 0) = 0.
//
// Kernel, chosen by measurement on this machine (Node 20, BigInt): below 2^53 a Euclid loop on doubles;
// above, Lehmer's algorithm (Knuth, TAOCP vol. 2, §4.5.2, Algorithm L) on the leading 53 bits, which
// replaces ~15 big-number divisions by one 2×2 cofactor update, with Euclid's division step when the
// quotient is too large to simulate. Above GMP_FROM, GMP's mpz_gcd through WebAssembly where it loads
// synchronously (Node: src/exact/gcd-gmp.ts), about twice as fast as the Lehmer loop here including the
// conversions; elsewhere the Lehmer loop. Synchronous either way, so the exact core stays synchronous.
import { gcdGmpKernel } from './gcd-gmp.ts';

const TWO53 = 9007199254740992; // 2^53
const TWO53N = 9007199254740992n;
const TWO52 = 4503599627370496;
/** Below this size Euclid's BigInt divisions beat Lehmer's set-up (measured crossover ~ 22 digits). */
const LEHMER_FROM = 1n << 72n;
/** Above this size GMP (where present) beats the Lehmer loop despite the hexadecimal conversions (measured). */
const GMP_FROM = 1n << 256n;

let gmp: ((a: bigint, b: bigint) => bigint) | null | undefined;

/** Euclid on doubles; exact because both arguments are integers below 2^53. */
function gcdSmall(a: number, b: number): number {
  while (b !== 0) {
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}

function bitLen(a: bigint): number {
  const hex = a.toString(16);
  return (hex.length - 1) * 4 + (32 - Math.clz32(parseInt(hex[0], 16)));
}

/** floor(x / y) for non-negative integers below 2^53, corrected for the rounding of the float division. */
function quot(x: number, y: number): number {
  let q = Math.floor(x / y);
  let r = x - q * y;
  while (r < 0) {
    q -= 1;
    r += y;
  }
  while (r >= y) {
    q += 1;
    r -= y;
  }
  return q;
}

/** Lehmer's gcd. Assumes u >= v > 0 and u >= 2^72. Any unimodular update keeps the gcd, so a quotient
 * misjudged on the leading digits could only slow the loop, never change the answer. */
function gcdLehmer(u: bigint, v: bigint): bigint {
  let s = Math.max(0, bitLen(u) - 53);
  for (;;) {
    if (u < LEHMER_FROM) return gcdEuclidSorted(u, v);
    let x = Number(u >> BigInt(s));
    if (x < TWO52 && x > 0 && s > 0) {
      // u lost bits since the last step: move the window down without a full bit count.
      s = Math.max(0, s - (52 - Math.floor(Math.log2(x))));
      x = Number(u >> BigInt(s));
    }
    if (!(x < TWO53) || (x < TWO52 && s > 0)) {
      s = Math.max(0, bitLen(u) - 53);
      x = Number(u >> BigInt(s));
    }
    const y = Number(v >> BigInt(s));
    let A = 1;
    let B = 0;
    let C = 0;
    let D = 1;
    let xx = x;
    let yy = y;
    // Simulate Euclid on the leading digits while both bracketing quotients agree (Knuth's condition).
    while (yy + C !== 0 && yy + D !== 0) {
      const q = quot(xx + A, yy + C);
      if (q !== quot(xx + B, yy + D)) break;
      let t = A - q * C;
      A = C;
      C = t;
      t = B - q * D;
      B = D;
      D = t;
      t = xx - q * yy;
      xx = yy;
      yy = t;
    }
    if (B === 0) {
      const r = u % v;
      u = v;
      v = r;
    } else {
      const nu = BigInt(A) * u + BigInt(B) * v;
      const nv = BigInt(C) * u + BigInt(D) * v;
      u = nu;
      v = nv;
    }
    if (v === 0n) return u;
  }
}

export function gcd(a: bigint, b: bigint): bigint {
  return gcdWith(a, b, true);
}

/** The BigInt kernel alone (doubles, Euclid, Lehmer; never GMP): the fallback, tested against the GMP path. */
export function gcdBigInt(a: bigint, b: bigint): bigint {
  return gcdWith(a, b, false);
}

// The size dispatch shared by both faces: doubles, then Euclid, then GMP (when allowed and loaded), then Lehmer.
function gcdWith(a: bigint, b: bigint, allowGmp: boolean): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  if (a < b) {
    const t = a;
    a = b;
    b = t;
  }
  if (b === 0n) return a;
  if (a < TWO53N) return BigInt(gcdSmall(Number(a), Number(b)));
  if (a < LEHMER_FROM) return gcdEuclidSorted(a, b);
  if (allowGmp && a >= GMP_FROM && b >= LEHMER_FROM) {
    if (gmp === undefined) gmp = gcdGmpKernel();
    if (gmp) return gmp(a, b);
  }
  return gcdLehmer(a, b);
}

/** Which kernel answers gcds above GMP_FROM here: 'gmp' (Node) or 'lehmer' (where GMP cannot load synchronously). */
export function gcdLargeKernel(): 'gmp' | 'lehmer' {
  if (gmp === undefined) gmp = gcdGmpKernel();
  return gmp ? 'gmp' : 'lehmer';
}

/** Euclid on BigInt down to 2^53, then on doubles. Assumes a >= b >= 0. */
function gcdEuclidSorted(a: bigint, b: bigint): bigint {
  while (b !== 0n) {
    if (a < TWO53N) return BigInt(gcdSmall(Number(a), Number(b)));
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}

/** The plain Euclidean algorithm on BigInt: the baseline the kernel is measured against, and a test oracle. */
export function gcdEuclid(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}
