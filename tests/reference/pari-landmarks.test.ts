// The tracer's exact landmarks (src/poly/curve-landmarks.ts) against PARI/GP, run live: for seeded random
// cubics and quartics, the distinct real roots of D(u) = Res_v(G, dG/dv) with G(u, v) = F(u + s v, v)
// (polresultant, then polrootsreal of the square-free part) and the real points at infinity (polrootsreal
// of F_d(t, 1)). Curves with a singular point placed by construction at a known rational point must list
// that point's abscissa u = a - s b among the singular lines (and the discriminant must vanish there).
import { describe, expect, it } from 'vitest';
import { gp, gpVector, randomBigInt, seededRandom } from './oracles.ts';
import { curveLandmarks } from '../../src/poly/curve-landmarks.ts';
import { monomials, type Form } from '../../src/poly/form.ts';

const SEED = 4711;

function gpPolynomial(f: Form): string {
  return monomials(f.degree)
    .map(([i, j], k) => (f.coeffs[k] === 0n ? null : `(${f.coeffs[k]})*x^${i}*y^${j}`))
    .filter((t) => t !== null)
    .join('+') || '0';
}

function randomForm(rand: () => number, d: number, digits: number): Form {
  const n = ((d + 1) * (d + 2)) / 2;
  return { degree: d, coeffs: Array.from({ length: n }, () => randomBigInt(rand, digits)) };
}

/** F(x - a, y - b) for a form whose affine part has no terms of degree < 2: a singular point at (a, b). */
function singularAt(rand: () => number, d: number, a: bigint, b: bigint): Form {
  const f = randomForm(rand, d, 2);
  const m = monomials(d);
  // Kill the constant and linear terms (Z^d, X Z^(d-1), Y Z^(d-1)) so the origin is singular.
  const coeffs = f.coeffs.map((c, k) => (m[k][0] + m[k][1] < 2 ? 0n : c));
  // Translate: x -> x - a z, y -> y - b z, expanded exactly.
  const out = new Array<bigint>(m.length).fill(0n);
  const binom = (n: number, k: number): bigint => {
    let r = 1n;
    for (let t = 0; t < k; t++) r = (r * BigInt(n - t)) / BigInt(t + 1);
    return r;
  };
  const idx = (i: number, j: number): number => m.findIndex((e) => e[0] === i && e[1] === j);
  m.forEach(([i, j], k) => {
    const c = coeffs[k];
    if (c === 0n) return;
    for (let p = 0; p <= i; p++) {
      for (let q = 0; q <= j; q++) {
        out[idx(p, q)] += c * binom(i, p) * binom(j, q) * (-a) ** BigInt(i - p) * (-b) ** BigInt(j - q);
      }
    }
  });
  return { degree: d, coeffs: out };
}

function close(ours: number[], theirs: number[]): boolean {
  return ours.length === theirs.length && ours.every((u, i) => Math.abs(u - theirs[i]) <= 1e-9 * (1 + Math.abs(u)));
}

describe(`landmarks against PARI/GP (seed ${SEED})`, () => {
  const rand = seededRandom(SEED);
  const cases: { f: Form; singular: [bigint, bigint] | null }[] = [];
  for (let k = 0; k < 40; k++) cases.push({ f: randomForm(rand, 3, 2), singular: null });
  for (let k = 0; k < 15; k++) cases.push({ f: randomForm(rand, 4, 1), singular: null });
  for (let k = 0; k < 15; k++) {
    const a = BigInt(Math.floor(rand() * 7) - 3);
    const b = BigInt(Math.floor(rand() * 7) - 3);
    cases.push({ f: singularAt(rand, 3 + (k % 2), a, b), singular: [a, b] });
  }
  const ours = cases.map(({ f }) => curveLandmarks(f));

  it('critical abscissae and points at infinity agree with polresultant + polrootsreal', () => {
    const script = ['default(realprecision, 40);'];
    cases.forEach(({ f }, k) => {
      const [p, q] = ours[k].shearExact;
      script.push(
        `F=${gpPolynomial(f)}; G=subst(subst(F,x,u+(${p}/${q})*v),y,v); D=polresultant(G,deriv(G,v),v); D0=D/gcd(D,deriv(D,u));`,
        `print(if(poldegree(D0,u)>0, Vec(polrootsreal(D0)), []));`,
        `T=sum(i=0,${f.degree},polcoeff(polcoeff(F,i,x),${f.degree}-i,y)*t^i); T0=T/gcd(T,deriv(T,t)); print(if(poldegree(T0,t)>0, Vec(polrootsreal(T0)), []));`,
      );
    });
    const lines = gp(script.join('\n'));
    expect(lines.length).toBe(2 * cases.length);
    // Not a vacuous comparison: most random curves have real critical abscissae and real points at infinity.
    expect(ours.reduce((n, lm) => n + lm.critical.length, 0)).toBeGreaterThan(100);
    expect(ours.reduce((n, lm) => n + lm.atInfinity.length, 0)).toBeGreaterThan(50);
    cases.forEach(({ f }, k) => {
      const crit = gpVector(lines[2 * k]).map(Number);
      const mine = ours[k].critical;
      expect(close(mine, crit), `seed ${SEED}, case ${k}: ${f.coeffs.join(' ')}; ours ${mine} PARI ${crit}`).toBe(true);
      // Real points at infinity (t : 1 : 0) with F_d(t, 1) = 0; ours as directions (dx, dy), dy > 0.
      const inf = gpVector(lines[2 * k + 1]).map(Number);
      const ts = ours[k].atInfinity.filter((p) => p.direction[1] !== 0).map((p) => p.direction[0] / p.direction[1]).sort((a, b) => a - b);
      expect(close(ts, inf), `seed ${SEED}, case ${k}: points at infinity ${ts} vs ${inf}`).toBe(true);
    });
  });

  it('a singular point placed by construction lies on a singular line', () => {
    cases.forEach(({ f, singular }, k) => {
      if (!singular) return;
      const lm = ours[k];
      const u = Number(singular[0]) - lm.shear * Number(singular[1]);
      expect(lm.singularLines.some((s) => Math.abs(s - u) < 1e-9 * (1 + Math.abs(u))), `seed ${SEED}, case ${k}: ${f.coeffs.join(' ')} at ${singular}`).toBe(true);
      const i = lm.critical.findIndex((c) => Math.abs(c - u) < 1e-9 * (1 + Math.abs(u)));
      expect(i, 'the singular abscissa is critical').toBeGreaterThanOrEqual(0);
      expect(lm.criticalMultiplicity[i], 'with multiplicity at least 2').toBeGreaterThanOrEqual(2);
    });
  });
});
