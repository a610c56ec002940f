// The height sieve: every rational point of height <= H on a plane curve of degree <= 3, found by
// running over the primitive-up-to-sign pairs (X, Z) with |X|, |Z| <= H and solving F(X, Y, Z) = 0 for
// integers |Y| <= H exactly (src/cubic/integer-roots.ts).
//
// Completeness (why nothing is missed): a point of height <= H has a primitive representative (X:Y:Z)
// with max(|X|, |Y|, |Z|) <= H; fixing its sign by Z > 0, or Z = 0 and X > 0, or (0:1:0), its (X, Z) is
// one of the pairs visited and Y is an integer root of the polynomial F(X, y, Z) in [-H, H]. When that
// polynomial vanishes identically the line through (0:1:0) and (X:0:Z) is a component and every
// admissible Y is listed. Cost: about 2·H² pairs; most are discarded by a table lookup modulo a few small
// primes (an integer root y is a root modulo every prime, so a pair whose polynomial has no root mod l
// has none at all — a necessary condition only, so nothing is lost), the rest cost O(log H) exact
// evaluations of a cubic.
import { Cancelled, InvalidInput } from '../exact/errors.ts';
import { gcd } from '../exact/gcd.ts';
import { ratCmp, type Rational } from '../exact/rational.ts';
import { monomials, type Form } from '../poly/form.ts';
import type { Point } from '../plane/point.ts';
import { triple } from '../plane/point.ts';
import { integerRootsInRange } from './integer-roots.ts';

/** Affine regions (points with Z != 0 only): all coordinates positive, or a closed box. */
export type SearchRegion =
  | { readonly kind: 'positive' }
  | { readonly kind: 'box'; readonly xmin: Rational; readonly xmax: Rational; readonly ymin: Rational; readonly ymax: Rational };

export interface SieveOptions {
  readonly region?: SearchRegion;
  /** Called after each value of Z with the pairs done so far and the total. */
  readonly onProgress?: (done: number, total: number) => void;
  /** Polled about every 2,000 pairs; returning true stops the search with Cancelled. */
  readonly isCancelled?: () => boolean;
}

function ceilDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return a % b !== 0n && (a < 0n) === (b < 0n) ? q + 1n : q;
}

function floorDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return a % b !== 0n && (a < 0n) !== (b < 0n) ? q - 1n : q;
}

/** The range of integers n with lo <= n / z <= hi (z > 0), clipped to [-h, h]. */
function boxRange(lo: Rational, hi: Rational, z: bigint, h: bigint): [bigint, bigint] {
  let a = ceilDiv(lo.num * z, lo.den);
  let b = floorDiv(hi.num * z, hi.den);
  if (a < -h) a = -h;
  if (b > h) b = h;
  return [a, b];
}

/** Is the point inside the region? Points at infinity are in no affine region. */
export function regionContains(region: SearchRegion | undefined, p: Point): boolean {
  if (!region) return true;
  const [x, y, z] = p;
  if (z === 0n) return false;
  if (region.kind === 'positive') return x * z > 0n && y * z > 0n;
  const xr = { num: z < 0n ? -x : x, den: z < 0n ? -z : z };
  const yr = { num: z < 0n ? -y : y, den: z < 0n ? -z : z };
  return ratCmp(region.xmin, xr) <= 0 && ratCmp(xr, region.xmax) <= 0 && ratCmp(region.ymin, yr) <= 0 && ratCmp(yr, region.ymax) <= 0;
}

// Building a table costs l³ evaluations; primes to 31 cost about 80,000 in all and leave about 2^-11 of
// the pairs of a Weierstrass cubic (a binary quadratic in y has a root mod l about half of the time).
/** Far beyond any height the sieve can finish (2·H² pairs), and small enough for exact double loop counters. */
export const MAX_SIEVE_HEIGHT = 10_000_000n;

const FILTER_PRIMES = [3, 5, 7, 11, 13, 17, 19, 23, 29, 31];

