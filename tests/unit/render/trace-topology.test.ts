// The tracer against curves of known real topology (tests/unit/render/curve-table.ts names the source of
// each): pieces, closed pieces, dots, branch ends at the singular points, vertices within 0.25 px of the
// curve, consecutive vertices at most 2 px apart, and no piece coming back over another.
import { describe, expect, it } from 'vitest';
import { curvePrepare, curveTrace } from '../../../shaders-free-render/trace.ts';
import { curveLandmarks } from '../../../src/poly/curve-landmarks.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { TOPOLOGY_CASES, caseForm, caseView } from './curve-table.ts';
import { affineEvaluator, singularEndsAt, traceFaults } from './trace-check.ts';

describe('tracer topology on the curve table', () => {
  it('has at least 40 curves', () => {
    expect(TOPOLOGY_CASES.length).toBeGreaterThanOrEqual(40);
  });
  for (const c of TOPOLOGY_CASES) {
    const exact = c.scale === undefined && c.stretch === undefined;
    for (const withLandmarks of exact ? [false, true] : [false]) {
    it(`${c.name}: ${c.eq} (${c.source})${withLandmarks ? ', exact landmarks' : ''}`, () => {
      const form = caseForm(c);
      const view = caseView(c);
      const lm = withLandmarks ? curveLandmarks(formParse(c.eq).form) : null;
      const tr = curveTrace(curvePrepare(form, lm), view);
      const summary = {
        open: tr.polylines.filter((p) => !p.closed).length,
        closed: tr.polylines.filter((p) => p.closed).length,
        dots: tr.dots.length,
      };
      expect(summary, `pieces in view ${c.view.join(',')}`).toEqual({ open: c.open, closed: c.closed, dots: c.dots });
      for (const s of c.singular ?? []) {
        expect(singularEndsAt(view, tr, s.at[0], s.at[1]), `branch ends at ${s.at.join(',')}`).toBe(s.ends);
        if (s.ends === 0) {
          expect(tr.dots.some(([x, y]) => Math.hypot((x - s.at[0]) / (c.view[2] - c.view[0]), (y - s.at[1]) / (c.view[3] - c.view[1])) < 1e-3)).toBe(true);
        }
      }
      const totalSingularEnds = tr.polylines.flatMap((p) => p.ends ?? []).filter((e) => e.kind === 'singular').length;
      expect(totalSingularEnds, 'no singular ends other than the listed ones').toBe((c.singular ?? []).reduce((a, s) => a + s.ends, 0));
      const faults = traceFaults(affineEvaluator(form.degree, form.coeffs), view, tr, c.exclusionPx ?? 4);
      expect(faults.worstDistancePx, 'vertex distance to the curve (px)').toBeLessThanOrEqual(0.25);
      expect(faults.worstGapPx, 'gap between consecutive vertices (px)').toBeLessThanOrEqual(2);
      expect(faults.closeApproaches, 'pieces coming within half a pixel of each other').toBe(0);
    });
    }
  }
});

describe('the same table at device-pixel ratio 2 and at 1920 px (exact landmarks)', () => {
  for (const c of TOPOLOGY_CASES) {
    // Ovals and excursions below a pixel change with the pixel size: their counts are checked above.
    if (/pixel|oval below|just cut/.test(c.name)) continue;
    for (const [w, h, dpr] of [[800, 600, 2], [1920, 1440, 1]] as const) {
      it(`${c.name} at ${w}x${h}, dpr ${dpr}`, () => {
        const form = caseForm(c);
        const view = { ...caseView(c), width: w, height: h, dpr };
        const exact = c.scale === undefined && c.stretch === undefined;
        const tr = curveTrace(curvePrepare(form, exact ? curveLandmarks(formParse(c.eq).form) : null), view);
        const summary = { open: tr.polylines.filter((p) => !p.closed).length, closed: tr.polylines.filter((p) => p.closed).length, dots: tr.dots.length };
        expect(summary).toEqual({ open: c.open, closed: c.closed, dots: c.dots });
        const faults = traceFaults(affineEvaluator(form.degree, form.coeffs), view, tr, (c.exclusionPx ?? 4) * (w / 800) * dpr);
        expect(faults.worstDistancePx).toBeLessThanOrEqual(0.25);
        expect(faults.worstGapPx).toBeLessThanOrEqual(2);
        expect(faults.closeApproaches).toBe(0);
      });
    }
  }
});
