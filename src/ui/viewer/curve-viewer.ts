// The viewer page: an equation box, the parsed curve's report (degree, normalised equation), in-place
// messages for text that does not read (the canvas keeps the last good curve), and the curve drawn by
// the Pixi canvas sink, pannable and zoomable. Plain DOM; the construction UI builds on the same sink,
// viewport and tracer. State worth checking from outside (renderer, pieces, trace time) is mirrored on
// the root element's data attributes for the e2e tests.
import { displayListEmpty, type DisplayList } from '../../../shaders-free-render/display-list.ts';
import { PixiCanvasSink } from '../../../shaders-free-render/pixi-sink.ts';
import { curveTrace, curveTraceItems } from '../../../shaders-free-render/trace.ts';
import { viewportBounds, viewportFit, viewportResize, type Viewport } from '../../../shaders-free-render/viewport.ts';
import { curveSourceRead, type CurveReady } from './curve-source.ts';
import { gesturesAttach } from './gestures.ts';

const CSS = `
.nf-viewer { position: fixed; inset: 0; display: flex; flex-direction: column; background: #f3f1ea;
  color: #2b2a26; font: 14px/1.4 system-ui, sans-serif; }
.nf-viewer header { padding: 10px 14px 8px; border-bottom: 1px solid #dedad0; background: #f8f6f0; }
.nf-viewer form { display: flex; gap: 8px; align-items: center; }
.nf-viewer label { color: #6b675c; font-size: 13px; }
.nf-viewer input { flex: 1; min-width: 8em; font: 15px ui-monospace, monospace; padding: 5px 8px;
  border: 1px solid #cfcabd; border-radius: 3px; background: #fffefb; color: #1f1e1b; }
.nf-viewer input[aria-invalid="true"] { border-color: #a8552f; }
.nf-viewer button { font: inherit; padding: 4px 10px; border: 1px solid #cfcabd; border-radius: 3px;
  background: #fffefb; color: #3d3b35; cursor: pointer; }
.nf-viewer .nf-report { margin-top: 6px; font-size: 13px; color: #4a4740; min-height: 1.4em; }
.nf-viewer .nf-report code { font: 13px ui-monospace, monospace; }
.nf-viewer .nf-problem { margin-top: 4px; font-size: 13px; color: #9a4a26; min-height: 1.4em; white-space: pre; font-family: ui-monospace, monospace; }
.nf-viewer .nf-stage { position: relative; flex: 1; min-height: 0; overflow: hidden; cursor: grab; }
.nf-viewer .nf-stage canvas { display: block; }
.nf-viewer .nf-status { position: absolute; right: 10px; bottom: 8px; font-size: 12px; color: #7a766b;
  background: rgba(251, 250, 246, 0.85); padding: 2px 6px; border-radius: 3px; pointer-events: none; }
`;

export const DEFAULT_EQUATION = '2y^2 - x y = x^3 - 4x + 1';

export class CurveViewer {
  private sink: PixiCanvasSink | null = null;
  private vp: Viewport;
  private curve: CurveReady | null = null;
  private frame = 0;
  private readonly root: HTMLElement;
  private readonly input: HTMLInputElement;
  private readonly report: HTMLElement;
  private readonly problem: HTMLElement;
  private readonly stage: HTMLElement;
  private readonly status: HTMLElement;

  constructor(host: HTMLElement) {
    const style = document.createElement('style');
    style.textContent = CSS;
    document.head.appendChild(style);
    this.root = el('div', 'nf-viewer');
    const header = el('header');
    const form = el('form') as HTMLFormElement;
    const label = el('label');
    label.textContent = 'Curve';
    label.setAttribute('for', 'nf-equation');
    this.input = el('input') as HTMLInputElement;
    this.input.id = 'nf-equation';
    this.input.spellcheck = false;
    this.input.autocomplete = 'off';
    this.input.placeholder = 'an equation in x and y, e.g. y^2 = x^3 - 2x + 3';
    const draw = el('button') as HTMLButtonElement;
    draw.type = 'submit';
    draw.textContent = 'Draw';
    const home = el('button') as HTMLButtonElement;
    home.type = 'button';
    home.textContent = 'Recentre';
    form.append(label, this.input, draw, home);
    this.report = el('div', 'nf-report');
    this.problem = el('div', 'nf-problem');
    this.problem.setAttribute('role', 'status');
    header.append(form, this.report, this.problem);
    this.stage = el('div', 'nf-stage');
    this.status = el('div', 'nf-status');
    this.stage.appendChild(this.status);
    this.root.append(header, this.stage);
    host.appendChild(this.root);
    this.vp = this.homeViewport();
    form.addEventListener('submit', (e) => {
      e.preventDefault();
      this.curveSet(this.input.value);
    });
    home.addEventListener('click', () => this.viewportSet(this.homeViewport()));
    gesturesAttach(this.stage, { viewport: () => this.vp, viewportSet: (vp) => this.viewportSet(vp) });
    new ResizeObserver(() => this.resized()).observe(this.stage);
  }

