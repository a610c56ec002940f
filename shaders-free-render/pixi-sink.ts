// The Pixi canvas sink: replays a display list (world coordinates) with pixi.js 8 forced to its CPU
// canvas renderer. Every point is taken to screen coordinates here and stroked at a fixed pixel width,
// because the canvas renderer scales stroke widths with a container's transform and has no dashes
// (PLATFORM.md): dashed paths are split here. The renderer is checked at start: anything but the canvas
// renderer is refused with a clear message (no WebGL or WebGPU path exists).
//
// Speed (the drag of hundreds of dependents, tests/bench/drag.bench.ts): Pixi's canvas renderer strokes
// every sub-path with its own canvas call, so the cost is the number of sub-paths, and dashes made most of
// them. Dashed straight segments are therefore one stroke each filled with a stripe pattern laid along
// them (sink-dash-pattern.ts); the rest is drawn in the batches of sinkPlan (one Pixi stroke or fill per
// look, painting order kept); label Text objects are kept between frames and matched by text and look
// (making and measuring a Text is the dear part on canvas); the grid is rebuilt only when the view changes.
// Point marks follow the figures' rule (dotMarkParts): a disc with its rim, or a ring, dashed or not.
// Labels of the list get a paper-coloured halo so they stay readable over curves and lines.
import { Application, Container, Graphics, Text } from 'pixi.js';
import { dashSplit } from './dash.ts';
import type { DisplayList } from './display-list.ts';
import { sinkPlan, sinkStyleOf, type SinkBatch } from './sink-batch.ts';
import { labelMatch, type LabelKey } from './sink-labels.ts';
import { StripePatterns } from './sink-stripes.ts';
import { ticksIn } from './ticks.ts';
import { viewportBounds, worldToScreen, type Viewport } from './viewport.ts';

export interface SinkLook {
  readonly background: string;
  readonly grid: string;
  readonly gridMajor: string;
  readonly axis: string;
  readonly label: string;
  readonly fontFamily: string;
  /** Width in CSS pixels of the paper-coloured outline behind list labels (0 for none). */
  readonly labelHalo?: number;
}

/** A quiet paper-like look of our own. */
export const SINK_LOOK: SinkLook = {
  background: '#fbfaf6',
  grid: '#ece9e0',
  gridMajor: '#dcd7ca',
  axis: '#8a8577',
  label: '#6b675c',
  fontFamily: 'system-ui, sans-serif',
  labelHalo: 3,
};

export class RendererNotCanvas extends Error {}

export { dashSplit };

/** One wanted label of a frame, before it is matched to a kept Text. */
interface LabelWant {
  text: string;
  x: number;
  y: number;
  color: string;
  size: number;
  halo: number;
}

/** Kept Text objects beyond this many, unused in a frame, are destroyed rather than hidden. */
const TEXT_KEEP = 400;

