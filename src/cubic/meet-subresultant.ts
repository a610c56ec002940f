// The first subresultant of two curves viewed as polynomials in Y over Z[x] (affine chart Z = 1), used by
// the curve–curve meet to decide that a root x = α of the resultant carries exactly one common point and
// to give its y-coordinate: if Res(α) = 0 and s11(α) != 0 (leading Y-coefficients constant), then
// gcd(A(α, Y), B(α, Y)) = s11(α)·Y + s10(α) (Cohen, A Course in Computational Algebraic Number Theory,
// §3.3, the fundamental theorem of subresultants; Basu–Pollack–Roy, Algorithms in Real Algebraic
// Geometry, §4.2).
//
// Canonical form: a Y-polynomial is an array of UPoly in x, index k = coefficient of Y^k, trimmed.
import { upolyAdd, upolyMul, upolySub, upolyTrim, type UPoly } from '../exact/upoly.ts';
import { monomials, type Form } from '../poly/form.ts';

/** F(x, Y, 1) as a polynomial in Y with coefficients in Z[x]. */
export function formAsYPolynomial(f: Form): UPoly[] {
  const d = f.degree;
  const out: bigint[][] = Array.from({ length: d + 1 }, () => new Array<bigint>(d + 1).fill(0n));
  const m = monomials(d);
  for (let k = 0; k < m.length; k++) if (f.coeffs[k] !== 0n) out[m[k][1]][m[k][0]] += f.coeffs[k];
  const trimmed = out.map((c) => upolyTrim(c));
  while (trimmed.length > 0 && trimmed[trimmed.length - 1].length === 0) trimmed.pop();
  return trimmed;
}

/** det of a square matrix of polynomials by Laplace expansion along rows, memoised on the columns used. */
function polyDeterminant(rows: readonly (readonly UPoly[])[]): UPoly {
  const n = rows.length;
  if (n === 0) return [1n];
  const memo = new Map<number, UPoly>();
  const expand = (r: number, free: number): UPoly => {
    if (r === n) return [1n];
    const hit = memo.get(free);
    if (hit) return hit;
    let acc: UPoly = [];
    let sign = 0;
    for (let c = 0; c < n; c++) {
      if (!(free & (1 << c))) continue;
      const entry = rows[r][c];
      if (entry.length > 0) {
        const term = upolyMul(entry, expand(r + 1, free & ~(1 << c)));
        acc = sign % 2 === 0 ? upolyAdd(acc, term) : upolySub(acc, term);
      }
      sign++;
    }
    memo.set(free, acc);
    return acc;
  };
  return expand(0, (1 << n) - 1);
}

/**
 * S_1 = s11·Y + s10 for A of degree m >= 2 and B of degree n >= 2 in Y (their leading coefficients need
 * not be constant here; the meet ensures they are).
 */
export function firstSubresultant(a: readonly UPoly[], b: readonly UPoly[]): { s11: UPoly; s10: UPoly } {
  const m = a.length - 1;
  const n = b.length - 1;
  const cols = m + n - 1; // coefficients of Y^(m+n-2) .. Y^0
  const matrix: UPoly[][] = [];
  const shifted = (p: readonly UPoly[], deg: number, shift: number): UPoly[] => {
    const row: UPoly[] = new Array<UPoly>(cols).fill([]);
    for (let k = 0; k <= deg; k++) row[cols - 1 - (k + shift)] = p[k];
    return row;
  };
  for (let i = n - 2; i >= 0; i--) matrix.push(shifted(a, m, i));
  for (let i = m - 2; i >= 0; i--) matrix.push(shifted(b, n, i));
  const size = m + n - 2;
  const pick = (last: number): UPoly[][] => matrix.map((row) => [...row.slice(0, size - 1), row[last]]);
  return { s11: polyDeterminant(pick(cols - 2)), s10: polyDeterminant(pick(cols - 1)) };
}
