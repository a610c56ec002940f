// The inspector: the selected object's exact value, height, status, how it was built, and copy buttons
// for plain text and LaTeX.
import { LitElement, css, html, nothing } from 'lit';
import { customElement } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { constructionObject, constructionUpdate } from '../../construct/graph.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $selection, noticeShow } from '../stores/interaction.ts';
import { builtText, pointHeightText, valueText } from '../format.ts';
import { theme } from './theme.ts';

@customElement('nf-inspector')
export class NfInspector extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      dl { display: grid; grid-template-columns: max-content 1fr; gap: 3px 10px; margin: 0; }
      dt { color: var(--ink-soft); }
      dd { margin: 0; min-width: 0; overflow-wrap: anywhere; }
      .row { display: flex; gap: 6px; margin-top: 6px; }
      input.label { width: 90px; }
      .failure { color: var(--fails); }
    `,
  ];

  private readonly doc = new StoreController(this, $doc);
  private readonly values = new StoreController(this, $values);
  private readonly selection = new StoreController(this, $selection);

  protected override render(): unknown {
    const doc = this.doc.value;
    const id = this.selection.value[0];
    const o = id ? constructionObject(doc, id) : undefined;
    if (!o) return html`<p class="soft">Select an object (Pick and drag, or the list) to see it exactly.</p>`;
    const v = this.values.value.get(o.id);
    const text = v ? valueText(v) : null;
    const height = v ? pointHeightText(v) : null;
    const status = !v || v.type === 'failure' ? 'failed' : (v as { status: string }).status;
    return html`<dl aria-label="Inspector">
        <dt>Label</dt>
        <dd>
          <input class="label" aria-label="Label of ${o.label}" .value=${o.label} @keydown=${(e: KeyboardEvent) => e.stopPropagation()} @change=${(e: Event) => this.relabel(o.id, (e.target as HTMLInputElement).value)} />
          <span class="soft">${o.type}</span>
        </dd>
        <dt>Status</dt><dd><span class="status-${status}">${status}</span></dd>
        ${v?.type === 'failure' ? html`<dt>Problem</dt><dd class="failure">${v.message}</dd>` : nothing}
        ${text ? html`<dt>${o.type === 'point' ? 'Coordinates' : o.type === 'check' ? 'Verdict' : 'Equation'}</dt><dd class="mono exact-value">${text.text}</dd>` : nothing}
        ${v?.type === 'point' && v.exact ? html`<dt>Projective</dt><dd class="mono">${v.exact.join(':')}</dd>` : nothing}
        ${v?.type === 'point' && v.algebraic ? html`<dt>Exactly</dt><dd class="mono">${v.algebraic.text}</dd>` : nothing}
        ${v?.type === 'point' && v.multiplicity && v.multiplicity > 1 ? html`<dt>Multiplicity</dt><dd>${v.multiplicity}</dd>` : nothing}
        ${height ? html`<dt>Height</dt><dd class="mono">${height}</dd>` : nothing}
        <dt>Built as</dt><dd>${builtText(doc, o)}</dd>
      </dl>
      <div class="row">
        <button ?disabled=${!text} @click=${() => this.copy(text?.text ?? '', 'text')}>Copy text</button>
        <button ?disabled=${!text?.latex} @click=${() => this.copy(text?.latex ?? '', 'LaTeX')}>Copy LaTeX</button>
      </div>`;
  }

  private relabel(id: string, label: string): void {
    const t = label.trim();
    if (!t) return;
    docCommit(constructionUpdate($doc.get(), id, { label: t }));
  }

  private async copy(text: string, what: string): Promise<void> {
    (window as unknown as { __ninefoldClipboard?: string }).__ninefoldClipboard = text;
    try {
      await navigator.clipboard.writeText(text);
      noticeShow('done', `Copied as ${what}: ${text}`, 'inspector');
    } catch {
      noticeShow('info', `Copy this ${what} by hand (the browser refused the clipboard): ${text}`, 'inspector');
    }
  }
}
