// The Pixi canvas sink: replays a display list (world coordinates) with pixi.js 8 forced to its CPU
// canvas renderer. Every point is taken to screen coordinates here and stroked at a fixed pixel width,
// because the canvas renderer scales stroke widths with a container's transform and has no dashes
// (PLATFORM.md): dashed paths are split here. The renderer is checked at start: anything but the canvas
// renderer is refused with a clear message (no WebGL or WebGPU path exists).
import { Application, Container, Graphics, Text } from 'pixi.js';
import { dashSplit } from './dash.ts';
import type { DisplayList, ItemStyle } from './display-list.ts';
import { ticksIn } from './ticks.ts';
import { viewportBounds, worldToScreen, type Viewport } from './viewport.ts';

export interface SinkLook {
  readonly background: string;
  readonly grid: string;
  readonly gridMajor: string;
  readonly axis: string;
  readonly label: string;
  readonly fontFamily: string;
}

/** A quiet paper-like look of our own. */
export const SINK_LOOK: SinkLook = {
  background: '#fbfaf6',
  grid: '#ece9e0',
  gridMajor: '#dcd7ca',
  axis: '#8a8577',
  label: '#6b675c',
  fontFamily: 'system-ui, sans-serif',
};

export class RendererNotCanvas extends Error {}

export { dashSplit };

export class PixiCanvasSink {
  readonly app: Application;
  readonly rendererName: string;
  private readonly gridLayer = new Graphics();
  private readonly curveLayer = new Graphics();
  private readonly labelLayer = new Container();
  private readonly labels: Text[] = [];
  private readonly look: SinkLook;

  private constructor(app: Application, look: SinkLook) {
    this.app = app;
    this.look = look;
    this.rendererName = app.renderer.name;
    app.stage.addChild(this.gridLayer, this.curveLayer, this.labelLayer);
  }

  /** Start Pixi on the canvas renderer inside `host`; refuses any other renderer. */
  static async create(host: HTMLElement, width: number, height: number, dpr: number, look: SinkLook = SINK_LOOK): Promise<PixiCanvasSink> {
    const app = new Application();
    await app.init({
      preference: 'canvas',
      width,
      height,
      resolution: dpr,
      autoDensity: true,
      antialias: true,
      background: look.background,
      autoStart: false,
    });
    if (app.renderer.name !== 'canvas') {
      const name = app.renderer.name;
      app.destroy(true);
      throw new RendererNotCanvas(`Ninefold draws on the CPU with Pixi's canvas renderer only, but Pixi started its "${name}" renderer`);
    }
    host.appendChild(app.canvas);
    return new PixiCanvasSink(app, look);
  }

  resize(width: number, height: number, dpr: number): void {
    this.app.renderer.resolution = dpr;
    this.app.renderer.resize(width, height);
  }

  /** Draw the grid with labelled axes and the display list for the viewport, then render one frame. */
  draw(list: DisplayList, vp: Viewport, options: { grid?: boolean } = {}): void {
    if (options.grid !== false) this.gridDraw(vp);
    else {
      this.gridLayer.clear();
      this.labelsHide(0);
    }
    this.listDraw(list, vp);
    this.app.render();
  }

  destroy(): void {
    this.app.destroy(true, { children: true });
  }

  private listDraw(list: DisplayList, vp: Viewport): void {
    const g = this.curveLayer;
    g.clear();
    const styleOf = (key: string): ItemStyle => list.styles[key] ?? list.styles.curve ?? FALLBACK_STYLE;
    for (const item of list.items) {
      const st = styleOf(item.style);
      if (item.kind === 'polyline') {
        const pts = screenPath(vp, item.points);
        for (const piece of dashSplit(pts, st.dash)) {
          g.moveTo(piece[0], piece[1]);
          for (let i = 2; i < piece.length; i += 2) g.lineTo(piece[i], piece[i + 1]);
          if (item.closed && st.dash.length === 0) g.closePath();
        }
        g.stroke({ width: st.width, color: st.stroke, cap: 'round', join: 'round' });
      } else if (item.kind === 'segment') {
        const pts = screenPath(vp, [item.x0, item.y0, item.x1, item.y1]);
        for (const piece of dashSplit(pts, st.dash)) {
          g.moveTo(piece[0], piece[1]);
          for (let i = 2; i < piece.length; i += 2) g.lineTo(piece[i], piece[i + 1]);
        }
        g.stroke({ width: st.width, color: st.stroke, cap: 'round' });
      } else if (item.kind === 'dot') {
        const [sx, sy] = worldToScreen(vp, item.x, item.y);
        g.circle(sx, sy, st.radius).fill({ color: st.fill });
      }
    }
    let n = this.labelsUsedByGrid;
    for (const item of list.items) {
      if (item.kind !== 'label') continue;
      const st = styleOf(item.style);
      const [sx, sy] = worldToScreen(vp, item.x, item.y);
      this.labelPut(n++, item.text, sx + 4, sy - st.fontSize - 2, st.stroke, st.fontSize);
    }
    this.labelsHide(n);
  }

