// Dash stripes laid along a segment must cover what the split dashes of dash.ts cover once each dash
// gets its round caps (a cap reaches half the stroke width beyond a dash's end: common practice for
// canvas and SVG strokes), checked along the segment's centre line at many places.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dashSplit } from '../../../shaders-free-render/dash.ts';
import { dashStripeMatrix, dashStripes } from '../../../shaders-free-render/sink-dash-pattern.ts';

describe('dashStripes', () => {
  it('widens the on runs and narrows the off runs by the width', () => {
    expect(dashStripes([7, 5], 1.25)).toEqual({ runs: [8.25, 3.75], period: 12 });
  });
  it('repeats an odd pattern (as a canvas line dash and dashSplit do)', () => {
    expect(dashStripes([1, 2, 3], 0.5)).toEqual({ runs: [1.5, 1.5, 3.5, 0.5, 2.5, 2.5], period: 12 });
  });
  it('refuses what stripes cannot show: gaps closed by the caps, solid, bad entries', () => {
    expect(dashStripes([2, 1], 1.5)).toBeNull();
    expect(dashStripes([], 1)).toBeNull();
    expect(dashStripes([3, 0], 1)).toBeNull();
    expect(dashStripes([3, Number.NaN], 1)).toBeNull();
    expect(dashStripes([3, 2], 0)).toBeNull();
  });

  it('covers the centre line where the split dashes with round caps cover it (seeded)', () => {
    const dashEntry = fc.double({ min: 0.5, max: 12, noNaN: true });
    fc.assert(
      fc.property(fc.array(dashEntry, { minLength: 1, maxLength: 4 }), fc.double({ min: 0.25, max: 3, noNaN: true }), fc.double({ min: 5, max: 300, noNaN: true }), (dash, width, length) => {
        const stripes = dashStripes(dash, width);
        if (!stripes) return;
        const pieces = dashSplit([0, 0, length, 0], dash);
        // The last half width is left out: a dash that would start there is not cut by dashSplit (it has
        // no length inside the segment) while its stripe's cap shows; that sliver sits at the view's edge.
        for (let k = 0; k <= 400; k++) {
          const t = (k / 400) * (length - width / 2);
          const byPieces = pieces.some((p) => t >= p[0] - width / 2 && t <= p[p.length - 2] + width / 2);
          // Stripe phase: the first on run starts half a width before the segment's start.
          let u = (t + width / 2) % stripes.period;
          let on = true;
          let near = false;
          for (const r of stripes.runs) {
            if (Math.abs(u) < 1e-7 || Math.abs(u - r) < 1e-7) near = true;
            if (u < r) break;
            u -= r;
            on = !on;
          }
          if (near) continue;
          if (on !== byPieces) throw new Error(`at ${t} of ${length}: stripes ${on ? 'on' : 'off'}, split dashes ${byPieces ? 'on' : 'off'}`);
        }
      }),
      { seed: 1201, numRuns: 200 },
    );
  });
});

describe('dashStripeMatrix', () => {
  it('lays texel 0 half a width before the start and one period further along the segment', () => {
    const m = dashStripeMatrix(10, 20, 13, 24, 2, 4)!; // direction (0.6, 0.8)
    const apply = (x: number, y: number): [number, number] => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];
    const [x0, y0] = apply(0, 0);
    expect(x0).toBeCloseTo(10 - 0.6, 12);
    expect(y0).toBeCloseTo(20 - 0.8, 12);
    const [x1, y1] = apply(4 * 5, 0); // 5 px along
    expect(x1).toBeCloseTo(10 - 0.6 + 3, 12);
    expect(y1).toBeCloseTo(20 - 0.8 + 4, 12);
  });
  it('gives null for a segment of no length', () => {
    expect(dashStripeMatrix(1, 1, 1, 1, 1, 4)).toBeNull();
  });
});
