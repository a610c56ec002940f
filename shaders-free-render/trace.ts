// The tracer: the real locus of F(x, y) = 0 inside a viewport, as polylines and dots with the right
// topology (a cylindrical decomposition in the sheared frame of frame.ts).
//
// Between consecutive critical abscissae of the projection to U the real roots V_1(U) < ... < V_m(U) are
// smooth and never meet, so each is one branch piece: it is started at the interval's midpoint and
// followed to both ends (follow.ts). Pieces meet only on the critical lines, at junctions: a fold or an
// ordinary point where two pieces join into one polyline, or a singular point where the pieces end.
// A singular point with no piece at it is an isolated real point (a dot); a closed polyline smaller
// than a pixel is drawn as a dot too. Critical abscissae and singular points come from the core's exact
// landmarks when given (already in the world's sheared coordinate u = x - s*y), else from a float search.
import { ABSCISSA_MERGE, criticalFloatSearch, foldRefine, singularOnLines, singularRefine } from './critical-float.ts';
import { branchFollow, outsidePx, screenLength, type FollowEnd, type FollowView } from './follow.ts';
import {
  floatFormCheck, formAffine, frameAtU, frameEval, frameMake, frameToWorld, shearChoose, worldToFrame,
  type FloatForm, type Frame,
} from './frame.ts';
import { fpolyRealRoots } from './upoly-float.ts';
import { piecesAssemble, type Fragment, type Junction } from './assemble.ts';
import { runsSplit } from './runs.ts';
import type { BranchEnd, DisplayItem } from './display-list.ts';

/** A world rectangle drawn into width x height CSS pixels at a device-pixel ratio. */
export interface TraceView {
  readonly xmin: number;
  readonly ymin: number;
  readonly xmax: number;
  readonly ymax: number;
  readonly width: number;
  readonly height: number;
  readonly dpr?: number;
}

/** Landmarks handed over by the core (exact values rounded to doubles). */
export interface FloatLandmarks {
  /** The shear s of the critical abscissae below (u = x - s*y); the tracer works in this frame. */
  readonly shear: number;
  /** Every critical abscissa u of the projection (x, y) -> x - s*y, ascending. */
  readonly critical: readonly number[];
  /** The critical abscissae that may carry a singular point (the tracer locates the points on them). */
  readonly singularLines?: readonly number[];
  /** Every real singular point (x, y) in the affine plane, when the caller knows them. */
  readonly singular?: readonly (readonly [number, number])[];
}

export interface PreparedCurve {
  readonly degree: number;
  readonly affine: number[][];
  readonly shear: number;
  readonly landmarks: FloatLandmarks | null;
}

export interface TracedPolyline {
  readonly points: number[];
  readonly closed: boolean;
  readonly ends: readonly [BranchEnd, BranchEnd] | null;
}

export interface CurveTrace {
  readonly polylines: TracedPolyline[];
  readonly dots: [number, number][];
  readonly stats: { readonly vertices: number; readonly pieces: number; readonly critical: number };
}

export interface TraceOptions {
  /** Largest predictor step in device pixels (vertices end up at most maxGapPx apart). */
  readonly maxStepPx?: number;
  readonly maxGapPx?: number;
}

/** Everything about a curve that does not depend on the viewport; reuse it across pans and zooms. */
export function curvePrepare(form: FloatForm, landmarks?: FloatLandmarks | null): PreparedCurve {
  floatFormCheck(form);
  const affine = formAffine(form);
  const shear = landmarks ? landmarks.shear : shearChoose(affine, form.degree);
  return { degree: form.degree, affine, shear, landmarks: landmarks ?? null };
}

