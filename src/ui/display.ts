// The canvas's display list: the figure's list (src/export/display.ts, the one place that decides how
// curves, lines, point marks, labels and styles are drawn) with the page-only layers around it. Under it:
// the search region, the selection and pick halos, the widened copies of selected or hovered curves and
// lines; over it: the hover ring of a point, the blow-up view's lines and rings, the points found by the
// search. The base items are kept unchanged and in order, so the screen draws exactly what a figure of
// the same view draws, plus highlights.
//
// Canonical form: items = [region, halos, widened copies, ...base.items, over]; every highlight item's
// style key starts with `hl:` (so a test can tell the layers apart); base styles are as the builder made them.
import type { DisplayItem, DisplayList, ItemStyle } from '../../shaders-free-render/display-list.ts';
import { constructionDisplayList, lineClip, pointMarkRadius, ringPoints, style } from '../export/display.ts';
import type { ConstructionDoc, ObjectId, ObjectValue, PointApprox } from '../construct/types.ts';
import type { BlowupView, View } from './stores/interaction.ts';

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

/** Prefix of every page-only style key. */
export const HIGHLIGHT_PREFIX = 'hl:';

const HALO_SELECT = '#f2c14e';
const HALO_HOVER = '#2b2b2b';
const BLOWUP_INK = '#0f6b5c';

export function viewBounds(v: View): { xmin: number; xmax: number; ymin: number; ymax: number } {
  const hw = v.width / 2 / v.scale;
  const hh = v.height / 2 / v.scale;
  return { xmin: v.cx - hw, xmax: v.cx + hw, ymin: v.cy - hh, ymax: v.cy + hh };
}

export function sceneDisplay(doc: ConstructionDoc, values: ReadonlyMap<ObjectId, ObjectValue>, view: View, extras: DisplayExtras): DisplayList {
  const box = viewBounds(view);
  const base = constructionDisplayList(doc, values, { ...box, widthPx: view.width, heightPx: view.height }, { labelFirst: extras.selection });
  const styles: Record<string, ItemStyle> = { ...base.styles };
  const under: DisplayItem[] = [];
  const halos: DisplayItem[] = [];
  const wides: DisplayItem[] = [];
  const over: DisplayItem[] = [];
  const px = 1 / view.scale;
  const put = (key: string, s: ItemStyle): string => {
    styles[HIGHLIGHT_PREFIX + key] = s;
    return HIGHLIGHT_PREFIX + key;
  };

  if (extras.region) {
    const r = extras.region;
    const key = put('region', style('#7a6a9c', 1, '#7a6a9c', 0, [6, 4]));
    const [x0, x1] = [Math.min(r.x0, r.x1), Math.max(r.x0, r.x1)];
    const [y0, y1] = [Math.min(r.y0, r.y1), Math.max(r.y0, r.y1)];
    under.push({ kind: 'polyline', points: [x0, y0, x1, y0, x1, y1, x0, y1, x0, y0], closed: true, ends: null, style: key });
  }

  // Highlights follow the base items of the objects they mark: a selected or picked curve or line gets a
  // pale halo and a copy a little wider, both under the figure's items (so the marks of points on it stay
  // on top); hovering widens it by a pixel; a point gets a pale disc under it (selected) or a dark ring
  // around it (hovered, over everything).
  const picked = new Set(extras.picks);
  const kindOf = new Map(doc.objects.map((o) => [o.id, o]));
  for (const item of base.items) {
    const owner = item.owner;
    if (owner === undefined || item.kind === 'label') continue;
    const highlighted = extras.selection.has(owner) || picked.has(owner);
    const hovered = extras.hover === owner;
    if (!highlighted && !hovered) continue;
    const st = base.styles[item.style];
    const obj = kindOf.get(owner);
    if (obj?.type === 'point') {
      const at = item.kind === 'dot' ? [item.x, item.y] : item.kind === 'polyline' ? ringCentre(item.points) : null;
      if (!at) continue;
      if (highlighted) halos.push({ kind: 'dot', x: at[0], y: at[1], role: 'point', style: put('select:point', style(HALO_SELECT, 0, HALO_SELECT, 10)), owner });
      if (hovered) {
        const r = pointMarkRadius(obj.helperOf !== undefined);
        over.push({ kind: 'polyline', points: ringPoints(at[0], at[1], (r + 4) * px), closed: true, ends: null, style: put('hover:point', style(HALO_HOVER, 1.5, HALO_HOVER, 0)), owner });
      }
      continue;
    }
    if (item.kind === 'dot') continue; // an isolated point of a curve: its curve's halo is enough
    const extra = (highlighted ? 1.5 : 0) + (hovered ? 1 : 0);
    const width = st.width + extra;
    if (highlighted) halos.push({ ...item, style: put(`select:${width}`, style(HALO_SELECT, width + 5, HALO_SELECT, 0)) });
    wides.push({ ...item, style: put(`wide:${item.style}:${width}`, { ...st, width }) });
  }

  if (extras.blowup) {
    const b = extras.blowup;
    const tangent = put('blowup:tangent', style(BLOWUP_INK, 1.5, BLOWUP_INK, 0, [9, 4]));
    for (const t of b.tangents) {
      const seg = lineClip(t, box);
      if (seg) over.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: tangent });
    }
    if (b.singular.finite) {
      over.push({ kind: 'polyline', points: ringPoints(b.singular.x, b.singular.y, 10 * px), closed: true, ends: null, style: put('blowup:singular', style(BLOWUP_INK, 2, BLOWUP_INK, 0, [3, 2])) });
      if (b.point?.finite) {
        const l = [b.singular.y - b.point.y, b.point.x - b.singular.x, b.singular.x * b.point.y - b.point.x * b.singular.y];
        const seg = lineClip(l, box);
        if (seg) over.push({ kind: 'segment', x0: seg[0], y0: seg[1], x1: seg[2], y1: seg[3], style: put('blowup:line', style(BLOWUP_INK, 1.5, BLOWUP_INK, 0)) });
      }
    }
    if (b.point?.finite) over.push({ kind: 'polyline', points: ringPoints(b.point.x, b.point.y, 7 * px), closed: true, ends: null, style: put('blowup:point', style(BLOWUP_INK, 2.5, BLOWUP_INK, 0)) });
  }
  if (extras.found?.length) {
    const key = put('found', style('#5d4a8a', 1, '#5d4a8a', 2.5));
    for (const p of extras.found) if (p.finite) over.push({ kind: 'dot', x: p.x, y: p.y, role: 'point', style: key });
  }
  return { items: [...under, ...halos, ...wides, ...base.items, ...over], styles };
}

/** Centre of a ring made by ringPoints (assumes the 21-vertex closed circle: opposite vertices 0 and 10). */
function ringCentre(pts: readonly number[]): [number, number] {
  return [0.5 * (pts[0] + pts[20]), 0.5 * (pts[1] + pts[21])];
}
