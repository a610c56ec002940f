// The display list: what is drawn, in world coordinates, independent of any backend. One display list
// feeds the Pixi canvas sink and the figure exporters, so the screen and a figure cannot disagree.
//
// Canonical form: polylines as flat [x0, y0, x1, y1, ...] arrays; a closed polyline repeats its first
// vertex at the end; every item names a style by key (styles live in `DisplayList.styles`), so a later
// item kind (a point of a construction, a line, a label) needs only a new `kind` and its fields.

/** How a curve piece ends. */
export type BranchEndKind =
  /** The branch runs on outside the view; the end lies on the view's border. */
  | 'leaves-view'
  /** The branch meets a singular point of the curve there (node, cusp, triple point, ...). */
  | 'singular'
  /** The tracer could not follow further (numerical trouble); the end is left open honestly. */
  | 'open';

export interface BranchEnd {
  readonly x: number;
  readonly y: number;
  readonly kind: BranchEndKind;
}

export interface PolylineItem {
  readonly kind: 'polyline';
  readonly points: number[];
  readonly closed: boolean;
  /** The two ends (start, finish) of an open piece; null for a closed one. */
  readonly ends: readonly [BranchEnd, BranchEnd] | null;
  readonly style: string;
  /** Which object the piece belongs to (a curve id), for hit-testing and exports. */
  readonly owner?: string;
}

export interface DotItem {
  readonly kind: 'dot';
  readonly x: number;
  readonly y: number;
  /** 'isolated' for an isolated real point of a curve or an oval below one pixel; 'point' for a marked point. */
  readonly role: 'isolated' | 'point';
  readonly style: string;
  readonly owner?: string;
}

export interface SegmentItem {
  readonly kind: 'segment';
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
  readonly style: string;
  readonly owner?: string;
}

export interface LabelItem {
  readonly kind: 'label';
  readonly x: number;
  readonly y: number;
  readonly text: string;
  readonly style: string;
  readonly owner?: string;
}

export type DisplayItem = PolylineItem | DotItem | SegmentItem | LabelItem;

export interface ItemStyle {
  /** CSS colour of strokes and of text. */
  readonly stroke: string;
  /** Stroke width in CSS pixels (never scaled by zoom). */
  readonly width: number;
  /** Fill colour of dots. */
  readonly fill: string;
  /** Dot radius in CSS pixels. */
  readonly radius: number;
  /** Dash pattern in CSS pixels (on, off, ...); empty for solid. Sinks split the path themselves. */
  readonly dash: readonly number[];
  /** Text size in CSS pixels. */
  readonly fontSize: number;
}

export interface DisplayList {
  readonly items: DisplayItem[];
  readonly styles: Record<string, ItemStyle>;
}

export const CURVE_STYLE: ItemStyle = {
  stroke: '#1d3f5e', width: 1.75, fill: '#1d3f5e', radius: 2.5, dash: [], fontSize: 12,
};

export function displayListEmpty(): DisplayList {
  return { items: [], styles: { curve: CURVE_STYLE } };
}

/** How a dot is marked, the one rule every sink and exporter follows: a dot whose fill is "none" is a ring
 * (dashed when its style is); a filled point dot gets an outline in its stroke colour when that differs
 * from the fill (the paper rim of an exact point). */
export type DotMark = { readonly ring: true } | { readonly ring: false; readonly outline: boolean };

export function dotMark(style: ItemStyle, role: 'isolated' | 'point'): DotMark {
  if (style.fill === 'none') return { ring: true };
  return { ring: false, outline: role === 'point' && style.width > 0 && style.stroke !== style.fill };
}
