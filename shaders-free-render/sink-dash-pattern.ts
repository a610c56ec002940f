// Dashed straight segments as one stroke filled with a repeating stripe pattern laid along the segment,
// instead of one stroke per dash: Pixi's canvas renderer strokes every sub-path on its own, so a view of
// a hundred dashed lines cost over ten thousand stroke calls. The stripes copy what the split dashes
// with round caps covered: each "on" run widened by the stroke width (half a width of cap at each end),
// each "off" run narrowed by it, the first run starting half a width before the segment's start.
//
// Canonical form: stops are [on, off, on, off, ...] in CSS pixels with an even count and a positive
// period; a pattern this cannot express returns null (the caller splits the dashes itself).

export interface DashStripes {
  /** Runs in CSS pixels along the segment, starting with an opaque one (even count). */
  readonly runs: readonly number[];
  readonly period: number;
}

/** The stripes of a dash pattern stroked at `width` with round caps, or null when they do not fit. */
export function dashStripes(dash: readonly number[], width: number): DashStripes | null {
  if (dash.length === 0 || !(width > 0) || !Number.isFinite(width)) return null;
  if (!dash.every((d) => d > 0 && Number.isFinite(d))) return null;
  // An odd pattern repeats to an even one (what a canvas line dash and dashSplit both do).
  const full = dash.length % 2 ? [...dash, ...dash] : [...dash];
  const runs = full.map((d, i) => (i % 2 === 0 ? d + width : d - width));
  // Caps that would meet across a gap: the dashes merge, which stripes cannot show apart from solid.
  if (runs.some((r) => !(r > 0))) return null;
  return { runs, period: runs.reduce((a, b) => a + b, 0) };
}

/**
 * The pattern transform (a, b, c, d, tx, ty: pattern texel -> screen CSS pixel) laying stripes drawn
 * at `texelsPerPx` along the segment from (x0, y0) to (x1, y1); null for a segment of no length.
 */
export function dashStripeMatrix(x0: number, y0: number, x1: number, y1: number, width: number, texelsPerPx: number): [number, number, number, number, number, number] | null {
  const len = Math.hypot(x1 - x0, y1 - y0);
  if (!(len > 0) || !Number.isFinite(len)) return null;
  const ux = (x1 - x0) / len;
  const uy = (y1 - y0) / len;
  const s = 1 / texelsPerPx;
  return [ux * s, uy * s, -uy * s, ux * s, x0 - (ux * width) / 2, y0 - (uy * width) / 2];
}
