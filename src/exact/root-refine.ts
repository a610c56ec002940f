// Refinement of one simple real root of an integer polynomial inside a bracketing interval, to any width.
//
// Canonical form: the bracket is dyadic, (a/2^k, b/2^k) with integers a < b, the root strictly inside, the
// signs of f at both ends known, non-zero and opposite; or the root was hit exactly (`exact`).
//
// Method: Newton steps from the midpoint, each rounded onto a grid twice as fine and accepted only when the
// two grid points around the prediction still bracket the root inside the old bracket (so the answer never
// rests on the convergence theory); a failed step falls back to bisection and asks for more guard bits.
// This is a simple relative of Abbott's quadratic interval refinement (J. Abbott, "Quadratic interval
// refinement for real roots", 2006): precision doubles per accepted step.
import { InvalidInput } from './errors.ts';
import { bitLength } from './integer.ts';
import { ratCmp, type Rational } from './rational.ts';
import { upolyScaledFloats } from './float-roots.ts';
import { upolyDerivative, upolySignAt } from './upoly.ts';

export interface RootInterval {
  readonly lo: Rational;
  readonly hi: Rational;
}

/** 2^(k·deg)·f(m/2^k), whose sign is the sign of f(m/2^k). Assumes f non-zero, k >= 0. */
export function upolyEvalDyadic(f: readonly bigint[], m: bigint, k: number): bigint {
  const d = f.length - 1;
  let r = f[d];
  const K = BigInt(k);
  for (let i = d - 1; i >= 0; i--) r = r * m + (f[i] << (K * BigInt(d - i)));
  return r;
}

function sgn(v: bigint): -1 | 0 | 1 {
  return v > 0n ? 1 : v < 0n ? -1 : 0;
}

/**
 * The canonical rational m/2^k (k >= 0) without a gcd: strip the common factors 2 (a general gcd of a
 * 3,000-bit numerator with 2^k would cost a hundred Lehmer steps).
 */
export function dyadicRat(m: bigint, k: number): Rational {
  if (m === 0n) return { num: 0n, den: 1n };
  const low = m & -m; // the lowest set bit of m
  const tz = bitLength(low) - 1;
  const t = Math.min(tz, k);
  return { num: m >> BigInt(t), den: 1n << BigInt(k - t) };
}

/** floor(a / b) for b > 0. */
export function floorDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return a < 0n && q * b !== a ? q - 1n : q;
}

function isPowerOfTwo(n: bigint): boolean {
  return n > 0n && (n & (n - 1n)) === 0n;
}

export class RootRefiner {
  private a = 0n;
  private b = 0n;
  private k = 0;
  private sa: -1 | 1 = 1;
  private guard = 6;
  private readonly df: bigint[];
  /** The root itself, once a grid point hits it. */
  exact: Rational | null = null;

  /** f square-free or at least with a sign change at lo < hi and exactly one root inside (the caller's promise). */
  constructor(
    private readonly f: readonly bigint[],
    lo: Rational,
    hi: Rational,
  ) {
    this.df = upolyDerivative(f);
    const sLo = upolySignAt(f, lo);
    const sHi = upolySignAt(f, hi);
    if (sLo === 0 || sHi === 0 || sLo === sHi) {
      throw new InvalidInput('the interval does not bracket a simple root: the polynomial must change sign strictly between its ends', 'interval');
    }
    this.sa = sLo;
    this.toDyadic(lo, hi, sLo);
  }

