// Singular points and components of cubics against Singular, live, in one run: seeded singular and
// reducible cubics of every configuration (normal forms of our own moved by random unimodular matrices,
// tests/unit/cubic/singular-samples.ts) and seeded random dense cubics.
//
// Singular computes, independently of our code: the saturated Jacobian ideal sat(jacob(F), m) (its
// dimension, its degree = Σ τ over the singular points, and the degree of its radical = how many
// singular points over C), factorize(F) over Q (component degrees and multiplicities), and at each of our
// rational singular points, moved to the origin of an affine chart in a local ring (ds): the order
// (multiplicity), milnor, tjurina (sing.lib) and factorize of the tangent cone jet(g, ord g) — which
// decides our split test (two rational lines, a quadratic irreducible over Q, a double line), and
// classify (classify.lib) for the kind: A[1] node, A[2] cusp, A[3] tacnode, D[4] ordinary triple point,
// consistent with (order, μ) = (2, 1), (2, 2), (2, 3), (3, 4) (Arnold's list; Greuel, Lossen, Shustin,
// Introduction to Singularities and Deformations, I.2). Orbits of conjugate points are checked over
// Q(u) with Singular's minpoly: the partials vanish at our polynomial coordinates.
import { describe, expect, it } from 'vitest';
import { seededRandom, singular } from './oracles.ts';
import { formToText } from '../../src/poly/print.ts';
import { monomials, formPrimitive, type Form } from '../../src/poly/form.ts';
import { cubicSingularPoints, type CubicSingularities, type SingularPoint } from '../../src/cubic/singular.ts';
import { SAMPLE_FAMILIES, randomUnimodular, singularSample } from '../unit/cubic/singular-samples.ts';
import { formSingularPoints } from '../../src/cubic/singular-general.ts';
import { formParse } from '../../src/poly/parse.ts';
import { formTransform } from '../../src/poly/transform.ts';

function singularPoly(f: Form): string {
  const terms = monomials(f.degree)
    .map(([i, j, k], n) => (f.coeffs[n] === 0n ? '' : `(${f.coeffs[n]})*x^${i}*y^${j}*z^${k}`))
    .filter((t) => t !== '');
  return terms.join('+') || '0';
}

/** The affine chart substitution moving P to the origin: X_k = P_k, the others P_i + P_k·x, P_j + P_k·y. */
function chart(p: readonly bigint[]): string {
  const k = p[2] !== 0n ? 2 : p[1] !== 0n ? 1 : 0;
  const others = [0, 1, 2].filter((i) => i !== k);
  const sub = ['', '', ''];
  sub[k] = `${p[k]}`;
  sub[others[0]] = `(${p[others[0]]})+(${p[k]})*x`;
  sub[others[1]] = `(${p[others[1]]})+(${p[k]})*y`;
  return sub.join(', ');
}

const PRELUDE = `LIB "elim.lib"; LIB "primdec.lib"; LIB "sing.lib"; LIB "classify.lib";
ring r = 0,(x,y,z),dp;
proc rep(poly f, int n) { ideal J = jacob(f); def S0 = sat(J, maxideal(1)); ideal S = S0[1]; ideal Ss = std(S);
  list fa = factorize(f); string s = "C " + string(n) + " " + string(dim(Ss)) + " " + string(mult(Ss)) + " " + string(mult(std(radical(S)))) + " F";
  int i; for (i = 1; i <= size(fa[1]); i++) { if (deg(fa[1][i]) > 0) { s = s + " " + string(deg(fa[1][i])) + "^" + string(fa[2][i]); } }
  print(s); }
proc loc(poly f, int n, int k, poly a, poly b, poly c) { map m = basering, a, b, c; poly h = m(f); def R0 = basering;
  ring rl2 = 0,(x,y),ds; poly g = imap(R0, h); list tc = factorize(jet(g, ord(g)));
  string s = "P " + string(n) + " " + string(k) + " " + string(ord(g)) + " " + string(milnor(g)) + " " + string(tjurina(g)) + " T";
  int i; for (i = 1; i <= size(tc[1]); i++) { if (deg(tc[1][i]) > 0) { s = s + " " + string(deg(tc[1][i])) + "^" + string(tc[2][i]); } }
  print(s); }
proc kind(poly f, int n, int k, poly a, poly b, poly c) { map m = basering, a, b, c; poly h = m(f); def R0 = basering;
  ring rl3 = 0,(x,y),ds; poly g = imap(R0, h); print("K " + string(n) + " " + string(k) + " begin"); def cl = classify(g); print("K end"); }
`;

