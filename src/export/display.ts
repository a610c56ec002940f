// A construction with its computed values -> the display list (world coordinates) for a view: curves
// traced by shaders-free-render, lines clipped to the view, points with their status mark, labels beside
// their objects. This is the one place that decides how a construction is drawn: the figure exporters
// draw this list as it is, and the canvas (src/ui/display.ts) draws this same list with its page-only
// highlights (selection, hover, picks, search finds, blow-up, region) added under and over it, so a
// figure shows what the screen shows.
//
// Canonical form: items in drawing order (axes, curves, lines, point marks, labels); every style key
// names a style in `styles`; widths, radii and dashes are CSS pixels, which the exporters turn into points.
// Status marks, readable in greyscale: exact = a filled disc with a paper rim (a dot), algebraic = a ring,
// approximate = a dashed ring (rings are closed polylines, so the Pixi sink, which only fills dots, and
// the exporters stroke them alike).
import { curvePrepare, curveTrace, type FloatLandmarks, type PreparedCurve } from '../../shaders-free-render/trace.ts';
import { curveLandmarks } from '../poly/curve-landmarks.ts';
import type { Form } from '../poly/form.ts';
import type { DisplayItem, DisplayList, ItemStyle } from '../../shaders-free-render/display-list.ts';
import type { ConstructionDoc, CurveValue, ObjectId, PointApprox, Style, ValueMap } from '../construct/types.ts';

export interface ViewBox {
  readonly xmin: number;
  readonly xmax: number;
  readonly ymin: number;
  readonly ymax: number;
}

export interface DisplayView extends ViewBox {
  /** Size the view is drawn at, in CSS pixels (the tracer's step and the label offsets depend on it). */
  readonly widthPx: number;
  readonly heightPx: number;
}

export interface DisplayOptions {
  /** Draw the coordinate axes with unit ticks (figures leave them out by default; the canvas's sink draws its own grid). */
  readonly axes?: boolean;
  /** Objects whose labels win when labels would overlap (the canvas passes its selection). */
  readonly labelFirst?: ReadonlySet<ObjectId>;
}

/** The page's paper colour: the outline of an exact point, so it stands clear of the curve under it. */
export const PAPER = '#fbf8f1';
export const LABEL_INK = '#1e1c18';
const LABEL_PX = 14;

/** Style keys of point marks start so: their shape (disc, ring, dashed ring) says the status and must be kept. */
export const POINT_MARK_PREFIX = 'point:';

/** Is this style key a point's status mark? (Greyscale printing must not give a ring a dash.) */
export function styleIsPointMark(key: string): boolean {
  return key.startsWith(POINT_MARK_PREFIX);
}

/** Radius in CSS pixels of a point's mark (helpers smaller), shared with the canvas's highlight rings. */
export function pointMarkRadius(helper: boolean): number {
  return helper ? 3 : 4.5;
}

