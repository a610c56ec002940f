// A followed piece cut to the window: the runs of vertices inside it, each entering and leaving exactly on
// the border, with long gaps filled by points pulled onto the curve so that consecutive vertices stay
// within maxGapPx. Canonical form: frame coordinates, flat; a run that starts or ends at the piece's own
// end carries that end's junction, one that starts or ends on the border carries -1.
import type { Fragment } from './assemble.ts';
import { outsidePx, screenLength, type FollowView } from './follow.ts';
import { frameEval, type Frame } from './frame.ts';

// Cut a piece's vertex sequence into the runs inside the window, entering and leaving on the border.
// Returns the number of vertices kept.
export function runsSplit(fv: FollowView, seq: number[], jStart: number, jEnd: number, frags: Fragment[]): number {
  let kept = 0;
  let run: number[] | null = null;
  let runStart = -1;
  const n = seq.length / 2;
  let prevIn = false;
  for (let i = 0; i < n; i++) {
    const u = seq[2 * i];
    const v = seq[2 * i + 1];
    const inside = outsidePx(fv, u, v) === 0;
    if (inside && !run) {
      run = [];
      if (i === 0) runStart = jStart;
      else {
        runStart = -1;
        const c = borderPoint(fv, seq[2 * i - 2], seq[2 * i - 1], u, v);
        run.push(c[0], c[1]);
      }
    }
    if (inside && run) {
      gapFill(fv, run, u, v, 0);
      run.push(u, v);
    }
    if (!inside && run && prevIn) {
      const c = borderPoint(fv, u, v, seq[2 * i - 2], seq[2 * i - 1]);
      gapFill(fv, run, c[0], c[1], 0);
      run.push(c[0], c[1]);
      frags.push({ points: run, start: runStart, end: -1 });
      kept += run.length / 2;
      run = null;
    }
    prevIn = inside;
  }
  if (run) {
    frags.push({ points: run, start: runStart, end: jEnd });
    kept += run.length / 2;
  }
  return kept;
}

// Where the curve crosses the border between an outside and an inside vertex: bisection on G along the
// border line that the outside vertex lies beyond, between the two vertices' positions along it; where
// G does not change sign there (the curve nearly tangent to the border), the chord's crossing pulled
// onto the curve.
function borderPoint(fv: FollowView, uo: number, vo: number, ui: number, vi: number): [number, number] {
  let lo = 0;
  let hi = 1;
  for (let it = 0; it < 50; it++) {
    const t = 0.5 * (lo + hi);
    if (outsidePx(fv, ui + (uo - ui) * t, vi + (vo - vi) * t) === 0) lo = t;
    else hi = t;
  }
  const u = ui + (uo - ui) * lo;
  const v = vi + (vo - vi) * lo;
  const s = fv.fr.shear;
  const xo = uo + s * vo;
  const onX = xo < fv.x0 ? fv.x0 : xo > fv.x1 ? fv.x1 : null;
  const onY = vo < fv.y0 ? fv.y0 : vo > fv.y1 ? fv.y1 : null;
  if (onX === null && onY === null) return project(fv.fr, u, v);
  const ev = new Float64Array(4);
  // Along X' = const the free coordinate is V (U = X' - sV); along V = const it is U. The crossing lies
  // between the two vertices' free coordinates: bisect there when G changes sign, else Newton.
  const at = (t: number): [number, number] => (onX !== null ? [onX - s * t, t] : [t, onY as number]);
  const g = (t: number): number => {
    const [pu, pv] = at(t);
    return frameEval(fv.fr, pu, pv, ev)[0];
  };
  let a = onX !== null ? vi : ui;
  let b = onX !== null ? vo : uo;
  let ga = g(a);
  const gb = g(b);
  if (ga === 0) return at(a);
  if (gb === 0) return at(b);
  if (ga < 0 !== gb < 0) {
    for (let it = 0; it < 80; it++) {
      const m = 0.5 * (a + b);
      const gm = g(m);
      if (gm === 0 || m === a || m === b) return at(m);
      if (gm < 0 === ga < 0) {
        a = m;
        ga = gm;
      } else b = m;
    }
    return at(0.5 * (a + b));
  }
  return project(fv.fr, u, v);
}

// Assumes (u, v) is within a fraction of a pixel of a smooth part of the curve.
function project(fr: Frame, u: number, v: number): [number, number] {
  const ev = new Float64Array(4);
  for (let it = 0; it < 4; it++) {
    frameEval(fr, u, v, ev);
    const g2 = ev[1] * ev[1] + ev[2] * ev[2];
    if (!(g2 > 0)) break;
    u -= (ev[0] * ev[1]) / g2;
    v -= (ev[0] * ev[2]) / g2;
  }
  return [u, v];
}

// Keep consecutive vertices within maxGapPx: fill a long gap with midpoints pulled onto the curve.
function gapFill(fv: FollowView, run: number[], u: number, v: number, depth: number): void {
  const k = run.length;
  if (k === 0 || depth > 10) return;
  const pu = run[k - 2];
  const pv = run[k - 1];
  if (screenLength(fv, u - pu, v - pv) <= fv.maxGapPx) return;
  const [mu, mv] = project(fv.fr, 0.5 * (pu + u), 0.5 * (pv + v));
  gapFill(fv, run, mu, mv, depth + 1);
  run.push(mu, mv);
  gapFill(fv, run, u, v, depth + 1);
}

