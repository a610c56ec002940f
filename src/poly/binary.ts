// Binary forms b(s, t) with integer coefficients: what a ternary form becomes on a parametrised line,
// and what a resultant leaves behind.
//
// Representation (shared with src/poly/binary-roots.ts): `b[i]` is the coefficient of s^(d-i) t^i, so
// the array has length d + 1 and the degree is the length minus one (leading zeros are allowed: a form
// of degree d may vanish to some order at (1:0)). Primitive forms (`binaryPrimitive`) have content 1 and
// first non-zero coefficient positive.
import { InvalidInput } from '../exact/errors.ts';
import { primitive } from '../exact/integer.ts';

export type BinaryForm = readonly bigint[];

export function binaryDegree(b: BinaryForm): number {
  return b.length - 1;
}

export function binaryZero(d: number): bigint[] {
  return new Array<bigint>(d + 1).fill(0n);
}

export function binaryIsZero(b: BinaryForm): boolean {
  return b.every((c) => c === 0n);
}

export function binaryAdd(a: BinaryForm, b: BinaryForm): bigint[] {
  if (a.length !== b.length) throw new InvalidInput(`binary forms of degrees ${a.length - 1} and ${b.length - 1} cannot be added`);
  return a.map((c, i) => c + b[i]);
}

export function binaryScale(a: BinaryForm, k: bigint): bigint[] {
  return a.map((c) => c * k);
}

export function binaryMul(a: BinaryForm, b: BinaryForm): bigint[] {
  const out = binaryZero(a.length + b.length - 2);
  for (let i = 0; i < a.length; i++) {
    if (a[i] === 0n) continue;
    for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  }
  return out;
}

export function binaryPow(a: BinaryForm, e: number): bigint[] {
  let acc: bigint[] = [1n];
  for (let k = 0; k < e; k++) acc = binaryMul(acc, a);
  return acc;
}

/** b(s, t) at integers s, t. */
export function binaryEval(b: BinaryForm, s: bigint, t: bigint): bigint {
  let acc = 0n;
  let tp = 1n;
  const d = b.length - 1;
  const sPow: bigint[] = [1n];
  for (let k = 1; k <= d; k++) sPow.push(sPow[k - 1] * s);
  for (let i = 0; i <= d; i++) {
    if (b[i] !== 0n) acc += b[i] * sPow[d - i] * tp;
    tp *= t;
  }
  return acc;
}

export function binaryPrimitive(b: BinaryForm): bigint[] {
  return primitive(b);
}

/** Dehomogenise at t = 1: the polynomial b(x, 1) in UPoly order (coefficient of x^k at index k), trimmed. */
export function binaryToUPolyInS(b: BinaryForm): bigint[] {
  const out = b.slice().reverse();
  while (out.length > 0 && out[out.length - 1] === 0n) out.pop();
  return out;
}

/** The binary form of degree d whose dehomogenisation at t = 1 is p(x) (p in UPoly order, deg p <= d). */
export function binaryFromUPolyInS(p: readonly bigint[], d: number): bigint[] {
  if (p.length - 1 > d) throw new InvalidInput(`a polynomial of degree ${p.length - 1} does not fit a binary form of degree ${d}`);
  const out = binaryZero(d);
  for (let k = 0; k < p.length; k++) out[d - k] = p[k];
  return out;
}