export function curveTrace(curve: PreparedCurve, view: TraceView, options: TraceOptions = {}): CurveTrace {
  viewCheck(view);
  const d = curve.degree;
  const dpr = view.dpr ?? 1;
  const wpx = view.width * dpr;
  const hpx = view.height * dpr;
  const ox = 0.5 * (view.xmin + view.xmax);
  const oy = 0.5 * (view.ymin + view.ymax);
  const scaleX = 0.5 * (view.xmax - view.xmin);
  const scaleY = 0.5 * (view.ymax - view.ymin);
  const empty: CurveTrace = { polylines: [], dots: [], stats: { vertices: 0, pieces: 0, critical: 0 } };
  if (d === 0 || curve.affine.every((r) => r.every((c) => c === 0))) return empty;
  const fr = frameMake(curve.affine, d, curve.shear, ox, oy, scaleX, scaleY);
  if (fr.a.every((c) => c === 0)) return empty;
  const fv: FollowView = {
    fr,
    pxX: 0.5 * wpx,
    pxY: 0.5 * hpx,
    x0: -1,
    x1: 1,
    y0: -1,
    y1: 1,
    maxStepPx: options.maxStepPx ?? 1.5,
    maxGapPx: options.maxGapPx ?? 1.9,
  };
  const s = fr.shear;
  const corners = [fv.x0 - s * fv.y0, fv.x0 - s * fv.y1, fv.x1 - s * fv.y0, fv.x1 - s * fv.y1];
  const margin = 2 / fv.pxX;
  const umin = Math.min(...corners) - margin;
  const umax = Math.max(...corners) + margin;

  const { critical, singular } = frameLandmarks(curve, fr, umin, umax);
  const breaks = [umin, ...critical, umax];
  const junctions: Junction[] = [];
  // A singular point belongs to the critical line through it: only ends on that line may meet it (a fold
  // on a neighbouring line a pixel away is a different point).
  for (const [u, v] of singular) {
    let line = 0;
    for (let k = 1; k < breaks.length; k++) if (Math.abs(breaks[k] - u) < Math.abs(breaks[line] - u)) line = k;
    junctions.push({ u, v, singular: true, line, ends: [] });
  }
  const frags: Fragment[] = [];
  let vertices = 0;
  let pieces = 0;
  for (let k = 0; k + 1 < breaks.length; k++) {
    const a = breaks[k];
    const b = breaks[k + 1];
    const mid = 0.5 * (a + b);
    if (!(b > a)) continue;
    const roots = fpolyRealRoots(frameAtU(fr, mid));
    for (let index = 0; index < roots.length; index++) {
      const root = roots[index];
      pieces++;
      const left: number[] = [];
      const right: number[] = [];
      const endL = branchFollow(fv, mid, root.t, -1, a, left, index);
      const endR = branchFollow(fv, mid, root.t, 1, b, right, index);
      const jl = endResolve(fv, endL, k, k === 0, junctions);
      const jr = endResolve(fv, endR, k + 1, k + 1 === breaks.length - 1, junctions);
      const seq: number[] = [jl.u, jl.v];
      for (let i = left.length - 2; i >= 0; i -= 2) seq.push(left[i], left[i + 1]);
      seq.push(mid, root.t);
      for (let i = 0; i < right.length; i++) seq.push(right[i]);
      seq.push(jr.u, jr.v);
      vertices += runsSplit(fv, seq, jl.junction, jr.junction, frags);
    }
  }
  const assembled = piecesAssemble(frags, junctions);
  const polylines: TracedPolyline[] = [];
  const dots: [number, number][] = [];
  for (const p of assembled.polylines) {
    const pts: number[] = [];
    let xlo = Infinity, xhi = -Infinity, ylo = Infinity, yhi = -Infinity;
    for (let i = 0; i < p.points.length; i += 2) {
      const [x, y] = frameToWorld(fr, p.points[i], p.points[i + 1]);
      pts.push(x, y);
      xlo = Math.min(xlo, x); xhi = Math.max(xhi, x); ylo = Math.min(ylo, y); yhi = Math.max(yhi, y);
    }
    const size = Math.max(((xhi - xlo) * wpx) / (view.xmax - view.xmin), ((yhi - ylo) * hpx) / (view.ymax - view.ymin));
    if (p.closed && size < 1) {
      dots.push([0.5 * (xlo + xhi), 0.5 * (ylo + yhi)]);
      continue;
    }
    const ends = p.ends ? (p.ends.map((e) => {
      const [x, y] = frameToWorld(fr, e.u, e.v);
      return { x, y, kind: e.kind };
    }) as unknown as [BranchEnd, BranchEnd]) : null;
    polylines.push({ points: pts, closed: p.closed, ends });
  }
  for (const j of assembled.isolated) {
    if (outsidePx(fv, j.u, j.v) === 0) dots.push(frameToWorld(fr, j.u, j.v));
  }
  return { polylines, dots, stats: { vertices, pieces, critical: critical.length } };
}

function viewCheck(v: TraceView): void {
  const nums = [v.xmin, v.ymin, v.xmax, v.ymax, v.width, v.height, v.dpr ?? 1];
  if (!nums.every(Number.isFinite)) throw new Error('the view has a coordinate or size that is not a finite number');
  if (!(v.xmax > v.xmin) || !(v.ymax > v.ymin)) throw new Error('the view needs xmin < xmax and ymin < ymax');
  if (!(v.width >= 1) || !(v.height >= 1) || !((v.dpr ?? 1) > 0)) throw new Error('the view needs a pixel size of at least 1 x 1');
}

