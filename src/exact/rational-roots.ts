// All rational roots of an integer polynomial, with multiplicities, found completely and without
// enumerating divisors or trusting a tolerance.
//
// Canonical form of the answer: distinct roots in increasing order, each a canonical Rational with the
// multiplicity it has in p.
//
// Method (per square-free factor f of p, lead a = lead(f)):
//  1. Upper bound N on the number of rational roots: a root u/v of the primitive f gives the factor vx − u
//     over Z (Gauss), so modulo a prime l not dividing a with f mod l square-free, distinct rational roots
//     stay distinct roots in F_l. N = min over a few such primes of #roots in F_l. N = 0 ends the search.
//  2. Isolate the real roots exactly (root-isolation.ts) and refine them together, doubling precision.
//  2'. Before isolating, candidates from floating approximations of the roots (Aberth's method): each
//     convergent of an approximately real root is checked exactly. If as many roots are verified as the
//     bound of step 1 allows, the search is already complete; otherwise steps 2–3 run on the intervals
//     not yet accounted for. Floats only propose; nothing is accepted without the exact check.
//  3. A rational root u/v has v | a, so v <= |a|. Once a root's interval is narrower than 1/(2a²), any point x
//     of it has |x − u/v| < 1/(2v²), so u/v is a convergent of x (Legendre; Hardy & Wright, "An Introduction
//     to the Theory of Numbers", ch. X, Thm 184 — theorem number from memory) — the last convergent with
//     denominator <= |a|. It is accepted only if it lies in that root's interval and passes the exact test
//     (cheap divisibility filters v | a, u | f(0) first); at full width a failure proves the root irrational.
//     At coarser widths w the same test with the bound v < sqrt(1/(2w)) finds roots of small height early;
//     once N roots are found the rest are irrational.
import { InvalidInput } from './errors.ts';
import { bigAbs, bitLength } from './integer.ts';
import { rat, ratCmp, type Rational } from './rational.ts';
import { RootRefiner } from './root-refine.ts';
import { upolyRealRootIntervals } from './root-isolation.ts';
import { COUNT_PRIMES, modPolyDerivative, modPolyGcd, modPolyReduce, modPolyRootCount } from './upoly-mod.ts';
import { upolyFloatRoots } from './float-roots.ts';
import { upolyEvalHomogeneous, upolySquarefreeFactorisation, type UPoly } from './upoly.ts';

export interface RationalRoot {
  readonly root: Rational;
  readonly multiplicity: number;
}

/** How many good primes the bound of step 1 tries at most. */
const BOUND_PRIMES = 10;

/**
 * Step 1's bound, tightened one good prime at a time (each costs ~16 squarings modulo a 16-bit prime), so
 * the search pays for more primes only while it has not yet found as many roots as the bound allows.
 * Assumes f primitive, square-free, deg >= 1.
 */
class RationalRootBound {
  best: number;
  private next = 0;
  private used = 0;

  constructor(private readonly f: readonly bigint[]) {
    this.best = f.length - 1;
  }

  /** Tries one more good prime; false when the budget is spent. */
  tighten(): boolean {
    const lead = this.f[this.f.length - 1];
    while (this.used < BOUND_PRIMES && this.next < COUNT_PRIMES.length) {
      const l = COUNT_PRIMES[this.next++];
      if (lead % BigInt(l) === 0n) continue;
      const fl = modPolyReduce(this.f, l);
      if (modPolyGcd(fl, modPolyDerivative(fl, l), l).length !== 1) continue;
      this.used++;
      this.best = Math.min(this.best, modPolyRootCount(fl, l));
      return true;
    }
    return false;
  }
}

/** Upper bound on the number of distinct rational roots of f. Assumes f primitive, square-free, deg >= 1. */
export function upolyRationalRootBound(f: readonly bigint[]): number {
  const b = new RationalRootBound(f);
  while (b.best > 0 && b.tighten());
  return b.best;
}

/**
 * The last continued-fraction convergent of n/d (d > 0) whose denominator is <= bound (bound >= 1).
 */
