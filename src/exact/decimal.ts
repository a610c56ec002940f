// Decimal display of exact rationals: N significant digits, correctly rounded (half away from zero).
// The digits are decided in BigInt; big.js only lays out the decided digits with an exponent, so it never
// decides anything.
//
// Canonical form: a decimal is { negative, digits, exp } with `digits` an integer of exactly N decimal
// digits (the rounded significand) and value ±digits·10^(exp − N + 1); zero is { false, 0n, 0 }.
import Big from 'big.js';
import { InvalidInput } from './errors.ts';
import type { Rational } from './rational.ts';

export interface DecimalDigits {
  readonly negative: boolean;
  readonly digits: bigint;
  /** Decimal exponent of the first digit: 10^exp <= |value| < 10^(exp+1) after rounding. */
  readonly exp: number;
}

function checkDigits(n: number): void {
  if (!Number.isInteger(n) || n < 1 || n > 100_000) {
    throw new InvalidInput(`the number of significant digits must be a whole number from 1 to 100000, got ${n}`, 'digits');
  }
}

/** |q| rounded to N significant digits (half away from zero). */
export function ratDecimalDigits(q: Rational, N: number): DecimalDigits {
  checkDigits(N);
  if (q.num === 0n) return { negative: false, digits: 0n, exp: 0 };
  const negative = q.num < 0n;
  const n = negative ? -q.num : q.num;
  const d = q.den;
  // n/d lies in (10^(ln-ld-1), 10^(ln-ld+1)); pick the exponent exactly.
  let e = n.toString().length - d.toString().length;
  const below = e >= 0 ? n < d * 10n ** BigInt(e) : n * 10n ** BigInt(-e) < d;
  if (below) e--;
  const s = N - 1 - e;
  const num = s >= 0 ? n * 10n ** BigInt(s) : n;
  const den = s >= 0 ? d : d * 10n ** BigInt(-s);
  let r = num / den;
  if (2n * (num - r * den) >= den) r += 1n;
  if (r === 10n ** BigInt(N)) {
    r = 10n ** BigInt(N - 1);
    e++;
  }
  return { negative, digits: r, exp: e };
}

/** Text of decided digits: plain for moderate exponents, "1.234e+500" beyond (big.js layout rules). */
export function decimalToString(x: DecimalDigits, N: number): string {
  if (x.digits === 0n) return N > 1 ? `0.${'0'.repeat(N - 1)}` : '0';
  const text = `${x.negative ? '-' : ''}${x.digits}e${x.exp - N + 1}`;
  const b = new Big(text);
  return Math.abs(x.exp) > 20 ? b.toExponential(N - 1) : b.toPrecision(N);
}

/** q to N significant digits, correctly rounded. */
export function ratToDecimal(q: Rational, N: number): string {
  return decimalToString(ratDecimalDigits(q, N), N);
}

/**
 * The N-digit rounding shared by every number in [lo, hi], or null when the ends round differently
 * (rounding is monotone, so equal ends decide every value between them).
 */
export function intervalToDecimal(lo: Rational, hi: Rational, N: number): string | null {
  const a = ratDecimalDigits(lo, N);
  const b = ratDecimalDigits(hi, N);
  if (a.negative !== b.negative || a.digits !== b.digits || a.exp !== b.exp) return null;
  return decimalToString(a, N);
}
