// The sink's drawing plan: a display list cut into as few stroke and fill calls as painting allows.
// Items of one look (fill or stroke, colour, width) are gathered into one batch, drawn as one path with
// separate sub-paths (dashes are split into sub-paths before, so a pattern does not part batches). A primitive may join an earlier batch only if it overlaps nothing drawn after that
// batch, so the plan paints exactly the picture the list paints item by item in order (opaque inks:
// moving a primitive past others it does not touch changes no pixel).
//
// Canonical form: batches in painting order; every primitive of every non-label item appears in exactly
// one batch; within a batch members keep list order. Boxes are screen CSS pixels, widened by half the
// stroke width and one pixel of antialiasing; a box that is not finite counts as the whole plane.
import { dotMark, type DisplayItem, type DisplayList, type ItemStyle } from './display-list.ts';
import type { Viewport } from './viewport.ts';

/**
 * What one primitive of an item is: a stroked polyline or segment (`path`, dashed by its style), a filled
 * disc (`disc`), the solid outline round a disc (`outline`), or a stroked circle (`ring`, dashed by its
 * style) for a dot whose fill is "none".
 */
export type SinkPart = 'path' | 'disc' | 'outline' | 'ring';

export interface SinkMember {
  readonly item: number;
  readonly part: SinkPart;
}

export interface SinkBatch {
  readonly mode: 'stroke' | 'fill';
  readonly color: string;
  /** Stroke width in CSS pixels (0 for a fill). */
  readonly width: number;
  readonly members: SinkMember[];
}

/** How a dot is marked, shared with the figure exporters' rule: fill "none" is a ring; a point's disc
 * has an outline when its style gives a width and an ink other than the fill. */
export function dotMarkParts(st: ItemStyle, role: 'isolated' | 'point'): SinkPart[] {
  const mark = dotMark(st, role);
  if (mark.ring) return st.width > 0 ? ['ring'] : [];
  return mark.outline ? ['disc', 'outline'] : ['disc'];
}

export const SINK_FALLBACK_STYLE: ItemStyle = { stroke: '#222222', width: 1.5, fill: '#222222', radius: 2.5, dash: [], fontSize: 12 };

export function sinkStyleOf(list: DisplayList, item: DisplayItem): ItemStyle {
  return list.styles[item.style] ?? list.styles.curve ?? SINK_FALLBACK_STYLE;
}

/** Overlap checks allowed per primitive before it simply opens a new batch (keeps planning linear). */
const CHECK_BUDGET = 2048;

interface OpenBatch extends SinkBatch {
  readonly key: string;
  /** Flat boxes x0, y0, x1, y1 of the members. */
  readonly boxes: number[];
}

/** Plan the drawing of `list` in the viewport: batches in painting order (labels are not planned). */
export function sinkPlan(list: DisplayList, vp: Viewport): SinkBatch[] {
  const batches: OpenBatch[] = [];
  const latest = new Map<string, number>();
  const box = [0, 0, 0, 0];
  const items = list.items;
  for (let i = 0; i < items.length; i++) {
    const item = items[i];
    if (item.kind === 'label') continue;
    const st = sinkStyleOf(list, item);
    const parts: SinkPart[] = item.kind === 'dot' ? dotMarkParts(st, item.role) : st.width > 0 ? ['path'] : [];
    for (const part of parts) {
      const mode = part === 'disc' ? 'fill' : 'stroke';
      const color = part === 'disc' ? st.fill : st.stroke;
      const width = mode === 'fill' ? 0 : st.width;
      partBox(item, st, part, vp, box);
      const key = `${mode}|${color}|${width}`;
      const j = latest.get(key);
      if (j !== undefined && clearAfter(batches, j, box)) {
        batches[j].members.push({ item: i, part });
        batches[j].boxes.push(box[0], box[1], box[2], box[3]);
      } else {
        latest.set(key, batches.length);
        batches.push({ key, mode, color, width, members: [{ item: i, part }], boxes: [box[0], box[1], box[2], box[3]] });
      }
    }
  }
  return batches.map(({ mode, color, width, members }) => ({ mode, color, width, members }));
}

/** Does `b` overlap no box of the batches after index j? (False also when the check budget runs out.) */
function clearAfter(batches: readonly OpenBatch[], j: number, b: readonly number[]): boolean {
  let checks = 0;
  for (let k = j + 1; k < batches.length; k++) {
    const bx = batches[k].boxes;
    for (let m = 0; m < bx.length; m += 4) {
      if (++checks > CHECK_BUDGET) return false;
      if (bx[m] <= b[2] && b[0] <= bx[m + 2] && bx[m + 1] <= b[3] && b[1] <= bx[m + 3]) return false;
    }
  }
  return true;
}

/** The screen box of one primitive, written into `out` as x0, y0, x1, y1. */
export function partBox(item: DisplayItem, st: ItemStyle, part: SinkPart, vp: Viewport, out: number[]): void {
  const k = 1 / vp.scale;
  const hw = vp.width / 2;
  const hh = vp.height / 2;
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  let pad = part === 'disc' ? 1 : st.width / 2 + 1;
  if (item.kind === 'dot') {
    const sx = hw + (item.x - vp.cx) * k;
    const sy = hh - (item.y - vp.cy) * k;
    pad += st.radius;
    x0 = x1 = sx;
    y0 = y1 = sy;
  } else if (item.kind === 'segment' || item.kind === 'polyline') {
    const pts = item.kind === 'segment' ? [item.x0, item.y0, item.x1, item.y1] : item.points;
    for (let m = 0; m + 1 < pts.length; m += 2) {
      const sx = hw + (pts[m] - vp.cx) * k;
      const sy = hh - (pts[m + 1] - vp.cy) * k;
      if (sx < x0) x0 = sx;
      if (sx > x1) x1 = sx;
      if (sy < y0) y0 = sy;
      if (sy > y1) y1 = sy;
    }
  }
  if (!(Number.isFinite(x0) && Number.isFinite(x1) && Number.isFinite(y0) && Number.isFinite(y1) && Number.isFinite(pad))) {
    out[0] = out[1] = -Infinity;
    out[2] = out[3] = Infinity;
    return;
  }
  out[0] = x0 - pad;
  out[1] = y0 - pad;
  out[2] = x1 + pad;
  out[3] = y1 + pad;
}
