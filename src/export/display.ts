// A construction with its computed values -> the display list (world coordinates) for a view: curves
// traced by shaders-free-render, lines clipped to the view, points as dots, labels beside their objects.
// The canvas and the figure exporters both draw this list, so a figure shows what the screen shows.
//
// The rules (style keys, status shapes, dash patterns, label places) are the canvas's own (src/ui/display.ts
// draws the same base list plus selection highlights); widths, radii and dashes are CSS pixels, which the
// exporters turn into points.
import { curvePrepare, curveTrace, type FloatLandmarks, type PreparedCurve } from '../../shaders-free-render/trace.ts';
import { curveLandmarks } from '../poly/curve-landmarks.ts';
import type { CurveValue } from '../construct/types.ts';
import type { DisplayItem, DisplayList, ItemStyle } from '../../shaders-free-render/display-list.ts';
import type { ConstructionDoc, Style, ValueMap } from '../construct/types.ts';

export interface DisplayView {
  readonly xmin: number;
  readonly xmax: number;
  readonly ymin: number;
  readonly ymax: number;
  /** Size the view is drawn at, in CSS pixels (the tracer's step and the label offsets depend on it). */
  readonly widthPx: number;
  readonly heightPx: number;
}

export interface DisplayOptions {
  /** Draw the coordinate axes with unit ticks, as the canvas does (figures leave them out by default). */
  readonly axes?: boolean;
}

/** The page's paper colour: the outline of an exact point, so it stands clear of the curve under it. */
export const PAPER = '#fbf8f1';
const LABEL_INK = '#1e1c18';
const LABEL_PX = 14;

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
      let trace;
      try {
        trace = curveTrace(curvePrepared(v), { xmin: view.xmin, xmax: view.xmax, ymin: view.ymin, ymax: view.ymax, width: view.widthPx, height: view.heightPx });
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
      const a = v.approx;
      if (!a.finite || a.x < view.xmin || a.x > view.xmax || a.y < view.ymin || a.y > view.ymax) continue;
      const r = o.helperOf !== undefined ? 3 : 4.5;
      // Status by shape, readable in greyscale: exact a filled disc, algebraic a ring, approximate a dashed ring.
      const key = `point:${v.status}:${o.style.colour}:${r}`;
      styles[key] =
        v.status === 'exact'
          ? style(PAPER, 1.25, o.style.colour, r)
          : v.status === 'algebraic'
            ? style(o.style.colour, 2, 'none', r)
            : style(o.style.colour, 1.75, 'none', r + 0.5, [2.5, 2]);
      points.push({ kind: 'dot', x: a.x, y: a.y, role: 'point', style: key, owner: o.id });
      if (showLabel) labels.push({ kind: 'label', x: a.x + 7 * px, y: a.y + 7 * px, text: o.label, style: labelStyle(LABEL_INK), owner: o.id });
    }
  }
  const axisItems: DisplayItem[] = [];
  if (opts.axes) axes(axisItems, styles, view);
  return { items: [...axisItems, ...strokes, ...lines, ...points, ...labelsDeclutter(labels, view)], styles };
}

/** An exact curve is traced with the core's exact landmarks (critical abscissae, lines that may carry
 * singular points), so nodes, cusps and isolated points come out right; otherwise a float search. */
function curvePrepared(v: CurveValue): PreparedCurve {
  const f = v.form;
  if (f) {
    try {
      const l = curveLandmarks(f);
      const marks: FloatLandmarks = { shear: l.shear, critical: l.critical, singularLines: l.singularLines };
      return curvePrepare({ degree: f.degree, coeffs: v.approx }, marks);
    } catch {
      // fall through to the float search
    }
  }
  return curvePrepare({ degree: degreeOf(v.approx.length), coeffs: v.approx });
}

/**
 * Labels that would overlap one already placed are left out, so text stays readable however crowded the
 * view: a grid of 12-pixel cells, each label claiming the cells of its box (the canvas's rule).
 */
function labelsDeclutter(labels: readonly DisplayItem[], view: DisplayView): DisplayItem[] {
  const taken = new Set<string>();
  const out: DisplayItem[] = [];
  for (const item of labels) {
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

function style(stroke: string, width: number, fill: string, radius: number, dash: readonly number[] = [], fontSize = LABEL_PX): ItemStyle {
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
export function lineClip(l: readonly [number, number, number], view: DisplayView): [number, number, number, number] | null {
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
