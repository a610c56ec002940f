// Viewport maths: a world rectangle shown in a CSS-pixel box at a device-pixel ratio, with the same
// scale on both axes (a circle stays round). Screen coordinates are CSS pixels from the top left, y down.
// Canonical form: centre (cx, cy), `scale` = world units per CSS pixel (> 0), box width x height.
import type { TraceView } from './trace.ts';

export interface Viewport {
  readonly cx: number;
  readonly cy: number;
  readonly scale: number;
  readonly width: number;
  readonly height: number;
  readonly dpr: number;
}

/** Zoom limits in world units per CSS pixel: doubles keep about 15 digits, so stay well inside. */
export const SCALE_MIN = 1e-12;
export const SCALE_MAX = 1e12;

export function viewportMake(cx: number, cy: number, scale: number, width: number, height: number, dpr = 1): Viewport {
  if (![cx, cy, scale, width, height, dpr].every(Number.isFinite)) throw new Error('a viewport needs finite numbers');
  return {
    cx,
    cy,
    scale: Math.min(SCALE_MAX, Math.max(SCALE_MIN, scale)),
    width: Math.max(1, width),
    height: Math.max(1, height),
    dpr: dpr > 0 ? dpr : 1,
  };
}

/** The viewport showing at least the world rectangle, centred on it. */
export function viewportFit(xmin: number, ymin: number, xmax: number, ymax: number, width: number, height: number, dpr = 1): Viewport {
  const scale = Math.max((xmax - xmin) / Math.max(1, width), (ymax - ymin) / Math.max(1, height));
  return viewportMake((xmin + xmax) / 2, (ymin + ymax) / 2, scale, width, height, dpr);
}

export function viewportBounds(vp: Viewport): TraceView {
  const hw = (vp.width * vp.scale) / 2;
  const hh = (vp.height * vp.scale) / 2;
  return { xmin: vp.cx - hw, ymin: vp.cy - hh, xmax: vp.cx + hw, ymax: vp.cy + hh, width: vp.width, height: vp.height, dpr: vp.dpr };
}

export function worldToScreen(vp: Viewport, x: number, y: number): [number, number] {
  return [vp.width / 2 + (x - vp.cx) / vp.scale, vp.height / 2 - (y - vp.cy) / vp.scale];
}

export function screenToWorld(vp: Viewport, sx: number, sy: number): [number, number] {
  return [vp.cx + (sx - vp.width / 2) * vp.scale, vp.cy - (sy - vp.height / 2) * vp.scale];
}

/** Move the picture by (dx, dy) CSS pixels (a drag). */
export function viewportPan(vp: Viewport, dx: number, dy: number): Viewport {
  return viewportMake(vp.cx - dx * vp.scale, vp.cy + dy * vp.scale, vp.scale, vp.width, vp.height, vp.dpr);
}

/** Zoom by `factor` (> 1 magnifies) keeping the world point under (sx, sy) fixed on screen. */
export function viewportZoomAt(vp: Viewport, sx: number, sy: number, factor: number): Viewport {
  if (!(factor > 0) || !Number.isFinite(factor)) return vp;
  const [wx, wy] = screenToWorld(vp, sx, sy);
  const scale = Math.min(SCALE_MAX, Math.max(SCALE_MIN, vp.scale / factor));
  return viewportMake(wx - (sx - vp.width / 2) * scale, wy + (sy - vp.height / 2) * scale, scale, vp.width, vp.height, vp.dpr);
}

/** A new box size (window resize), keeping centre and scale. */
export function viewportResize(vp: Viewport, width: number, height: number, dpr = vp.dpr): Viewport {
  return viewportMake(vp.cx, vp.cy, vp.scale, width, height, dpr);
}
