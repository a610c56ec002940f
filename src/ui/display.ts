// The construction as a display list (shaders-free-render/display-list.ts) for the current view: curves
// traced by the CPU tracer, lines clipped to the view, points with their status shape, labels, and the
// highlights of selection, hover and picks. The same list could feed an exporter; here it feeds the sink.
//
// Status shapes (readable in greyscale; the same code as the figure exporter): exact = filled disc,
// algebraic = ring, approximate = dashed ring. Selection = a wide pale halo, hover = a thin dark ring.
import type { DisplayItem, DisplayList, ItemStyle } from '../../shaders-free-render/display-list.ts';
import { curvePrepare, curveTrace, type PreparedCurve } from '../../shaders-free-render/trace.ts';
import type { ConstructionDoc, CurveValue, ObjectId, ObjectValue, PointApprox } from '../construct/types.ts';
import type { Form } from '../poly/form.ts';
import { curveLandmarks } from '../poly/curve-landmarks.ts';
import { worldToScreen, type BlowupView, type View } from './stores/interaction.ts';

export interface DisplayExtras {
  readonly selection: ReadonlySet<ObjectId>;
  readonly hover: ObjectId | null;
  readonly picks: readonly ObjectId[];
  /** Points found by the search, drawn small (not objects of the construction). */
  readonly found?: readonly PointApprox[];
  readonly blowup?: BlowupView | null;
  /** The search region being drawn or in force, in world coordinates. */
  readonly region?: { readonly x0: number; readonly y0: number; readonly x1: number; readonly y1: number } | null;
}

const HALO_SELECT = '#f2c14e';
const HALO_HOVER = '#2b2b2b';

function style(stroke: string, width: number, fill: string, radius: number, dash: readonly number[] = [], fontSize = 13): ItemStyle {
  return { stroke, width, fill, radius, dash, fontSize };
}

const PREPARED = new WeakMap<readonly number[], PreparedCurve | null>();
const PREPARED_EXACT = new WeakMap<Form, PreparedCurve | null>();

/** An exact curve is prepared with the core's exact landmarks (critical abscissae, lines of singular
 * points), so its singular points are drawn right; a moving curve with a float search. */
function preparedFor(v: CurveValue): PreparedCurve | null {
  const f = v.form;
  if (!f) return prepared(v.approx);
  if (PREPARED_EXACT.has(f)) return PREPARED_EXACT.get(f)!;
  let p: PreparedCurve | null;
  try {
    const l = curveLandmarks(f);
    p = curvePrepare({ degree: f.degree, coeffs: v.approx }, { shear: l.shear, critical: l.critical, singularLines: l.singularLines });
  } catch {
    p = prepared(v.approx);
  }
  PREPARED_EXACT.set(f, p);
  return p;
}

function prepared(coeffs: readonly number[]): PreparedCurve | null {
  if (PREPARED.has(coeffs)) return PREPARED.get(coeffs)!;
  const degree = Math.round((Math.sqrt(8 * coeffs.length + 1) - 3) / 2);
  let p: PreparedCurve | null = null;
  try {
    p = curvePrepare({ degree, coeffs });
  } catch {
    p = null; // a curve the tracer refuses is left undrawn; its report says why
  }
  PREPARED.set(coeffs, p);
  return p;
}

export function viewBounds(v: View): { xmin: number; xmax: number; ymin: number; ymax: number } {
  const hw = v.width / 2 / v.scale;
  const hh = v.height / 2 / v.scale;
  return { xmin: v.cx - hw, xmax: v.cx + hw, ymin: v.cy - hh, ymax: v.cy + hh };
}

/** The part of the line ax + by + c = 0 inside the box, or null. */
export function lineClip(l: readonly number[], b: { xmin: number; xmax: number; ymin: number; ymax: number }): [number, number, number, number] | null {
  const [a, bb, c] = l;
  const pts: [number, number][] = [];
  if (Math.abs(bb) > 1e-300) {
    for (const x of [b.xmin, b.xmax]) {
      const y = -(a * x + c) / bb;
      if (y >= b.ymin - 1e-12 && y <= b.ymax + 1e-12) pts.push([x, y]);
    }
  }
  if (Math.abs(a) > 1e-300) {
    for (const y of [b.ymin, b.ymax]) {
      const x = -(bb * y + c) / a;
      if (x >= b.xmin - 1e-12 && x <= b.xmax + 1e-12) pts.push([x, y]);
    }
  }
  if (pts.length < 2) return null;
  pts.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  const p = pts[0];
  const q = pts[pts.length - 1];
  return [p[0], p[1], q[0], q[1]];
}

