// Pointer and keyboard behaviour of the canvas: tool picks, placing points, dragging with live preview and
// exact snap on drop, panning and zooming. No drawing here (the canvas component redraws on store
// changes) and no DOM beyond the events it is handed.
import { InvalidInput, NinefoldError } from '../exact/errors.ts';
import { rat, ratToString } from '../exact/rational.ts';
import { constructionAdd, constructionDependents, constructionObject, constructionUpdate } from '../construct/graph.ts';
import { constructionMeetsSettle } from '../construct/meet-identity.ts';
import { curvePlace } from '../construct/on-curve.ts';
import { ratSnap } from '../construct/snap.ts';
import { formGradientFloat } from '../construct/float.ts';
import type { CurveValue, ObjectId, PointApprox } from '../construct/types.ts';
import { $doc, $values, docCommit, docPreview, docRefresh } from './stores/construction.ts';
import { $hover, $multipleN, $notice, $picks, $selection, $tool, $view, noticeShow, screenToWorld, toolChoose } from './stores/interaction.ts';
import { $region } from './stores/search.ts';
import { curveDistancePx, curveFloat, hitTest } from './hit.ts';
import { pickRefusal, toolBuild, toolHint, toolSpec } from './tools.ts';

/** Pixels within which a click counts as on the active curve for the on-curve tool. */
const ON_CURVE_PX = 12;

type Gesture =
  | { kind: 'none' }
  | { kind: 'pan'; sx: number; sy: number; cx: number; cy: number; moved: boolean }
  | { kind: 'drag'; id: ObjectId; moved: boolean; last: PointApprox }
  | { kind: 'region'; x0: number; y0: number };

let gesture: Gesture = { kind: 'none' };

function labelOf(id: ObjectId): string {
  return constructionObject($doc.get(), id)?.label ?? id;
}

/** Exact "X:Y:Z" of the simplest rational point inside the pixel around (x, y). */
export function snapFree(x: number, y: number, scale: number): string {
  const r = 0.5 / scale;
  const qx = ratSnap(x, r);
  const qy = ratSnap(y, r);
  const d = (qx.den * qy.den) / gcdBig(qx.den, qy.den);
  return `${(qx.num * d) / qx.den}:${(qy.num * d) / qy.den}:${d}`;
}

function gcdBig(a: bigint, b: bigint): bigint {
  while (b) [a, b] = [b, a % b];
  return a < 0n ? -a : a;
}

function fail(e: unknown, where = 'canvas'): void {
  if (e instanceof NinefoldError) noticeShow('error', e.message, where);
  else throw e;
}

export function canvasPointerDown(sx: number, sy: number, shift: boolean): void {
  const view = $view.get();
  const [x, y] = screenToWorld(view, sx, sy);
  const tool = toolSpec($tool.get());
  const doc = $doc.get();
  const values = $values.get();
  try {
    if (tool.id === 'move') {
      const hit = hitTest(doc, values, view, sx, sy);
      const obj = hit ? constructionObject(doc, hit.id) : undefined;
      if (obj) {
        const sel = $selection.get();
        $selection.set(shift ? (sel.includes(obj.id) ? sel.filter((s) => s !== obj.id) : [...sel, obj.id]) : [obj.id]);
        const kind = obj.construction.kind;
        if (kind === 'point-free' || kind === 'point-on-curve') {
          const v = values.get(obj.id);
          gesture = { kind: 'drag', id: obj.id, moved: false, last: v?.type === 'point' ? v.approx : { x, y, finite: true } };
          return;
        }
      } else if (!shift) $selection.set([]);
      gesture = { kind: 'pan', sx, sy, cx: view.cx, cy: view.cy, moved: false };
      return;
    }
    if (tool.id === 'region') {
      gesture = { kind: 'region', x0: x, y0: y };
      $region.set({ x0: x, y0: y, x1: x, y1: y });
      return;
    }
    if (tool.id === 'point') {
      const at = snapFree(x, y, view.scale);
      const r = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at } } });
      docCommit(r.doc);
      $selection.set([r.id]);
      noticeShow('done', `${labelOf(r.id)} placed at ${atText(at)}.`, 'tool');
      return;
    }
    if (tool.id === 'on-curve') {
      placeOnCurve(x, y);
      return;
    }
    // A picking tool.
    const picks = $picks.get();
    const hit = hitTest(doc, values, view, sx, sy);
    if (!hit) {
      noticeShow('error', `${toolHint(tool, picks.length)} Nothing is under the pointer there.`, 'tool');
      return;
    }
    const obj = constructionObject(doc, hit.id)!;
    const refusal = pickRefusal(tool, picks.length, obj.type, obj.label);
    if (refusal) {
      noticeShow('error', refusal, 'tool');
      return;
    }
    const next = [...picks, obj.id];
    if (next.length < tool.picks.length) {
      $picks.set(next);
      noticeShow('info', toolHint(tool, next.length), 'tool');
      return;
    }
    $picks.set([]);
    const built = toolBuild(tool, next, { doc, values, n: $multipleN.get() });
    docCommit(built.doc);
    $selection.set([built.made[0]]);
    const v = $values.get().get(built.made[0]);
    if (v?.type === 'failure') noticeShow('error', `${labelOf(built.made[0])}: ${v.message}`, 'tool');
    else noticeShow('done', `${tool.name}: made ${built.made.filter((id) => !constructionObject(built.doc, id)?.helperOf).map(labelOf).join(', ')}.`, 'tool');
  } catch (e) {
    $picks.set([]);
    fail(e, 'tool');
  }
}

function atText(at: string): string {
  const [a, b, c] = at.split(':').map(BigInt);
  const q = (n: bigint): string => ratToString(rat(n, c));
  return c === 0n ? at : `(${q(a)}, ${q(b)})`;
}