  private labelsUsedByGrid = 0;

  private gridDraw(vp: Viewport): void {
    const g = this.gridLayer;
    g.clear();
    const b = viewportBounds(vp);
    const xs = ticksIn(b.xmin, b.xmax, vp.scale);
    const ys = ticksIn(b.ymin, b.ymax, vp.scale);
    for (const major of [false, true]) {
      for (const t of xs) {
        if (t.major !== major) continue;
        const [sx] = worldToScreen(vp, t.value, 0);
        const x = Math.round(sx) + 0.5;
        g.moveTo(x, 0).lineTo(x, vp.height);
      }
      for (const t of ys) {
        if (t.major !== major) continue;
        const [, sy] = worldToScreen(vp, 0, t.value);
        const y = Math.round(sy) + 0.5;
        g.moveTo(0, y).lineTo(vp.width, y);
      }
      g.stroke({ width: 1, color: major ? this.look.gridMajor : this.look.grid });
    }
    const [ax, ay] = worldToScreen(vp, 0, 0);
    // Axes where they are visible; otherwise labels sit along the nearest edge.
    const axisX = Math.min(vp.width - 1, Math.max(0, ax));
    const axisY = Math.min(vp.height - 1, Math.max(0, ay));
    if (ax >= 0 && ax <= vp.width) g.moveTo(Math.round(ax) + 0.5, 0).lineTo(Math.round(ax) + 0.5, vp.height);
    if (ay >= 0 && ay <= vp.height) g.moveTo(0, Math.round(ay) + 0.5).lineTo(vp.width, Math.round(ay) + 0.5);
    g.stroke({ width: 1, color: this.look.axis });
    let n = 0;
    const size = 11;
    for (const t of xs) {
      if (t.value === 0) continue;
      const [sx] = worldToScreen(vp, t.value, 0);
      const y = axisY > vp.height - size - 6 ? axisY - size - 4 : axisY + 3;
      this.labelPut(n++, t.label, sx + 3, y, this.look.label, size);
    }
    for (const t of ys) {
      if (t.value === 0) continue;
      const [, sy] = worldToScreen(vp, 0, t.value);
      const x = axisX > vp.width - 60 ? axisX - 8 * t.label.length - 4 : axisX + 4;
      this.labelPut(n++, t.label, x, sy - size - 2, this.look.label, size);
    }
    if (ax >= 0 && ax <= vp.width && ay >= 0 && ay <= vp.height) this.labelPut(n++, '0', ax + 4, ay + 3, this.look.label, size);
    this.labelsUsedByGrid = n;
  }

  private labelPut(i: number, text: string, x: number, y: number, color: string, size: number): void {
    let t = this.labels[i];
    if (!t) {
      t = new Text({ text, style: { fontFamily: this.look.fontFamily, fontSize: size, fill: color } });
      this.labels.push(t);
      this.labelLayer.addChild(t);
    }
    if (t.text !== text) t.text = text;
    if (t.style.fontSize !== size) t.style.fontSize = size;
    if (t.style.fill !== color) t.style.fill = color;
    t.visible = true;
    t.x = Math.round(x);
    t.y = Math.round(y);
  }

  private labelsHide(from: number): void {
    for (let i = from; i < this.labels.length; i++) this.labels[i].visible = false;
  }
}

const FALLBACK_STYLE: ItemStyle = { stroke: '#222222', width: 1.5, fill: '#222222', radius: 2.5, dash: [], fontSize: 12 };

function screenPath(vp: Viewport, pts: readonly number[]): number[] {
  // Differences from the centre first: far from the origin a large offset would swallow the digits.
  const out = new Array<number>(pts.length);
  const k = 1 / vp.scale;
  const hw = vp.width / 2;
  const hh = vp.height / 2;
  for (let i = 0; i < pts.length; i += 2) {
    out[i] = hw + (pts[i] - vp.cx) * k;
    out[i + 1] = hh - (pts[i + 1] - vp.cy) * k;
  }
  return out;
}