export function sceneDisplay(doc: ConstructionDoc, values: ReadonlyMap<ObjectId, ObjectValue>, view: View, extras: DisplayExtras): DisplayList {
  const items: DisplayItem[] = [];
  const styles: Record<string, ItemStyle> = {};
  const box = viewBounds(view);
  const px = 1 / view.scale;
  const traceView = { ...box, width: view.width, height: view.height };
  const picked = new Set(extras.picks);
  const lineOnTop: DisplayItem[] = [];
  const pointItems: DisplayItem[] = [];
  const labelItems: DisplayItem[] = [];

  if (extras.region) {
    const r = extras.region;
    styles.region = style('#7a6a9c', 1, '#7a6a9c', 0, [6, 4]);
    const [x0, x1] = [Math.min(r.x0, r.x1), Math.max(r.x0, r.x1)];
    const [y0, y1] = [Math.min(r.y0, r.y1), Math.max(r.y0, r.y1)];
    items.push({ kind: 'polyline', points: [x0, y0, x1, y0, x1, y1, x0, y1, x0, y0], closed: true, ends: null, style: 'region' });
  }

  for (const o of doc.objects) {
    const v = values.get(o.id);
    if (!v || v.type === 'failure' || !o.style.visible) continue;
    const highlighted = extras.selection.has(o.id) || picked.has(o.id);
    const hovered = extras.hover === o.id;
    if (v.type === 'curve') {
      const p = preparedFor(v);
      if (!p) continue;
      let trace;
      try {
        trace = curveTrace(p, traceView);
      } catch {
        continue;
      }
      const width = (o.style.width ?? 2) + (highlighted ? 1.5 : 0) + (hovered ? 1 : 0);
      const dash = v.status === 'exact' ? dashOf(o.style.stroke) : [7, 5];
      const key = `curve:${o.style.colour}:${width}:${dash.join(',')}`;
      styles[key] = style(o.style.colour, width, o.style.colour, 2.5, dash);
      if (highlighted) styles[`${key}:halo`] = style(HALO_SELECT, width + 5, HALO_SELECT, 4);
      for (const pl of trace.polylines) {
        if (highlighted) items.push({ kind: 'polyline', points: pl.points, closed: pl.closed, ends: pl.ends, style: `${key}:halo`, owner: o.id });
        items.push({ kind: 'polyline', points: pl.points, closed: pl.closed, ends: pl.ends, style: key, owner: o.id });
      }
      for (const [x, y] of trace.dots) items.push({ kind: 'dot', x, y, role: 'isolated', style: key, owner: o.id });
      if (o.style.showLabel && trace.polylines.length) {
        const pl = trace.polylines[0].points;
        const k = 2 * Math.floor(pl.length / 4);
        labelItems.push({ kind: 'label', x: pl[k] + 6 * px, y: pl[k + 1] + 6 * px, text: o.label, style: labelStyle(styles, o.style.colour) });
      }
    } else if (v.type === 'line') {
      const seg = lineClip(v.approx, box);
      if (!seg) continue;
      const width = (o.style.width ?? 1.25) + (highlighted ? 1.5 : 0) + (hovered ? 1 : 0);
      const dash = v.status === 'exact' ? dashOf(o.style.stroke) : v.status === 'algebraic' ? [2, 3] : [7, 5];
      const key = `line:${o.style.colour}:${width}:${dash.join(',')}`;
      styles[key] = style(o.style.colour, width, o.style.colour, 0, dash);
      if (highlighted) {
        styles[`${key}:halo`] = style(HALO_SELECT, width + 5, HALO_SELECT, 0);
        lineOnTop.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: `${key}:halo`, owner: o.id });
      }
      lineOnTop.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: key, owner: o.id });
      if (o.style.showLabel) {
        labelItems.push({ kind: 'label', x: 0.8 * seg[2] + 0.2 * seg[0] + 5 * px, y: 0.8 * seg[3] + 0.2 * seg[1] + 5 * px, text: o.label, style: labelStyle(styles, o.style.colour) });
      }
    } else if (v.type === 'point') {
      let a = v.approx;
      let atInfinity = false;
      if (!a.finite) {
        // Shown at the edge of the view, in its direction (the one with y > 0, or x > 0 when y = 0).
        const flip = a.y < 0 || (a.y === 0 && a.x < 0) ? -1 : 1;
        const dx = flip * a.x;
        const dy = flip * a.y;
        const inset = 16 * px;
        const tx = dx === 0 ? Infinity : (dx > 0 ? box.xmax - inset - view.cx : box.xmin + inset - view.cx) / dx;
        const ty = dy === 0 ? Infinity : (box.ymax - inset - view.cy) / dy;
        const t = Math.min(tx, ty);
        if (!Number.isFinite(t)) continue;
        a = { x: view.cx + t * dx, y: view.cy + t * dy, finite: true };
        atInfinity = true;
      }
      if (a.x < box.xmin - 1 || a.x > box.xmax + 1 || a.y < box.ymin - 1 || a.y > box.ymax + 1) continue;
      const helper = o.helperOf !== undefined;
      const r = helper ? 3 : 4.5;
      if (highlighted) {
        styles['halo:select'] = style(HALO_SELECT, 0, HALO_SELECT, 10);
        pointItems.push({ kind: 'dot', x: a.x, y: a.y, role: 'point', style: 'halo:select', owner: o.id });
      }
      if (hovered) {
        styles['halo:hover'] = style(HALO_HOVER, 1.5, HALO_HOVER, 0);
        pointItems.push({ kind: 'polyline', points: ring(a.x, a.y, r + 4, px), closed: true, ends: null, style: 'halo:hover', owner: o.id });
      }
      // exact: a filled disc; algebraic: a ring; approximate: a dashed ring. One item each: the sink strokes
      // item by item, so a drag with hundreds of points costs what it draws.
      const key = `point:${v.status}:${o.style.colour}:${r}`;
      if (v.status === 'exact') {
        styles[key] = style(o.style.colour, 0, o.style.colour, r);
        pointItems.push({ kind: 'dot', x: a.x, y: a.y, role: 'point', style: key, owner: o.id });
      } else {
        styles[key] = v.status === 'algebraic' ? style(o.style.colour, 2, o.style.colour, 0) : style(o.style.colour, 1.75, o.style.colour, 0, [2.5, 2]);
        pointItems.push({ kind: 'polyline', points: ring(a.x, a.y, v.status === 'algebraic' ? r : r + 0.5, px), closed: true, ends: null, style: key, owner: o.id });
      }
      if (o.style.showLabel || atInfinity) {
        const text = atInfinity ? `${o.label} at ∞` : o.label;
        const x = atInfinity && a.x > view.cx ? a.x - (8 * text.length + 12) * px : a.x + 7 * px;
        labelItems.push({ kind: 'label', x, y: a.y + (atInfinity ? -14 : 7) * px, text, style: labelStyle(styles, '#1e1c18'), owner: o.id });
      }
    }
  }
  if (extras.blowup) {
    const b = extras.blowup;
    styles['blowup:tangent'] = style('#0f6b5c', 1.5, '#0f6b5c', 0, [9, 4]);
    styles['blowup:line'] = style('#0f6b5c', 1.5, '#0f6b5c', 0);
    styles['blowup:point'] = style('#0f6b5c', 2.5, '#0f6b5c', 0);
    styles['blowup:singular'] = style('#0f6b5c', 2, '#0f6b5c', 0, [3, 2]);
    for (const t of b.tangents) {
      const seg = lineClip(t, box);
      if (seg) lineOnTop.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: 'blowup:tangent' });
    }
    if (b.singular.finite) {
      pointItems.push({ kind: 'polyline', points: ring(b.singular.x, b.singular.y, 10, px), closed: true, ends: null, style: 'blowup:singular' });
      if (b.point?.finite) {
        const l = [b.singular.y - b.point.y, b.point.x - b.singular.x, b.singular.x * b.point.y - b.point.x * b.singular.y];
        const seg = lineClip(l, box);
        if (seg) lineOnTop.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: 'blowup:line' });
      }
    }
    if (b.point?.finite) pointItems.push({ kind: 'polyline', points: ring(b.point.x, b.point.y, 7, px), closed: true, ends: null, style: 'blowup:point' });
  }
  if (extras.found?.length) {
    styles.found = style('#5d4a8a', 1, '#5d4a8a', 2.5);
    for (const p of extras.found) if (p.finite) pointItems.push({ kind: 'dot', x: p.x, y: p.y, role: 'point', style: 'found' });
  }
  return { items: [...items, ...lineOnTop, ...pointItems, ...declutter(labelItems, view, extras.selection)], styles };
}

