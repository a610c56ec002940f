// Factoring integers as far as minimal models need: trial division by small primes, Miller–Rabin, and
// Pollard's rho in Brent's form (Brent, "An improved Monte Carlo factorization algorithm", BIT 20, 1980).
//
// Canonical form: factors sorted by prime, each {prime, exponent} with exponent >= 1; `complete` is false
// when a composite cofactor could not be split within the work limit (it is then listed in `unfactored`).
import { gcd } from './gcd.ts';

export interface IntegerFactorisation {
  readonly factors: { prime: bigint; exponent: number }[];
  /** Composite parts that were not split (empty when complete). */
  readonly unfactored: bigint[];
  readonly complete: boolean;
}

const SMALL_LIMIT = 1 << 16;
let SMALL_PRIMES: number[] | null = null;

function smallPrimes(): number[] {
  if (SMALL_PRIMES) return SMALL_PRIMES;
  const sieve = new Uint8Array(SMALL_LIMIT + 1);
  const out: number[] = [];
  for (let i = 2; i <= SMALL_LIMIT; i++) {
    if (sieve[i]) continue;
    out.push(i);
    for (let j = i * i; j <= SMALL_LIMIT; j += i) sieve[j] = 1;
  }
  SMALL_PRIMES = out;
  return out;
}

function powMod(b: bigint, e: bigint, m: bigint): bigint {
  let r = 1n;
  b %= m;
  while (e > 0n) {
    if (e & 1n) r = (r * b) % m;
    b = (b * b) % m;
    e >>= 1n;
  }
  return r;
}

const MR_BASES = [2n, 3n, 5n, 7n, 11n, 13n, 17n, 19n, 23n, 29n, 31n, 37n, 41n, 43n, 47n, 53n];

/**
 * Miller–Rabin with the first 16 prime bases: a proof below 3.3·10^24 (Sorenson–Webster 2015), and a
 * probable-prime test above (no composite passing all 16 bases is known).
 */
export function integerIsProbablePrime(n: bigint): boolean {
  if (n < 2n) return false;
  for (const p of MR_BASES) {
    if (n === p) return true;
    if (n % p === 0n) return false;
  }
  let d = n - 1n;
  let s = 0;
  while ((d & 1n) === 0n) {
    d >>= 1n;
    s++;
  }
  outer: for (const a of MR_BASES) {
    let x = powMod(a, d, n);
    if (x === 1n || x === n - 1n) continue;
    for (let i = 1; i < s; i++) {
      x = (x * x) % n;
      if (x === n - 1n) continue outer;
    }
    return false;
  }
  return true;
}

// Assumes n odd composite with no prime factor below 2^16. Returns a proper factor or null.
function brentRho(n: bigint, maxIterations: number): bigint | null {
  for (let c = 1n; c < 20n; c++) {
    let y = 2n;
    let x = y;
    let g = 1n;
    let q = 1n;
    let r = 1;
    let ys = y;
    let iterations = 0;
    const m = 128;
    while (g === 1n && iterations < maxIterations) {
      x = y;
      for (let i = 0; i < r; i++) y = (y * y + c) % n;
      let k = 0;
      while (k < r && g === 1n) {
        ys = y;
        for (let i = 0; i < Math.min(m, r - k); i++) {
          y = (y * y + c) % n;
          q = (q * (x > y ? x - y : y - x)) % n;
        }
        g = gcd(q, n);
        k += m;
      }
      iterations += r;
      r *= 2;
    }
    if (g === n) {
      do {
        ys = (ys * ys + c) % n;
        g = gcd(x > ys ? x - ys : ys - x, n);
      } while (g === 1n);
    }
    if (g !== 1n && g !== n) return g;
  }
  return null;
}

/** Factor |n| (n ≠ 0); rho gets about `rhoIterations` steps per composite before giving up. */
export function integerFactor(n: bigint, rhoIterations = 200_000): IntegerFactorisation {
  if (n < 0n) n = -n;
  const found = new Map<bigint, number>();
  const unfactored: bigint[] = [];
  const add = (p: bigint, e = 1) => found.set(p, (found.get(p) ?? 0) + e);
  if (n === 0n) return { factors: [], unfactored: [0n], complete: false };
  for (const p of smallPrimes()) {
    const bp = BigInt(p);
    if (bp * bp > n) break;
    while (n % bp === 0n) {
      n /= bp;
      add(bp);
    }
  }
  const stack = n > 1n ? [n] : [];
  while (stack.length > 0) {
    const m = stack.pop()!;
    if (m < BigInt(SMALL_LIMIT) * BigInt(SMALL_LIMIT) || integerIsProbablePrime(m)) {
      add(m);
      continue;
    }
    const root = perfectPower(m);
    if (root) {
      for (let i = 0; i < root.k; i++) stack.push(root.base);
      continue;
    }
    const d = brentRho(m, rhoIterations);
    if (d === null) unfactored.push(m);
    else stack.push(d, m / d);
  }
  const factors = [...found.entries()].sort((a, b) => (a[0] < b[0] ? -1 : 1)).map(([prime, exponent]) => ({ prime, exponent }));
  return { factors, unfactored, complete: unfactored.length === 0 };
}

/** floor(n^(1/k)) for n >= 0, k >= 1 (Newton from above). */
export function integerRoot(n: bigint, k: number): bigint {
  if (n < 2n || k === 1) return n;
  const K = BigInt(k);
  let x = 1n << BigInt(Math.ceil(n.toString(2).length / k) + 1);
  for (;;) {
    const y = ((K - 1n) * x + n / x ** (K - 1n)) / K;
    if (y >= x) break;
    x = y;
  }
  while (x ** K > n) x--;
  while ((x + 1n) ** K <= n) x++;
  return x;
}

// Assumes n > 1. The smallest base with n = base^k, k >= 2, when there is one.
function perfectPower(n: bigint): { base: bigint; k: number } | null {
  const bits = n.toString(2).length;
  for (let k = 2; k <= bits; k++) {
    const r = integerRoot(n, k);
    if (r < 2n) break;
    if (r ** BigInt(k) === n) return { base: r, k };
  }
  return null;
}

/** The exponent of the prime p in n ≠ 0. */
export function integerValuation(n: bigint, p: bigint): number {
  if (n === 0n) return Infinity;
  let v = 0;
  while (n % p === 0n) {
    n /= p;
    v++;
  }
  return v;
}