/** Arnold's names of our kinds, as Singular's classify prints them (classify.lib). */
const ARNOLD: Record<string, string> = { node: 'A[1]', cusp: 'A[2]', tacnode: 'A[3]', 'triple point': 'D[4]' };

/** The type classify printed for point k of curve n ("... is R-equivalent to A[1]."), or null. */
function classifiedType(lines: readonly string[], n: number, k: number): string | null {
  const start = lines.findIndex((l) => l.trim() === `K ${n} ${k} begin`);
  if (start < 0) return null;
  for (let i = start + 1; i < lines.length && lines[i].trim() !== 'K end'; i++) {
    const m = /R-equivalent to ([A-Z]\[\d+\])/.exec(lines[i]);
    if (m) return m[1];
  }
  return null;
}

/** What Singular's factorisation of the tangent cone must look like for our answer at a rational point. */
function expectedCone(p: SingularPoint): string {
  if (p.kind === 'cusp' || p.kind === 'tacnode') return '1^2';
  return p.tangents.map((t) => `${t.degree}^1`).sort().join(' ');
}

function expectedComponents(s: CubicSingularities): string {
  return s.components.components.map((c) => `${c.form.degree}^${c.multiplicity}`).sort().join(' ');
}

const PRELUDE_HIGHER = `proc hi(poly f, int n) { ideal J = jacob(f); def S0 = sat(J, maxideal(1)); ideal S = S0[1]; ideal Ss = std(S);
  list P = minAssGTZ(S); int i; int rat = 0; for (i = 1; i <= size(P); i++) { if (mult(std(P[i])) == 1) { rat++; } }
  print("H " + string(n) + " " + string(dim(Ss)) + " " + string(mult(Ss)) + " " + string(rat) + " " + string(mult(std(radical(S))))); }
`;

const ORDER_MILNOR: Record<string, [number, number]> = { node: [2, 1], cusp: [2, 2], tacnode: [2, 3], 'triple point': [3, 4] };

function randomCubic(rand: () => number): Form {
  const coeffs = Array.from({ length: 10 }, () => BigInt(Math.floor(rand() * 41) - 20));
  if (!coeffs.some((c) => c !== 0n)) coeffs[0] = 1n;
  return formPrimitive({ degree: 3, coeffs });
}