export function constructionDisplayList(doc: ConstructionDoc, values: ValueMap, view: DisplayView, opts: DisplayOptions = {}): DisplayList {
  if (!(view.xmax > view.xmin && view.ymax > view.ymin && view.widthPx > 0 && view.heightPx > 0)) {
    throw new RangeError('a display needs a view with xmin < xmax, ymin < ymax and a positive size');
  }
  const styles: Record<string, ItemStyle> = {};
  const strokes: DisplayItem[] = [];
  const lines: DisplayItem[] = [];
  const points: DisplayItem[] = [];
  const labels: DisplayItem[] = [];
  const px = (view.xmax - view.xmin) / view.widthPx; // world units per CSS pixel
  const traceView = { xmin: view.xmin, xmax: view.xmax, ymin: view.ymin, ymax: view.ymax, width: view.widthPx, height: view.heightPx };
  const labelStyle = (colour: string): string => {
    const key = `label:${colour}`;
    styles[key] = style(colour, 0, colour, 0, [], LABEL_PX);
    return key;
  };
  for (const o of doc.objects) {
    const v = values.get(o.id);
    if (!v || v.type === 'failure' || !o.style.visible) continue;
    const showLabel = o.style.showLabel && o.label.trim() !== '';
    if (v.type === 'curve') {
      const prepared = curvePrepared(v);
      if (!prepared) continue;
      let trace;
      try {
        trace = curveTrace(prepared, traceView);
      } catch {
        continue; // a curve the tracer refuses is left undrawn; its report says why
      }
      const key = `curve:${o.id}`;
      styles[key] = style(o.style.colour, o.style.width ?? 2, o.style.colour, 2.5, v.status === 'exact' ? dashOf(o.style.stroke) : [7, 5]);
      for (const pl of trace.polylines) strokes.push({ kind: 'polyline', points: pl.points, closed: pl.closed, ends: pl.ends, style: key, owner: o.id });
      for (const [x, y] of trace.dots) strokes.push({ kind: 'dot', x, y, role: 'isolated', style: key, owner: o.id });
      if (showLabel && trace.polylines.length) {
        const pl = trace.polylines[0].points;
        const k = 2 * Math.floor(pl.length / 4);
        labels.push({ kind: 'label', x: pl[k] + 6 * px, y: pl[k + 1] + 6 * px, text: o.label, style: labelStyle(o.style.colour), owner: o.id });
      }
    } else if (v.type === 'line') {
      const seg = lineClip(v.approx, view);
      if (!seg) continue;
      const key = `line:${o.id}`;
      styles[key] = style(o.style.colour, o.style.width ?? 1.25, o.style.colour, 0, v.status === 'exact' ? dashOf(o.style.stroke) : v.status === 'algebraic' ? [2, 3] : [7, 5]);
      lines.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: key, owner: o.id });
      if (showLabel) {
        labels.push({ kind: 'label', x: 0.8 * seg[2] + 0.2 * seg[0] + 5 * px, y: 0.8 * seg[3] + 0.2 * seg[1] + 5 * px, text: o.label, style: labelStyle(o.style.colour), owner: o.id });
      }
    } else if (v.type === 'point') {
      const r = pointMarkRadius(o.helperOf !== undefined);
      const at = pointPlace(v.approx, view, px);
      // A mark whose disc reaches into the view is drawn (the sink and the figure's clip cut it at the edge).
      const reach = (r + 2) * px;
      if (!at || at.x < view.xmin - reach || at.x > view.xmax + reach || at.y < view.ymin - reach || at.y > view.ymax + reach) continue;
      const key = `${POINT_MARK_PREFIX}${v.status}:${o.style.colour}:${r}`;
      if (v.status === 'exact') {
        styles[key] = style(PAPER, 1.25, o.style.colour, r);
        points.push({ kind: 'dot', x: at.x, y: at.y, role: 'point', style: key, owner: o.id });
      } else {
        const rr = v.status === 'algebraic' ? r : r + 0.5;
        styles[key] = v.status === 'algebraic' ? style(o.style.colour, 2, 'none', rr) : style(o.style.colour, 1.75, 'none', rr, [2.5, 2]);
        points.push({ kind: 'polyline', points: ringPoints(at.x, at.y, rr * px), closed: true, ends: null, style: key, owner: o.id });
      }
      if (showLabel || at.atInfinity) {
        const text = at.atInfinity ? `${o.label} at \u221e` : o.label;
        const centre = 0.5 * (view.xmin + view.xmax);
        const x = at.atInfinity && at.x > centre ? at.x - (8 * text.length + 12) * px : at.x + 7 * px;
        labels.push({ kind: 'label', x, y: at.y + (at.atInfinity ? -14 : 7) * px, text, style: labelStyle(LABEL_INK), owner: o.id });
      }
    }
  }
  const axisItems: DisplayItem[] = [];
  if (opts.axes) axes(axisItems, styles, view);
  return { items: [...axisItems, ...strokes, ...lines, ...points, ...labelsDeclutter(labels, view, opts.labelFirst)], styles };
}

/**
 * Where a point's mark goes: its own place, or for a point at infinity a place 16 pixels inside the view's
 * edge in its direction from the centre (the direction with y > 0, or x > 0 when y = 0); null if none.
 */
