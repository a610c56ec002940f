// Meets and flexes against PARI/GP, run live (tests/reference/oracles.ts), one gp call per group with
// many seeded cases batched:
//  - meets: polresultant after a random change of coordinates chosen by PARI itself, factor of the
//    resultant (degrees, multiplicities, polsturm real-root counts), the rational points recovered by a
//    gcd on each linear factor's line (pari-cubic-helpers.ts);
//  - flexes: the same on F and its Hessian (matdet of the second derivatives, computed by PARI).
import { describe, expect, it } from 'vitest';
import { curveCurveMeet, lineCurveMeet } from '../../src/cubic/meet.ts';
import { cubicFlexes } from '../../src/cubic/flex.ts';
import { curvesThroughPoints } from '../../src/plane/linear-system.ts';
import { formEval, formFromCoeffs, formGradientAt, formMul, type Form } from '../../src/poly/form.ts';
import { formParse } from '../../src/poly/parse.ts';
import { triple, tripleIsZero, type Point } from '../../src/plane/point.ts';
import { gp, seededRandom } from './oracles.ts';
import { algebraicMeetPointDecimals } from '../../src/cubic/meet-decimal.ts';
import { rat, ratAbs, ratCmp, ratMul, ratParse, ratSub } from '../../src/exact/rational.ts';
import { formToGp, key, MEET_GP, parseMeet, randomMember, randomPoints } from './pari-cubic-helpers.ts';

function compareMeet(ctx: string, f: Form, g: Form, meet: ReturnType<typeof curveCurveMeet>, pari: ReturnType<typeof parseMeet>): void {
  expect(meet.total, ctx).toBe(f.degree * g.degree);
  // Multiplicities as a multiset: a PARI factor of degree k and multiplicity m stands for k points of multiplicity m.
  const ms = (xs: number[]) => xs.sort((a, b) => a - b).join(',');
  expect(ms(meet.points.map((p) => p.multiplicity)), ctx).toBe(ms(pari.flatMap((e) => new Array<number>(e.k).fill(e.m))));
  const oursRational = meet.points.filter((p) => p.point).map((p) => `${key(p.point!)}x${p.multiplicity}`).sort();
  const pariRational = pari.filter((e) => e.point).map((e) => `${key(e.point!)}x${e.m}`).sort();
  expect(oursRational, ctx).toEqual(pariRational);
  expect(meet.points.filter((p) => p.real).length, ctx).toBe(pari.reduce((s, e) => s + e.s, 0));
  for (const p of meet.points) {
    if (!p.point) continue;
    expect(formEval(f, p.point), ctx).toBe(0n);
    expect(formEval(g, p.point), ctx).toBe(0n);
  }
}