export class PixiCanvasSink {
  readonly app: Application;
  readonly rendererName: string;
  private readonly gridLayer = new Graphics();
  private readonly curveLayer = new Graphics();
  private readonly stripes = new StripePatterns();
  private readonly labelLayer = new Container();
  private readonly look: SinkLook;
  /** Kept Texts by look ("size|colour|halo"), each with the text it shows. */
  private readonly texts = new Map<string, Text[]>();
  private textCount = 0;
  private readonly wants: LabelWant[] = [];
  private wantCount = 0;
  private gridKey = '';
  private gridWants: LabelWant[] = [];

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
    this.gridKey = '';
  }

  /** Draw the grid with labelled axes and the display list for the viewport, then render one frame. */
  draw(list: DisplayList, vp: Viewport, options: { grid?: boolean } = {}): void {
    this.wantCount = 0;
    if (options.grid !== false) {
      const key = `${vp.cx} ${vp.cy} ${vp.scale} ${vp.width} ${vp.height}`;
      if (key !== this.gridKey) {
        this.gridKey = key;
        this.gridWants = [];
        this.gridDraw(vp);
      }
      for (const w of this.gridWants) this.want(w.text, w.x, w.y, w.color, w.size, 0);
    } else if (this.gridKey !== 'none') {
      this.gridKey = 'none';
      this.gridLayer.clear();
    }
    this.listDraw(list, vp);
    this.labelsPlace();
    this.app.render();
  }

  destroy(): void {
    this.app.destroy(true, { children: true });
    this.stripes.destroy();
  }

  private listDraw(list: DisplayList, vp: Viewport): void {
    const g = this.curveLayer;
    g.clear();
    this.stripes.frameStart();
    for (const batch of sinkPlan(list, vp)) batchDraw(g, list, batch, vp, this.stripes);
    const halo = this.look.labelHalo ?? 0;
    for (const item of list.items) {
      if (item.kind !== 'label') continue;
      const st = sinkStyleOf(list, item);
      const [sx, sy] = worldToScreen(vp, item.x, item.y);
      this.want(item.text, sx + 4, sy - st.fontSize - 2, st.stroke, st.fontSize, halo);
    }
  }

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
    const size = 11;
    const put = (text: string, x: number, y: number): void => {
      this.gridWants.push({ text, x, y, color: this.look.label, size, halo: 0 });
    };
    for (const t of xs) {
      if (t.value === 0) continue;
      const [sx] = worldToScreen(vp, t.value, 0);
      const y = axisY > vp.height - size - 6 ? axisY - size - 4 : axisY + 3;
      put(t.label, sx + 3, y);
    }
    for (const t of ys) {
      if (t.value === 0) continue;
      const [, sy] = worldToScreen(vp, 0, t.value);
      const x = axisX > vp.width - 60 ? axisX - 8 * t.label.length - 4 : axisX + 4;
      put(t.label, x, sy - size - 2);
    }
    if (ax >= 0 && ax <= vp.width && ay >= 0 && ay <= vp.height) put('0', ax + 4, ay + 3);
  }

  /** Ask for a label this frame (placed by labelsPlace; the array of wants is reused between frames). */
  private want(text: string, x: number, y: number, color: string, size: number, halo: number): void {
    let w = this.wants[this.wantCount];
    if (!w) {
      w = { text, x, y, color, size, halo };
      this.wants.push(w);
    } else {
      w.text = text;
      w.x = x;
      w.y = y;
      w.color = color;
      w.size = size;
      w.halo = halo;
    }
    this.wantCount++;
  }

  /** Show the frame's labels on kept Texts as labelMatch pairs them; the kept ones left over are hidden. */
  private labelsPlace(): void {
    const kept: Text[] = [];
    const keys: LabelKey[] = [];
    for (const [look, list] of this.texts) for (const t of list) {
      kept.push(t);
      keys.push({ look, text: t.text });
    }
    const wants = this.wants.slice(0, this.wantCount);
    const { use, retext } = labelMatch(keys, wants.map((w) => ({ look: lookKey(w), text: w.text })));
    const used = new Set<Text>();
    wants.forEach((w, i) => {
      let t: Text;
      if (use[i] < 0) t = this.textMake(lookKey(w), w);
      else {
        t = kept[use[i]];
        if (retext[i]) t.text = w.text;
      }
      used.add(t);
      textMove(t, w);
    });
    for (const [key, list] of this.texts) {
      const keep: Text[] = [];
      for (const t of list) {
        if (used.has(t)) keep.push(t);
        else if (this.textCount > TEXT_KEEP) {
          t.destroy();
          this.textCount--;
        } else {
          t.visible = false;
          keep.push(t);
        }
      }
      if (keep.length) this.texts.set(key, keep);
      else this.texts.delete(key);
    }
  }

  private textMake(key: string, w: LabelWant): Text {
    const style = w.halo > 0
      ? { fontFamily: this.look.fontFamily, fontSize: w.size, fill: w.color, stroke: { color: this.look.background, width: w.halo, join: 'round' as const } }
      : { fontFamily: this.look.fontFamily, fontSize: w.size, fill: w.color };
    const t = new Text({ text: w.text, style });
    this.labelLayer.addChild(t);
    const list = this.texts.get(key);
    if (list) list.push(t);
    else this.texts.set(key, [t]);
    this.textCount++;
    return t;
  }
}

function lookKey(w: LabelWant): string {
  return `${w.size}|${w.color}|${w.halo}`;
}

