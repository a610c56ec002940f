// The group law, Weierstrass models, minimal models, invariants and orders against PARI/GP, run live.
// PARI/GP functions used as the oracle: ellfromeqn (Jacobian of a plane cubic: c4, c6, hence S and T),
// ellinit, ellminimalmodel, elladd, ellmul, ellneg, ellisoncurve, elltors, ellorder.
import { describe, expect, it } from 'vitest';
import { gp, seededRandom } from './oracles.ts';
import {
  cubicToGp, pointPullBack, randomPoint, randomSmoothCubicThrough, randomUnimodular, weierstrassCubic,
} from '../unit/cubic/group-samples.ts';
import { cubicInvariants, cubicRealComponents } from '../../src/cubic/invariants.ts';
import { weierstrassMap, weierstrassModel } from '../../src/cubic/weierstrass.ts';
import { groupAdd, groupMultiple, groupNegate } from '../../src/cubic/group.ts';
import { groupOrder } from '../../src/cubic/order.ts';
import { cubicIsFlex } from '../../src/cubic/chord.ts';
import type { ModelPoint } from '../../src/cubic/curve-model.ts';
import { rat, ratMul, ratPow, ratSub, ratToString, type Rational } from '../../src/exact/rational.ts';
import { lcm } from '../../src/exact/integer.ts';
import { formTransform } from '../../src/poly/transform.ts';
import { triple, type Point } from '../../src/plane/point.ts';

const gpPoint = (p: ModelPoint) => (p === 'infinity' ? '[0]' : `[${ratToString(p.x)}, ${ratToString(p.y)}]`);
const gpRat = (q: Rational) => ratToString(q);
const gpVec = (a: readonly bigint[]) => `[${a.join(', ')}]`;

describe('random smooth cubics through rational points, against PARI/GP', () => {
  it('c4, c6 (hence S, T), j, minimal model, real components and the group law through our map (120 cubics, non-flex base)', () => {
    const seed = 20261201;
    const rand = seededRandom(seed);
    const cases = [];
    for (let k = 0; k < 120; k++) {
      const [o, p, q] = [randomPoint(rand), randomPoint(rand), randomPoint(rand)];
      const f = randomSmoothCubicThrough(rand, [o, p, q]);
      const inv = cubicInvariants(f);
      const m = weierstrassModel(f, o);
      const fp = weierstrassMap(m, p);
      const fq = weierstrassMap(m, q);
      cases.push({
        k, f, o, p, q, flex: cubicIsFlex(f, o),
        ours: [
          `[${gpRat(inv.c4)}, ${gpRat(inv.c6)}]`,
          m.minimal ? gpVec(m.minimal) : `unfactored: ${m.minimalNote}`,
          gpRat(m.j),
          '1',
          gpPoint(weierstrassMap(m, groupAdd(f, o, p, q))),
          gpPoint(weierstrassMap(m, groupMultiple(f, o, p, 2))),
          gpPoint(weierstrassMap(m, groupNegate(f, o, p))),
          gpPoint(weierstrassMap(m, groupMultiple(f, o, q, 7))),
          gpPoint(weierstrassMap(m, groupMultiple(f, o, p, -4))),
          String(cubicRealComponents(f)),
        ],
        fp, fq, a: m.a,
      });
    }
    const script = cases
      .map((c) => [
        `e=ellinit(ellfromeqn(${cubicToGp(c.f)})); print([e.c4, e.c6]); print(ellminimalmodel(e)[1..5]); print(e.j);`,
        `E=ellinit(${gpVec(c.a)}); P=${gpPoint(c.fp)}; Q=${gpPoint(c.fq)}; print(ellisoncurve(E,P) && ellisoncurve(E,Q));`,
        `print(elladd(E,P,Q)); print(ellmul(E,P,2)); print(ellneg(E,P)); print(ellmul(E,Q,7)); print(ellmul(E,P,-4)); print(if(e.disc>0,2,1));`,
      ].join('\n'))
      .join('\n');
    const out = gp(script);
    expect(out.length, 'one block of 10 lines per case').toBe(cases.length * 10);
    let nonFlex = 0;
    for (const c of cases) {
      const theirs = out.slice(c.k * 10, c.k * 10 + 10);
      const info = `seed ${seed}, case ${c.k}: F = ${c.f.coeffs.join(',')}, O = ${c.o}, P = ${c.p}, Q = ${c.q}`;
      expect(c.ours, info).toEqual(theirs);
      if (!c.flex) nonFlex++;
    }
    expect(nonFlex).toBeGreaterThan(100);
  });
});

