// Ninth points and pencil members follow a drag in floats (float-pencil.ts). At each step of a path of
// moves of one of eight free points: the float ninth point is within a small distance of the exact ninth
// base point at that step's rational position (src/cubic/nine.ts); the float pencil member passes through
// the eight points, lies in the exact pencil, and moves continuously; after the drop both are exact.
// Points are seeded random small rationals (the seed is printed on failure).
import { describe, expect, it } from 'vitest';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { f3FromBig, f3Normalise, f3Sine, floatFormEval, type F3 } from '../../../src/construct/float.ts';
import { ninthPointFloat, pencilMemberFloat, pencilThroughPointsFloat } from '../../../src/construct/float-pencil.ts';
import { seededUniform } from '../../../src/exact/random.ts';
import { ninthPoint } from '../../../src/cubic/nine.ts';
import { curvesThroughPoints } from '../../../src/plane/linear-system.ts';
import { triple, type Point } from '../../../src/plane/point.ts';
import type { CurveValue } from '../../../src/construct/types.ts';
import { build, dragDrop, dragStep, pointValue, type Step } from './drag-helpers.ts';

function randomPoints(rand: () => number, n: number): Point[] {
  const r = (k: number): bigint => BigInt(Math.floor(rand() * (2 * k + 1)) - k);
  return Array.from({ length: n }, () => triple(r(5), r(5), 1n + BigInt(Math.floor(rand() * 2))));
}

/** The distance of a coefficient vector from the span of two others (all made unit first). */
function offSpan(v: readonly number[], a: readonly number[], b: readonly number[]): number {
  const unit = (x: readonly number[]) => {
    const n = Math.hypot(...x);
    return x.map((c) => c / n);
  };
  const u = unit(a);
  const bb = unit(b);
  const dotp = (x: readonly number[], y: readonly number[]) => x.reduce((s, c, i) => s + c * y[i], 0);
  // Gram–Schmidt on a, b, then the residual of v.
  const w = unit(bb.map((c, i) => c - dotp(bb, u) * u[i]));
  const vv = unit(v);
  const res = vv.map((c, i) => c - dotp(vv, u) * u[i] - dotp(vv, w) * w[i]);
  return Math.hypot(...res);
}

/** sin of the angle between two coefficient vectors (0 when they are the same curve). */
function sine(a: readonly number[], b: readonly number[]): number {
  const na = Math.hypot(...a);
  const nb = Math.hypot(...b);
  const c = a.reduce((s, x, i) => s + x * b[i], 0) / (na * nb);
  return Math.sqrt(Math.max(0, 1 - c * c));
}

let compared = 0;

describe('ninth points and pencil members during a drag', () => {
  for (const seed of [11, 12, 13, 14, 15]) {
    it(`follow the exact pencil (seed ${seed})`, () => {
      const rand = seededUniform(seed);
      const pts = randomPoints(rand, 8);
      if (ninthPoint(pts).point === null) return; // special position: nothing to follow
      const steps: Step[] = pts.map((p, k) => [`P${k}`, 'point-free', [], { at: `${p[0]}:${p[1]}:${p[2]}` }] as Step);
      const names = pts.map((_, k) => `P${k}`);
      steps.push(['N', 'point-ninth', names], ['F', 'pencil-member', names, { member: '2:-3' }]);
      const { doc, id } = build(steps);
      let values = constructionEvaluate(doc);
      let lastMember = (values.get(id.F) as CurveValue).approx;
      const N = 25;
      let at = '';
      for (let s = 1; s <= N; s++) {
        const den = 4n * BigInt(N) * pts[0][2];
        const P0 = triple(pts[0][0] * 4n * BigInt(N) + BigInt(s), pts[0][1] * 4n * BigInt(N) - BigInt(2 * s), den);
        const now = [P0, ...pts.slice(1)];
        const exact = ninthPoint(now);
        if (!exact.point) break;
        values = dragStep(doc, values, id.P0, { x: Number(P0[0]) / Number(P0[2]), y: Number(P0[1]) / Number(P0[2]), finite: true });
        at = `${P0[0]}:${P0[1]}:${P0[2]}`;
        const where = `seed ${seed} points ${pts.map((p) => p.join(':')).join(' ')} step ${s}`;
        const n = pointValue(values.get(id.N), where);
        expect(n.status).toBe('approximate');
        const nf = f3Normalise(n.approx.finite ? [n.approx.x, n.approx.y, 1] : [n.approx.x, n.approx.y, 0]);
        expect(f3Sine(nf, f3FromBig(exact.point)), where).toBeLessThan(1e-7);
        const member = values.get(id.F) as CurveValue;
        expect(member.status).toBe('approximate');
        // through the eight points (relative residual) ...
        for (const p of now.map(f3FromBig)) expect(Math.abs(floatFormEval({ degree: 3, coeffs: member.approx }, p[0], p[1], p[2])), where).toBeLessThan(1e-9);
        // ... a member of the exact pencil ...
        const basis = exact.pencil.map((f) => f.coeffs.map(Number));
        expect(offSpan(member.approx, basis[0], basis[1]), where).toBeLessThan(1e-8);
        // ... and close to the last one (continuity; a step moves a point by under 1/100)
        expect(sine(member.approx, lastMember), where).toBeLessThan(0.05);
        lastMember = member.approx;
        compared++;
      }
      if (!at) return;
      const drop = dragDrop(doc, values, id.P0, at);
      expect(pointValue(drop.values.get(id.N)).status).toBe('exact');
      expect((drop.values.get(id.F) as CurveValue).status).toBe('exact');
    });
  }

  it('compared many steps', () => {
    expect(compared).toBeGreaterThan(60);
  });

  it('starts at the exact member: projected onto its own pencil, the exact member is itself', () => {
    const rand = seededUniform(21);
    const pts = randomPoints(rand, 8);
    const sys = curvesThroughPoints(3, pts);
    expect(sys.dimension).toBe(1);
    const exact = sys.basis[0].coeffs.map((c, i) => 2 * Number(c) - 3 * Number(sys.basis[1].coeffs[i]));
    const f = pencilMemberFloat(pts.map(f3FromBig), 2, -3, exact)!;
    const n = Math.hypot(...exact);
    const m = Math.hypot(...f.coeffs);
    const sign = Math.sign(f.coeffs.find((c) => Math.abs(c) > 1e-6)! * exact.find((c) => Math.abs(c) > 1e-6 * n)!);
    f.coeffs.forEach((c, i) => expect(Math.abs(c / m - (sign * exact[i]) / n)).toBeLessThan(1e-9));
  });

  it('refuses special positions', () => {
    // eight points, five of them on the line y = 0: every cubic through them contains the line (a cubic
    // meets a line in three points unless it contains it), times a conic through the other three: a net,
    // not a pencil (Eisenbud–Green–Harris, Bull. AMS 1996, §1)
    const onLine: F3[] = [0, 1, 2, 3, -4].map((x) => f3Normalise([x, 0, 1]));
    const others: F3[] = [f3Normalise([0, 1, 1]), f3Normalise([1, 2, 1]), f3Normalise([2, 5, 1])];
    expect(pencilThroughPointsFloat([...onLine, ...others])).toBeNull();
    expect(ninthPointFloat([...onLine, ...others])).toBeNull();
    const repeated = [...others, f3Normalise([-1, 3, 1]), ...others, f3Normalise([-1, 3, 1])];
    expect(ninthPointFloat(repeated)).toBeNull();
  });
});