  /** Start the canvas sink (refusing any renderer but Pixi's canvas one) and draw the first curve. */
  async start(text: string): Promise<void> {
    this.input.value = text;
    const size = this.stageSize();
    try {
      this.sink = await PixiCanvasSink.create(this.stage, size.width, size.height, window.devicePixelRatio || 1);
    } catch (e) {
      this.problem.textContent = e instanceof Error ? e.message : String(e);
      this.root.dataset.renderer = 'refused';
      return;
    }
    this.stage.insertBefore(this.sink.app.canvas, this.status);
    this.root.dataset.renderer = this.sink.rendererName;
    this.curveSet(text);
  }

  /** Read new text: a good curve replaces the drawn one; a bad one leaves it and says why, in place. */
  curveSet(text: string): void {
    const src = curveSourceRead(text);
    if (!src.ok) {
      this.input.setAttribute('aria-invalid', 'true');
      const col = src.column;
      this.problem.textContent = col !== null
        ? `${src.message}\n${' '.repeat(Math.max(0, col - 1))}^ column ${col}`
        : src.message;
      this.root.dataset.problem = src.message;
      return;
    }
    this.input.removeAttribute('aria-invalid');
    this.problem.textContent = src.note ?? '';
    delete this.root.dataset.problem;
    this.curve = src;
    this.report.innerHTML = '';
    const deg = el('span');
    deg.textContent = `degree ${src.degree} · `;
    const eq = el('code');
    eq.textContent = src.equation;
    this.report.append(deg, eq);
    this.root.dataset.degree = String(src.degree);
    this.root.dataset.equation = src.equation;
    this.redraw();
  }

  viewportSet(vp: Viewport): void {
    this.vp = vp;
    if (!this.frame) this.frame = requestAnimationFrame(() => this.redraw());
  }

  private redraw(): void {
    this.frame = 0;
    if (!this.sink) return;
    const list: DisplayList = displayListEmpty();
    let ms = 0;
    if (this.curve) {
      const t0 = performance.now();
      try {
        const tr = curveTrace(this.curve.prepared, viewportBounds(this.vp));
        ms = performance.now() - t0;
        list.items.push(...curveTraceItems(tr, 'curve', 'curve'));
        this.root.dataset.pieces = String(tr.polylines.length);
        this.root.dataset.dots = String(tr.dots.length);
      } catch (e) {
        this.problem.textContent = `could not draw this view: ${e instanceof Error ? e.message : String(e)}`;
      }
    }
    this.sink.draw(list, this.vp);
    this.root.dataset.traceMs = ms.toFixed(3);
    this.root.dataset.view = `${this.vp.cx},${this.vp.cy},${this.vp.scale}`;
    const pieces = this.root.dataset.pieces ?? '0';
    const dots = this.root.dataset.dots ?? '0';
    this.status.textContent = `${pieces} piece${pieces === '1' ? '' : 's'}${dots !== '0' ? ` · ${dots} isolated` : ''} · traced in ${ms.toFixed(1)} ms`;
  }

  private resized(): void {
    const size = this.stageSize();
    this.vp = viewportResize(this.vp, size.width, size.height, window.devicePixelRatio || 1);
    if (this.sink) {
      this.sink.resize(size.width, size.height, window.devicePixelRatio || 1);
      this.viewportSet(this.vp);
    }
  }

  private stageSize(): { width: number; height: number } {
    return { width: Math.max(1, this.stage.clientWidth), height: Math.max(1, this.stage.clientHeight) };
  }

  private homeViewport(): Viewport {
    const size = this.stageSize();
    return viewportFit(-4, -3, 4, 3, size.width, size.height, window.devicePixelRatio || 1);
  }
}

function el(tag: string, cls?: string): HTMLElement {
  const e = document.createElement(tag);
  if (cls) e.className = cls;
  return e;
}
