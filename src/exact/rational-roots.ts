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
//  3. A rational root u/v has v | a, so v <= |a|. Once a root's interval is narrower than 1/(2a²), any point x
//     of it has |x − u/v| < 1/(2v²), so u/v is a convergent of x (Legendre; Hardy & Wright, "An Introduction
//     to the Theory of Numbers", Thm 184) — the last convergent with denominator <= |a|. It is tested exactly
//     (cheap divisibility filters v | a, u | f(0) first). At coarser widths w the same test with the bound
//     v < sqrt(1/(2w)) finds roots of small height early; once N roots are found the rest are irrational.
import { InvalidInput } from './errors.ts';
import { bigAbs, bitLength } from './integer.ts';
import { rat, ratCmp, type Rational } from './rational.ts';
import { RootRefiner } from './root-refine.ts';
import { upolyRealRootIntervals } from './root-isolation.ts';
import { FILTER_PRIMES, modPolyDerivative, modPolyGcd, modPolyReduce, modPolyRootCount } from './upoly-mod.ts';
import { upolyEvalHomogeneous, upolySquarefreeFactorisation, type UPoly } from './upoly.ts';

export interface RationalRoot {
  readonly root: Rational;
  readonly multiplicity: number;
}

/** How many good primes the bound of step 1 tries before settling for the smallest count seen. */
const BOUND_PRIMES = 6;

/** Upper bound on the number of distinct rational roots of f. Assumes f primitive, square-free, deg >= 1. */
export function upolyRationalRootBound(f: readonly bigint[]): number {
  const d = f.length - 1;
  const lead = f[d];
  let best = d;
  let used = 0;
  for (const l of FILTER_PRIMES) {
    if (lead % BigInt(l) === 0n) continue;
    const fl = modPolyReduce(f, l);
    if (modPolyGcd(fl, modPolyDerivative(fl, l), l).length !== 1) continue;
    best = Math.min(best, modPolyRootCount(fl, l));
    if (best === 0 || ++used >= BOUND_PRIMES) break;
  }
  return best;
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
  return rat(p1, q1);
}

/** Is u/v a root of f? Cheap necessary conditions first (a root u/v of a primitive f has v | lead, u | f(0)). */
function isRootOf(f: readonly bigint[], c: Rational): boolean {
  const lead = f[f.length - 1];
  if (lead % c.den !== 0n) return false;
  if (c.num === 0n) return f[0] === 0n;
  if (f[0] % c.num !== 0n) return false;
  return upolyEvalHomogeneous(f, c.num, c.den) === 0n;
}

/** Distinct rational roots of f. Assumes f primitive and square-free with deg f >= 1. */
export function upolySquarefreeRationalRoots(f: readonly bigint[]): Rational[] {
  const d = f.length - 1;
  if (d === 1) return [rat(-f[0], f[1])];
  const found: Rational[] = [];
  let g: readonly bigint[] = f;
  if (g[0] === 0n) {
    found.push(rat(0n));
    g = g.slice(1);
    if (g.length === 1) return found;
  }
  const bound = upolyRationalRootBound(g);
  if (bound === 0) return found;
  let want = bound;
  const lead = bigAbs(g[g.length - 1]);
  const fullBits = 2 * bitLength(lead) + 2; // 2^-fullBits < 1/(2·lead²)
  const open: RootRefiner[] = [];
  for (const iv of upolyRealRootIntervals(g)) {
    if (ratCmp(iv.lo, iv.hi) === 0) {
      if (isRootOf(g, iv.lo)) {
        found.push(iv.lo);
        want--;
      }
    } else open.push(new RootRefiner(g, iv.lo, iv.hi));
  }
  for (let bits = 24; want > 0 && open.length > 0; bits = Math.min(2 * bits, fullBits)) {
    const last = bits >= fullBits;
    // Denominators v with 2v² < 2^bits are decided at this width.
    const denBound = last ? lead : minBig(lead, 1n << BigInt(Math.max(0, (bits - 2) >> 1)));
    for (let i = 0; i < open.length && want > 0; i++) {
      const r = open[i];
      r.refineToBits(bits);
      let cand: Rational;
      if (r.exact) cand = r.exact;
      else {
        const { m, k } = r.midpoint();
        cand = ratLastConvergent(m, 1n << BigInt(k), denBound);
      }
      if (isRootOf(g, cand)) {
        found.push(cand);
        want--;
        open.splice(i--, 1);
      } else if (last || r.exact) open.splice(i--, 1);
    }
    if (last) break;
  }
  return found.sort(ratCmp);
}

function minBig(a: bigint, b: bigint): bigint {
  return a < b ? a : b;
}

/** Every rational root of p with its multiplicity, in increasing order. The zero polynomial is refused. */
export function upolyRationalRoots(p: readonly bigint[]): RationalRoot[] {
  if (p.length === 0) throw new InvalidInput('the zero polynomial vanishes at every rational', 'polynomial');
  const out: RationalRoot[] = [];
  for (const { factor, multiplicity } of upolySquarefreeFactorisation(p)) {
    for (const root of upolySquarefreeRationalRoots(factor)) out.push({ root, multiplicity });
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
