// Dashes by hand: Pixi's canvas renderer has no line dash (PLATFORM.md), so a dashed path is cut into
// its "on" pieces before it is stroked. Canonical form: pieces as flat [x0, y0, x1, y1, ...] arrays in the
// same (screen) units as the pattern; an empty or all-zero pattern means one solid piece.

/** Split a screen polyline into its dash pieces (pattern on, off, ... in pixels). */
export function dashSplit(pts: readonly number[], dash: readonly number[]): number[][] {
  if (dash.length === 0 || dash.every((d) => !(d > 0))) return [pts.slice()];
  const out: number[][] = [];
  let k = 0;
  let left = dash[0];
  let on = true;
  let cur: number[] = [pts[0], pts[1]];
  for (let i = 0; i + 3 < pts.length; i += 2) {
    let x0 = pts[i];
    let y0 = pts[i + 1];
    const x1 = pts[i + 2];
    const y1 = pts[i + 3];
    let seg = Math.hypot(x1 - x0, y1 - y0);
    while (seg > left) {
      const t = left / seg;
      x0 += (x1 - x0) * t;
      y0 += (y1 - y0) * t;
      seg -= left;
      if (on) {
        cur.push(x0, y0);
        out.push(cur);
      } else cur = [x0, y0];
      on = !on;
      k = (k + 1) % dash.length;
      left = dash[k] > 0 ? dash[k] : 1;
    }
    left -= seg;
    if (on) cur.push(x1, y1);
    else cur = [x1, y1];
  }
  if (on && cur.length >= 4) out.push(cur);
  return out;
}

