// The drawing surface: a Pixi application on its canvas renderer (never WebGL), redrawn from the display
// list whenever the construction, its values, the view or the highlights change, at most once per frame.
import { LitElement, css, html } from 'lit';
import { customElement } from 'lit/decorators.js';
import type { ReadableAtom } from 'nanostores';
import { $doc, $values } from '../stores/construction.ts';
import { $blowup, $hover, $notice, $picks, $selection, $view } from '../stores/interaction.ts';
import { $region, $search } from '../stores/search.ts';
import { sceneDisplay } from '../display.ts';
import { canvasCancel, canvasGestureActive, canvasPointerDown, canvasPointerMove, canvasPointerUp, canvasWheel } from '../canvas-controller.ts';
import { PixiCanvasSink, RendererNotCanvas } from '../../../shaders-free-render/pixi-sink.ts';
import type { Viewport } from '../../../shaders-free-render/viewport.ts';
import { pointParse } from '../../plane/parse-point.ts';
import { f3FromBig, f3ToApprox } from '../../construct/float.ts';
import type { PointApprox } from '../../construct/types.ts';
import { theme } from './theme.ts';

/** Times of the last frames drawn (performance.now() at the end of each draw), for the drag benchmark. */
export const frameLog: number[] = [];
/** For each frame: ms spent building the display list, replaying and rendering it in the sink, and 0
 * (the sink renders as it replays). */
export const frameParts: [number, number, number][] = [];

@customElement('nf-canvas')
export class NfCanvas extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; position: relative; overflow: hidden; background: var(--paper); }
      .surface { position: absolute; inset: 0; touch-action: none; }
      .surface:focus-visible { outline: 3px solid var(--focus); outline-offset: -3px; }
      canvas { display: block; }
      .coords { position: absolute; right: 8px; bottom: 6px; font-size: 11px; color: var(--ink-soft); background: rgba(251,248,241,0.85); padding: 1px 5px; border-radius: 3px; pointer-events: none; }
    `,
  ];

  private sink: PixiCanvasSink | null = null;
  private pending = 0;
  private unsubscribe: (() => void)[] = [];
  private resizeObserver: ResizeObserver | null = null;
  private foundCache: { key: readonly string[]; points: PointApprox[] } = { key: [], points: [] };

  protected override render(): unknown {
    return html`<div
        class="surface"
        tabindex="0"
        role="application"
        aria-label="Construction canvas: click with a tool, drag points, wheel to zoom"
        @pointerdown=${this.down}
        @pointermove=${this.move}
        @pointerup=${this.up}
        @pointercancel=${this.up}
        @wheel=${this.wheel}
        @keydown=${(e: KeyboardEvent) => e.key === 'Escape' && canvasCancel()}
      ></div>
      <div class="coords" aria-hidden="true"></div>`;
  }

  protected override async firstUpdated(): Promise<void> {
    const surface = this.renderRoot.querySelector('.surface') as HTMLElement;
    try {
      this.sink = await PixiCanvasSink.create(surface, Math.max(1, surface.clientWidth), Math.max(1, surface.clientHeight), window.devicePixelRatio || 1);
    } catch (e) {
      if (e instanceof RendererNotCanvas) {
        $notice.set({ kind: 'error', text: e.message, where: 'canvas' });
        return;
      }
      throw e;
    }
    this.resizeObserver = new ResizeObserver(() => this.resize(surface));
    this.resizeObserver.observe(surface);
    this.resize(surface);
    const stores: ReadableAtom<unknown>[] = [$doc, $values, $view, $selection, $hover, $picks, $search, $region, $blowup];
    for (const s of stores) this.unsubscribe.push(s.listen(() => this.schedule()));
    this.schedule();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    for (const u of this.unsubscribe) u();
    this.resizeObserver?.disconnect();
    this.sink?.destroy();
  }

  private resize(surface: HTMLElement): void {
    const w = surface.clientWidth;
    const h = surface.clientHeight;
    if (!w || !h || !this.sink) return;
    this.sink.resize(w, h, window.devicePixelRatio || 1);
    const v = $view.get();
    if (v.width !== w || v.height !== h) $view.set({ ...v, width: w, height: h });
    this.schedule();
  }

  private schedule(): void {
    if (this.pending) return;
    this.pending = requestAnimationFrame(() => {
      this.pending = 0;
      this.draw();
    });
  }

  /** Draw now (also called by tests and the benchmark through the page hook). */
  draw(): void {
    if (!this.sink) return;
    const search = $search.get();
    if (this.foundCache.key !== search.points) {
      this.foundCache = { key: search.points, points: search.points.map((p) => f3ToApprox(f3FromBig(pointParse(p)))) };
    }
    const t0 = performance.now();
    const list = sceneDisplay($doc.get(), $values.get(), $view.get(), {
      selection: new Set($selection.get()),
      hover: $hover.get(),
      picks: $picks.get(),
      found: this.foundCache.points,
      region: $region.get(),
      blowup: $blowup.get(),
    });
    const t1 = performance.now();
    const v = $view.get();
    const vp: Viewport = { cx: v.cx, cy: v.cy, scale: 1 / v.scale, width: v.width, height: v.height, dpr: window.devicePixelRatio || 1 };
    this.sink.draw(list, vp); // replays the list and renders the frame
    const t2 = performance.now();
    const t3 = t2;
    frameLog.push(t3);
    frameParts.push([t1 - t0, t2 - t1, t3 - t2]);
    if (frameParts.length > 2000) frameParts.splice(0, 1000);
    if (frameLog.length > 2000) frameLog.splice(0, 1000);
  }

  private local(e: PointerEvent | WheelEvent): [number, number] {
    const r = (e.currentTarget as HTMLElement).getBoundingClientRect();
    return [e.clientX - r.left, e.clientY - r.top];
  }

  private readonly down = (e: PointerEvent): void => {
    (e.currentTarget as HTMLElement).setPointerCapture(e.pointerId);
    (e.currentTarget as HTMLElement).focus();
    const [x, y] = this.local(e);
    canvasPointerDown(x, y, e.shiftKey);
  };

  private readonly move = (e: PointerEvent): void => {
    const [x, y] = this.local(e);
    canvasPointerMove(x, y);
    if (canvasGestureActive()) {
      // While dragging, the frame follows the pointer at once (no wait for the next animation frame).
      if (this.pending) cancelAnimationFrame(this.pending);
      this.pending = 0;
      this.draw();
    }
    const v = $view.get();
    const wx = v.cx + (x - v.width / 2) / v.scale;
    const wy = v.cy - (y - v.height / 2) / v.scale;
    const c = this.renderRoot.querySelector('.coords');
    if (c) c.textContent = `x ≈ ${wx.toPrecision(4)}, y ≈ ${wy.toPrecision(4)}`;
  };

  private readonly up = (): void => canvasPointerUp();

  private readonly wheel = (e: WheelEvent): void => {
    e.preventDefault();
    const [x, y] = this.local(e);
    canvasWheel(x, y, e.deltaY);
  };
}