/**
 * Labels that would overlap one already placed are left out (selected objects' labels first), so text
 * stays readable however crowded the view: a grid of 12-pixel cells, each label claiming the cells of
 * its box.
 */
function declutter(labels: DisplayItem[], view: View, selection: ReadonlySet<ObjectId>): DisplayItem[] {
  const taken = new Set<string>();
  const out: DisplayItem[] = [];
  const ordered = [...labels].sort((a, b) => Number(selection.has(b.owner ?? '')) - Number(selection.has(a.owner ?? '')));
  for (const item of ordered) {
    if (item.kind !== 'label') continue;
    const [sx, sy] = worldToScreen(view, item.x, item.y);
    const w = 8 * item.text.length + 4;
    const cells: string[] = [];
    for (let cx = Math.floor(sx / 12); cx <= Math.floor((sx + w) / 12); cx++) for (let cy = Math.floor((sy - 16) / 12); cy <= Math.floor(sy / 12); cy++) cells.push(`${cx},${cy}`);
    if (cells.some((c) => taken.has(c))) continue;
    for (const c of cells) taken.add(c);
    out.push(item);
  }
  return out;
}

/** A circle of `r` pixels around (x, y) as a closed world polyline (rings are strokes, not dots). */
function ring(x: number, y: number, r: number, px: number): number[] {
  const pts: number[] = [];
  for (let k = 0; k <= 20; k++) pts.push(x + r * px * Math.cos((k / 20) * 2 * Math.PI), y + r * px * Math.sin((k / 20) * 2 * Math.PI));
  return pts;
}

function dashOf(stroke: string | undefined): number[] {
  return stroke === 'dashed' ? [8, 5] : stroke === 'dotted' ? [2, 4] : [];
}

function labelStyle(styles: Record<string, ItemStyle>, colour: string): string {
  const key = `label:${colour}`;
  styles[key] = style(colour, 0, colour, 0, [], 14);
  return key;
}