function pointPlace(a: PointApprox, view: ViewBox, px: number): { x: number; y: number; atInfinity: boolean } | null {
  if (a.finite) return { x: a.x, y: a.y, atInfinity: false };
  const cx = 0.5 * (view.xmin + view.xmax);
  const cy = 0.5 * (view.ymin + view.ymax);
  const flip = a.y < 0 || (a.y === 0 && a.x < 0) ? -1 : 1;
  const dx = flip * a.x;
  const dy = flip * a.y;
  const inset = 16 * px;
  const tx = dx === 0 ? Infinity : (dx > 0 ? view.xmax - inset - cx : view.xmin + inset - cx) / dx;
  const ty = dy === 0 ? Infinity : (view.ymax - inset - cy) / dy;
  const t = Math.min(tx, ty);
  if (!Number.isFinite(t)) return null;
  return { x: cx + t * dx, y: cy + t * dy, atInfinity: true };
}

/** A circle of world radius `r` around (x, y) as a closed polyline of 21 vertices (first repeated). */
export function ringPoints(x: number, y: number, r: number): number[] {
  const pts: number[] = [];
  for (let k = 0; k <= 20; k++) {
    const t = k === 20 ? 0 : (k / 20) * 2 * Math.PI;
    pts.push(x + r * Math.cos(t), y + r * Math.sin(t));
  }
  return pts;
}

const PREPARED_EXACT = new WeakMap<Form, PreparedCurve | null>();
const PREPARED_FLOAT = new WeakMap<readonly number[], PreparedCurve | null>();

/**
 * An exact curve is traced with the core's exact landmarks (critical abscissae, lines that may carry
 * singular points), so nodes, cusps and isolated points come out right; otherwise a float search; null if
 * the tracer refuses the curve. Cached by the identity of the form or the coefficient array: evaluation
 * keeps an unchanged curve's value object, so a drag that does not move a curve never prepares it again.
 */
function curvePrepared(v: CurveValue): PreparedCurve | null {
  const f = v.form;
  if (f) {
    const known = PREPARED_EXACT.get(f);
    if (known !== undefined) return known;
    let p: PreparedCurve | null;
    try {
      const l = curveLandmarks(f);
      const marks: FloatLandmarks = { shear: l.shear, critical: l.critical, singularLines: l.singularLines };
      p = curvePrepare({ degree: f.degree, coeffs: v.approx }, marks);
    } catch {
      p = curvePreparedFloat(v.approx);
    }
    PREPARED_EXACT.set(f, p);
    return p;
  }
  return curvePreparedFloat(v.approx);
}

function curvePreparedFloat(coeffs: readonly number[]): PreparedCurve | null {
  const known = PREPARED_FLOAT.get(coeffs);
  if (known !== undefined) return known;
  let p: PreparedCurve | null;
  try {
    p = curvePrepare({ degree: degreeOf(coeffs.length), coeffs });
  } catch {
    p = null;
  }
  PREPARED_FLOAT.set(coeffs, p);
  return p;
}

/**
 * Labels that would overlap one already placed are left out (those in `first` placed first), so text
 * stays readable however crowded the view: a grid of 12-pixel cells, each label claiming the cells of its box.
 */
function labelsDeclutter(labels: readonly DisplayItem[], view: DisplayView, first?: ReadonlySet<ObjectId>): DisplayItem[] {
  const taken = new Set<string>();
  const out: DisplayItem[] = [];
  const rank = (i: DisplayItem): number => (first && i.owner !== undefined && first.has(i.owner) ? 0 : 1);
  const ordered = first && first.size ? [...labels].sort((a, b) => rank(a) - rank(b)) : labels;
  for (const item of ordered) {
    if (item.kind !== 'label') continue;
    const sx = ((item.x - view.xmin) / (view.xmax - view.xmin)) * view.widthPx;
    const sy = ((view.ymax - item.y) / (view.ymax - view.ymin)) * view.heightPx;
    const w = 8 * item.text.length + 4;
    const cells: string[] = [];
    for (let cx = Math.floor(sx / 12); cx <= Math.floor((sx + w) / 12); cx++) for (let cy = Math.floor((sy - 16) / 12); cy <= Math.floor(sy / 12); cy++) cells.push(`${cx},${cy}`);
    if (cells.some((c) => taken.has(c))) continue;
    for (const c of cells) taken.add(c);
    out.push(item);
  }
  return out;
}