// Critical abscissae (ascending, inside (umin, umax)) and singular points in frame coordinates.
function frameLandmarks(curve: PreparedCurve, fr: Frame, umin: number, umax: number): { critical: number[]; singular: [number, number][] } {
  let critical: number[];
  let singular: [number, number][];
  if (curve.landmarks) {
    const shift = fr.ox - fr.worldShear * fr.oy;
    const toFrame = (u: number): number => (u - shift) / fr.scaleX;
    critical = curve.landmarks.critical.map(toFrame).filter((u) => u > umin && u < umax);
    const known = curve.landmarks.singular;
    singular = known
      ? known.map(([x, y]) => worldToFrame(fr, x, y))
      : singularOnLines(fr, (curve.landmarks.singularLines ?? curve.landmarks.critical).map(toFrame).filter((u) => u > umin && u < umax));
  } else {
    const found = criticalFloatSearch(fr, umin, umax);
    critical = found.abscissae;
    singular = found.singular;
  }
  const all = [...critical, ...singular.map((p) => p[0])].filter((u) => u > umin && u < umax).sort((a, b) => a - b);
  const unique: number[] = [];
  for (const u of all) if (!unique.length || u - unique[unique.length - 1] > ABSCISSA_MERGE) unique.push(u);
  return { critical: unique, singular: singular.filter((p) => p[0] > umin && p[0] < umax) };
}

interface ResolvedEnd {
  readonly u: number;
  readonly v: number;
  /** Index of the junction this end belongs to, -1 when it attaches to nothing. */
  readonly junction: number;
}

// Settle where a followed branch ends: on its critical line, at a fold, or open; and file it under a
// junction (clustering ends that are within half a pixel on the same line).
function endResolve(fv: FollowView, end: FollowEnd, line: number, rangeEdge: boolean, junctions: Junction[]): ResolvedEnd {
  if (rangeEdge && end.kind === 'line') return { u: end.u, v: end.v, junction: -1 };
  const ev = new Float64Array(4);
  // Candidates: on the line (Newton in V), a fold, a singular point; the nearest to the last vertex wins,
  // and none farther than a few steps (the last vertex is within two steps of the true end).
  const lastU = end.kind === 'line' ? end.lastU : end.u;
  const lastV = end.kind === 'line' ? end.lastV : end.v;
  let p: [number, number] | null = null;
  let best = Infinity;
  const cands = [
    end.kind === 'line' ? lineRefine(fv.fr, end.u, end.v, ev) : null,
    foldRefine(fv.fr, end.u, end.v, ev),
    singularRefine(fv.fr, end.u, end.v, ev),
  ];
  for (const c of cands) {
    if (!c) continue;
    const dpx = screenLength(fv, c[0] - lastU, c[1] - lastV);
    if (dpx < best && dpx <= 4 * fv.maxStepPx) {
      best = dpx;
      p = c;
    }
  }
  const [u, v] = p ?? [lastU, lastV];
  let bestJ = -1;
  let bestPx = Infinity;
  for (let j = 0; j < junctions.length; j++) {
    const J = junctions[j];
    if (J.line !== line && end.kind === 'line') continue;
    const dpx = screenLength(fv, J.u - u, J.v - v);
    const reach = J.singular ? 1 : 0.5;
    if (dpx <= reach && dpx < bestPx) {
      bestJ = j;
      bestPx = dpx;
    }
  }
  if (bestJ < 0) {
    if (!p && end.kind === 'stuck') return { u, v, junction: -1 };
    junctions.push({ u, v, singular: false, line: end.kind === 'line' ? line : -2, ends: [] });
    bestJ = junctions.length - 1;
  }
  return { u: junctions[bestJ].u, v: junctions[bestJ].v, junction: bestJ };
}

// Newton in V on the line U = u (linear convergence at a multiple root is enough here).
function lineRefine(fr: Frame, u: number, v: number, ev: Float64Array): [number, number] | null {
  for (let it = 0; it < 100; it++) {
    frameEval(fr, u, v, ev);
    if (ev[0] === 0) break;
    const dv = ev[0] / ev[2];
    if (!Number.isFinite(dv)) break;
    v -= dv;
    if (Math.abs(dv) < 1e-16 * (1 + Math.abs(v))) break;
  }
  frameEval(fr, u, v, ev);
  return Math.abs(ev[0]) <= 1e-12 * Math.max(ev[3], 1e-3) ? [u, v] : null;
}

/** The trace as display-list items in one style (closed pieces keep their repeated first vertex). */
export function curveTraceItems(tr: CurveTrace, style = 'curve', owner?: string): DisplayItem[] {
  const items: DisplayItem[] = [];
  for (const p of tr.polylines) items.push({ kind: 'polyline', points: p.points, closed: p.closed, ends: p.ends, style, owner });
  for (const [x, y] of tr.dots) items.push({ kind: 'dot', x, y, role: 'isolated', style, owner });
  return items;
}