// Tate normal form E(b, c): y² + (1 − c)xy − by = x³ − bx², (0, 0) of order N for Kubert's parameters
// (Kubert, "Universal bounds on the torsion of elliptic curves", Proc. LMS 1976, table 3; Husemöller,
// Elliptic Curves, 4.4; the families were recalled from memory and PARI's elltors confirms each group).
function tate(b: Rational, c: Rational): bigint[] {
  const a = [ratSub(rat(1n), c), ratMul(rat(-1n), b), ratMul(rat(-1n), b), rat(0n), rat(0n)];
  // Clear denominators with x = x'/u², y = y'/u³: a_i ↦ u^i a_i (weights 1, 2, 3, 4, 6).
  const u = a.reduce((acc, q) => lcm(acc, q.den), 1n);
  return a.map((q, i) => {
    const w = [1, 2, 3, 4, 6][i];
    const v = ratMul(q, ratPow(rat(u), w));
    return v.num;
  });
}

const r = (n: bigint, d = 1n) => rat(n, d);
const FAMILIES: { name: string; a: bigint[] }[] = (() => {
  const t2 = r(2n);
  const f10 = r(2n);
  const d10 = ratMul(ratPow(f10, 2), ratPow(ratSub(f10, ratPow(ratSub(f10, r(1n)), 2)), -1));
  const c10 = ratSub(ratMul(f10, d10), f10);
  const t12 = r(3n);
  const m12 = ratMul(ratSub(ratSub(ratMul(r(3n), t12), ratMul(r(3n), ratPow(t12, 2))), r(1n)), ratPow(ratSub(t12, r(1n)), -1));
  const f12 = ratMul(m12, ratPow(ratSub(r(1n), t12), -1));
  const d12 = ratSub(m12, ratMul(r(-1n), t12));
  const c12 = ratSub(ratMul(f12, d12), f12);
  const c26 = ratMul(r(6n), r(1n, -5n));
  const z8 = (t: Rational) => {
    const b = ratMul(ratSub(ratMul(r(2n), t), r(1n)), ratSub(t, r(1n)));
    return tate(b, ratMul(b, ratPow(t, -1)));
  };
  return [
    { name: 'trivial (y² + y = x³ − x)', a: [0n, 0n, 1n, -1n, 0n] },
    { name: 'Z/2', a: [0n, 3n, 0n, 5n, 0n] },
    { name: 'Z/3', a: [1n, 0n, 5n, 0n, 0n] },
    { name: 'Z/4', a: tate(t2, r(0n)) },
    { name: 'Z/5', a: tate(t2, t2) },
    { name: 'Z/6', a: tate(r(6n), t2) },
    { name: 'Z/7', a: tate(r(4n), r(2n)) },
    { name: 'Z/8', a: z8(r(2n)) },
    { name: 'Z/9', a: tate(r(12n), r(4n)) },
    { name: 'Z/10', a: tate(ratMul(c10, d10), c10) },
    { name: 'Z/12', a: tate(ratMul(c12, d12), c12) },
    { name: 'Z/2 x Z/2', a: [0n, 1n, 0n, -2n, 0n] },
    { name: 'Z/2 x Z/4', a: tate(r(15n, 16n), r(0n)) },
    { name: 'Z/2 x Z/6', a: tate(ratSub(c26, ratMul(r(-1n), ratPow(c26, 2))), c26) },
    { name: 'Z/2 x Z/8', a: z8(r(3n)) },
  ];
})();

