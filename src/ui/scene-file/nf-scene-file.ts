// The scene's file controls: its title, save (download), open (file picker or a file dropped anywhere on
// the page), and the demo scenes. A refused file leaves the open scene as it was and says what is wrong
// and where inside the file. Everything from a file is shown as text (lit escapes it), never as markup.
import { LitElement, css, html } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { NinefoldError } from '../../exact/errors.ts';
import { sceneParse } from '../../scene/load.ts';
import { sceneFileName, sceneToText } from '../../scene/save.ts';
import type { Scene } from '../../scene/scene.ts';
import { theme } from '../components/theme.ts';
import { $sceneMeta, sceneCurrent, sceneOpen } from './bridge.ts';
import { DEMO_SCENES, demoScene } from './demos.ts';
import { fileDownload, sceneFileText } from './files.ts';

export interface SceneRefusal {
  readonly file: string;
  readonly message: string;
  readonly where: string;
}

@customElement('nf-scene-file')
export class NfSceneFile extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      .bar { display: flex; flex-wrap: wrap; gap: 6px; align-items: center; margin-top: 6px; }
      .named { display: flex; gap: 6px; align-items: center; }
      .named span { color: var(--ink-soft); }
      .title { flex: 1 1 auto; min-width: 0; }
      /* The demo list is as wide as its longest title unless told otherwise: keep it inside the side bar. */
      select { flex: 1 1 100%; min-width: 0; max-width: 100%; text-overflow: ellipsis; }
      .refusal { margin-top: 6px; padding: 6px 8px; border-left: 4px solid var(--fails); background: var(--panel); white-space: pre-wrap; overflow-wrap: anywhere; }
      .refusal b { color: var(--fails); }
      .drop { position: fixed; inset: 0; display: grid; place-items: center; background: rgba(251, 248, 241, 0.86); border: 4px dashed var(--accent); font-size: 18px; z-index: 50; pointer-events: none; }
      input[type='file'] { display: none; }
      .notes { margin-top: 4px; }
      .notes summary { cursor: pointer; color: var(--ink-soft); }
      textarea { width: 100%; box-sizing: border-box; font: inherit; border: 1px solid var(--rule); border-radius: 4px; }
    `,
  ];

  private meta = new StoreController(this, $sceneMeta);
  @state() private refusal: SceneRefusal | null = null;
  @state() private dropping = false;
  private dragDepth = 0;

  override connectedCallback(): void {
    super.connectedCallback();
    window.addEventListener('dragenter', this.onDragEnter);
    window.addEventListener('dragover', this.onDragOver);
    window.addEventListener('dragleave', this.onDragLeave);
    window.addEventListener('drop', this.onDrop);
  }

  override disconnectedCallback(): void {
    window.removeEventListener('dragenter', this.onDragEnter);
    window.removeEventListener('dragover', this.onDragOver);
    window.removeEventListener('dragleave', this.onDragLeave);
    window.removeEventListener('drop', this.onDrop);
    super.disconnectedCallback();
  }

  /** Open the text of a scene file: the scene changes only when the whole file is accepted. */
  public openText(text: string, name: string): boolean {
    let scene: Scene;
    try {
      scene = sceneParse(text);
    } catch (e) {
      this.refuse(name, e);
      return false;
    }
    this.refusal = null;
    sceneOpen(scene);
    this.dispatchEvent(new CustomEvent('nf-scene-opened', { detail: { name, title: scene.title }, bubbles: true, composed: true }));
    return true;
  }

  public async openFile(file: File): Promise<boolean> {
    try {
      return this.openText(await sceneFileText(file), file.name);
    } catch (e) {
      this.refuse(file.name, e);
      return false;
    }
  }

  private refuse(file: string, e: unknown): void {
    const err = e instanceof NinefoldError ? e : null;
    this.refusal = { file, message: err ? err.message : `the file could not be read: ${(e as Error)?.message ?? e}`, where: err?.where ?? '' };
    this.dispatchEvent(new CustomEvent('nf-scene-refused', { detail: this.refusal, bubbles: true, composed: true }));
  }

  private save(): void {
    const scene = sceneCurrent();
    fileDownload(sceneFileName(scene), sceneToText(scene));
  }

  private onPick(e: Event): void {
    const input = e.target as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    if (file) void this.openFile(file);
  }

  private onDemo(e: Event): void {
    const select = e.target as HTMLSelectElement;
    const file = select.value;
    select.value = '';
    if (!file) return;
    this.refusal = null;
    sceneOpen(demoScene(file));
  }

  private onNotes(e: Event): void {
    const notes = (e.target as HTMLTextAreaElement).value.slice(0, 20_000);
    $sceneMeta.set({ ...$sceneMeta.get(), notes });
  }

  private onTitle(e: Event): void {
    const title = (e.target as HTMLInputElement).value.slice(0, 400);
    $sceneMeta.set({ ...$sceneMeta.get(), title });
  }

  private readonly onDragEnter = (e: DragEvent): void => {
    if (!e.dataTransfer?.types.includes('Files')) return;
    this.dragDepth++;
    this.dropping = true;
  };

  private readonly onDragOver = (e: DragEvent): void => {
    if (!e.dataTransfer?.types.includes('Files')) return;
    e.preventDefault();
    e.dataTransfer.dropEffect = 'copy';
  };

  private readonly onDragLeave = (): void => {
    this.dragDepth = Math.max(0, this.dragDepth - 1);
    if (this.dragDepth === 0) this.dropping = false;
  };

  private readonly onDrop = (e: DragEvent): void => {
    if (!e.dataTransfer?.files.length) return;
    e.preventDefault();
    this.dragDepth = 0;
    this.dropping = false;
    void this.openFile(e.dataTransfer.files[0]);
  };

  protected override render() {
    const r = this.refusal;
    return html`
      <label class="named"><span>Title</span>
        <input class="title" aria-label="Scene title" title=${this.meta.value.title} .value=${this.meta.value.title} @change=${this.onTitle} maxlength="400" />
      </label>
      <div class="bar">
        <button @click=${() => this.save()} title="Download the scene as a file">Save scene</button>
        <button @click=${() => (this.renderRoot.querySelector('input[type=file]') as HTMLInputElement).click()} title="Open a scene file (or drop one on the page)">Open scene…</button>
        <input type="file" accept=".json,application/json" @change=${this.onPick} aria-label="Scene file to open" />
        <select aria-label="Open a demo scene" @change=${this.onDemo}>
          <option value="">Demo scenes…</option>
          ${DEMO_SCENES.map((d) => html`<option value=${d.file} title=${d.shows}>${d.title}</option>`)}
        </select>
      </div>
      <details class="notes">
        <summary>Notes</summary>
        <textarea aria-label="Scene notes" rows="4" maxlength="20000" .value=${this.meta.value.notes} @change=${this.onNotes}></textarea>
      </details>
      ${r
        ? html`<div class="refusal" role="alert" data-where=${r.where}><b>Not opened:</b> ${r.file}: ${r.message}${r.where ? html` <i>(at ${r.where})</i>` : ''}. The open scene is unchanged.</div>`
        : ''}
      ${this.dropping ? html`<div class="drop">Drop a scene file to open it</div>` : ''}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'nf-scene-file': NfSceneFile;
  }
}
