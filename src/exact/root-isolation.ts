// Exact real root isolation of integer polynomials.
//
// Canonical form of the answer: the distinct real roots in increasing order, each as {lo, hi} with exact
// rational ends. lo == hi when the root is exactly that rational (met on the bisection grid); otherwise the
// root lies strictly inside (lo, hi), it is the only root of p in [lo, hi], and the square-free part of p
// is non-zero at lo and hi with opposite signs (p itself too when the root is simple). Intervals may share
// an end point, never a root.
//
// Method: Descartes' rule of signs with bisection, the Vincent–Collins–Akritas algorithm in its
// (0,1)-bisection form (Collins & Akritas, "Polynomial real root isolation using Descartes' rule of signs",
// SYMSAC 1976; Eigenwillig's thesis (2008), ch. 2, for the termination bound): the number of sign
// variations of (x+1)^d q(1/(x+1)) bounds the roots of q in (0,1) and is exact when it is 0 or 1.
import { InvalidInput } from './errors.ts';
import { bitLength } from './integer.ts';
import { rat, ratCmp, type Rational } from './rational.ts';
import { RootRefiner, dyadicRat, type RootInterval } from './root-refine.ts';
import {
  upolyDerivative, upolyReflect, upolySignAt, upolySquarefreePart, upolyTaylorShift1InPlace,
} from './upoly.ts';

export type { RootInterval };

/** Sign variations of the coefficient list, ignoring zeros; stops counting at `cap`. */
function signVariations(c: readonly bigint[], cap: number): number {
  let v = 0;
  let last = 0;
  for (const x of c) {
    if (x === 0n) continue;
    const s = x > 0n ? 1 : -1;
    if (last !== 0 && s !== last && ++v >= cap) return v;
    last = s;
  }
  return v;
}

/**
 * Descartes bound for the roots of q in (0, 1), capped at 2: the sign variations of the coefficients of
 * (x+1)^d q(1/(x+1)). The Taylor shift runs in passes and pass i fixes coefficient i, so counting stops as
 * soon as two variations are certain (most inner nodes of the bisection tree).
 */
function descartes01(q: readonly bigint[]): number {
  // Fast exit: all coefficients of one sign means no positive root at all.
  if (signVariations(q, 1) === 0) return 0;
  const t = q.slice().reverse();
  const n = t.length;
  let v = 0;
  let last = 0;
  for (let i = 0; i < n; i++) {
    for (let j = n - 2; j >= i; j--) t[j] += t[j + 1];
    const x = t[i];
    if (x === 0n) continue;
    const sg = x > 0n ? 1 : -1;
    if (last !== 0 && sg !== last && ++v >= 2) return 2;
    last = sg;
  }
  return v;
}

/**
 * Bits b with every positive root of f below 2^b: 2·max over coefficients of sign opposite to the lead of
 * |a_i/a_d|^(1/(d-i)) (Kioustelidis' bound, 1986), taken on bit lengths so it only overestimates. Assumes deg f >= 1.
 */
function positiveRootBoundBits(f: readonly bigint[]): number {
  const d = f.length - 1;
  const ld = bitLength(f[d]);
  const positiveLead = f[d] > 0n;
  let best = -Infinity;
  for (let i = 0; i < d; i++) {
    // Only coefficients of the opposite sign to the lead can bound positive roots from above.
    if (f[i] === 0n || (f[i] > 0n) === positiveLead) continue;
    const e = Math.ceil((bitLength(f[i]) - ld + 1) / (d - i));
    if (e > best) best = e;
  }
  return best === -Infinity ? 0 : best + 1;
}

interface DyadicRoot {
  /** root in (c·2^e, (c+1)·2^e), or exactly c·2^e when `exact`. */
  c: bigint;
  e: number;
  exact: boolean;
}

/** Roots of f in (0, ∞) as dyadic cells. Assumes f square-free, f(0) != 0. */
function isolatePositive(f: readonly bigint[]): DyadicRoot[] {
  const d = f.length - 1;
  if (d < 1 || signVariations(f, 1) === 0) return [];
  const bb = positiveRootBoundBits(f);
  // q(x) = f(2^bb x), scaled to stay integral.
  const q = f.map((c, i) => (bb >= 0 ? c << BigInt(bb * i) : c << BigInt(-bb * (d - i))));
  const out: DyadicRoot[] = [];
  const stack: { q: bigint[]; c: bigint; j: number }[] = [{ q, c: 0n, j: 0 }];
  while (stack.length > 0) {
    const node = stack.pop()!;
    const v = descartes01(node.q);
    if (v === 0) continue;
    if (v === 1) {
      out.push({ c: node.c, e: bb - node.j, exact: false });
      continue;
    }
    const n = node.q.length - 1;
    const left = node.q.map((x, i) => x << BigInt(n - i)); // 2^n q(x/2)
    const right = upolyTaylorShift1InPlace(left.slice()); // 2^n q((x+1)/2)
    if (right[0] === 0n) {
      out.push({ c: 2n * node.c + 1n, e: bb - node.j - 1, exact: true });
      right.shift();
    }
    stack.push({ q: right, c: 2n * node.c + 1n, j: node.j + 1 });
    stack.push({ q: left, c: 2n * node.c, j: node.j + 1 });
  }
  return out;
}

