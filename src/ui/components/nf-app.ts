// The page: a top bar (name, undo, redo, the message line), the tool rail, the canvas and the sidebar of
// panels. Keyboard: tool keys, Escape, Delete, Ctrl+Z / Ctrl+Shift+Z (or Ctrl+Y).
import { LitElement, css, html } from 'lit';
import { customElement, query } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { $canRedo, $canUndo, docRedo, docUndo } from '../stores/construction.ts';
import { $notice, $picks, $tool, toolChoose } from '../stores/interaction.ts';
import { canvasCancel } from '../canvas-controller.ts';
import { toolByKey, toolHint, toolSpec } from '../tools.ts';
import { theme } from './theme.ts';
import './nf-rail.ts';
import './nf-canvas.ts';
import './nf-curve-panel.ts';
import './nf-objects.ts';
import './nf-inspector.ts';
import './nf-verify.ts';
import './nf-blowup.ts';
import './nf-search.ts';
import type { NfObjects } from './nf-objects.ts';

@customElement('nf-app')
export class NfApp extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: grid; grid-template-rows: 44px 1fr; grid-template-columns: 150px minmax(0, 1fr) 400px; height: 100vh; width: 100vw; overflow: hidden; background: var(--paper); }
      header { grid-column: 1 / 4; display: flex; align-items: center; gap: 10px; padding: 0 12px; border-bottom: 1px solid var(--rule); background: #ebe5d6; min-width: 0; }
      h1 { font-size: 17px; margin: 0; letter-spacing: 0.02em; font-weight: 700; }
      h1 span { color: var(--accent); }
      .notice { flex: 1; min-width: 0; overflow: hidden; text-overflow: ellipsis; white-space: nowrap; padding: 3px 8px; border-radius: 4px; }
      .notice.error { background: #fbe3dc; color: #7a2714; }
      .notice.error::before { content: '⚠ '; }
      .notice.done { background: var(--accent-soft); color: #0b4a40; }
      .notice.info { background: #efe9da; color: var(--ink); }
      nf-rail { grid-row: 2; grid-column: 1; }
      nf-canvas { grid-row: 2; grid-column: 2; }
      aside { grid-row: 2; grid-column: 3; overflow-y: auto; border-left: 1px solid var(--rule); background: var(--panel); padding: 6px 10px 40px; }
      details { border-bottom: 1px solid var(--rule); padding: 6px 0 8px; }
      summary { font-weight: 700; cursor: pointer; padding: 2px 0; font-size: 13px; }
      summary span { font-weight: 400; color: var(--ink-soft); font-size: 12px; margin-left: 6px; }
      details > *:not(summary) { margin-top: 6px; }
      @media (max-width: 1400px) { :host { grid-template-columns: 140px minmax(0, 1fr) 360px; } }
    `,
  ];

  private readonly notice = new StoreController(this, $notice);
  private readonly canUndo = new StoreController(this, $canUndo);
  private readonly canRedo = new StoreController(this, $canRedo);
  private readonly tool = new StoreController(this, $tool);
  private readonly picks = new StoreController(this, $picks);
  @query('nf-objects') private objects!: NfObjects;

  override connectedCallback(): void {
    super.connectedCallback();
    window.addEventListener('keydown', this.key);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    window.removeEventListener('keydown', this.key);
  }

  private readonly key = (e: KeyboardEvent): void => {
    const t = e.composedPath()[0] as HTMLElement | undefined;
    if (t && (t.tagName === 'INPUT' || t.tagName === 'TEXTAREA' || t.tagName === 'SELECT')) return;
    const mod = e.ctrlKey || e.metaKey;
    if (mod && e.key.toLowerCase() === 'z') {
      e.preventDefault();
      if (e.shiftKey) docRedo();
      else docUndo();
      return;
    }
    if (mod && e.key.toLowerCase() === 'y') {
      e.preventDefault();
      docRedo();
      return;
    }
    if (mod || e.altKey) return;
    if (e.key === 'Escape') {
      canvasCancel();
      return;
    }
    if (e.key === 'Delete' || e.key === 'Backspace') {
      e.preventDefault();
      this.objects?.askDelete();
      return;
    }
    const tool = toolByKey(e.key);
    if (tool) toolChoose(tool.id);
  };

  protected override render(): unknown {
    const n = this.notice.value;
    const tool = toolSpec(this.tool.value);
    const text = n ? n.text : toolHint(tool, this.picks.value.length);
    const kind = n ? n.kind : 'info';
    return html`
      <header>
        <h1>Nine<span>fold</span></h1>
        <button aria-label="Undo" title="Undo (Ctrl+Z)" ?disabled=${!this.canUndo.value} @click=${docUndo}>↶ Undo</button>
        <button aria-label="Redo" title="Redo (Ctrl+Shift+Z)" ?disabled=${!this.canRedo.value} @click=${docRedo}>↷ Redo</button>
        <div class="notice ${kind}" role=${kind === 'error' ? 'alert' : 'status'} data-where=${n?.where ?? 'tool'} title=${text}>${text}</div>
      </header>
      <nf-rail></nf-rail>
      <nf-canvas></nf-canvas>
      <aside aria-label="Mathematics of the construction">
        <details open><summary>Curve<span>equation and report</span></summary><nf-curve-panel></nf-curve-panel></details>
        <details open><summary>Objects</summary><nf-objects></nf-objects></details>
        <details open><summary>Inspect<span>exact values</span></summary><nf-inspector></nf-inspector></details>
        <details open><summary>Verify<span>checks kept up to date</span></summary><nf-verify></nf-verify></details>
        <details><summary>Singular point<span>blow-up and parametrisation</span></summary><nf-blowup></nf-blowup></details>
        <details><summary>Rational points<span>search by height</span></summary><nf-search></nf-search></details>
      </aside>
    `;
  }
}