export function ratLastConvergent(n: bigint, d: bigint, bound: bigint): Rational {
  // Convergents p_k/q_k with p_k = a_k p_{k-1} + p_{k-2}; stop before q exceeds the bound.
  let [p0, q0, p1, q1] = [0n, 1n, 1n, 0n];
  let [x, y] = [n, d];
  for (;;) {
    let a = x / y;
    if (x % y !== 0n && x < 0n) a -= 1n; // floor
    const p2 = a * p1 + p0;
    const q2 = a * q1 + q0;
    if (q2 > bound) break;
    [p0, q0, p1, q1] = [p1, q1, p2, q2];
    const r = x - a * y;
    if (r === 0n) break;
    [x, y] = [y, r];
  }
  // Convergents are already in lowest terms (p_k q_{k-1} − p_{k-1} q_k = ±1) with q >= 1: no gcd needed.
  return { num: p1, den: q1 };
}

/** Is u/v a root of f? Cheap necessary conditions first (a root u/v of a primitive f has v | lead, u | f(0)). */
function isRootOf(f: readonly bigint[], c: Rational): boolean {
  const lead = f[f.length - 1];
  if (lead % c.den !== 0n) return false;
  if (c.num === 0n) return f[0] === 0n;
  if (f[0] % c.num !== 0n) return false;
  return upolyEvalHomogeneous(f, c.num, c.den) === 0n;
}

export interface RationalRootOptions {
  /** Use floating candidates before isolating (default true); false runs the exact steps alone (tests). */
  readonly floatCandidates?: boolean;
}

/** Distinct rational roots of f. Assumes f primitive and square-free with deg f >= 1. */
export function upolySquarefreeRationalRoots(f: readonly bigint[], options: RationalRootOptions = {}): Rational[] {
  const d = f.length - 1;
  if (d === 1) return [rat(-f[0], f[1])];
  const found: Rational[] = [];
  let g: readonly bigint[] = f;
  if (g[0] === 0n) {
    found.push(rat(0n));
    g = g.slice(1);
    if (g.length === 1) return found;
    if (g.length === 2) return [...found, rat(-g[0], g[1])].sort(ratCmp);
  }
  const bound = new RationalRootBound(g);
  bound.tighten();
  if (bound.best === 0) return found;
  // Cheap candidates first: convergents of floating approximations, each verified exactly. When as many
  // are found as the modular bound allows, the search is complete without isolating anything.
  const early = options.floatCandidates === false ? [] : floatCandidateRoots(g);
  let count = early.length; // rational roots of g found so far
  found.push(...early);
  while (count < bound.best && bound.tighten());
  if (count >= bound.best) return found.sort(ratCmp);
  const lead = bigAbs(g[g.length - 1]);
  const fullBits = 2 * bitLength(lead) + 2; // 2^-fullBits < 1/(2·lead²)
  const open: RootRefiner[] = [];
  const intervals = upolyRealRootIntervals(g);
  bound.best = Math.min(bound.best, intervals.length);
  for (const iv of intervals) {
    if (early.some((q) => ratCmp(iv.lo, q) <= 0 && ratCmp(q, iv.hi) <= 0)) continue; // already found
    if (ratCmp(iv.lo, iv.hi) === 0) {
      if (isRootOf(g, iv.lo)) {
        found.push(iv.lo);
        count++;
      }
    } else open.push(new RootRefiner(g, iv.lo, iv.hi));
  }
  for (let bits = 24; count < bound.best && open.length > 0; bits = Math.min(2 * bits, fullBits)) {
    const last = bits >= fullBits;
    // Denominators v with 2v² < 2^bits are decided at this width.
    const denBound = last ? lead : minBig(lead, 1n << BigInt(Math.max(0, (bits - 2) >> 1)));
    for (let i = 0; i < open.length && count < bound.best; i++) {
      const r = open[i];
      r.refineToBits(bits);
      let cand: Rational;
      if (r.exact) cand = r.exact;
      else {
        const { m, k } = r.midpoint();
        cand = ratLastConvergent(m, 1n << BigInt(k), denBound);
      }
      // The candidate must be this interval's root: a convergent can also be a neighbouring root.
      if (r.contains(cand) && isRootOf(g, cand)) {
        found.push(cand);
        count++;
        open.splice(i--, 1);
      } else if (last || r.exact) open.splice(i--, 1);
    }
    if (last) break;
    // Before paying for finer widths, see whether one more prime shows that the search is complete.
    if (count < bound.best) bound.tighten();
  }
  return found.sort(ratCmp);
}

