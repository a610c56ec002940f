// The gcd of two primitive integer polynomials by images modulo many word-sized primes and the Chinese
// remainder theorem, with early termination checked by exact trial division (Brown's small-primes
// modular gcd; von zur Gathen & Gerhard, "Modern Computer Algebra", §6.7, Algorithm 6.38 in its
// early-terminating form; Cohen, "A Course in Computational Algebraic Number Theory", §3.3).
//
// Canonical form: the answer is primitive with a positive leading coefficient.
//
// Why it is right whatever the primes: a prime dividing neither leading coefficient gives an image gcd of
// degree >= the true degree; images of the least degree seen are combined, and a candidate is returned only
// after it divides both inputs exactly over Z, while its degree equals the least image degree, which is an
// upper bound on the true degree. So the candidate is a common divisor of maximal degree: the gcd.
import { modPolyGcd, modPolyReduce } from './upoly-mod.ts';
import { upolyPrimitive, type UPoly } from './upoly.ts';

/** a^-1 mod l for gcd(a, l) = 1, l < 2^26. */
function invMod(a: number, l: number): number {
  let [r0, r1] = [a % l, l];
  let [s0, s1] = [1, 0];
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  return ((s0 % l) + l) % l;
}

function mulMod(a: number, b: number, l: number): number {
  // a, b < 2^26: the product is below 2^52, exact in a double.
  return (a * b) % l;
}

function powMod(b: number, e: number, l: number): number {
  let r = 1;
  b %= l;
  while (e > 0) {
    if (e & 1) r = mulMod(r, b, l);
    b = mulMod(b, b, l);
    e = Math.floor(e / 2);
  }
  return r;
}

/** Deterministic Miller–Rabin for n < 2^32 with bases 2, 7, 61 (Jaeschke 1993). Assumes n < 2^26 here. */
export function isPrimeSmall(n: number): boolean {
  if (n < 2) return false;
  for (const p of [2, 3, 5, 7, 11, 13, 61]) if (n % p === 0) return n === p;
  let d = n - 1;
  let s = 0;
  while (d % 2 === 0) {
    d /= 2;
    s++;
  }
  outer: for (const a of [2, 7, 61]) {
    let x = powMod(a, d, n);
    if (x === 1 || x === n - 1) continue;
    for (let i = 1; i < s; i++) {
      x = mulMod(x, x, n);
      if (x === n - 1) continue outer;
    }
    return false;
  }
  return true;
}

const PRIMES: number[] = [];
let primeCursor = 1 << 26;

/** The i-th prime below 2^26, counting down (generated once, cached). */
function primeAt(i: number): number {
  while (PRIMES.length <= i) {
    do primeCursor--;
    while (!isPrimeSmall(primeCursor));
    PRIMES.push(primeCursor);
  }
  return PRIMES[i];
}

/** Does q divide p over Z? (Exact division with an early exit on the first non-integral quotient.) */
function dividesOverZ(q: readonly bigint[], p: readonly bigint[]): boolean {
  const dq = q.length - 1;
  const n = p.length - 1 - dq;
  if (n < 0) return false;
  const lq = q[dq];
  const r = p.slice();
  for (let k = n; k >= 0; k--) {
    const top = r[k + dq];
    const t = top / lq;
    if (t * lq !== top) return false;
    if (t !== 0n) for (let j = 0; j <= dq; j++) r[k + j] -= t * q[j];
  }
  for (let j = 0; j < dq; j++) if (r[j] !== 0n) return false;
  return true;
}

/** Primitive gcd of primitive a, b with deg a, deg b >= 1. */
export function upolyGcdModular(a: readonly bigint[], b: readonly bigint[]): UPoly {
  const la = a[a.length - 1];
  const lb = b[b.length - 1];
  // The gcd's leading coefficient divides c = gcd(la, lb); images are normalised to lead c.
  let c = la < 0n ? -la : la;
  let y = lb < 0n ? -lb : lb;
  while (y !== 0n) [c, y] = [y, c % y];
  let bestDeg = Math.min(a.length, b.length); // above any possible degree
  let G: bigint[] = [];
  let M = 1n;
  let prevSym: bigint[] | null = null;
  for (let i = 0; ; i++) {
    const l = primeAt(i);
    const L = BigInt(l);
    if (la % L === 0n || lb % L === 0n) continue;
    const g = modPolyGcd(modPolyReduce(a, l), modPolyReduce(b, l), l); // monic
    const deg = g.length - 1;
    if (deg === 0) return [1n];
    if (deg > bestDeg) continue; // an unlucky prime
    const cl = Number(c % L);
    const img = g.map((x) => mulMod(x, cl, l));
    if (deg < bestDeg) {
      // Every earlier prime was unlucky: start again from this image.
      bestDeg = deg;
      G = img.map((x) => BigInt(x));
      M = L;
      prevSym = null;
    } else {
      const inv = invMod(Number(M % L), l);
      for (let k = 0; k <= deg; k++) {
        const gk = Number(G[k] % L);
        const t = mulMod(((img[k] - gk) % l + l) % l, inv, l);
        G[k] += M * BigInt(t);
      }
      M *= L;
    }
    const half = M >> 1n;
    const sym = G.map((x) => (x > half ? x - M : x));
    const stable = prevSym !== null && sym.every((x, k) => x === prevSym![k]);
    prevSym = sym;
    if (stable) {
      const h = upolyPrimitive(sym);
      if (h.length - 1 === bestDeg && dividesOverZ(h, a) && dividesOverZ(h, b)) return h;
    }
  }
}
