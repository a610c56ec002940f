// The one place the page hands a display list to Pixi. Replays items in screen coordinates at fixed pixel
// widths (Pixi's canvas renderer scales strokes with transforms, and has no dashes: we split paths).
// This adaptor stays thin so it can give way to the tracer package's own canvas sink when that lands.
import { Container, Graphics, Text } from 'pixi.js';
import type { Application } from 'pixi.js';
import type { DisplayList, ItemStyle } from '../../shaders-free-render/display-list.ts';
import { worldToScreen, type View } from './stores/interaction.ts';

export interface Sink {
  draw(list: DisplayList, view: View): void;
}

/** Split a screen polyline into dash pieces of the pattern (on, off, ...). */
function dashed(g: Graphics, pts: readonly number[], dash: readonly number[]): void {
  let k = 0;
  let left = dash[0];
  let on = true;
  for (let i = 0; i + 3 < pts.length; i += 2) {
    let x0 = pts[i];
    let y0 = pts[i + 1];
    const x1 = pts[i + 2];
    const y1 = pts[i + 3];
    let seg = Math.hypot(x1 - x0, y1 - y0);
    if (on) g.moveTo(x0, y0);
    while (seg > left) {
      const t = left / seg;
      const xm = x0 + (x1 - x0) * t;
      const ym = y0 + (y1 - y0) * t;
      if (on) g.lineTo(xm, ym);
      else g.moveTo(xm, ym);
      on = !on;
      seg -= left;
      x0 = xm;
      y0 = ym;
      k = (k + 1) % dash.length;
      left = dash[k];
    }
    if (on) g.lineTo(x1, y1);
    left -= seg;
  }
}

function strokeOf(s: ItemStyle): { width: number; color: string; cap: 'round'; join: 'round' } {
  return { width: s.width, color: s.stroke, cap: 'round', join: 'round' };
}

export function sinkCreate(app: Application): Sink {
  const root = new Container();
  app.stage.addChild(root);
  const g = new Graphics();
  root.addChild(g);
  const labels = new Container();
  root.addChild(labels);
  const textPool: Text[] = [];
  return {
    draw(list: DisplayList, view: View): void {
      g.clear();
      let used = 0;
      // Consecutive strokes of one style go into one path and one stroke call (the canvas renderer replays
      // every call each frame, so a drag with hundreds of lines is dominated by their number).
      let open: ItemStyle | null = null;
      let openFill: ItemStyle | null = null;
      const flush = (): void => {
        if (open) g.stroke(strokeOf(open));
        open = null;
      };
      const flushFill = (): void => {
        if (openFill) {
          g.fill({ color: openFill.fill });
          if (openFill.width > 0) g.stroke(strokeOf(openFill));
        }
        openFill = null;
      };
      const stroking = (s: ItemStyle): void => {
        flushFill();
        if (open !== s) flush();
        open = s;
      };
      for (const item of list.items) {
        const s = list.styles[item.style];
        if (!s) continue;
        if (item.kind === 'polyline') {
          const pts: number[] = [];
          for (let i = 0; i + 1 < item.points.length; i += 2) pts.push(...worldToScreen(view, item.points[i], item.points[i + 1]));
          if (pts.length < 4) continue;
          stroking(s);
          if (s.dash.length) dashed(g, pts, s.dash);
          else {
            g.moveTo(pts[0], pts[1]);
            for (let i = 2; i + 1 < pts.length; i += 2) g.lineTo(pts[i], pts[i + 1]);
          }
        } else if (item.kind === 'segment') {
          const [x0, y0] = worldToScreen(view, item.x0, item.y0);
          const [x1, y1] = worldToScreen(view, item.x1, item.y1);
          stroking(s);
          if (s.dash.length) dashed(g, [x0, y0, x1, y1], s.dash);
          else g.moveTo(x0, y0).lineTo(x1, y1);
        } else if (item.kind === 'dot') {
          const [x, y] = worldToScreen(view, item.x, item.y);
          const r = item.role === 'isolated' ? Math.max(2.5, s.width + 1) : s.radius;
          if (s.fill !== 'none' && s.dash.length === 0) {
            // A filled disc (with a solid rim or none): batch with the next discs of the same style.
            flush();
            if (openFill !== s) flushFill();
            openFill = s;
            g.circle(x, y, r);
            continue;
          }
          flush();
          flushFill();
          if (s.fill !== 'none') g.circle(x, y, r).fill({ color: s.fill });
          if (s.width > 0) {
            if (s.dash.length) {
              const pts: number[] = [];
              for (let k = 0; k <= 24; k++) pts.push(x + r * Math.cos((k / 24) * 2 * Math.PI), y + r * Math.sin((k / 24) * 2 * Math.PI));
              dashed(g, pts, s.dash);
              g.stroke(strokeOf(s));
            } else g.circle(x, y, r).stroke(strokeOf(s));
          }
        } else if (item.kind === 'label') {
          const [x, y] = worldToScreen(view, item.x, item.y);
          let t = textPool[used];
          if (!t) {
            t = new Text({ text: '', style: { fontFamily: 'DejaVu Sans, sans-serif', fontSize: 14, fill: '#1e1c18' } });
            textPool.push(t);
            labels.addChild(t);
          }
          used++;
          // Touch the text and its style only when they change: each change re-renders the text's texture.
          if (t.text !== item.text) t.text = item.text;
          const key = `${s.stroke}/${s.fontSize}`;
          if ((t as Text & { nfStyle?: string }).nfStyle !== key) {
            t.style.fill = s.stroke;
            t.style.fontSize = s.fontSize;
            t.style.stroke = { color: '#fbf8f1', width: 4, join: 'round' };
            (t as Text & { nfStyle?: string }).nfStyle = key;
          }
          t.position.set(Math.round(x), Math.round(y - s.fontSize - 2));
          t.visible = true;
        }
      }
      flush();
      flushFill();
      for (let i = used; i < textPool.length; i++) textPool[i].visible = false;
    },
  };
}
