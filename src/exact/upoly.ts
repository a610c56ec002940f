// Univariate polynomials over Z: dense arithmetic, evaluation, exact and pseudo division.
// gcd, square-free factorisation and resultants live in upoly-gcd.ts and are re-exported here, so callers
// import everything univariate from this one module.
//
// Canonical form: `UPoly = bigint[]`, the coefficient of x^i at index i, trimmed (no trailing zeros); the
// zero polynomial is []. Every function here returns trimmed arrays and never mutates its arguments.
// "Primitive" means content 1 and positive leading coefficient (upolyPrimitive).
import { InvalidInput, NinefoldError } from './errors.ts';
import { content } from './integer.ts';
import { rat, type Rational } from './rational.ts';

export type UPoly = bigint[];

/** Drops trailing zeros (in place) and returns p. */
export function upolyTrim(p: bigint[]): UPoly {
  let n = p.length;
  while (n > 0 && p[n - 1] === 0n) n--;
  p.length = n;
  return p;
}

/** A trimmed copy of any coefficient list (index i = coefficient of x^i). */
export function upoly(coeffs: readonly (bigint | number)[]): UPoly {
  return upolyTrim(coeffs.map((c) => BigInt(c)));
}

/** Degree; -1 for the zero polynomial. */
export function upolyDegree(p: readonly bigint[]): number {
  return p.length - 1;
}

/** Leading coefficient; 0 for the zero polynomial. */
export function upolyLead(p: readonly bigint[]): bigint {
  return p.length === 0 ? 0n : p[p.length - 1];
}

export function upolyIsZero(p: readonly bigint[]): boolean {
  return p.length === 0;
}

export function upolyEquals(p: readonly bigint[], q: readonly bigint[]): boolean {
  if (p.length !== q.length) return false;
  for (let i = 0; i < p.length; i++) if (p[i] !== q[i]) return false;
  return true;
}

export function upolyAdd(p: readonly bigint[], q: readonly bigint[]): UPoly {
  const n = Math.max(p.length, q.length);
  const r = new Array<bigint>(n);
  for (let i = 0; i < n; i++) r[i] = (p[i] ?? 0n) + (q[i] ?? 0n);
  return upolyTrim(r);
}

export function upolySub(p: readonly bigint[], q: readonly bigint[]): UPoly {
  const n = Math.max(p.length, q.length);
  const r = new Array<bigint>(n);
  for (let i = 0; i < n; i++) r[i] = (p[i] ?? 0n) - (q[i] ?? 0n);
  return upolyTrim(r);
}

export function upolyNeg(p: readonly bigint[]): UPoly {
  return p.map((c) => -c);
}

export function upolyScale(p: readonly bigint[], c: bigint): UPoly {
  if (c === 0n) return [];
  return p.map((a) => a * c);
}

/** Schoolbook product: the degrees met in Ninefold (<= a few dozen) are far below any fast-multiplication crossover. */
export function upolyMul(p: readonly bigint[], q: readonly bigint[]): UPoly {
  if (p.length === 0 || q.length === 0) return [];
  const r = new Array<bigint>(p.length + q.length - 1).fill(0n);
  for (let i = 0; i < p.length; i++) {
    const a = p[i];
    if (a === 0n) continue;
    for (let j = 0; j < q.length; j++) r[i + j] += a * q[j];
  }
  return upolyTrim(r);
}

export function upolyPow(p: readonly bigint[], e: number): UPoly {
  if (!Number.isInteger(e) || e < 0) throw new InvalidInput(`exponent must be a natural number, got ${e}`, 'exponent');
  let r: UPoly = [1n];
  let b: UPoly = p.slice();
  while (e > 0) {
    if (e & 1) r = upolyMul(r, b);
    e >>= 1;
    if (e > 0) b = upolyMul(b, b);
  }
  return r;
}

