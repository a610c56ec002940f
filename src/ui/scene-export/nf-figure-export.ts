// Figure export from the page: the current view as SVG, TikZ (a standalone file, or a snippet copied to
// the clipboard) and PNG at a chosen resolution, with print settings. The figure is built from the same
// display list rules as the canvas (src/export/display.ts) and carries the exact values of every object.
import { LitElement, css, html } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { sceneFigureInput } from '../../export/scene-figure.ts';
import { figureToSvg } from '../../export/svg.ts';
import { figureToTikzSnippet, figureToTikzStandalone } from '../../export/tikz.ts';
import type { FigureInput } from '../../export/figure.ts';
import { theme } from '../components/theme.ts';
import { sceneCurrent, sceneValues } from '../scene-file/bridge.ts';
import { fileDownload } from '../scene-file/files.ts';
import { sceneFileName } from '../../scene/save.ts';

const MAX_SIDE_PX = 8000;

@customElement('nf-figure-export')
export class NfFigureExport extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      .grid { display: grid; grid-template-columns: auto 1fr; gap: 4px 8px; align-items: center; margin-bottom: 6px; }
      .row { display: flex; flex-wrap: wrap; gap: 6px; }
      input[type='number'] { width: 6em; }
      .note { color: var(--ink-soft); margin-top: 4px; }
    `,
  ];

  @state() private widthPt = 360;
  @state() private fontPt = 9;
  @state() private dpi = 300;
  @state() private greyscale = false;
  @state() private axes = false;
  @state() private note = '';

  private input(): FigureInput {
    return sceneFigureInput(sceneCurrent(), { widthPt: this.widthPt, fontSizePt: this.fontPt, greyscale: this.greyscale, axes: this.axes }, sceneValues());
  }

  private base(): string {
    return sceneFileName(sceneCurrent()).replace(/\.ninefold\.json$/, '');
  }

  private svg(): void {
    fileDownload(`${this.base()}.svg`, figureToSvg(this.input()), 'image/svg+xml');
    this.note = 'SVG saved.';
  }

  private tikz(): void {
    fileDownload(`${this.base()}.tex`, figureToTikzStandalone(this.input()), 'application/x-tex');
    this.note = 'TikZ file saved (compiles on its own with pdflatex).';
  }

  private async snippet(): Promise<void> {
    const text = figureToTikzSnippet(this.input());
    try {
      await navigator.clipboard.writeText(text);
      this.note = 'TikZ snippet copied: paste it into a document that loads tikz.';
    } catch {
      fileDownload(`${this.base()}-snippet.tex`, text, 'application/x-tex');
      this.note = 'The clipboard is not available here, so the snippet was saved as a file.';
    }
  }

  private async png(): Promise<void> {
    const input = this.input();
    const svg = figureToSvg(input);
    const m = /width="([\d.]+)pt" height="([\d.]+)pt"/.exec(svg)!;
    const w = Math.round((Number(m[1]) / 72) * this.dpi);
    const h = Math.round((Number(m[2]) / 72) * this.dpi);
    if (w > MAX_SIDE_PX || h > MAX_SIDE_PX) {
      this.note = `${w} x ${h} pixels is more than the page can draw (${MAX_SIDE_PX} a side): lower the resolution.`;
      return;
    }
    const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
    try {
      const img = new Image();
      await new Promise<void>((ok, bad) => {
        img.onload = () => ok();
        img.onerror = () => bad(new Error('the figure did not load as an image'));
        img.src = url;
      });
      const canvas = document.createElement('canvas');
      canvas.width = w;
      canvas.height = h;
      const ctx = canvas.getContext('2d')!;
      ctx.fillStyle = '#ffffff';
      ctx.fillRect(0, 0, w, h);
      ctx.drawImage(img, 0, 0, w, h);
      const blob = await new Promise<Blob | null>((ok) => canvas.toBlob(ok, 'image/png'));
      if (!blob) throw new Error('the browser could not make a PNG');
      fileDownload(`${this.base()}.png`, blob, 'image/png');
      this.note = `PNG saved: ${w} x ${h} pixels at ${this.dpi} dpi.`;
    } catch (e) {
      this.note = `PNG not saved: ${(e as Error).message}`;
    } finally {
      URL.revokeObjectURL(url);
    }
  }

  private num(e: Event, lo: number, hi: number, fallback: number): number {
    const v = Number((e.target as HTMLInputElement).value);
    return Number.isFinite(v) ? Math.min(hi, Math.max(lo, Math.round(v))) : fallback;
  }

  protected override render() {
    return html`
      <div class="grid">
        <label for="w">Width (pt)</label>
        <input id="w" type="number" min="36" max="4000" .value=${String(this.widthPt)} @change=${(e: Event) => (this.widthPt = this.num(e, 36, 4000, 360))} />
        <label for="f">Label size (pt)</label>
        <input id="f" type="number" min="4" max="48" .value=${String(this.fontPt)} @change=${(e: Event) => (this.fontPt = this.num(e, 4, 48, 9))} />
        <label for="d">PNG resolution (dpi)</label>
        <input id="d" type="number" min="10" max="2400" .value=${String(this.dpi)} @change=${(e: Event) => (this.dpi = this.num(e, 10, 2400, 300))} />
        <label for="g">Greyscale</label>
        <input id="g" type="checkbox" .checked=${this.greyscale} @change=${(e: Event) => (this.greyscale = (e.target as HTMLInputElement).checked)} />
        <label for="a">Axes</label>
        <input id="a" type="checkbox" .checked=${this.axes} @change=${(e: Event) => (this.axes = (e.target as HTMLInputElement).checked)} />
      </div>
      <div class="row">
        <button @click=${() => this.svg()}>SVG</button>
        <button @click=${() => this.tikz()}>TikZ file</button>
        <button @click=${() => void this.snippet()}>Copy TikZ snippet</button>
        <button @click=${() => void this.png()}>PNG</button>
      </div>
      <div class="note" role="status">${this.note}</div>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'nf-figure-export': NfFigureExport;
  }
}