  /** Finds dyadic points xL in [lo, root) and xR in (root, hi] on one grid. */
  private toDyadic(lo: Rational, hi: Rational, sLo: -1 | 1): void {
    // 2^-k below a quarter of the width (unreduced fraction: only its size matters).
    let k = Math.max(0, bitLength(lo.den * hi.den) - bitLength(hi.num * lo.den - lo.num * hi.den) + 3);
    let aK: bigint | null = isPowerOfTwo(lo.den) ? lo.num : null;
    let aScale = aK === null ? 0 : bitLength(lo.den) - 1;
    let bK: bigint | null = isPowerOfTwo(hi.den) ? hi.num : null;
    let bScale = bK === null ? 0 : bitLength(hi.den) - 1;
    for (; aK === null && this.exact === null; k += 8) {
      const m = -floorDiv(-lo.num << BigInt(k), lo.den); // ceil(lo·2^k)
      const s = sgn(upolyEvalDyadic(this.f, m, k));
      if (s === 0) this.exact = dyadicRat(m, k);
      else if (s === sLo) {
        aK = m;
        aScale = k;
      }
    }
    for (; bK === null && this.exact === null; k += 8) {
      const mf = floorDiv(hi.num << BigInt(k), hi.den); // floor(hi·2^k)
      const s = sgn(upolyEvalDyadic(this.f, mf, k));
      if (s === 0) this.exact = dyadicRat(mf, k);
      else if (s === -sLo) {
        bK = mf;
        bScale = k;
      }
    }
    if (this.exact !== null || aK === null || bK === null) return;
    const K = Math.max(aScale, bScale);
    this.a = aK << BigInt(K - aScale);
    this.b = bK << BigInt(K - bScale);
    this.k = K;
  }

  /** About -log2 of the bracket's width. */
  widthBits(): number {
    if (this.exact) return Infinity;
    return this.k - bitLength(this.b - this.a);
  }

  interval(): RootInterval {
    if (this.exact) return { lo: this.exact, hi: this.exact };
    return { lo: dyadicRat(this.a, this.k), hi: dyadicRat(this.b, this.k) };
  }

  /** Is q in the closed bracket? */
  contains(q: Rational): boolean {
    if (this.exact) return ratCmp(q, this.exact) === 0;
    const x = q.num << BigInt(this.k);
    return this.a * q.den <= x && x <= this.b * q.den;
  }

  /** A point of the bracket (its midpoint) as a dyadic m/2^k. */
  midpoint(): { m: bigint; k: number } {
    return { m: this.a + this.b, k: this.k + 1 };
  }

  /** Refine until the width is at most 2^-bits. */
  refineToBits(bits: number): void {
    if (!this.exact && this.k - bitLength(this.b - this.a - 1n) < bits) this.seed();
    while (!this.exact && this.k - bitLength(this.b - this.a - 1n) < bits) this.step();
  }

  /** Refine until the width is at most w (w > 0). */
  refineToWidth(w: Rational): void {
    if (w.num <= 0n) throw new InvalidInput('the target width must be positive', 'width');
    if (!this.exact && (this.b - this.a) * w.den > w.num << BigInt(this.k)) this.seed();
    while (!this.exact && (this.b - this.a) * w.den > w.num << BigInt(this.k)) this.step();
  }

  /**
   * Once per refiner: a floating safeguarded Newton inside the bracket proposes the root to ~45 bits, and
   * the two dyadic grid points around the proposal are accepted as the new bracket only if f changes sign
   * between them and they lie inside the old bracket. A bad proposal costs two evaluations and is dropped.
   */
  private seeded = false;
  private seed(): void {
    if (this.seeded) return;
    this.seeded = true;
    const den = 2 ** -this.k;
    const lo = Number(this.a) * den;
    const hi = Number(this.b) * den;
    if (!Number.isFinite(lo) || !Number.isFinite(hi) || !(hi > lo) || this.k > 1000) return;
    const x = floatRootIn(upolyScaledFloats(this.f), lo, hi, this.sa);
    if (x === null) return;
    const scale = Math.max(Math.abs(x), Number.MIN_VALUE * 2 ** 60);
    const K = Math.max(this.k + 4, Math.ceil(44 - Math.log2(scale)));
    if (K > 1060 || K - this.k > 4000) return;
    for (const spread of [1n, 1n << 12n]) {
      const m = BigInt(Math.round(x * 2 ** Math.min(K, 1000))) << BigInt(K - Math.min(K, 1000));
      const l = m - spread;
      const h = m + spread;
      const up = BigInt(K - this.k);
      if (l < this.a << up || h > this.b << up) return;
      if (spread === 1n && upolyEvalDyadic(this.f, m, K) === 0n) {
        this.exact = dyadicRat(m, K); // the proposal itself is the root (a dyadic root)
        return;
      }
      const sl = sgn(upolyEvalDyadic(this.f, l, K));
      if (sl === 0) {
        this.exact = dyadicRat(l, K);
        return;
      }
      const sh = sgn(upolyEvalDyadic(this.f, h, K));
      if (sh === 0) {
        this.exact = dyadicRat(h, K);
        return;
      }
      if (sl === this.sa && sh === -this.sa) {
        this.a = l;
        this.b = h;
        this.k = K;
        return;
      }
    }
  }

