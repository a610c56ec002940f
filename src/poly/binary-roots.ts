// Roots of a binary form b(s, t) = Σ b[i] s^(d−i) t^i over P^1: rational ones exactly, real irrational ones
// as real algebraic numbers, the rest counted with the polynomial that carries them.
//
// Canonical form of the answer:
//  - `roots`: the distinct real roots, each with its multiplicity; `point` is the primitive (s:t) (first
//    non-zero entry positive, as for points of P^2) when the root is rational, `real` the value s/t when it
//    is real and irrational (exactly one of the two is set). Finite roots in increasing order of s/t, then
//    (1:0) when t divides the form (multiplicity = the power of t dividing it).
//  - `complex`: for each square-free factor that has non-real roots, `poly` (in x = s/t, primitive,
//    square-free, with the rational roots of the factor divided out), the `multiplicity` of the factor, and
//    `nonReal`, how many of poly's roots are non-real. poly's real roots, if any, are listed in `roots` as
//    `real` entries with this same poly; a caller solving poly numerically must skip them.
//  Multiplicities over `roots` plus nonReal·multiplicity over `complex` sum to the degree.
import { Degenerate, InvalidInput } from '../exact/errors.ts';
import { algebraicCmp, algebraicFromRational, type RealAlgebraic } from '../exact/algebraic.ts';
import { upolySquarefreeRationalRoots } from '../exact/rational-roots.ts';
import { upolyRealRootIntervals } from '../exact/root-isolation.ts';
import { upolyDivExact, upolySquarefreeFactorisation, upolyTrim, type UPoly } from '../exact/upoly.ts';

export interface BinaryRoot {
  readonly point: readonly [bigint, bigint] | null;
  readonly real: RealAlgebraic | null;
  readonly multiplicity: number;
}

export interface BinaryComplexPart {
  readonly poly: UPoly;
  readonly multiplicity: number;
  readonly nonReal: number;
}

export interface BinaryFormRoots {
  readonly roots: BinaryRoot[];
  readonly complex: BinaryComplexPart[];
}

/** (num : den) with den > 0 made primitive with its first non-zero entry positive. */
function rootPoint(num: bigint, den: bigint): [bigint, bigint] {
  return num < 0n ? [-num, -den] : [num, den];
}

export function binaryFormRoots(coeffs: readonly bigint[]): BinaryFormRoots {
  if (coeffs.length === 0) throw new InvalidInput('a binary form needs at least one coefficient', 'form');
  if (coeffs.every((c) => c === 0n)) throw new Degenerate('the binary form is zero: every (s:t) is a root', 'form');
  const d = coeffs.length - 1;
  let atInfinity = 0;
  while (coeffs[atInfinity] === 0n) atInfinity++;
  // Dehomogenise at t = 1: the coefficient of x^j (x = s/t) is b[d − j].
  const u = upolyTrim(Array.from({ length: d + 1 }, (_, j) => coeffs[d - j]));
  const finite: { key: RealAlgebraic; root: BinaryRoot }[] = [];
  const complex: BinaryComplexPart[] = [];
  for (const { factor, multiplicity } of upolySquarefreeFactorisation(u)) {
    let rest: UPoly = factor;
    for (const q of upolySquarefreeRationalRoots(factor)) {
      finite.push({ key: algebraicFromRational(q), root: { point: rootPoint(q.num, q.den), real: null, multiplicity } });
      rest = upolyDivExact(rest, [-q.num, q.den]);
    }
    if (rest.length <= 1) continue;
    const ivs = upolyRealRootIntervals(rest);
    for (const iv of ivs) {
      const real: RealAlgebraic = { poly: rest, lo: iv.lo, hi: iv.hi };
      finite.push({ key: real, root: { point: null, real, multiplicity } });
    }
    const nonReal = rest.length - 1 - ivs.length;
    if (nonReal > 0) complex.push({ poly: rest, multiplicity, nonReal });
  }
  finite.sort((a, b) => algebraicCmp(a.key, b.key));
  const roots = finite.map((f) => f.root);
  if (atInfinity > 0) roots.push({ point: [1n, 0n], real: null, multiplicity: atInfinity });
  return { roots, complex };
}
