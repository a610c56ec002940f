// Pan and zoom by mouse, wheel and touch on one element, reported as viewport changes. One pointer drags
// the picture; two pointers pinch (zoom about their midpoint, and pan with it); the wheel zooms about
// the cursor. Pointer Events cover mouse, pen and touch alike.
import { viewportPan, viewportZoomAt, type Viewport } from '../../../shaders-free-render/viewport.ts';

export interface GestureTarget {
  viewport(): Viewport;
  viewportSet(vp: Viewport): void;
}

export function gesturesAttach(el: HTMLElement, target: GestureTarget): () => void {
  const pointers = new Map<number, { x: number; y: number }>();
  const local = (e: { clientX: number; clientY: number }): { x: number; y: number } => {
    const r = el.getBoundingClientRect();
    return { x: e.clientX - r.left, y: e.clientY - r.top };
  };
  const pair = (): [{ x: number; y: number }, { x: number; y: number }] | null => {
    const ps = [...pointers.values()];
    return ps.length >= 2 ? [ps[0], ps[1]] : null;
  };
  const down = (e: PointerEvent): void => {
    try {
      el.setPointerCapture(e.pointerId);
    } catch {
      // A pointer the browser no longer tracks cannot be captured; the drag still works inside el.
    }
    pointers.set(e.pointerId, local(e));
    e.preventDefault();
  };
  const move = (e: PointerEvent): void => {
    const prev = pointers.get(e.pointerId);
    if (!prev) return;
    const before = pair();
    const now = local(e);
    pointers.set(e.pointerId, now);
    const after = pair();
    let vp = target.viewport();
    if (before && after) {
      const m0 = { x: (before[0].x + before[1].x) / 2, y: (before[0].y + before[1].y) / 2 };
      const m1 = { x: (after[0].x + after[1].x) / 2, y: (after[0].y + after[1].y) / 2 };
      const d0 = Math.hypot(before[0].x - before[1].x, before[0].y - before[1].y);
      const d1 = Math.hypot(after[0].x - after[1].x, after[0].y - after[1].y);
      vp = viewportPan(vp, m1.x - m0.x, m1.y - m0.y);
      if (d0 > 4 && d1 > 4) vp = viewportZoomAt(vp, m1.x, m1.y, d1 / d0);
    } else {
      vp = viewportPan(vp, now.x - prev.x, now.y - prev.y);
    }
    target.viewportSet(vp);
  };
  const up = (e: PointerEvent): void => {
    pointers.delete(e.pointerId);
  };
  const wheel = (e: WheelEvent): void => {
    e.preventDefault();
    const p = local(e);
    const lines = e.deltaMode === 1 ? 16 : e.deltaMode === 2 ? 400 : 1;
    target.viewportSet(viewportZoomAt(target.viewport(), p.x, p.y, Math.exp(-e.deltaY * lines * 0.0015)));
  };
  el.addEventListener('pointerdown', down);
  el.addEventListener('pointermove', move);
  el.addEventListener('pointerup', up);
  el.addEventListener('pointercancel', up);
  el.addEventListener('wheel', wheel, { passive: false });
  el.style.touchAction = 'none';
  return () => {
    el.removeEventListener('pointerdown', down);
    el.removeEventListener('pointermove', move);
    el.removeEventListener('pointerup', up);
    el.removeEventListener('pointercancel', up);
    el.removeEventListener('wheel', wheel);
  };
}
