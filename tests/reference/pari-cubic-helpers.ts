// Shared pieces of the PARI/GP reference checks of points, meets and flexes: a form printed for gp, GP
// vectors read back as points, and the GP meet script (polresultant after a random change of
// coordinates chosen by PARI, factor, polsturm, the rational points recovered by a gcd on each line).
import { lcm } from '../../src/exact/integer.ts';
import { ratParse } from '../../src/exact/rational.ts';
import { monomials, type Form } from '../../src/poly/form.ts';
import { triple, tripleProportional, type Point } from '../../src/plane/point.ts';
import { gpVector } from './oracles.ts';

export function formToGp(f: Form): string {
  const m = monomials(f.degree);
  const terms = f.coeffs.flatMap((c, k) => (c === 0n ? [] : [`(${c})*x^${m[k][0]}*y^${m[k][1]}*z^${m[k][2]}`]));
  return terms.length ? terms.join('+') : '0';
}

export function rationalTriple(entries: readonly string[]): Point {
  const r = entries.map((e) => ratParse(e));
  const l = r.reduce((a, q) => lcm(a, q.den), 1n);
  return triple(...(r.map((q) => (q.num * l) / q.den) as [bigint, bigint, bigint]));
}

export const key = (p: readonly bigint[]) => p.join(':');

// Nested GP vectors of the meet script: [[k, m, s, P or 0], ...].
export function parseMeet(line: string): { k: number; m: number; s: number; point: Point | null }[] {
  const out: { k: number; m: number; s: number; point: Point | null }[] = [];
  const re = /\[(\d+), (\d+), (\d+), (0|\[[^\]]*\])\]/g;
  for (const hit of line.matchAll(re)) {
    out.push({ k: Number(hit[1]), m: Number(hit[2]), s: Number(hit[3]), point: hit[4] === '0' ? null : rationalTriple(gpVector(hit[4])) });
  }
  return out;
}

export const MEET_GP = `
v=[x,y,z];
meetinfo(F, G, n, M) = {
  my(sub = [M[1,1]*x+M[1,2]*y+M[1,3]*z, M[2,1]*x+M[2,2]*y+M[2,3]*z, M[3,1]*x+M[3,2]*y+M[3,3]*z]);
  my(f = subst(substvec(F, v, sub), z, 1), g = subst(substvec(G, v, sub), z, 1));
  my(R = polresultant(f, g, y));
  if (R == 0 || poldegree(R, x) != n, return(0));
  my(fa = factor(R), out = List());
  for (i = 1, #fa~,
    my(p = fa[i,1], m = fa[i,2], k = poldegree(p));
    if (k == 1,
      my(r = -polcoeff(p,0)/polcoeff(p,1));
      my(h = gcd(subst(f, x, r), subst(g, x, r)));
      h = h / gcd(h, deriv(h, y));
      if (poldegree(h, y) != 1, return(0));
      my(yy = -polcoeff(h,0)/polcoeff(h,1));
      listput(out, [1, m, 1, (M*[r, yy, 1]~)~]),
      listput(out, [k, m, polsturm(p), 0]));
  );
  Vec(out)
};
meet(F, G, n, seed) = {
  setrand(seed);
  for (t = 1, 60,
    my(M = matrix(3, 3, i, j, random(19) - 9));
    if (matdet(M) != 0, my(r = meetinfo(F, G, n, M)); if (r != 0, return(r))));
  error("no generic frame");
};
hess(F) = matdet(matrix(3, 3, i, j, deriv(deriv(F, v[i]), v[j])));
`;

export function randomPoints(rand: () => number, n: number, size = 9): Point[] {
  const out: Point[] = [];
  while (out.length < n) {
    const c = [0, 1, 2].map(() => BigInt(Math.floor(rand() * (2 * size + 1)) - size));
    if (c.every((v) => v === 0n)) continue;
    const p = triple(c[0], c[1], c[2]);
    if (!out.some((q) => tripleProportional(p, q))) out.push(p);
  }
  return out;
}


/** A member Σ λ_i·basis_i of a linear system, one seeded λ_i in [-r, r] per basis form. */
export function randomMember(rand: () => number, basis: readonly Form[], r: number): Form {
  const out = new Array<bigint>(basis[0].coeffs.length).fill(0n);
  for (const b of basis) {
    const lam = BigInt(Math.floor(rand() * (2 * r + 1)) - r);
    b.coeffs.forEach((c, j) => (out[j] += lam * c));
  }
  return { degree: basis[0].degree, coeffs: out };
}