/** An exact dyadic m/2^k equal to the double x (finite). */
function dyadicOfDouble(x: number): { m: bigint; k: number } {
  if (x === 0) return { m: 0n, k: 0 };
  const k = Math.max(0, 52 - Math.floor(Math.log2(Math.abs(x))));
  return { m: BigInt(Math.round(x * 2 ** k)), k };
}

/** All convergents of m/2^k with denominator <= bound. */
function convergents(m: bigint, k: number, bound: bigint): Rational[] {
  const out: Rational[] = [];
  let [p0, q0, p1, q1] = [0n, 1n, 1n, 0n];
  let [x, y] = [m, 1n << BigInt(k)];
  for (;;) {
    let a = x / y;
    if (x % y !== 0n && x < 0n) a -= 1n;
    const p2 = a * p1 + p0;
    const q2 = a * q1 + q0;
    if (q2 > bound) break;
    out.push({ num: p2, den: q2 });
    [p0, q0, p1, q1] = [p1, q1, p2, q2];
    const r = x - a * y;
    if (r === 0n) break;
    [x, y] = [y, r];
  }
  return out;
}

/**
 * Rational roots of g among the convergents (denominator <= min(|lead|, 2^40)) of its approximately real
 * floating roots, each verified exactly: a sound subset of the rational roots, usually all of them.
 * Assumes g primitive, square-free, g(0) != 0, deg >= 2.
 */
function floatCandidateRoots(g: readonly bigint[]): Rational[] {
  const lead = bigAbs(g[g.length - 1]);
  const cap = minBig(lead, 1n << 40n);
  const { re, im } = upolyFloatRoots(g);
  const out: Rational[] = [];
  for (let i = 0; i < re.length; i++) {
    const x = re[i];
    // A non-zero rational with denominator <= 2^40 has modulus >= 2^-40; g(0) != 0, so tinier x propose nothing.
    if (!Number.isFinite(x) || Math.abs(x) < 2 ** -60 || !(Math.abs(im[i]) <= 1e-6 * Math.abs(x))) continue;
    const { m, k } = dyadicOfDouble(x);
    // Every convergent is tried (the first root met may be a close neighbour already found).
    for (const c of convergents(m, k, cap)) {
      if (!out.some((q) => q.num === c.num && q.den === c.den) && isRootOf(g, c)) out.push(c);
    }
  }
  return out;
}

function minBig(a: bigint, b: bigint): bigint {
  return a < b ? a : b;
}

/** Every rational root of p with its multiplicity, in increasing order. The zero polynomial is refused. */
export function upolyRationalRoots(p: readonly bigint[], options: RationalRootOptions = {}): RationalRoot[] {
  if (p.length === 0) throw new InvalidInput('the zero polynomial vanishes at every rational', 'polynomial');
  const out: RationalRoot[] = [];
  for (const { factor, multiplicity } of upolySquarefreeFactorisation(p)) {
    for (const root of upolySquarefreeRationalRoots(factor, options)) out.push({ root, multiplicity });
  }
  return out.sort((a, b) => ratCmp(a.root, b.root));
}

/** The polynomial ∏ (v x − u)^m of a list of rational roots, for tests and for splitting off linear factors. */
export function upolyFromRationalRoots(roots: readonly RationalRoot[]): UPoly {
  let r: bigint[] = [1n];
  for (const { root, multiplicity } of roots) {
    for (let i = 0; i < multiplicity; i++) {
      const next = new Array<bigint>(r.length + 1).fill(0n);
      for (let j = 0; j < r.length; j++) {
        next[j + 1] += r[j] * root.den;
        next[j] -= r[j] * root.num;
      }
      r = next;
    }
  }
  return r;
}
