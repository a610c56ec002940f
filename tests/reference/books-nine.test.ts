// Cayley–Bacharach and the nine points, against published statements and PARI/GP (live):
//  - Eisenbud, Green, Harris, "Cayley–Bacharach theorems and conjectures", Bull. AMS 33 (1996), §1:
//    Chasles' theorem (every cubic through eight of the nine points of two cubics passes through the
//    ninth), its corollary Pascal's theorem, and the special positions: eight distinct points fail to
//    impose independent conditions on cubics exactly when five are collinear or all eight lie on a conic
//    (stated there for the general case; from memory).
//  - Silverman–Tate, Rational Points on Elliptic Curves, §I.2 (the group law; from memory): on a cubic
//    through the eight points, smooth at the points used, the ninth point is
//    ((p1*p2)*(p3*p4)) * ((p5*p6)*(p7*p8)) (it is −(p1 + … + p8) in the group with a flex as zero).
//  - PARI/GP: matker of the 8 × 10 monomial matrix (PARI's own kernel) vanishes at our ninth point, and
//    matrank of the 9 × 10 matrix with our ninth point added is 8.
import { describe, expect, it } from 'vitest';
import { nineCheck, ninthPoint } from '../../src/cubic/nine.ts';
import { cubicThirdPoint } from '../../src/cubic/chord.ts';
import { formAdd, formScale, type Form } from '../../src/poly/form.ts';
import { curvesThroughPoints } from '../../src/plane/linear-system.ts';
import { pointsCollinear } from '../../src/plane/incidence.ts';
import { lineLineMeet, pointPointJoin, triple, tripleProportional, type Point } from '../../src/plane/point.ts';
import { Degenerate, SingularPoint } from '../../src/exact/errors.ts';
import { gp, gpVector, seededRandom } from './oracles.ts';
import { randomPoints } from './pari-cubic-helpers.ts';

/** ((p1*p2)*(p3*p4)) * ((p5*p6)*(p7*p8)) on the first member F1 + λF2 (λ = 0, 1, −1, 2, …) smooth at every point used. */
function chordNinth(pencil: readonly Form[], p: readonly Point[]): Point | null {
  for (const lam of [0n, 1n, -1n, 2n, -2n, 3n, 5n, -7n]) {
    const f = formAdd(pencil[0], formScale(pencil[1], lam));
    try {
      const a = cubicThirdPoint(f, cubicThirdPoint(f, p[0], p[1]), cubicThirdPoint(f, p[2], p[3]));
      const b = cubicThirdPoint(f, cubicThirdPoint(f, p[4], p[5]), cubicThirdPoint(f, p[6], p[7]));
      return cubicThirdPoint(f, a, b);
    } catch (e) {
      if (e instanceof SingularPoint || e instanceof Degenerate) continue;
      throw e;
    }
  }
  return null;
}