function activeCurveValue(): { id: ObjectId; value: CurveValue } {
  const doc = $doc.get();
  const id = doc.activeCurve;
  if (!id) throw new InvalidInput('On curve needs a curve: type an equation in the Curve panel first', 'tool');
  const v = $values.get().get(id);
  if (!v || v.type !== 'curve' || !v.form) throw new InvalidInput(`${labelOf(id)} cannot be used now (it is not exact)`, 'tool');
  return { id, value: v };
}

function placeOnCurve(x: number, y: number): void {
  const view = $view.get();
  const { id, value } = activeCurveValue();
  const d = curveDistancePx(value.approx, view, x, y);
  if (!(d <= ON_CURVE_PX)) {
    noticeShow('error', `On curve: click within ${ON_CURVE_PX} pixels of ${labelOf(id)} (that click was ${Number.isFinite(d) ? Math.round(d) : 'far'} pixels away).`, 'tool');
    return;
  }
  const params = placement(value, x, y, view.scale);
  const r = constructionAdd($doc.get(), { construction: { kind: 'point-on-curve', parents: [id], params } });
  docCommit(r.doc);
  $selection.set([r.id]);
  const v = $values.get().get(r.id);
  const status = v?.type === 'point' ? v.status : 'failed';
  noticeShow(v?.type === 'failure' ? 'error' : 'done', v?.type === 'failure' ? v.message : `${labelOf(r.id)} placed on ${labelOf(id)} (${status}).`, 'tool');
}

function placement(value: CurveValue, x: number, y: number, scale: number): Record<string, string> {
  const f = curveFloat(value.approx);
  const g = formGradientFloat(f, [x, y, 1]);
  const slope = g[1] !== 0 ? -g[0] / g[1] : Infinity;
  return curvePlace(value.form!, x, y, 6 / scale, slope).params;
}

/** Is a drag or a pan in progress? (The canvas then redraws at once on each move, not at the next frame.) */
export function canvasGestureActive(): boolean {
  return gesture.kind === 'drag' || gesture.kind === 'pan';
}

export function canvasPointerMove(sx: number, sy: number): void {
  const view = $view.get();
  const [x, y] = screenToWorld(view, sx, sy);
  if (gesture.kind === 'pan') {
    const dx = (sx - gesture.sx) / view.scale;
    const dy = (sy - gesture.sy) / view.scale;
    if (Math.abs(sx - gesture.sx) + Math.abs(sy - gesture.sy) > 2) gesture.moved = true;
    $view.set({ ...view, cx: gesture.cx - dx, cy: gesture.cy + dy });
    return;
  }
  if (gesture.kind === 'drag') {
    gesture.moved = true;
    gesture.last = { x, y, finite: true };
    docPreview(new Map([[gesture.id, gesture.last]]));
    return;
  }
  if (gesture.kind === 'region') {
    $region.set({ x0: gesture.x0, y0: gesture.y0, x1: x, y1: y });
    return;
  }
  const tool = toolSpec($tool.get());
  const hit = hitTest($doc.get(), $values.get(), view, sx, sy, tool.id === 'move' ? undefined : (t) => t !== 'check');
  const id = hit?.id ?? null;
  if ($hover.get() !== id) $hover.set(id);
}

export function canvasPointerUp(): void {
  const g = gesture;
  gesture = { kind: 'none' };
  if (g.kind === 'drag') {
    if (!g.moved) return;
    dropPoint(g.id, g.last);
  } else if (g.kind === 'region') {
    const r = $region.get();
    if (r && Math.abs(r.x1 - r.x0) * $view.get().scale < 4) {
      $region.set(null);
      noticeShow('info', 'Region cleared: the search covers the whole plane.', 'search');
    } else noticeShow('done', 'Region set: the point search keeps to it.', 'search');
  }
}

/** End of a drag: the point snaps to exact values and everything is recomputed exactly. */
export function dropPoint(id: ObjectId, at: PointApprox): void {
  const doc = $doc.get();
  const obj = constructionObject(doc, id);
  if (!obj) return;
  const view = $view.get();
  try {
    let params: Record<string, string>;
    if (obj.construction.kind === 'point-free') params = { at: snapFree(at.x, at.y, view.scale) };
    else {
      const v = $values.get().get(id);
      const curve = $values.get().get(obj.construction.parents[0]);
      if (!curve || curve.type !== 'curve' || !curve.form) throw new InvalidInput('the curve under this point is not exact now', 'drag');
      const p = v?.type === 'point' ? v.approx : at;
      params = placement(curve, p.x, p.y, view.scale);
    }
    // Meet points built from the dragged point remember where the drag left them, so the exact
    // recomputation (here or in the worker, and after a reload) names the same point.
    const moved = constructionUpdate(doc, id, { params });
    docCommit(constructionMeetsSettle(moved, $values.get(), new Set(constructionDependents(doc, id))));
  } catch (e) {
    docRefresh();
    fail(e, 'canvas');
  }
}

export function canvasWheel(sx: number, sy: number, deltaY: number): void {
  const view = $view.get();
  const [x, y] = screenToWorld(view, sx, sy);
  const factor = Math.exp(-deltaY * 0.0015);
  const scale = Math.min(1e7, Math.max(1e-3, view.scale * factor));
  // Keep the world point under the pointer fixed.
  const cx = x - (sx - view.width / 2) / scale;
  const cy = y + (sy - view.height / 2) / scale;
  $view.set({ ...view, scale, cx, cy });
}

export function canvasCancel(): void {
  gesture = { kind: 'none' };
  $picks.set([]);
  toolChoose('move');
  $notice.set(null);
}