describe('singular points of cubics agree with Singular (live)', () => {
  const seed = 31337;
  it(`${SAMPLE_FAMILIES * 6} configured cubics and 12 random cubics (seed ${seed})`, () => {
    const rand = seededRandom(seed);
    const curves: { curve: Form; family: string }[] = [];
    for (let n = 0; n < SAMPLE_FAMILIES * 6; n++) {
      const s = singularSample(rand, n);
      curves.push({ curve: s.curve, family: s.family });
    }
    for (let n = 0; n < 12; n++) curves.push({ curve: randomCubic(rand), family: 'random dense' });
    const ours = curves.map((c) => cubicSingularPoints(c.curve));
    let script = PRELUDE;
    curves.forEach((c, n) => {
      const poly = singularPoly(c.curve);
      script += `rep(${poly}, ${n});\n`;
      ours[n].points.forEach((p, k) => {
        if (p.point) script += `loc(${poly}, ${n}, ${k}, ${chart(p.point)});\nkind(${poly}, ${n}, ${k}, ${chart(p.point)});\n`;
      });
    });
    // Every orbit of conjugate singular points, checked in Singular over Q(u) with minpoly: the partials
    // vanish at (coords(u)).
    const orbits: { n: number; k: number; poly: string }[] = [];
    curves.forEach((c, n) => {
      const seen = new Set<object>();
      ours[n].points.forEach((p, k) => {
        if (!p.conjugates || seen.has(p.conjugates)) return;
        seen.add(p.conjugates);
        const o = p.conjugates;
        const up = (q: readonly bigint[]) => q.map((a, i) => `(${a})*u^${i}`).join('+') || '0';
        script += `ring rk_${n}_${k} = (0,u),(x,y,z),dp; minpoly = ${up(o.poly)};\n`;
        script += `print("O ${n} ${k} " + string(size(subst(jacob(${singularPoly(c.curve)}), x, ${up(o.coords[0])}, y, ${up(o.coords[1])}, z, ${up(o.coords[2])}))));\n`;
        script += 'setring r;\n';
        orbits.push({ n, k, poly: up(o.poly) });
      });
    });
    const lines = singular(script, 120_000);
    for (const o of orbits) {
      const line = lines.find((l) => l.startsWith(`O ${o.n} ${o.k} `));
      expect(line, `seed ${seed}, curve ${o.n}: orbit over ${o.poly} (${formToText(curves[o.n].curve)})`).toBe(`O ${o.n} ${o.k} 0`);
    }
    expect(orbits.length).toBeGreaterThan(5);
    const byKey = new Map<string, string[]>();
    for (const l of lines) {
      const parts = l.trim().split(/\s+/);
      if (parts[0] === 'C') byKey.set(`C ${parts[1]}`, parts.slice(2));
      else if (parts[0] === 'P') byKey.set(`P ${parts[1]} ${parts[2]}`, parts.slice(3));
    }
    let checkedPoints = 0;
    curves.forEach((c, n) => {
      const ctx = `seed ${seed}, curve ${n} (${c.family}): ${formToText(c.curve)}`;
      const s = ours[n];
      const rep = byKey.get(`C ${n}`);
      expect(rep, `${ctx}: no answer from Singular; output was ${lines.slice(0, 5).join(' | ')}`).toBeDefined();
      const [dim, degree, points, , ...factors] = rep!;
      expect(factors.sort().join(' '), `${ctx}: components`).toBe(expectedComponents(s));
      if (s.lines.length > 0) {
        expect(Number(dim), `${ctx}: a singular line`).toBe(2);
        return;
      }
      if (s.smooth) {
        expect(Number(dim), `${ctx}: smooth`).toBeLessThanOrEqual(0);
        return;
      }
      expect(Number(dim), ctx).toBe(1);
      expect(Number(degree), `${ctx}: Σ τ`).toBe(s.points.reduce((a, p) => a + p.tjurina, 0));
      expect(Number(points), `${ctx}: number of singular points`).toBe(s.points.length);
      s.points.forEach((p, k) => {
        if (!p.point) return;
        const loc = byKey.get(`P ${n} ${k}`);
        expect(loc, `${ctx}: point ${k}`).toBeDefined();
        const [ord, milnor, tjurina, , ...cone] = loc!;
        const pctx = `${ctx}: point ${p.point.join(':')} (${p.kind})`;
        expect([Number(ord), Number(milnor)], pctx).toEqual(ORDER_MILNOR[p.kind]);
        expect(Number(milnor), pctx).toBe(p.milnor);
        expect(Number(tjurina), pctx).toBe(p.tjurina);
        expect(cone.sort().join(' '), `${pctx}: tangent cone over Q`).toBe(expectedCone(p));
        expect(classifiedType(lines, n, k), `${pctx}: Singular classify`).toBe(ARNOLD[p.kind]);
        checkedPoints++;
      });
    });
    expect(checkedPoints).toBeGreaterThan(50);
  }, 180_000);
});