describe('orders on curves with each of Mazur\'s fifteen torsion groups, moved to general cubics (PARI/GP elltors, ellorder)', () => {
  it('every torsion point, seen in the law with a non-flex base point, has PARI\'s order', () => {
    const rand = seededRandom(4401);
    const script = FAMILIES.map(({ a }) => [
      `E=ellinit(${gpVec(a)}); T=elltors(E); g=T[3]; pts=List();`,
      `if(#g==0, listput(pts,[0]), if(#g==1, for(i=0,T[2][1]-1, listput(pts, ellmul(E,g[1],i))), for(i=0,T[2][1]-1, for(j=0,T[2][2]-1, listput(pts, elladd(E, ellmul(E,g[1],i), ellmul(E,g[2],j)))))));`,
      // The base must not be a flex: a torsion generator of order other than 3, else a point of infinite order.
      `B=if(#g>0 && ellorder(E,g[1])!=3, g[1], select(p->ellorder(E,p)==0, ellratpoints(E,300))[1]); print(T[2]); print(#pts); print(B); print(ellminimalmodel(E)[1..5]);`,
      `for(k=1,#pts, print(pts[k]); print(elladd(E, pts[k], B)); print(ellorder(E, pts[k])));`,
    ].join('\n')).join('\n');
    const out = gp(script);
    let at = 0;
    const readPoint = (line: string): Point => {
      if (line.trim() === '[0]') return [0n, 1n, 0n];
      const [x, y] = line.slice(1, -1).split(',').map((s) => rat(...(s.trim().split('/').map((v) => BigInt(v)) as [bigint, bigint?]) as [bigint, bigint]));
      const l = lcm(x.den, y.den);
      return triple((x.num * l) / x.den, (y.num * l) / y.den, l);
    };
    const groups: string[] = [];
    for (const { name, a } of FAMILIES) {
      const structure = out[at++];
      const count = Number(out[at++]);
      const baseW = readPoint(out[at++]);
      const minimal = out[at++];
      groups.push(structure);
      const w = weierstrassCubic(a);
      const mat = randomUnimodular(rand, 6);
      const f = formTransform(w, mat);
      const base = pointPullBack(mat, baseW);
      const info = `${name}: a = ${a.join(',')}, M = ${JSON.stringify(mat.map((row) => row.map(String)))}`;
      expect(cubicIsFlex(f, base), `${info}: the base point must not be a flex`).toBe(false);
      expect(gpVec(weierstrassModel(f, base).minimal ?? []), `${info}: minimal model from the non-flex base`).toBe(minimal);
      for (let k = 0; k < count; k++) {
        readPoint(out[at++]);
        const moved = pointPullBack(mat, readPoint(out[at++]));
        const order = Number(out[at++]);
        expect(groupOrder(f, base, moved), `${info}, point ${k}`).toBe(order === 0 ? 'infinite' : order);
      }
    }
    expect(groups).toEqual(['[]', '[2]', '[3]', '[4]', '[5]', '[6]', '[7]', '[8]', '[9]', '[10]', '[12]', '[2, 2]', '[4, 2]', '[6, 2]', '[8, 2]']);
  });

  it('a point of infinite order: (0, 0) on y² + y = x³ − x, base (1, 0) moved to a general cubic (PARI ellorder = 0)', () => {
    const a = [0n, 0n, 1n, -1n, 0n];
    const out = gp(`E=ellinit(${gpVec(a)}); print(ellorder(E,[0,0])); print(elladd(E,[0,0],[1,0]));`);
    expect(out[0]).toBe('0');
    const mat = randomUnimodular(seededRandom(4402), 6);
    const f = formTransform(weierstrassCubic(a), mat);
    const [x, y] = out[1].slice(1, -1).split(',').map((s) => BigInt(s.trim()));
    expect(groupOrder(f, pointPullBack(mat, [1n, 0n, 1n]), pointPullBack(mat, [x, y, 1n]))).toBe('infinite');
  });
});