describe('the ninth point (Eisenbud–Green–Harris §1; Silverman–Tate §I.2)', () => {
  it('equals the chord-and-tangent construction on a member of the pencil, for 40 seeded eight-point sets (seed 1996)', () => {
    const seed = 1996;
    const rand = seededRandom(seed);
    let compared = 0;
    for (let k = 0; k < 40; k++) {
      const eight = randomPoints(rand, 8, 7);
      const r = ninthPoint(eight);
      if (!r.point) continue;
      const c = chordNinth(r.pencil, eight);
      if (!c) continue;
      expect(c, `seed ${seed}, set ${k}: ${eight.map((p) => p.join(':')).join(' ')}`).toEqual(r.point);
      compared++;
    }
    expect(compared).toBeGreaterThan(30);
  });

  it('PARI: its own kernel of the monomial matrix vanishes at our ninth point, and the nine impose 8 conditions (seed 33, 30 sets)', () => {
    const seed = 33;
    const rand = seededRandom(seed);
    const cases: { eight: Point[]; ninth: Point }[] = [];
    while (cases.length < 30) {
      const eight = randomPoints(rand, 8, 9);
      const r = ninthPoint(eight);
      if (r.point) cases.push({ eight, ninth: r.point });
    }
    const vec = (p: Point) => `[${p.join(',')}]`;
    const script =
      'mons(P) = [P[1]^3, P[1]^2*P[2], P[1]^2*P[3], P[1]*P[2]^2, P[1]*P[2]*P[3], P[1]*P[3]^2, P[2]^3, P[2]^2*P[3], P[2]*P[3]^2, P[3]^3];\n' +
      cases
        .map(({ eight, ninth }) => {
          const rows = eight.map((p) => `mons(${vec(p)})`).join('; ');
          return `M = matconcat([${rows}]); K = matker(M); print([#K, mons(${vec(ninth)}) * K, matrank(matconcat([M; mons(${vec(ninth)})]))]);`;
        })
        .join('\n');
    const lines = gp(script);
    expect(lines).toHaveLength(cases.length);
    lines.forEach((l, i) => expect(l, `seed ${seed}, case ${i}: ${cases[i].eight.map((p) => p.join(':')).join(' ')} -> ${cases[i].ninth.join(':')}`).toBe('[2, [0, 0], 8]'));
  });

  it("Pascal's theorem as a corollary: six points on a conic and two of the three meets of opposite sides force the third (EGH §1)", () => {
    // Six rational points of x^2 + y^2 = 25 and the hexagon A B C D E F.
    const [A, B, C, D, E, F] = [[3n, 4n, 1n], [5n, 0n, 1n], [4n, -3n, 1n], [-3n, -4n, 1n], [-5n, 0n, 1n], [0n, 5n, 1n]].map((p) => triple(p[0], p[1], p[2]));
    const side = (p: Point, q: Point) => pointPointJoin(p, q);
    const X = lineLineMeet(side(A, B), side(D, E));
    const Y = lineLineMeet(side(B, C), side(E, F));
    const Z = lineLineMeet(side(C, D), side(F, A));
    // The two cubics AB·CD·EF and BC·DE·FA meet in the nine points A..F, X, Y, Z.
    const check = nineCheck([A, B, C, D, E, F, X, Y, Z]);
    expect(check.holds).toBe(true);
    expect(check.each.every((e) => e)).toBe(true);
    expect(pointsCollinear([X, Y, Z]).holds).toBe(true);
  });

  it('eight points impose independent conditions unless five are collinear or all eight lie on a conic (EGH §1; from memory)', () => {
    const seed = 8;
    const rand = seededRandom(seed);
    // planted: five on the line y = 2x + 1, eight on the conic x y = 12 (rational points (d, 12/d))
    const line5 = [0, 1, 2, -1, 3].map((x) => triple(BigInt(x), BigInt(2 * x + 1), 1n));
    const conic8 = [1, 2, 3, 4, 6, 12, -1, -2].map((d) => triple(BigInt(d), BigInt(12 / d), 1n));
    const sets: Point[][] = [[...line5, ...randomPoints(rand, 3, 6)], conic8];
    for (let k = 0; k < 20; k++) sets.push(randomPoints(rand, 8, 4));
    expect(curvesThroughPoints(3, sets[0]).dimension).toBe(2);
    expect(curvesThroughPoints(3, conic8).dimension).toBe(2);
    for (const s of sets) {
      const distinct = s.every((p, i) => s.every((q, j) => i === j || !tripleProportional(p, q)));
      if (!distinct) continue;
      const fiveOnLine = s.some((p, i) => s.some((q, j) => j > i && s.filter((r) => pointsCollinear([p, q, r]).holds).length >= 5));
      const allOnConic = curvesThroughPoints(2, s).dimension >= 0;
      const dim = curvesThroughPoints(3, s).dimension;
      expect(dim > 1, `seed ${seed}: ${s.map((p) => p.join(':')).join(' ')}`).toBe(fiveOnLine || allOnConic);
    }
  });

  it('PARI: nineCheck agrees with matrank on 36 seeded nine-point sets (pencil base points, random, special positions; seed 90)', () => {
    const seed = 90;
    const rand = seededRandom(seed);
    const sets: Point[][] = [];
    while (sets.length < 36) {
      const kind = sets.length % 3;
      if (kind === 0) {
        const eight = randomPoints(rand, 8, 6);
        const r = ninthPoint(eight);
        if (r.point && r.coincidesWith === null) sets.push([...eight, r.point]);
      } else if (kind === 1) {
        sets.push(randomPoints(rand, 9, 6));
      } else {
        // four on the line x = 2y and five more
        const line = [0, 1, 2, -3].map((t) => triple(BigInt(2 * t), BigInt(t), 1n));
        const rest = randomPoints(rand, 5, 6).filter((p) => !line.some((q) => tripleProportional(p, q)));
        if (rest.length === 5) sets.push([...rest.slice(0, 4), ...line, rest[4]]);
      }
    }
    const mons = 'mons(P) = [P[1]^3, P[1]^2*P[2], P[1]^2*P[3], P[1]*P[2]^2, P[1]*P[2]*P[3], P[1]*P[3]^2, P[2]^3, P[2]^2*P[3], P[2]*P[3]^2, P[3]^3];';
    const script = mons + '\n' + sets.map((s9) => {
      const rows = s9.map((p) => `mons([${p.join(',')}])`);
      return `print([matrank(matconcat([${rows.join('; ')}])), matrank(matconcat([${rows.slice(0, 8).join('; ')}]))]);`;
    }).join('\n');
    const out = gp(script);
    sets.forEach((s9, i) => {
      const [r9, r8] = gpVector(out[i]).map(Number);
      const c = nineCheck(s9);
      const ctx = `seed ${seed}, set ${i}: ${s9.map((p) => p.join(':')).join(' ')}`;
      expect(c.dimension, ctx).toBe(10 - r9 - 1);
      expect(c.holds, ctx).toBe(r9 === r8);
    });
  });
});