/** For each prime l: ok[(X mod l)·l + (Z mod l)] = 1 when F(X, y, Z) ≡ 0 (mod l) has a root y. */
function residueTables(f: Form): { l: number; ok: Uint8Array }[] {
  const mons = monomials(f.degree);
  return FILTER_PRIMES.map((l) => {
    const L = BigInt(l);
    const c = f.coeffs.map((v) => Number(((v % L) + L) % L));
    const pw: number[][] = [];
    for (let b = 0; b < l; b++) pw.push([1, b % l, (b * b) % l, (b * b * b) % l]);
    const ok = new Uint8Array(l * l);
    for (let x = 0; x < l; x++) {
      for (let z = 0; z < l; z++) {
        const p = [0, 0, 0, 0];
        for (let k = 0; k < mons.length; k++) {
          if (c[k] !== 0) p[mons[k][1]] = (p[mons[k][1]] + c[k] * pw[x][mons[k][0]] * pw[z][mons[k][2]]) % l;
        }
        let has = 0;
        for (let y = 0; y < l && !has; y++) if ((((p[3] * y + p[2]) % l) * y % l * y + p[1] * y + p[0]) % l === 0) has = 1;
        ok[x * l + z] = has;
      }
    }
    return { l, ok };
  });
}

/**
 * Every point of height <= h on the curve F = 0 (degree 1..3, not the zero form) inside the region,
 * unsorted and without repeats.
 */
export function sievePoints(f: Form, h: bigint, options: SieveOptions = {}): Point[] {
  if (h > MAX_SIEVE_HEIGHT) throw new InvalidInput(`the sieve goes to height ${MAX_SIEVE_HEIGHT} at most, asked for ${h}`, 'height');
  const region = options.region;
  const mons = monomials(f.degree);
  const out: Point[] = [];
  const zMin = region ? 1n : 0n;
  const total = Number(h - zMin + 1n);
  let polled = 0;
  const poll = (): void => {
    if (options.isCancelled && options.isCancelled()) throw new Cancelled('rational point search');
  };
  const tables = residueTables(f);
  // (0:1:0), the one point with X = Z = 0.
  if (!region && h >= 1n && f.coeffs[indexOfY(f)] === 0n) out.push([0n, 1n, 0n]);
  for (let z = zMin; z <= h; z++) {
    let xlo = z === 0n ? 1n : -h;
    let xhi = h;
    let ylo = -h;
    let yhi = h;
    if (region?.kind === 'positive') {
      xlo = 1n;
      ylo = 1n;
    } else if (region?.kind === 'box') {
      [xlo, xhi] = boxRange(region.xmin, region.xmax, z, h);
      [ylo, yhi] = boxRange(region.ymin, region.ymax, z, h);
    }
    if (ylo > yhi) continue;
    const zn = Number(z);
    const zres = tables.map((t) => zn % t.l); // z >= 0
    // The pair loop runs on doubles (|x| <= h <= MAX_SIEVE_HEIGHT is exact) and makes BigInts for survivors only.
    const xhiN = Number(xhi);
    for (let xn = Number(xlo); xn <= xhiN; xn++) {
      if (++polled % 2000 === 0) poll();
      let possible = true;
      for (let i = 0; i < tables.length; i++) {
        const t = tables[i];
        if (!t.ok[(((xn % t.l) + t.l) % t.l) * t.l + zres[i]]) {
          possible = false;
          break;
        }
      }
      if (!possible) continue;
      const x = BigInt(xn);
      const g = gcd(x, z);
      if (g === 0n) continue;
      const p = [0n, 0n, 0n, 0n];
      for (let k = 0; k < mons.length; k++) {
        const c = f.coeffs[k];
        if (c !== 0n) p[mons[k][1]] += c * x ** BigInt(mons[k][0]) * z ** BigInt(mons[k][2]);
      }
      let ys: bigint[];
      if (p.every((c) => c === 0n)) {
        ys = [];
        for (let y = ylo; y <= yhi; y++) ys.push(y);
      } else {
        ys = integerRootsInRange(p, ylo, yhi);
      }
      for (const y of ys) if (g === 1n || gcd(g, y) === 1n) out.push(triple(x, y, z));
    }
    options.onProgress?.(Number(z - zMin + 1n), total);
  }
  poll();
  return out;
}

// Index of the Y^d coefficient: F(0, 1, 0).
function indexOfY(f: Form): number {
  const m = monomials(f.degree);
  return m.findIndex((e) => e[1] === f.degree);
}
