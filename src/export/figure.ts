// What every figure exporter shares: the frame (the view, in world and in print units), print settings,
// the exact facts written into a figure beside the drawing, and the mapping world -> page.
//
// Canonical form: page coordinates are in points (1/72 in), origin at the top left, v growing down (SVG);
// TikZ flips v itself. The view is a world rectangle xmin < xmax, ymin < ymax; a figure keeps its aspect.
import { dotMark, type DisplayItem, type DisplayList, type DotMark, type ItemStyle } from '../../shaders-free-render/display-list.ts';
import { styleIsPointMark } from './display.ts';

export interface FigureView {
  readonly xmin: number;
  readonly xmax: number;
  readonly ymin: number;
  readonly ymax: number;
  /** The same bounds as exact rationals ("-17/4"), written into the figure's notes. */
  readonly exact?: { readonly xmin: string; readonly xmax: string; readonly ymin: string; readonly ymax: string };
}

/** One object of the scene as the figure records it: exact values, so the figure can be checked later. */
export interface FigureFact {
  readonly id: string;
  readonly label: string;
  readonly type: 'curve' | 'point' | 'line' | 'check';
  readonly status: 'exact' | 'algebraic' | 'approximate' | 'failed';
  /** Point "X:Y:Z", line "a:b:c", or a check's verdict and certificate. */
  readonly exact?: string;
  /** Curves: the equation in ordinary notation and the primitive integer coefficients. */
  readonly equation?: string;
  readonly coefficients?: readonly string[];
  /** Why an object could not be built, in words (status 'failed'). */
  readonly note?: string;
  /** Decimal approximation, for reading the figure by eye. */
  readonly approx?: string;
}

export interface FigureOptions {
  /** Width of the figure in points (default 360 pt = 5 in). */
  readonly widthPt?: number;
  /** Points per CSS pixel of the screen styles (default 0.6: a 1.75 px curve prints at 1.05 pt). */
  readonly ptPerPx?: number;
  /** Label font size in points (default 9) and family (default serif, as in a paper). */
  readonly fontSizePt?: number;
  readonly fontFamily?: string;
  /** Map colours to greys (by luminance) so a black-and-white print keeps every object apart. */
  readonly greyscale?: boolean;
  /** Draw the coordinate axes with unit ticks, as on the screen (default: no axes). */
  readonly axes?: boolean;
  readonly title?: string;
}

export interface FigureInput {
  readonly list: DisplayList;
  readonly view: FigureView;
  readonly facts: readonly FigureFact[];
  readonly options?: FigureOptions;
}

export interface PageFrame {
  readonly widthPt: number;
  readonly heightPt: number;
  /** World -> page (points, v down). */
  readonly u: (x: number) => number;
  readonly v: (y: number) => number;
  readonly ptPerPx: number;
  readonly fontSizePt: number;
  readonly fontFamily: string;
  readonly greyscale: boolean;
}

export function pageFrame(view: FigureView, opts: FigureOptions = {}): PageFrame {
  const w = view.xmax - view.xmin;
  const h = view.ymax - view.ymin;
  if (!(w > 0 && h > 0) || !Number.isFinite(w) || !Number.isFinite(h)) {
    throw new RangeError('a figure needs a view with xmin < xmax and ymin < ymax');
  }
  const widthPt = clamp(opts.widthPt ?? 360, 36, 4000);
  const heightPt = (widthPt * h) / w;
  return {
    widthPt,
    heightPt,
    u: (x) => ((x - view.xmin) / w) * widthPt,
    v: (y) => ((view.ymax - y) / h) * heightPt,
    ptPerPx: clamp(opts.ptPerPx ?? 0.6, 0.05, 5),
    fontSizePt: clamp(opts.fontSizePt ?? 9, 4, 48),
    fontFamily: opts.fontFamily ?? 'serif',
    greyscale: opts.greyscale ?? false,
  };
}

function clamp(x: number, lo: number, hi: number): number {
  return Number.isFinite(x) ? Math.min(hi, Math.max(lo, x)) : lo;
}

/** "#rrggbb" for a style colour, turned grey by luminance (Rec. 709 weights, common practice) when asked. */
export function inkOf(colour: string, greyscale: boolean): string {
  const m = /^#([0-9a-fA-F]{6})$/.exec(colour.trim());
  const hex = m ? m[1].toLowerCase() : '000000';
  if (!greyscale) return `#${hex}`;
  const r = parseInt(hex.slice(0, 2), 16);
  const g = parseInt(hex.slice(2, 4), 16);
  const b = parseInt(hex.slice(4, 6), 16);
  // Darken so that even a light colour stays visible on paper (at most 65% grey).
  const y = Math.min(166, Math.round(0.2126 * r + 0.7152 * g + 0.0722 * b));
  const t = y.toString(16).padStart(2, '0');
  return `#${t}${t}${t}`;
}