  private bisect(): void {
    const m = this.a + this.b;
    this.a <<= 1n;
    this.b <<= 1n;
    this.k += 1;
    const s = sgn(upolyEvalDyadic(this.f, m, this.k));
    if (s === 0) this.exact = dyadicRat(m, this.k);
    else if (s === this.sa) this.a = m;
    else this.b = m;
  }

  /** One Newton step if it brackets, else two bisections. */
  step(): void {
    const k0 = this.k + 1;
    const m0 = this.a + this.b;
    const wb = this.k - bitLength(this.b - this.a);
    const K = Math.max(k0 + 1, 2 * wb - this.guard);
    const P = upolyEvalDyadic(this.f, m0, k0);
    if (P === 0n) {
      this.exact = dyadicRat(m0, k0);
      return;
    }
    const Q = this.df.length === 0 ? 0n : upolyEvalDyadic(this.df, m0, k0);
    if (Q !== 0n && K > k0 + 2) {
      const sh = BigInt(K - k0);
      const m1 = (m0 << sh) - (P << sh) / Q;
      const lo = m1 - 1n;
      const hi = m1 + 1n;
      const up = BigInt(K - this.k);
      if (lo >= this.a << up && hi <= this.b << up) {
        const sL = sgn(upolyEvalDyadic(this.f, lo, K));
        const sH = sL === 0 ? 0 : sgn(upolyEvalDyadic(this.f, hi, K));
        if (sL === 0) {
          this.exact = dyadicRat(lo, K);
          return;
        }
        if (sH === 0) {
          this.exact = dyadicRat(hi, K);
          return;
        }
        if (sL === this.sa && sH === -this.sa) {
          this.a = lo;
          this.b = hi;
          this.k = K;
          if (this.guard > 6) this.guard -= 2;
          return;
        }
      }
      this.guard += 8;
    }
    this.bisect();
    if (!this.exact) this.bisect();
  }
}

/**
 * A root of the (scaled, floating) polynomial in (lo, hi) by Newton's method safeguarded by bisection
 * (common practice; Press et al., "Numerical Recipes", §9.4, rtsafe). sLo = the sign of f at lo.
 * Returns null when the floats cannot follow the sign change.
 */
function floatRootIn(c: Float64Array, lo: number, hi: number, sLo: number): number | null {
  const n = c.length - 1;
  let a = lo;
  let b = hi;
  let x = 0.5 * (a + b);
  for (let it = 0; it < 100; it++) {
    let p = c[n];
    let dp = 0;
    for (let i = n - 1; i >= 0; i--) {
      dp = dp * x + p;
      p = p * x + c[i];
    }
    if (!Number.isFinite(p) || !Number.isFinite(dp)) return null;
    if (p === 0) return x;
    if (Math.sign(p) === sLo) a = x;
    else b = x;
    let next = x - p / dp;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (Math.abs(next - x) <= 2 ** -52 * Math.abs(x) || next === a || next === b) return next;
    x = next;
  }
  return x;
}

/** Does the rational x lie in the closed interval? */
export function intervalContains(iv: RootInterval, x: Rational): boolean {
  return ratCmp(iv.lo, x) <= 0 && ratCmp(x, iv.hi) <= 0;
}