describe('meets (PARI/GP polresultant + factor + polsturm, live)', () => {
  it('cubic ∩ cubic for pencils through 8 random points (9 rational base points) and for random cubics through 4 points (seed 314)', () => {
    const seed = 314;
    const rand = seededRandom(seed);
    const pairs: [Form, Form][] = [];
    for (let k = 0; k < 6; k++) {
      const sys = curvesThroughPoints(3, randomPoints(rand, 8, 6));
      if (sys.dimension === 1) pairs.push([sys.basis[0], sys.basis[1]]);
    }
    for (let k = 0; k < 6; k++) {
      const sys = curvesThroughPoints(3, randomPoints(rand, 4, 5));
      const pick = () => randomMember(rand, sys.basis, 3);
      pairs.push([pick(), pick()]);
    }
    // conic ∩ cubic and a tangency
    pairs.push([formParse('x^2 + y^2 = 25').form, formParse('y^2 = x^3 - 7x + 10').form]);
    pairs.push([formParse('y^2 = x^3 - 4x + 4').form, formParse('y^2 = x^3 - 4x + 4 + (x + 2y - 3)^2 (x - 5)').form]);
    const lines = gp(MEET_GP + pairs.map(([f, g], i) => `print(meet(${formToGp(f)}, ${formToGp(g)}, ${f.degree * g.degree}, ${i + 1}));`).join('\n'));
    expect(lines).toHaveLength(pairs.length);
    pairs.forEach(([f, g], i) => {
      const ctx = `seed ${seed}, pair ${i}: F = ${f.coeffs.join(',')}, G = ${g.coeffs.join(',')}`;
      compareMeet(ctx, f, g, curveCurveMeet(f, g), parseMeet(lines[i]));
    });
    // the pencils really gave nine rational points each
    for (let i = 0; i < 3; i++) expect(parseMeet(lines[i]).filter((e) => e.point).length).toBe(9);
  });
  it('line ∩ cubic on seeded lines through a rational point and random lines (seed 271)', () => {
    const seed = 271;
    const rand = seededRandom(seed);
    const f = formParse('y^2 + xy = x^3 - 5x + 7').form;
    const lines: Point[] = [];
    for (let k = 0; k < 12; k++) {
      const l = [0, 1, 2].map(() => BigInt(Math.floor(rand() * 13) - 6));
      if (l.some((c) => c !== 0n)) lines.push(triple(l[0], l[1], l[2]));
    }
    lines.push([1n, 0n, -1n]); // x = 1 through (1, 1) and (1, -2)
    const out = gp(MEET_GP + lines.map((l, i) => `print(meet(${formToGp(f)}, (${l[0]})*x+(${l[1]})*y+(${l[2]})*z, 3, ${i + 1}));`).join('\n'));
    lines.forEach((l, i) => {
      const g = formFromCoeffs(1, [l[0], l[1], l[2]]);
      compareMeet(`seed ${seed}, line ${key(l)}`, f, g, lineCurveMeet(f, l), parseMeet(out[i]));
    });
  });
});

describe('meets of reducible and mixed cubics (PARI/GP, live)', () => {
  it('random cubics, line × conic and three lines, paired at random: 45 pairs agree with PARI (seed 12345)', () => {
    const seed = 12345;
    const rand = seededRandom(seed);
    const r = (k: number) => BigInt(Math.floor(rand() * (2 * k + 1)) - k);
    const pairs: [Form, Form][] = [];
    while (pairs.length < 45) {
      const kind = pairs.length % 3;
      const make = (): Form => {
        if (kind === 0) return formFromCoeffs(3, Array.from({ length: 10 }, () => r(3)));
        if (kind === 1) return formMul(formFromCoeffs(1, [r(2), r(2), r(2)]), formFromCoeffs(2, Array.from({ length: 6 }, () => r(2))));
        return formMul(formMul(formFromCoeffs(1, [r(1), r(1), r(2)]), formFromCoeffs(1, [r(2), r(1), r(1)])), formFromCoeffs(1, [r(1), r(2), r(1)]));
      };
      const f = make();
      const g = make();
      if (f.coeffs.every((c) => c === 0n) || g.coeffs.every((c) => c === 0n) || curveCurveMeet(f, g).commonComponent) continue;
      pairs.push([f, g]);
    }
    const lines = gp(MEET_GP + pairs.map(([f, g], i) => `print(meet(${formToGp(f)}, ${formToGp(g)}, 9, ${i + 1}));`).join('\n'));
    pairs.forEach(([f, g], i) => compareMeet(`seed ${seed}, pair ${i}: F = ${f.coeffs.join(',')}, G = ${g.coeffs.join(',')}`, f, g, curveCurveMeet(f, g), parseMeet(lines[i])));
  });
});