function dyadic(c: bigint, e: number): Rational {
  return e >= 0 ? { num: c << BigInt(e), den: 1n } : dyadicRat(c, -e);
}

/** Moves ends that are roots of f (neighbouring exact roots) inwards. Assumes f square-free, one root inside. */
function clearEnds(f: readonly bigint[], iv: RootInterval): RootInterval {
  let { lo, hi } = iv;
  // Just right of a simple root r, sign f = sign f'(r): that is the sign of f on (lo, root).
  let sLo = upolySignAt(f, lo);
  let fixLo = sLo === 0;
  if (fixLo) sLo = upolySignAt(upolyDerivative(f), lo);
  let fixHi = upolySignAt(f, hi) === 0;
  while (fixLo || fixHi) {
    const m = rat(lo.num * hi.den + hi.num * lo.den, 2n * lo.den * hi.den);
    const s = upolySignAt(f, m);
    if (s === 0) return { lo: m, hi: m };
    if (s === sLo) {
      lo = m;
      fixLo = false;
    } else {
      hi = m;
      fixHi = false;
    }
  }
  return { lo, hi };
}

/**
 * Isolating intervals of the distinct real roots of p (see the canonical form above). The zero polynomial
 * is refused (every number is a root); a non-zero constant has none.
 */
export function upolyRealRootIntervals(p: readonly bigint[]): RootInterval[] {
  if (p.length === 0) throw new InvalidInput('the zero polynomial vanishes everywhere: its roots cannot be isolated', 'polynomial');
  if (p.length === 1) return [];
  let f = upolySquarefreePart(p);
  const full = f;
  const out: RootInterval[] = [];
  if (f[0] === 0n) {
    out.push({ lo: rat(0n), hi: rat(0n) });
    f = f.slice(1);
  }
  for (const r of isolatePositive(f)) {
    out.push(r.exact ? { lo: dyadic(r.c, r.e), hi: dyadic(r.c, r.e) } : { lo: dyadic(r.c, r.e), hi: dyadic(r.c + 1n, r.e) });
  }
  for (const r of isolatePositive(upolyReflect(f))) {
    const a = dyadic(-r.c, r.e);
    out.push(r.exact ? { lo: a, hi: a } : { lo: dyadic(-r.c - 1n, r.e), hi: a });
  }
  out.sort((x, y) => ratCmp(x.lo, y.lo) || ratCmp(x.hi, y.hi));
  return out.map((iv) => (ratCmp(iv.lo, iv.hi) === 0 ? iv : clearEnds(full, iv)));
}

/** Number of distinct real roots (as PARI's polsturm counts them). */
export function upolyRealRootCount(p: readonly bigint[]): number {
  return upolyRealRootIntervals(p).length;
}

/**
 * Shrinks an isolating interval of a root of p (one returned by upolyRealRootIntervals, or any interval
 * holding exactly one root of p with p non-zero at its ends) to width <= `width`; lo == hi when the refinement
 * lands on the root exactly.
 */
export function upolyRefineRoot(p: readonly bigint[], interval: RootInterval, width: Rational): RootInterval {
  if (width.num <= 0n) throw new InvalidInput('the target width must be positive', 'width');
  if (ratCmp(interval.lo, interval.hi) === 0) return interval;
  if (ratCmp(interval.lo, interval.hi) > 0) throw new InvalidInput('the interval has lo > hi', 'interval');
  if (p.length === 0) throw new InvalidInput('the zero polynomial has no isolated roots', 'polynomial');
  let f: readonly bigint[] = p;
  const sLo = upolySignAt(f, interval.lo);
  const sHi = upolySignAt(f, interval.hi);
  // An even-multiplicity root shows no sign change in p; its square-free part has one.
  if (!(sLo !== 0 && sHi !== 0 && sLo !== sHi)) f = upolySquarefreePart(p);
  const r = new RootRefiner(f, interval.lo, interval.hi);
  r.refineToWidth(width);
  return r.interval();
}

