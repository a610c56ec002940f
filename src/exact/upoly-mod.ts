// Univariate polynomials over a small prime field F_l, used only as cheap exact filters: "the integer gcd is
// 1" and "at most N rational roots" are proved by one computation modulo a good prime.
//
// Canonical form: `ModPoly = number[]`, coefficient of x^i at index i, each in [0, l), trimmed. Primes are
// below 2^26 so every product of two residues is below 2^52 and exact in a double.

export type ModPoly = number[];

/** Primes just below 2^26, tried in order; any prime dividing a leading coefficient is skipped by callers. */
export const FILTER_PRIMES: readonly number[] = [
  67108859, 67108837, 67108819, 67108777, 67108763, 67108757, 67108753, 67108747, 67108739, 67108729,
  67108721, 67108709, 67108693, 67108669, 67108667, 67108661,
];

function trim(p: number[]): ModPoly {
  let n = p.length;
  while (n > 0 && p[n - 1] === 0) n--;
  p.length = n;
  return p;
}

/**
 * x mod l in [0, l) for integers |x| < 2^53, by a multiply and floor instead of the double % (a slow runtime
 * call in V8): the float quotient is off by at most one, and q·l is exact, so one correction step suffices.
 */
export function modReduce(x: number, l: number): number {
  let r = x - Math.floor(x / l) * l;
  if (r < 0) r += l;
  else if (r >= l) r -= l;
  return r;
}

function mulMod(a: number, b: number, l: number): number {
  return modReduce(a * b, l);
}

/** a^-1 mod l by the extended Euclidean algorithm; assumes gcd(a, l) = 1. */
function invMod(a: number, l: number): number {
  let r0 = a;
  let r1 = l;
  let s0 = 1;
  let s1 = 0;
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    const r2 = r0 - q * r1;
    r0 = r1;
    r1 = r2;
    const s2 = s0 - q * s1;
    s0 = s1;
    s1 = s2;
  }
  return modReduce(s0, l);
}

export function modPolyReduce(p: readonly bigint[], l: number): ModPoly {
  const L = BigInt(l);
  return trim(
    p.map((c) => {
      const r = Number(c % L);
      return r < 0 ? r + l : r;
    }),
  );
}

function makeMonic(p: ModPoly, l: number): ModPoly {
  const inv = invMod(p[p.length - 1], l);
  return p.map((c) => mulMod(c, inv, l));
}

/** Remainder of a by b (b non-zero). */
export function modPolyRem(a: readonly number[], b: readonly number[], l: number): ModPoly {
  const r = a.slice();
  const db = b.length - 1;
  const inv = invMod(b[db], l);
  for (let k = r.length - 1; k >= db; k--) {
    const c = mulMod(r[k], inv, l);
    if (c === 0) continue;
    const base = k - db;
    for (let j = 0; j <= db; j++) r[base + j] = modReduce(r[base + j] - c * b[j], l);
  }
  r.length = Math.min(r.length, db);
  return trim(r);
}

/** Monic gcd ([] when both are zero). */
export function modPolyGcd(a: readonly number[], b: readonly number[], l: number): ModPoly {
  let x = a.slice();
  let y = b.slice();
  while (y.length > 0) {
    const r = modPolyRem(x, y, l);
    x = y;
    y = r;
  }
  return x.length === 0 ? x : makeMonic(x, l);
}

export function modPolyDerivative(p: readonly number[], l: number): ModPoly {
  const r: number[] = [];
  for (let i = 1; i < p.length; i++) r.push(mulMod(i % l, p[i], l));
  return trim(r);
}

/** Primes just below 2^16 for root counting: x^l mod f needs only 16 squarings, and every sum of d
 * products of residues stays far below 2^53. */
export const COUNT_PRIMES: readonly number[] = [
  65521, 65519, 65497, 65479, 65449, 65447, 65437, 65423, 65419, 65413, 65407, 65393, 65381, 65371, 65357, 65353,
];

/**
 * Number of distinct roots of p in F_l: deg gcd(x^l − x, p) (common practice; Cohen, "A Course in
 * Computational Algebraic Number Theory", §3.4.1). Assumes deg p >= 1 and l < 2^20.
 */
export function modPolyRootCount(p: readonly number[], l: number): number {
  const f = makeMonic(p.slice(), l);
  const d = f.length - 1;
  if (d === 1) return 1;
  // x^l mod f, left-to-right binary powering; multiplying by x is a shift and one reduction step.
  // Entries of a square are below d·l² < 2^37 and each reduction step subtracts less than l² more, so
  // the doubles stay exact with one % per coefficient instead of one per operation.
  const r = new Float64Array(d);
  r[1] = 1;
  const prod = new Float64Array(2 * d - 1);
  const topBit = 31 - Math.clz32(l);
  for (let bit = topBit - 1; bit >= 0; bit--) {
    prod.fill(0);
    for (let i = 0; i < d; i++) {
      const a = r[i];
      if (a === 0) continue;
      for (let j = 0; j < d; j++) prod[i + j] += a * r[j];
    }
    for (let k = 2 * d - 2; k >= d; k--) {
      const c = prod[k] % l;
      if (c === 0) continue;
      const base = k - d;
      for (let j = 0; j < d; j++) prod[base + j] -= c * f[j];
    }
    for (let k = 0; k < d; k++) {
      const v = prod[k] % l;
      r[k] = v < 0 ? v + l : v;
    }
    if ((l >> bit) & 1) {
      const top = r[d - 1];
      for (let k = d - 1; k >= 1; k--) r[k] = r[k - 1];
      r[0] = 0;
      if (top !== 0) {
        for (let j = 0; j < d; j++) {
          const v = (r[j] - top * f[j]) % l;
          r[j] = v < 0 ? v + l : v;
        }
      }
    }
  }
  const xl: number[] = Array.from(r);
  while (xl.length < 2) xl.push(0);
  xl[1] = (xl[1] - 1 + l) % l;
  const g = modPolyGcd(f, trim(xl), l);
  return g.length === 0 ? d : g.length - 1;
}