describe('curves of degree 4 to 6 agree with Singular (live)', () => {
  // Curves of our own, each also moved by a seeded unimodular matrix so that nothing sits at convenient
  // coordinates. Singular gives Σ τ (degree of the saturated Jacobian ideal) and the number of rational
  // singular points (minimal associated primes over Q of degree 1); locally at each of our points, the
  // order and Milnor number; our orbits of non-rational points are checked in a ring with u adjoined, and
  // rational plus orbit points must make up the degree of the radical (all singular points over C).
  const seed = 777;
  const texts = [
    '(y^2 - x^2)(y - 2)(x + 3) = 0',
    '(x^2 + 2y^2 - 3)(y - x^2 - 1) = 0',
    'x^5 + y^5 = x^2 y^2',
    '(x^2 + y^2)^2 + 3x^2 y - y^3 = 0',
    'y^2 = x^4 - 5x^2 + 7',
    '(x^3 - 2y^2 + 5)(x + y - 1) = 0',
    'x^4 + 3y^4 - 2x^2y + 11 = 0',
    '(y - x^2)^2 = x^5',
    '(x^2 + y^2 - 1)^3 = 7x^2y^3',
    'x^6 + y^6 - 2x^3y^2 + 4 = 0',
    '(x^2 - 2)^2 + (y^2 - 3)^2 = 0',
    '(x^2 + y^2 - 5)(x^2 - 3y^2 - 1)(x - 7) = 0',
  ];
  it(`${texts.length * 2} curves (seed ${seed})`, () => {
    const rand = seededRandom(seed);
    const curves: Form[] = [];
    for (const t of texts) {
      const f = formParse(t).form;
      curves.push(f, formPrimitive(formTransform(f, randomUnimodular(rand, 2))));
    }
    const ours = curves.map(formSingularPoints);
    let script = PRELUDE + PRELUDE_HIGHER;
    curves.forEach((c, n) => {
      const poly = singularPoly(c);
      script += `hi(${poly}, ${n});\n`;
      ours[n].points.forEach((p, k) => {
        script += `loc(${poly}, ${n}, ${k}, ${chart(p.point)});\n`;
      });
    });
    // Orbits of non-rational singular points: the partials vanish at coords(u) modulo poly(u) (the ideal
    // of the roots; poly need not be irreducible), in a ring with u as a fourth variable.
    script += 'ring ru = 0,(u,x,y,z),dp;\n';
    const orbitChecks: { n: number; k: number }[] = [];
    curves.forEach((c, n) => {
      (ours[n].orbits ?? []).forEach((o, k) => {
        const up = (q: readonly bigint[]) => q.map((a, i) => `(${a})*u^${i}`).join('+') || '0';
        script += `print("O ${n} ${k} " + string(size(reduce(subst(jacob(${singularPoly(c)}), x, ${up(o.orbit.coords[0])}, y, ${up(o.orbit.coords[1])}, z, ${up(o.orbit.coords[2])}), std(ideal(${up(o.orbit.poly)}))))));\n`;
        orbitChecks.push({ n, k });
      });
    });
    const lines = singular(script, 120_000);
    for (const o of orbitChecks) {
      expect(lines.find((l) => l.startsWith(`O ${o.n} ${o.k} `)), `seed ${seed}, curve ${o.n}: orbit ${o.k}`).toBe(`O ${o.n} ${o.k} 0`);
    }
    expect(orbitChecks.length).toBeGreaterThan(3);
    const get = (key: string) => lines.find((l) => l.startsWith(key + ' '))?.trim().split(/\s+/).slice(key.split(' ').length);
    curves.forEach((c, n) => {
      const ctx = `seed ${seed}, curve ${n}: ${formToText(c)}`;
      const h = get(`H ${n}`);
      expect(h, ctx).toBeDefined();
      const [dim, tau, rational, all] = h!.map(Number);
      const s = ours[n];
      expect(s.reduced, ctx).toBe(true);
      expect(s.smooth, ctx).toBe(dim <= 0);
      if (dim > 0) expect(s.tjurinaTotal, `${ctx}: Σ τ`).toBe(tau);
      expect(s.points.length, `${ctx}: rational singular points`).toBe(rational);
      expect(s.orbits, `${ctx}: general position reached`).not.toBeNull();
      const orbitPoints = s.orbits!.reduce((a, o) => a + o.orbit.poly.length - 1, 0);
      if (dim > 0) expect(s.points.length + orbitPoints, `${ctx}: all singular points over C`).toBe(all);
      s.points.forEach((p, k) => {
        const loc = get(`P ${n} ${k}`);
        expect(loc, `${ctx}: point ${k}`).toBeDefined();
        const [ord, milnor] = loc!.map(Number);
        expect(ord, `${ctx}: order at ${p.point.join(':')}`).toBe(p.multiplicity);
        if (p.milnor !== null) expect(milnor, `${ctx}: Milnor number at ${p.point.join(':')} (${p.kind})`).toBe(p.milnor);
      });
    });
  }, 180_000);
});
