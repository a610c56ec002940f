// Integer roots of an integer polynomial of degree <= 3 inside a range, found exactly: the real line is
// cut at integer brackets around the critical points (from isqrt of the derivative's discriminant), the
// polynomial is strictly monotone on the integers between brackets, and each monotone run is bisected.
// This is the kernel of the height sieve: O(log range) evaluations per polynomial instead of a scan.
//
// Canonical form: p[i] is the coefficient of y^i (UPoly convention); roots are returned ascending, distinct.
import { InvalidInput } from '../exact/errors.ts';
import { isqrt } from '../exact/integer.ts';

function evalAt(p: readonly bigint[], y: bigint): bigint {
  let s = 0n;
  for (let i = p.length - 1; i >= 0; i--) s = s * y + p[i];
  return s;
}

function floorDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return (a % b !== 0n && (a < 0n) !== (b < 0n)) ? q - 1n : q;
}

function ceilDiv(a: bigint, b: bigint): bigint {
  return -floorDiv(-a, b);
}

/**
 * All integers y with lo <= y <= hi and p(y) = 0, for p of degree <= 3 (trailing zero coefficients
 * allowed). Throws when p is the zero polynomial (every integer would be a root; callers handle that case).
 */
export function integerRootsInRange(p: readonly bigint[], lo: bigint, hi: bigint): bigint[] {
  let d = p.length - 1;
  while (d >= 0 && p[d] === 0n) d--;
  if (d < 0) throw new InvalidInput('the zero polynomial has every integer as a root');
  if (d > 3) throw new InvalidInput(`integerRootsInRange handles degree <= 3, got ${d}`);
  if (lo > hi) return [];
  if (d === 0) return [];
  if (d === 1) {
    // p0 + p1 y = 0
    if (p[0] % p[1] !== 0n) return [];
    const r = -p[0] / p[1];
    return r >= lo && r <= hi ? [r] : [];
  }
  // Integer brackets [u, v] around each real critical point; p is strictly monotone between them.
  const brackets: [bigint, bigint][] = [];
  if (d === 2) {
    // p' = p1 + 2 p2 y, critical point -p1 / (2 p2)
    const den = 2n * p[2];
    const c = [floorDiv(-p[1], den), ceilDiv(-p[1], den)];
    brackets.push([c[0] < c[1] ? c[0] : c[1], c[0] < c[1] ? c[1] : c[0]]);
  } else {
    // p' = p1 + 2 p2 y + 3 p3 y^2, critical points (-p2 ± sqrt(p2^2 - 3 p1 p3)) / (3 p3)
    const disc = p[2] * p[2] - 3n * p[1] * p[3];
    if (disc >= 0n) {
      const s = isqrt(disc);
      const den = 3n * p[3];
      for (const sign of [-1n, 1n]) {
        const a = -p[2] + sign * s;
        const b = -p[2] + sign * (s + 1n);
        const e = [floorDiv(a, den), ceilDiv(a, den), floorDiv(b, den), ceilDiv(b, den)];
        let u = e[0];
        let v = e[0];
        for (const x of e) {
          if (x < u) u = x;
          if (x > v) v = x;
        }
        brackets.push([u, v]);
      }
      brackets.sort((x, y) => (x[0] < y[0] ? -1 : x[0] > y[0] ? 1 : 0));
    }
  }
  const roots = new Set<bigint>();
  let start = lo;
  for (const [u, v] of brackets) {
    if (u > start) monotoneRoots(p, start, u - 1n < hi ? u - 1n : hi, roots);
    const a = u > lo ? u : lo;
    const b = v < hi ? v : hi;
    for (let y = a; y <= b; y++) if (evalAt(p, y) === 0n) roots.add(y);
    if (v + 1n > start) start = v + 1n;
  }
  if (start <= hi) monotoneRoots(p, start, hi, roots);
  return [...roots].sort((x, y) => (x < y ? -1 : x > y ? 1 : 0));
}

// Assumes p is strictly monotone on the integers of [a, b].
function monotoneRoots(p: readonly bigint[], a: bigint, b: bigint, out: Set<bigint>): void {
  if (a > b) return;
  let fa = evalAt(p, a);
  const fb = evalAt(p, b);
  if (fa === 0n) out.add(a);
  if (fb === 0n) out.add(b);
  if (fa === 0n || fb === 0n || (fa < 0n) === (fb < 0n)) return;
  while (b - a > 1n) {
    const m = (a + b) >> 1n;
    const fm = evalAt(p, m);
    if (fm === 0n) {
      out.add(m);
      return;
    }
    if ((fm < 0n) === (fa < 0n)) {
      a = m;
      fa = fm;
    } else b = m;
  }
}