describe('flexes (PARI/GP Hessian by matdet, meet by polresultant + factor, live)', () => {
  it('rational flexes and real flex counts agree on seeded smooth cubics and on nodal and cuspidal ones (seed 9001)', () => {
    const seed = 9001;
    const rand = seededRandom(seed);
    const curves: Form[] = [];
    while (curves.length < 10) {
      const c = Array.from({ length: 10 }, () => BigInt(Math.floor(rand() * 9) - 4));
      if (c.some((v) => v !== 0n)) curves.push(formFromCoeffs(3, c));
    }
    // sparse ones, many of them singular
    while (curves.length < 35) {
      const c = Array.from({ length: 10 }, () => (rand() < 0.5 ? 0n : BigInt(Math.floor(rand() * 5) - 2)));
      if (c.some((v) => v !== 0n)) curves.push(formFromCoeffs(3, c));
    }
    for (const t of ['X^3 + Y^3 + Z^3 + 6XYZ', 'y^2 = x^3 + 49', 'y^2 = (x - 1)^2 (x + 2)', 'y^2 = (x - 1)^2 (x - 4)', 'y^2 = (x - 2)^3', 'y^2 + 3y = x^3 - 2x^2 + 5']) {
      curves.push(formParse(t).form);
    }
    const ours = curves.map((f) => cubicFlexes(f));
    const usable = curves.filter((_f, i) => ours[i].degenerate === null);
    const out = gp(MEET_GP + usable.map((f, i) => `print(meet(${formToGp(f)}, hess(${formToGp(f)}), 9, ${i + 1}));`).join('\n'));
    let k = 0;
    curves.forEach((f, i) => {
      if (ours[i].degenerate !== null) return;
      const pari = parseMeet(out[k++]);
      const ctx = `seed ${seed}, curve ${f.coeffs.join(',')}`;
      const singular = pari.filter((e) => e.point && tripleIsZero(formGradientAt(f, e.point)));
      const flexRational = pari.filter((e) => e.point && !singular.includes(e)).map((e) => key(e.point!)).sort();
      expect(ours[i].rational.map(key).sort(), ctx).toEqual(flexRational);
      expect(ours[i].real, ctx).toBe(pari.reduce((s, e) => s + e.s, 0) - singular.length);
      expect(ours[i].count, ctx).toBe(pari.reduce((s, e) => s + e.k, 0) - singular.length);
    });
    expect(k).toBeGreaterThan(25);
  });
});

describe('irrational meet points to 30 digits (PARI/GP polresultant + polrootsreal at 60 digits, live)', () => {
  it('the affine x of every real irrational point agrees with PARI to 30 significant digits', () => {
    const pairs = [
      ['x^2 + y^2 = 5', 'y = x^3 - 2x'],
      ['y^2 = x^3 - 3x + 4', 'x^2 - 3y^2 = 2'],
      ['x^3 + 2y^3 = 7xy', 'x + 3y = 4'],
    ].map(([a, b]) => [formParse(a).form, formParse(b).form] as const);
    const script = 'default(realprecision, 60);\n' + pairs.map(([f, g]) => `print(polrootsreal(polresultant(subst(${formToGp(f)}, z, 1), subst(${formToGp(g)}, z, 1), y)));`).join('\n');
    const out = gp(script);
    pairs.forEach(([f, g], i) => {
      const pari = out[i].replace(/[\[\]~]/g, '').split(',').map((t) => t.trim()).filter((t) => t.length > 0).map((t) => ratParse(t));
      const ours = curveCurveMeet(f, g).points.filter((p) => p.algebraic);
      expect(ours.length).toBeGreaterThan(0);
      for (const p of ours) {
        const [x] = algebraicMeetPointDecimals(p.algebraic!, 30).affine!;
        const q = ratParse(x);
        // some PARI root within 1e-28 relative of ours (ours is rounded to 30 digits)
        const close = pari.some((r) => {
          const d = ratSub(q, r);
          const scale = ratAbs(r).num === 0n ? rat(1) : ratAbs(r);
          return ratCmp(ratAbs(d), ratMul(scale, rat(1, 10n ** 28n))) <= 0;
        });
        expect(close, `pair ${i}: x = ${x}; PARI: ${out[i]}`).toBe(true);
      }
    });
  });
});

