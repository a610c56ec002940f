// Curve–curve meet points follow a drag in floats (float-meet.ts): at every step of a path of moves of a
// free point, each meet point stays within a small distance of the exact meet point it continues
// (computed by src/cubic/meet.ts at that step's rational position and tracked by continuity), the meet
// objects stay distinct, and after the drop the exact value is the continued point.
// The cubic y^2 = x^3 - 4x + 4 is our own; conics are through seeded random points (seed printed on failure).
import { describe, expect, it } from 'vitest';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { curveCurveMeetFollow } from '../../../src/construct/float-meet.ts';
import { constructionMeetsSettle } from '../../../src/construct/meet-identity.ts';
import { f3Normalise, f3Sine, type F3 } from '../../../src/construct/float.ts';
import { seededUniform } from '../../../src/exact/random.ts';
import { curveCurveMeet } from '../../../src/cubic/meet.ts';
import { conicThroughFive } from '../../../src/plane/conic.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { triple, type Point } from '../../../src/plane/point.ts';
import { approxDistance, build, dragDrop, dragStep, pointValue, type Step } from './drag-helpers.ts';

const CUBIC = 'y^2 = x^3 - 4x + 4';
const cubic = formParse(CUBIC).form;

function unitOf(p: readonly number[]): F3 {
  return f3Normalise(p);
}

/** Exact real meets of the cubic with the conic through five rational points, as unit float triples. */
function exactMeets(points: Point[]): F3[] {
  const conic = conicThroughFive(points).conic;
  return curveCurveMeet(cubic, conic).points.filter((q) => q.real).map((q) => unitOf(q.approx));
}

/** Meet points compared, over all seeds: the paths must not all end at once (a test that cannot fail). */
let followed = 0;

describe('curve–curve meets during a drag', () => {
  for (const seed of [1, 2, 3, 4, 5, 6]) {
    it(`follow their exact points by continuity (seed ${seed})`, () => {
      const rand = seededUniform(seed);
      const r = (n: number): number => Math.floor(rand() * (2 * n + 1)) - n;
      const pts: [number, number][] = Array.from({ length: 5 }, () => [r(4), r(4)]);
      const steps: Step[] = [['E', 'curve-equation', [], { equation: CUBIC }]];
      pts.forEach(([x, y], k) => steps.push([`P${k}`, 'point-free', [], { at: `${x}:${y}:1` }]));
      steps.push(['C', 'conic-through-five', ['P0', 'P1', 'P2', 'P3', 'P4']]);
      let start: F3[];
      try {
        start = exactMeets(pts.map(([x, y]) => triple(BigInt(x), BigInt(y), 1n)));
      } catch {
        return; // five random points in special position: no single conic (nothing to follow)
      }
      for (let k = 0; k < start.length; k++) steps.push([`M${k}`, 'point-meet', ['C', 'E'], { index: String(k) }]);
      const { doc, id } = build(steps);
      let values = constructionEvaluate(doc);
      let tracked = start;
      const [x0, y0] = pts[0];
      const dx = r(3) || 1;
      const dy = r(3);
      const N = 30;
      let last = `${x0}:${y0}:1`;
      for (let s = 1; s <= N; s++) {
        // P0 moves to (x0 + s·dx/(2N), y0 + s·dy/(2N)): rational, so the exact answer exists at each step.
        const den = 2n * BigInt(N);
        const P0 = triple(BigInt(x0) * den + BigInt(s * dx), BigInt(y0) * den + BigInt(s * dy), den);
        let now: F3[];
        try {
          now = exactMeets([P0, ...pts.slice(1).map(([x, y]) => triple(BigInt(x), BigInt(y), 1n))]);
        } catch {
          break; // the five points became special
        }
        if (now.length !== tracked.length) break; // two real meets merged: the path ends here
        const next = tracked.map((t) => now.reduce((b, q) => (f3Sine(q, t) < f3Sine(b, t) ? q : b)));
        const gaps = now.flatMap((a, i) => now.slice(i + 1).map((b) => f3Sine(a, b)));
        if (gaps.some((g) => g < 1e-3)) break; // too close to tell apart by continuity: stop the path
        tracked = next;
        values = dragStep(doc, values, id.P0, { x: Number(P0[0]) / Number(P0[2]), y: Number(P0[1]) / Number(P0[2]), finite: true });
        last = `${P0[0]}:${P0[1]}:${P0[2]}`;
        tracked.forEach((t, k) => {
          const v = pointValue(values.get(id[`M${k}`]), `seed ${seed} points ${JSON.stringify(pts)} step ${s} meet ${k}`);
          expect(v.status).toBe('approximate');
          const d = approxDistance(v.approx, t[2] === 0 ? { x: t[0], y: t[1], finite: false } : { x: t[0] / t[2], y: t[1] / t[2], finite: true });
          expect(d, `seed ${seed} points ${JSON.stringify(pts)} step ${s} meet ${k}`).toBeLessThan(1e-8);
          followed++;
        });
      }
      const drop = dragDrop(doc, values, id.P0, last);
      // The worker's path: the page settles the meets from the drag's last values and the exact values are
      // computed from the document alone, with no previous values.
      const fresh = constructionEvaluate(constructionMeetsSettle(drop.doc, values));
      tracked.forEach((t, k) => {
        for (const [how, vs] of [['after the drop', drop.values], ['settled and recomputed from scratch', fresh]] as const) {
          const v = pointValue(vs.get(id[`M${k}`]), `seed ${seed} ${how}, meet ${k}`);
          expect(v.status).not.toBe('approximate');
          const u = v.approx.finite ? [v.approx.x, v.approx.y, 1] : [v.approx.x, v.approx.y, 0];
          expect(f3Sine(unitOf(u), t), `seed ${seed} meet ${k} ${how}`).toBeLessThan(1e-8);
        }
      });
    });
  }

  it('compared many meet points along the paths', () => {
    expect(followed).toBeGreaterThan(200);
  });

  it('gives null rather than a far point when Newton cannot follow', () => {
    const conic = { degree: 2, coeffs: [1, 0, 0, 1, 0, -1] }; // x^2 + y^2 = 1
    const line = { degree: 2, coeffs: [0, 0, 0, 0, 0, 0] }; // the zero form: no Jacobian at all
    expect(curveCurveMeetFollow(conic, line, [0.6, 0.8, 0])).toBeNull();
    // x^2 + y^2 = 1 and y = 2 (as a reducible conic y^2 - 4z^2) have no real common point
    const far = { degree: 2, coeffs: [0, 0, 0, 1, 0, -4] };
    expect(curveCurveMeetFollow(conic, far, f3Normalise([1, 1, 1]))).toBeNull();
    // and from near (0.6, 0.8) on the unit circle meeting y = 0.8 (y^2 - 0.64 z^2) it finds (0.6, 0.8)
    const near = { degree: 2, coeffs: [0, 0, 0, 1, 0, -0.64] };
    const q = curveCurveMeetFollow(conic, near, f3Normalise([0.61, 0.79, 1]))!;
    expect(q[0] / q[2]).toBeCloseTo(0.6, 12);
    expect(q[1] / q[2]).toBeCloseTo(0.8, 12);
  });
});