/** Put a kept Text at a label's place: the halo's stroke shifts the glyphs by half its width, undone here. */
function textMove(t: Text, w: LabelWant): void {
  t.visible = true;
  t.x = Math.round(w.x - w.halo / 2);
  t.y = Math.round(w.y - w.halo / 2);
}

/**
 * One batch into the Graphics: its sub-paths, then one stroke or fill. Pixi's canvas renderer still
 * strokes each sub-path on its own (which also keeps the browser's rasteriser on small paths: one
 * path of hundreds of crossing lines rasterises several times slower); the batch saves Pixi's per-call
 * work (a path copy and a style per stroke call).
 */
function batchDraw(g: Graphics, list: DisplayList, batch: SinkBatch, vp: Viewport, stripes: StripePatterns): void {
  const k = 1 / vp.scale;
  const hw = vp.width / 2;
  const hh = vp.height / 2;
  // Differences from the centre first: far from the origin a large offset would swallow the digits.
  const sx = (x: number): number => hw + (x - vp.cx) * k;
  const sy = (y: number): number => hh - (y - vp.cy) * k;
  let drawn = false;
  for (const m of batch.members) {
    const item = list.items[m.item];
    const st = sinkStyleOf(list, item);
    if (item.kind === 'dot') {
      if (!(st.radius > 0)) continue;
      if (m.part === 'ring' && st.dash.length > 0) piecesDraw(g, dashSplit(circlePath(sx(item.x), sy(item.y), st.radius), st.dash));
      else g.circle(sx(item.x), sy(item.y), st.radius);
    } else if (item.kind === 'segment') {
      const [x0, y0, x1, y1] = [sx(item.x0), sy(item.y0), sx(item.x1), sy(item.y1)];
      const striped = st.dash.length > 0 ? stripes.along(batch.color, st.dash, batch.width, x0, y0, x1, y1) : null;
      if (striped) {
        // Its own stroke call (its pattern is laid along it); what the batch holds so far goes first.
        if (drawn) g.stroke({ width: batch.width, color: batch.color, cap: 'round', join: 'round' });
        drawn = false;
        g.moveTo(x0, y0).lineTo(x1, y1).stroke({ width: batch.width, fill: striped, cap: 'round', join: 'round' });
        continue;
      }
      if (st.dash.length === 0) g.moveTo(x0, y0).lineTo(x1, y1);
      else piecesDraw(g, dashSplit([x0, y0, x1, y1], st.dash));
    } else if (item.kind === 'polyline') {
      const p = item.points;
      if (p.length < 4) continue;
      if (st.dash.length === 0) {
        g.moveTo(sx(p[0]), sy(p[1]));
        for (let i = 2; i + 1 < p.length; i += 2) g.lineTo(sx(p[i]), sy(p[i + 1]));
        if (item.closed) g.closePath();
      } else piecesDraw(g, dashSplit(screenPath(vp, p), st.dash));
    }
    drawn = true;
  }
  // A fill or stroke right after another with nothing drawn between reuses the last path in Pixi.
  if (!drawn) return;
  if (batch.mode === 'fill') g.fill({ color: batch.color });
  else g.stroke({ width: batch.width, color: batch.color, cap: 'round', join: 'round' });
}

/** Assumes pieces of at least two vertices (dashSplit's output). */
function piecesDraw(g: Graphics, pieces: readonly number[][]): void {
  for (const piece of pieces) {
    g.moveTo(piece[0], piece[1]);
    for (let i = 2; i + 1 < piece.length; i += 2) g.lineTo(piece[i], piece[i + 1]);
  }
}

/** A screen circle as a closed polyline whose chords stay within a tenth of a pixel of the circle. */
function circlePath(cx: number, cy: number, r: number): number[] {
  const n = Math.max(12, Math.min(256, Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - 0.1 / r)))));
  const pts = new Array<number>(2 * n + 2);
  for (let i = 0; i <= n; i++) {
    const t = i === n ? 0 : (2 * Math.PI * i) / n;
    pts[2 * i] = cx + r * Math.cos(t);
    pts[2 * i + 1] = cy + r * Math.sin(t);
  }
  return pts;
}

function screenPath(vp: Viewport, pts: readonly number[]): number[] {
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