export function upolyDerivative(p: readonly bigint[]): UPoly {
  const r: bigint[] = [];
  for (let i = 1; i < p.length; i++) r.push(BigInt(i) * p[i]);
  return upolyTrim(r);
}

/** p(x) at an integer (Horner). */
export function upolyEval(p: readonly bigint[], x: bigint): bigint {
  let r = 0n;
  for (let i = p.length - 1; i >= 0; i--) r = r * x + p[i];
  return r;
}

/**
 * The integer d^deg·p(n/d) (homogenised Horner), whose sign is the sign of p(n/d) for d > 0.
 * Assumes d != 0; deg = upolyDegree(p) (0 for the zero polynomial).
 */
export function upolyEvalHomogeneous(p: readonly bigint[], n: bigint, d: bigint): bigint {
  if (p.length === 0) return 0n;
  let r = p[p.length - 1];
  let dk = 1n;
  for (let i = p.length - 2; i >= 0; i--) {
    dk *= d;
    r = r * n + p[i] * dk;
  }
  return r;
}

/** p(r) as a canonical rational. */
export function upolyEvalRat(p: readonly bigint[], r: Rational): Rational {
  if (p.length === 0) return rat(0n);
  return rat(upolyEvalHomogeneous(p, r.num, r.den), r.den ** BigInt(p.length - 1));
}

/** Sign of p(r), without forming the reduced rational. */
export function upolySignAt(p: readonly bigint[], r: Rational): -1 | 0 | 1 {
  const v = upolyEvalHomogeneous(p, r.num, r.den);
  return v > 0n ? 1 : v < 0n ? -1 : 0;
}

/** gcd of the coefficients (>= 0; 0 for the zero polynomial). */
export function upolyContent(p: readonly bigint[]): bigint {
  return content(p);
}

/** p divided by its content, leading coefficient made positive. The zero polynomial stays []. */
export function upolyPrimitive(p: readonly bigint[]): UPoly {
  if (p.length === 0) return [];
  const g = content(p);
  const s = p[p.length - 1] < 0n ? -g : g;
  return s === 1n ? p.slice() : p.map((c) => c / s);
}

/** p(-x). */
export function upolyReflect(p: readonly bigint[]): UPoly {
  return p.map((c, i) => (i & 1 ? -c : c));
}

/** x^deg·p(1/x): the reciprocal polynomial (trailing zeros of p become a lower degree). */
export function upolyReverse(p: readonly bigint[]): UPoly {
  let lo = 0;
  while (lo < p.length && p[lo] === 0n) lo++;
  return p.slice(lo).reverse();
}

/** p(x + 1) in place by the O(d²) additive Taylor shift. Assumes p is a fresh array the caller owns. */
export function upolyTaylorShift1InPlace(p: bigint[]): bigint[] {
  const n = p.length;
  for (let i = 0; i < n - 1; i++) for (let j = n - 2; j >= i; j--) p[j] += p[j + 1];
  return p;
}

/** p(x + c) for an integer c. */
export function upolyTaylorShift(p: readonly bigint[], c: bigint): UPoly {
  const r = p.slice();
  const n = r.length;
  if (c === 1n) return upolyTaylorShift1InPlace(r);
  for (let i = 0; i < n - 1; i++) for (let j = n - 2; j >= i; j--) r[j] += c * r[j + 1];
  return upolyTrim(r);
}

/**
 * Exact quotient p / q over Z. Throws when q is zero or does not divide p with an integer quotient.
 */
