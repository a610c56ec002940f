// The tool rail: one button per tool with its key, grouped by what the tools do, and the n of nP.
import { LitElement, css, html } from 'lit';
import { customElement } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { $multipleN, $tool, toolChoose } from '../stores/interaction.ts';
import { TOOLS, type ToolSpec } from '../tools.ts';
import { theme } from './theme.ts';

const GROUP_TITLES: Record<ToolSpec['group'], string> = {
  hand: 'Hand',
  place: 'Place',
  lines: 'Lines and meets',
  'group law': 'Group law',
  models: 'Weierstrass form',
  pencils: 'Pencils',
  search: 'Search',
};

@customElement('nf-rail')
export class NfRail extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; background: var(--panel); border-right: 1px solid var(--rule); padding: 8px 6px; overflow-y: auto; }
      h3 { font-size: 11px; text-transform: uppercase; letter-spacing: 0.06em; color: var(--ink-soft); margin: 10px 2px 4px; font-weight: 600; }
      h3:first-child { margin-top: 0; }
      button.tool { display: flex; width: 100%; justify-content: space-between; align-items: center; margin: 2px 0; text-align: left; padding: 4px 6px; }
      button.tool[aria-pressed='true'] { background: var(--accent); color: #fff; border-color: var(--accent); }
      kbd { font-family: 'DejaVu Sans Mono', monospace; font-size: 11px; border: 1px solid currentColor; border-radius: 3px; padding: 0 4px; opacity: 0.75; }
      label.n { display: flex; gap: 4px; align-items: center; margin: 2px 0 4px 8px; font-size: 12px; }
      label.n input { width: 56px; }
    `,
  ];

  private readonly tool = new StoreController(this, $tool);
  private readonly n = new StoreController(this, $multipleN);

  protected override render(): unknown {
    const groups = [...new Set(TOOLS.map((t) => t.group))];
    return html`<nav aria-label="Construction tools">
      ${groups.map(
        (g) => html`<h3>${GROUP_TITLES[g]}</h3>
          ${TOOLS.filter((t) => t.group === g).map(
            (t) => html`<button
                class="tool"
                data-tool=${t.id}
                aria-pressed=${this.tool.value === t.id ? 'true' : 'false'}
                title=${t.help}
                @click=${() => toolChoose(t.id)}
              >
                <span>${t.name}</span><kbd aria-label="key ${t.key}">${t.key.toUpperCase()}</kbd>
              </button>
              ${t.id === 'multiple'
                ? html`<label class="n">n =
                    <input
                      aria-label="n for the multiple nP"
                      .value=${this.n.value}
                      @input=${(e: Event) => $multipleN.set((e.target as HTMLInputElement).value)}
                      @keydown=${(e: KeyboardEvent) => e.stopPropagation()}
                  /></label>`
                : null}`,
          )}`,
      )}
    </nav>`;
  }
}
