// Q on native BigInt.
//
// Canonical form: { num, den } with den > 0 and gcd(num, den) = 1; zero is 0/1. Every function here
// returns canonical values; `rat` makes any pair canonical.
import { NinefoldError, ParseError } from './errors.ts';
import { gcd } from './gcd.ts';

export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

export const RAT_ZERO: Rational = Object.freeze({ num: 0n, den: 1n });
export const RAT_ONE: Rational = Object.freeze({ num: 1n, den: 1n });

export function rat(num: bigint | number, den: bigint | number = 1n): Rational {
  let n = BigInt(num);
  let d = BigInt(den);
  if (d === 0n) throw new NinefoldError('division by zero');
  if (d < 0n) {
    n = -n;
    d = -d;
  }
  const g = gcd(n, d);
  return g === 1n ? { num: n, den: d } : { num: n / g, den: d / g };
}

export function ratFromInt(n: bigint): Rational {
  return { num: n, den: 1n };
}

export function ratAdd(a: Rational, b: Rational): Rational {
  if (a.den === b.den) return rat(a.num + b.num, a.den);
  return rat(a.num * b.den + b.num * a.den, a.den * b.den);
}

export function ratSub(a: Rational, b: Rational): Rational {
  if (a.den === b.den) return rat(a.num - b.num, a.den);
  return rat(a.num * b.den - b.num * a.den, a.den * b.den);
}

export function ratMul(a: Rational, b: Rational): Rational {
  // Cross-cancel first so the products stay small (both inputs are already reduced).
  const g1 = gcd(a.num, b.den);
  const g2 = gcd(b.num, a.den);
  const n = (g1 === 0n ? a.num : a.num / g1) * (g2 === 0n ? b.num : b.num / g2);
  const d = (g2 === 0n ? a.den : a.den / g2) * (g1 === 0n ? b.den : b.den / g1);
  return n === 0n ? RAT_ZERO : { num: n, den: d };
}

export function ratInv(a: Rational): Rational {
  if (a.num === 0n) throw new NinefoldError('division by zero');
  return a.num < 0n ? { num: -a.den, den: -a.num } : { num: a.den, den: a.num };
}

export function ratDiv(a: Rational, b: Rational): Rational {
  return ratMul(a, ratInv(b));
}

export function ratNeg(a: Rational): Rational {
  return { num: -a.num, den: a.den };
}

export function ratAbs(a: Rational): Rational {
  return a.num < 0n ? { num: -a.num, den: a.den } : a;
}

export function ratSign(a: Rational): -1 | 0 | 1 {
  return a.num > 0n ? 1 : a.num < 0n ? -1 : 0;
}

export function ratIsZero(a: Rational): boolean {
  return a.num === 0n;
}

export function ratIsInteger(a: Rational): boolean {
  return a.den === 1n;
}

export function ratEq(a: Rational, b: Rational): boolean {
  return a.num === b.num && a.den === b.den;
}

export function ratCmp(a: Rational, b: Rational): -1 | 0 | 1 {
  const l = a.num * b.den;
  const r = b.num * a.den;
  return l < r ? -1 : l > r ? 1 : 0;
}

export function ratPow(a: Rational, e: number): Rational {
  if (!Number.isInteger(e)) throw new RangeError('ratPow needs an integer exponent');
  if (e < 0) return ratPow(ratInv(a), -e);
  const E = BigInt(e);
  return { num: a.num ** E, den: a.den ** E };
}

/** Largest integer <= a. */
export function ratFloor(a: Rational): bigint {
  const q = a.num / a.den;
  return a.num < 0n && q * a.den !== a.num ? q - 1n : q;
}

/** Midpoint (a + b) / 2. */
export function ratMid(a: Rational, b: Rational): Rational {
  return rat(a.num * b.den + b.num * a.den, 2n * a.den * b.den);
}

/** Nearest double; correct for numerators and denominators far beyond the double range. */
export function ratToNumber(a: Rational): number {
  const n = Number(a.num);
  const d = Number(a.den);
  if (Number.isFinite(n) && Number.isFinite(d) && Math.abs(n) < 2 ** 53 && d < 2 ** 53) return n / d;
  // Scale both to about 64 significant bits before dividing.
  const nb = a.num < 0n ? (-a.num).toString(2).length : a.num.toString(2).length;
  const db = a.den.toString(2).length;
  const shiftN = Math.max(0, nb - 64);
  const shiftD = Math.max(0, db - 64);
  const ns = Number(a.num >> BigInt(shiftN));
  const ds = Number(a.den >> BigInt(shiftD));
  return (ns / ds) * 2 ** (shiftN - shiftD);
}

/** "-17/4", "3", "0". */
export function ratToString(a: Rational): string {
  return a.den === 1n ? a.num.toString() : `${a.num}/${a.den}`;
}

const RATIONAL_TEXT = /^\s*([+-]?)(\d+)(?:\.(\d*))?(?:\s*\/\s*([+-]?)(\d+)(?:\.(\d*))?)?\s*$/;

/**
 * Parse "-17/4", "3", "2.25", "1.5/7". Decimal points are exact (2.25 = 9/4).
 * `where` names the place for the error message (an argument or a path in a file).
 */
export function ratParse(text: string, where = ''): Rational {
  const m = RATIONAL_TEXT.exec(text);
  if (!m) {
    const col = firstBadColumn(text);
    throw new ParseError(
      `expected a rational number like -17/4 or 2.25, found "${text}"`,
      col,
      where ? `${where}, column ${col}` : `column ${col}`,
    );
  }
  const top = decimal(m[1], m[2], m[3]);
  if (m[5] === undefined) return top;
  const bottom = decimal(m[4], m[5], m[6]);
  if (bottom.num === 0n) {
    throw new ParseError(`zero denominator in "${text}"`, text.indexOf('/') + 2, where || `column ${text.indexOf('/') + 2}`);
  }
  return ratDiv(top, bottom);
}

function decimal(sign: string, whole: string, frac: string | undefined): Rational {
  const f = frac ?? '';
  const n = BigInt(whole + f) * (sign === '-' ? -1n : 1n);
  return rat(n, 10n ** BigInt(f.length));
}

function firstBadColumn(text: string): number {
  for (let i = 0; i < text.length; i++) {
    if (!/[\d\s+\-/.]/.test(text[i])) return i + 1;
  }
  return Math.max(1, text.length);
}