/** Faint axes with a tick at each unit step that leaves at least 40 pixels between ticks. */
function axes(items: DisplayItem[], styles: Record<string, ItemStyle>, view: DisplayView): void {
  styles.axis = style('#cfc6b0', 1, '#cfc6b0', 0);
  styles['axis:label'] = style('#8f8672', 0, '#8f8672', 0, [], 11);
  const scale = view.widthPx / (view.xmax - view.xmin); // pixels per world unit
  const step = 10 ** Math.ceil(Math.log10(40 / scale));
  const tick = 4 / scale;
  if (view.ymin <= 0 && view.ymax >= 0) {
    items.push({ kind: 'segment', x0: view.xmin, y0: 0, x1: view.xmax, y1: 0, style: 'axis' });
    for (let x = Math.ceil(view.xmin / step) * step; x <= view.xmax; x += step) {
      if (Math.abs(x) < step / 2) continue;
      items.push({ kind: 'segment', x0: x, y0: -tick, x1: x, y1: tick, style: 'axis' });
      items.push({ kind: 'label', x: x + 2 / scale, y: -17 / scale, text: String(Number(x.toPrecision(6))), style: 'axis:label' });
    }
  }
  if (view.xmin <= 0 && view.xmax >= 0) {
    items.push({ kind: 'segment', x0: 0, y0: view.ymin, x1: 0, y1: view.ymax, style: 'axis' });
    for (let y = Math.ceil(view.ymin / step) * step; y <= view.ymax; y += step) {
      if (Math.abs(y) < step / 2) continue;
      items.push({ kind: 'segment', x0: -tick, y0: y, x1: tick, y1: y, style: 'axis' });
      items.push({ kind: 'label', x: 5 / scale, y: y - 6 / scale, text: String(Number(y.toPrecision(6))), style: 'axis:label' });
    }
  }
}

export function style(stroke: string, width: number, fill: string, radius: number, dash: readonly number[] = [], fontSize = LABEL_PX): ItemStyle {
  return { stroke, width, fill, radius, dash, fontSize };
}

function dashOf(stroke: Style['stroke']): number[] {
  return stroke === 'dashed' ? [8, 5] : stroke === 'dotted' ? [2, 4] : [];
}

function degreeOf(n: number): number {
  // n = (d + 1)(d + 2) / 2
  return Math.round((Math.sqrt(8 * n + 1) - 3) / 2);
}

/** The part of the line aX + bY + c = 0 (Z = 1) inside the view, or null (Liang–Barsky on a long chord). */
export function lineClip(l: readonly number[], view: ViewBox): [number, number, number, number] | null {
  const [a, b, c] = l;
  if (!(Math.abs(a) + Math.abs(b) > 0)) return null; // the line at infinity is not drawn
  const cx = 0.5 * (view.xmin + view.xmax);
  const cy = 0.5 * (view.ymin + view.ymax);
  const n2 = a * a + b * b;
  // Foot of the perpendicular from the centre, then a direction along the line.
  const t0 = -(a * cx + b * cy + c) / n2;
  const fx = cx + a * t0;
  const fy = cy + b * t0;
  const n = Math.sqrt(n2);
  const dx = -b / n;
  const dy = a / n;
  let lo = -Infinity;
  let hi = Infinity;
  const clip = (p: number, q: number): boolean => {
    if (p === 0) return q >= 0;
    const r = q / p;
    if (p < 0) lo = Math.max(lo, r);
    else hi = Math.min(hi, r);
    return true;
  };
  if (!clip(-dx, fx - view.xmin) || !clip(dx, view.xmax - fx) || !clip(-dy, fy - view.ymin) || !clip(dy, view.ymax - fy)) return null;
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) return null;
  return [fx + lo * dx, fy + lo * dy, fx + hi * dx, fy + hi * dy];
}
