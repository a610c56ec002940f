// The inspector: the selected object's exact value, height, status, how it was built, copy buttons
// for plain text and LaTeX, and its style (colour, stroke pattern and width, shown or hidden, label shown).
// Each style change is one undo step (constructionStyle through docCommit); the display list reads the
// style, so the canvas and the exported figures follow it alike.
import { LitElement, css, html, nothing } from 'lit';
import { customElement } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { constructionObject, constructionStyle, constructionUpdate } from '../../construct/graph.ts';
import type { ConstructionObject, Style } from '../../construct/types.ts';
import { NinefoldError } from '../../exact/errors.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $selection, noticeShow } from '../stores/interaction.ts';
import { builtText, pointHeightText, valueText } from '../format.ts';
import { theme } from './theme.ts';

/** Our palette, darkest first: the CIE lightness steps by 9 or more (17, 28, 40, 52, 62, 70), so the
 * colours stay apart when a figure is printed in greyscale; the stroke pattern is the second cue. */
export const STYLE_PALETTE: readonly { readonly name: string; readonly colour: string }[] = [
  { name: 'night', colour: '#1b2a49' },
  { name: 'wine', colour: '#7a1f3d' },
  { name: 'blue', colour: '#1f5fa8' },
  { name: 'copper', colour: '#c0641a' },
  { name: 'teal', colour: '#3fa3a0' },
  { name: 'ochre', colour: '#d9a21b' },
];

const STROKES: readonly NonNullable<Style['stroke']>[] = ['solid', 'dashed', 'dotted'];
const WIDTHS: readonly number[] = [1, 1.5, 2, 3, 4];

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
      fieldset.style { border: 1px solid var(--rule); border-radius: 4px; margin: 8px 0 0; padding: 4px 8px 6px; display: grid; grid-template-columns: max-content 1fr; gap: 4px 10px; align-items: center; }
      fieldset.style legend { color: var(--ink-soft); padding: 0 4px; }
      .swatches { display: flex; flex-wrap: wrap; gap: 4px; align-items: center; }
      .swatches button { width: 22px; height: 22px; padding: 0; border: 2px solid transparent; border-radius: 50%; background-clip: content-box; }
      .swatches button[aria-pressed='true'] { border-color: var(--ink); box-shadow: inset 0 0 0 2px var(--paper); }
      fieldset.style select { justify-self: start; min-width: 8em; }
      .flags { display: flex; flex-wrap: wrap; gap: 4px 12px; }
      .flags label { display: inline-flex; gap: 4px; align-items: center; white-space: nowrap; }
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
      </div>
      ${this.styleControls(o)}`;
  }

  private styleControls(o: ConstructionObject): unknown {
    const st = o.style;
    const stroked = o.type === 'curve' || o.type === 'line';
    const named = STYLE_PALETTE.find((p) => p.colour.toLowerCase() === st.colour.toLowerCase());
    const widths = st.width !== undefined && !WIDTHS.includes(st.width) ? [...WIDTHS, st.width].sort((a, b) => a - b) : WIDTHS;
    const keep = (e: KeyboardEvent) => e.stopPropagation();
    return html`<fieldset class="style" aria-label="Style of ${o.label}">
      <legend>Style</legend>
      <span class="soft" id="colour-term">Colour</span>
      <div class="swatches" role="group" aria-labelledby="colour-term">
        ${STYLE_PALETTE.map(
          (p, k) => html`<button
            data-colour=${p.colour}
            style="background-color:${p.colour}"
            aria-pressed=${p === named ? 'true' : 'false'}
            aria-label="Colour ${p.name} (${k + 1} of ${STYLE_PALETTE.length}, darkest first)"
            title=${p.name}
            @keydown=${keep}
            @click=${() => this.restyle(o.id, { colour: p.colour })}
          ></button>`,
        )}
        ${named ? nothing : html`<span class="soft mono" title="a colour outside the palette">${st.colour}</span>`}
      </div>
      ${stroked
        ? html`<label class="soft" for="stroke">Stroke</label>
            <select id="stroke" aria-label="Stroke pattern of ${o.label}" @keydown=${keep} @change=${(e: Event) => this.restyle(o.id, { stroke: (e.target as HTMLSelectElement).value as Style['stroke'] })}>
              ${STROKES.map((k) => html`<option value=${k} ?selected=${(st.stroke ?? 'solid') === k}>${k}</option>`)}
            </select>
            <label class="soft" for="width">Width</label>
            <select id="width" aria-label="Stroke width of ${o.label}" @keydown=${keep} @change=${(e: Event) => this.restyle(o.id, { width: Number((e.target as HTMLSelectElement).value) })}>
              ${widths.map((w) => html`<option value=${String(w)} ?selected=${st.width === w}>${w} px</option>`)}
            </select>`
        : nothing}
      <span class="soft">Show</span>
      <div class="flags">
        <label><input type="checkbox" name="visible" aria-label="Show ${o.label}" .checked=${st.visible} @keydown=${keep} @change=${(e: Event) => this.restyle(o.id, { visible: (e.target as HTMLInputElement).checked })} />object</label>
        <label><input type="checkbox" name="showLabel" aria-label="Show the label of ${o.label}" .checked=${st.showLabel} @keydown=${keep} @change=${(e: Event) => this.restyle(o.id, { showLabel: (e.target as HTMLInputElement).checked })} />label</label>
      </div>
    </fieldset>`;
  }

  private restyle(id: string, patch: Partial<Style>): void {
    try {
      docCommit(constructionStyle($doc.get(), id, patch));
    } catch (err) {
      if (err instanceof NinefoldError) noticeShow('error', err.message, 'inspector');
      else throw err;
    }
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
