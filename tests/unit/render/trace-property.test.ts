// Property test (fast-check, seeded): random integer cubics (and some quartics and sextics) in random
// viewports, traced with the core's exact landmarks and, for cubics, with the tracer's float search too.
// Every vertex within 0.25 px of the curve, consecutive vertices at most 2 px apart, and no two pieces
// crossing (nor a piece crossing itself) except at a singular point. On failure the seed, the curve's
// coefficients and the view are printed, and fast-check shrinks to a small counterexample.
import { describe, it } from 'vitest';
import fc from 'fast-check';
import { curveLandmarks, formFloatCoefficients } from '../../../src/poly/curve-landmarks.ts';
import { formPrimitive } from '../../../src/poly/form.ts';
import { curvePrepare, curveTrace, type CurveTrace, type TraceView } from '../../../shaders-free-render/trace.ts';
import { affineEvaluator, pixelScale, traceFaults } from './trace-check.ts';

const SEED = 20261201;

/** Proper crossings between segments of different pieces, or non-neighbouring segments of one piece. */
function crossings(view: TraceView, tr: CurveTrace, exclusionPx: number): number {
  const [kx, ky] = pixelScale(view);
  const sing: [number, number][] = [];
  for (const p of tr.polylines) for (const e of p.ends ?? []) if (e.kind === 'singular') sing.push([e.x * kx, e.y * ky]);
  const segs: [number, number, number, number, number, number][] = [];
  tr.polylines.forEach((p, pi) => {
    for (let i = 0; i + 3 < p.points.length; i += 2) {
      segs.push([p.points[i] * kx, p.points[i + 1] * ky, p.points[i + 2] * kx, p.points[i + 3] * ky, pi, i / 2]);
    }
  });
  const cell = 4;
  const grid = new Map<string, number[]>();
  segs.forEach((s, k) => {
    const key = `${Math.floor(s[0] / cell)},${Math.floor(s[1] / cell)}`;
    (grid.get(key) ?? grid.set(key, []).get(key)!).push(k);
  });
  let n = 0;
  segs.forEach((a, ka) => {
    const cx = Math.floor(a[0] / cell);
    const cy = Math.floor(a[1] / cell);
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        for (const kb of grid.get(`${cx + dx},${cy + dy}`) ?? []) {
          if (kb <= ka) continue;
          const b = segs[kb];
          const len = tr.polylines[a[4]].points.length / 2 - 1;
          if (a[4] === b[4] && (Math.abs(a[5] - b[5]) <= 1 || (tr.polylines[a[4]].closed && Math.abs(a[5] - b[5]) === len - 1))) continue;
          const p = properIntersection(a, b);
          if (p && !sing.some(([sx, sy]) => Math.hypot(sx - p[0], sy - p[1]) < exclusionPx)) n++;
        }
      }
    }
  });
  return n;
}

function properIntersection(a: number[], b: number[]): [number, number] | null {
  const d = (a[2] - a[0]) * (b[3] - b[1]) - (a[3] - a[1]) * (b[2] - b[0]);
  if (d === 0) return null;
  const t = ((b[0] - a[0]) * (b[3] - b[1]) - (b[1] - a[1]) * (b[2] - b[0])) / d;
  const u = ((b[0] - a[0]) * (a[3] - a[1]) - (b[1] - a[1]) * (a[2] - a[0])) / d;
  if (t <= 1e-9 || t >= 1 - 1e-9 || u <= 1e-9 || u >= 1 - 1e-9) return null;
  return [a[0] + t * (a[2] - a[0]), a[1] + t * (a[3] - a[1])];
}

// (degree, exact landmarks or the tracer's own float search, runs)
const RUNS: readonly [number, boolean, number][] = [[3, true, 150], [3, false, 100], [4, true, 60], [6, true, 25]];

describe('tracer on random curves (property)', () => {
  for (const [deg, exact, runs] of RUNS) {
    const n = ((deg + 1) * (deg + 2)) / 2;
    it(`degree ${deg}, ${exact ? 'exact landmarks' : 'float landmarks'}: vertices on the curve, small gaps, no crossings away from singular points (seed ${SEED})`, () => {
      fc.assert(
        fc.property(
          fc.array(fc.integer({ min: -9, max: 9 }), { minLength: n, maxLength: n }),
          fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }),
          fc.double({ min: 0.5, max: 12, noNaN: true }),
          (coeffs, cx, cy, w) => {
            const form = formPrimitive({ degree: deg, coeffs: coeffs.map(BigInt) });
            // Only curves of full degree with no repeated component (the discriminant would vanish).
            if (form.coeffs.slice(0, deg + 1).every((c) => c === 0n)) return true;
            let lm;
            try {
              lm = curveLandmarks(form);
            } catch {
              return true;
            }
            const floats = { degree: deg, coeffs: formFloatCoefficients(form) };
            const view: TraceView = { xmin: cx - w / 2, xmax: cx + w / 2, ymin: cy - 0.375 * w, ymax: cy + 0.375 * w, width: 400, height: 300 };
            const tr = curveTrace(curvePrepare(floats, exact ? lm : null), view);
            const faults = traceFaults(affineEvaluator(deg, floats.coeffs), view, tr, 1e9);
            const cross = crossings(view, tr, 3);
            const ok = faults.worstDistancePx <= 0.25 && faults.worstGapPx <= 2 && cross === 0;
            if (!ok) console.error(JSON.stringify({ seed: SEED, coeffs, view, faults, cross }));
            return ok;
          },
        ),
        { seed: SEED + deg, numRuns: runs },
      );
    });
  }
});