export function upolyDivExact(p: readonly bigint[], q: readonly bigint[]): UPoly {
  if (q.length === 0) throw new InvalidInput('division by the zero polynomial', 'divisor');
  if (p.length === 0) return [];
  const dq = q.length - 1;
  const lq = q[dq];
  const r = p.slice();
  const n = r.length - 1 - dq;
  if (n < 0) throw new NinefoldError('upolyDivExact: the divisor does not divide the dividend', 'divisor');
  const out = new Array<bigint>(n + 1);
  for (let k = n; k >= 0; k--) {
    const top = r[k + dq];
    const c = top / lq;
    if (c * lq !== top) throw new NinefoldError('upolyDivExact: the divisor does not divide the dividend', 'divisor');
    out[k] = c;
    if (c !== 0n) for (let j = 0; j <= dq; j++) r[k + j] -= c * q[j];
  }
  for (let j = 0; j < dq; j++) {
    if (r[j] !== 0n) throw new NinefoldError('upolyDivExact: the divisor does not divide the dividend', 'divisor');
  }
  return upolyTrim(out);
}

/**
 * Pseudo-remainder: lead(q)^(deg p - deg q + 1)·p mod q (Cohen, "A Course in Computational Algebraic
 * Number Theory", §3.1.2). Returns p itself when deg p < deg q.
 */
export function upolyPseudoRem(p: readonly bigint[], q: readonly bigint[]): UPoly {
  if (q.length === 0) throw new InvalidInput('pseudo-remainder by the zero polynomial', 'divisor');
  const dq = q.length - 1;
  if (p.length - 1 < dq) return p.slice();
  const lq = q[dq];
  let r = p.slice();
  let e = r.length - 1 - dq + 1;
  while (r.length - 1 >= dq) {
    const dr = r.length - 1;
    const top = r[dr];
    const shift = dr - dq;
    const next = new Array<bigint>(dr).fill(0n);
    for (let i = 0; i < dr; i++) next[i] = r[i] * lq;
    for (let j = 0; j < dq; j++) next[j + shift] -= top * q[j];
    r = upolyTrim(next);
    e--;
  }
  if (e > 0) {
    const f = lq ** BigInt(e);
    r = r.map((c) => c * f);
  }
  return r;
}

/** Quotient and remainder over Q scaled to Z: lead(q)^k·p = quo·q + rem, as upolyPseudoRem. */
export function upolyPseudoDivision(p: readonly bigint[], q: readonly bigint[]): { quo: UPoly; rem: UPoly } {
  if (q.length === 0) throw new InvalidInput('pseudo-division by the zero polynomial', 'divisor');
  const dq = q.length - 1;
  const dp = p.length - 1;
  if (dp < dq) return { quo: [], rem: p.slice() };
  const lq = q[dq];
  const n = dp - dq;
  const r = p.slice();
  const quo = new Array<bigint>(n + 1).fill(0n);
  for (let k = n; k >= 0; k--) {
    const top = r[k + dq];
    for (let i = 0; i < quo.length; i++) quo[i] *= lq;
    quo[k] = top;
    for (let i = 0; i < k + dq; i++) r[i] *= lq;
    r[k + dq] = 0n;
    for (let j = 0; j < dq; j++) r[k + j] -= top * q[j];
  }
  return { quo: upolyTrim(quo), rem: upolyTrim(r.slice(0, dq)) };
}

/** "3*x^2 - x + 5" for messages and debugging. */
export function upolyToString(p: readonly bigint[], v = 'x'): string {
  if (p.length === 0) return '0';
  const parts: string[] = [];
  for (let i = p.length - 1; i >= 0; i--) {
    const c = p[i];
    if (c === 0n) continue;
    const a = c < 0n ? -c : c;
    const mono = i === 0 ? '' : i === 1 ? v : `${v}^${i}`;
    const body = mono === '' ? a.toString() : a === 1n ? mono : `${a}*${mono}`;
    parts.push(parts.length === 0 ? (c < 0n ? `-${body}` : body) : `${c < 0n ? '-' : '+'} ${body}`);
  }
  return parts.join(' ');
}

export {
  upolyGcd, upolyGcdSubresultant, upolySquarefreePart, upolySquarefreeFactorisation, upolyResultant, upolyDiscriminant,
  type SquarefreeFactor,
} from './upoly-gcd.ts';