/** How a dot is drawn, read from its style as the canvas reads it: fill "none" is a ring (algebraic, or
 * dashed: approximate); otherwise a filled disc, outlined when the style has a stroke width. */
export type DotShape = DotMark;

/** The mark of a dot: the display list's one rule (shaders-free-render/display-list.ts). */
export const dotShape = dotMark;

/**
 * The exact value to write beside a point's mark, or undefined: a point at infinity (Z = 0) is marked at
 * the view's edge in its direction, which is not its place, so its mark carries no coordinates.
 */
export function dotExactNote(fact: { readonly exact?: string } | undefined, role: 'isolated' | 'point'): string | undefined {
  if (!fact?.exact || role !== 'point') return undefined;
  return /:0$/.test(fact.exact) ? undefined : fact.exact;
}

/** The outline of a disc on paper: a light (paper-coloured) outline prints white, never grey. */
export function outlineInk(colour: string, greyscale: boolean): string {
  const ink = inkOf(colour, false);
  const r = parseInt(ink.slice(1, 3), 16);
  const g = parseInt(ink.slice(3, 5), 16);
  const b = parseInt(ink.slice(5, 7), 16);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b > 230 ? '#ffffff' : inkOf(colour, greyscale);
}

export function styleOf(list: DisplayList, item: DisplayItem): ItemStyle {
  return (
    list.styles[item.style] ?? { stroke: '#000000', width: 1, fill: '#000000', radius: 2.5, dash: [], fontSize: 12 }
  );
}

/** Drop vertices closer than `tol` page points to the last kept one (keeps the ends): figures stay small. */
export function polylineThin(points: readonly number[], u: (x: number) => number, v: (y: number) => number, tol: number): number[] {
  const out: number[] = [];
  let lu = NaN;
  let lv = NaN;
  const n = points.length / 2;
  for (let k = 0; k < n; k++) {
    const pu = u(points[2 * k]);
    const pv = v(points[2 * k + 1]);
    if (!Number.isFinite(pu) || !Number.isFinite(pv)) continue;
    if (k === n - 1 || out.length === 0 || Math.hypot(pu - lu, pv - lv) >= tol) {
      out.push(pu, pv);
      lu = pu;
      lv = pv;
    }
  }
  return out;
}

/** A number for a figure file: at most `digits` decimals, no exponent, no "-0". */
export function num(x: number, digits = 3): string {
  const s = x.toFixed(digits).replace(/\.?0+$/, '');
  return s === '-0' ? '0' : s;
}

/** Dash patterns (CSS pixels) given in turn to strokes that greyscale would otherwise make look alike. */
const GREY_DASHES: readonly (readonly number[])[] = [[7, 3.5], [1.5, 3], [8, 3, 1.5, 3], [3, 3]];

/**
 * Greyscale print keeps objects apart: strokes (curves, lines) whose colours differ but turn into nearly
 * the same grey (within 32 of 255) and share a dash pattern get the next pattern of GREY_DASHES. Returns
 * the list unchanged when nothing needs it; never changes dots or labels.
 */
export function greyscaleDistinguish(list: DisplayList): DisplayList {
  const stroked = new Set<string>();
  // Point marks are left alone: a ring given a dash would read as an approximate point.
  for (const it of list.items) if ((it.kind === 'polyline' || it.kind === 'segment') && !styleIsPointMark(it.style)) stroked.add(it.style);
  const kept: { grey: number; dash: string; colour: string }[] = [];
  const styles: Record<string, ItemStyle> = { ...list.styles };
  let next = 0;
  let changed = false;
  for (const key of stroked) {
    const st = list.styles[key];
    if (!st) continue;
    const grey = parseInt(inkOf(st.stroke, true).slice(1, 3), 16);
    const colour = inkOf(st.stroke, false);
    const clash = (dash: string) => kept.some((k) => k.colour !== colour && Math.abs(k.grey - grey) <= 32 && k.dash === dash);
    let dash = st.dash.join(',');
    while (clash(dash) && next < GREY_DASHES.length) {
      const d = GREY_DASHES[next++];
      styles[key] = { ...st, dash: d };
      dash = d.join(',');
      changed = true;
    }
    kept.push({ grey, dash, colour });
  }
  return changed ? { items: list.items, styles } : list;
}
