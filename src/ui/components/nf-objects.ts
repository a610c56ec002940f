// The list of objects: status glyph, label, what it is; click to select, and delete with a question first
// when other objects are built from the one deleted.
import { LitElement, css, html, nothing } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { constructionDelete, constructionDependents, constructionObject } from '../../construct/graph.ts';
import { KINDS } from '../../construct/kinds.ts';
import type { ObjectId } from '../../construct/types.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $selection, noticeShow } from '../stores/interaction.ts';
import { theme } from './theme.ts';

@customElement('nf-objects')
export class NfObjects extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      ul { list-style: none; margin: 0; padding: 0; max-height: 220px; overflow-y: auto; border: 1px solid var(--rule); border-radius: 4px; background: var(--paper); }
      li { display: grid; grid-template-columns: 84px 66px minmax(0, 1fr); gap: 6px; padding: 3px 6px; cursor: pointer; border-bottom: 1px solid #ece6d8; align-items: baseline; }
      li:last-child { border-bottom: none; }
      li[aria-selected='true'] { background: #f9e6b0; }
      li.helper { color: var(--ink-soft); }
      .label { font-weight: 600; overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
      .what { color: var(--ink-soft); overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
      .st { font-size: 11px; white-space: nowrap; }
      .row { display: flex; gap: 6px; align-items: center; margin-top: 6px; flex-wrap: wrap; }
      .confirm { border: 1px solid var(--fails); background: #fff4f1; border-radius: 4px; padding: 6px; margin-top: 6px; }
      label { display: flex; gap: 4px; align-items: center; }
    `,
  ];

  private readonly doc = new StoreController(this, $doc);
  private readonly values = new StoreController(this, $values);
  private readonly selection = new StoreController(this, $selection);
  @state() private asking: { id: ObjectId; dependents: ObjectId[] } | null = null;
  @state() private showHelpers = false;

  protected override render(): unknown {
    const doc = this.doc.value;
    const sel = new Set(this.selection.value);
    const shown = doc.objects.filter((o) => this.showHelpers || o.helperOf === undefined);
    return html`
      ${shown.length === 0
        ? html`<p class="soft">Nothing built yet.</p>`
        : html`<ul role="listbox" aria-label="Objects" aria-multiselectable="true">
            ${shown.map((o) => {
              const v = this.values.value.get(o.id);
              const st = !v ? 'failed' : v.type === 'failure' ? 'failed' : (v as { status: string }).status;
              return html`<li
                role="option"
                tabindex="0"
                class=${o.helperOf ? 'helper' : ''}
                data-id=${o.id}
                data-label=${o.label}
                aria-selected=${sel.has(o.id) ? 'true' : 'false'}
                title=${`${o.label}: ${v?.type === 'failure' ? v.message : KINDS[o.construction.kind].words}`}
                @click=${(e: MouseEvent) => this.pick(o.id, e.shiftKey)}
                @keydown=${(e: KeyboardEvent) => (e.key === 'Enter' || e.key === ' ') && (e.preventDefault(), this.pick(o.id, e.shiftKey))}
              >
                <span class="label">${o.label}</span><span class="st status-${st}">${st === 'approximate' ? 'approx.' : st}</span><span class="what">${KINDS[o.construction.kind].words}</span>
              </li>`;
            })}
          </ul>`}
      <div class="row">
        <button ?disabled=${sel.size === 0} @click=${this.askDelete}>Delete selected</button>
        <label><input type="checkbox" .checked=${this.showHelpers} @change=${(e: Event) => (this.showHelpers = (e.target as HTMLInputElement).checked)} /> show helper objects</label>
      </div>
      ${this.asking ? this.confirm() : nothing}
    `;
  }

  private confirm(): unknown {
    const doc = this.doc.value;
    const a = this.asking!;
    const label = constructionObject(doc, a.id)?.label ?? a.id;
    const names = a.dependents.map((d) => constructionObject(doc, d)?.label ?? d);
    return html`<div class="confirm" role="alertdialog" aria-label="Confirm delete">
      <p>Delete <strong>${label}</strong> and the ${names.length} object${names.length === 1 ? '' : 's'} built from it (${names.join(', ')})?</p>
      <div class="row">
        <button class="yes" @click=${() => this.removeObject(a.id)}>Delete all ${names.length + 1}</button>
        <button class="no" @click=${() => (this.asking = null)}>Keep them</button>
      </div>
    </div>`;
  }

  private pick(id: ObjectId, add: boolean): void {
    const sel = $selection.get();
    $selection.set(add ? (sel.includes(id) ? sel.filter((s) => s !== id) : [...sel, id]) : [id]);
  }

  /** Delete the first selected object, asking first when others depend on it. */
  askDelete(): void {
    const doc = $doc.get();
    const id = $selection.get().find((s) => constructionObject(doc, s));
    if (!id) return;
    const dependents = constructionDependents(doc, id);
    if (dependents.length === 0) this.removeObject(id);
    else this.asking = { id, dependents };
  }

  private removeObject(id: ObjectId): void {
    const doc = $doc.get();
    const label = constructionObject(doc, id)?.label ?? id;
    const n = constructionDependents(doc, id).length;
    docCommit(constructionDelete(doc, id));
    $selection.set([]);
    this.asking = null;
    noticeShow('done', `Deleted ${label}${n ? ` and ${n} object${n === 1 ? '' : 's'} built from it` : ''}. Undo brings ${n ? 'them' : 'it'} back.`, 'canvas');
  }
}
