// The scene panel: the file controls, the figure export and the theorem trials, in three folding
// sections. src/ui/scene-file/wire.ts places it in the app's side bar.
import { LitElement, css, html } from 'lit';
import { customElement } from 'lit/decorators.js';
import { theme } from '../components/theme.ts';
import './nf-scene-file.ts';
import '../scene-export/nf-figure-export.ts';
import '../scene-trials/nf-trials.ts';

@customElement('nf-scene-panel')
export class NfScenePanel extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      details { border-top: 1px solid var(--rule); padding: 6px 0; }
      summary { font-weight: 600; cursor: pointer; margin-bottom: 4px; }
    `,
  ];

  protected override render() {
    return html`
      <details open><summary>Scene file</summary><nf-scene-file></nf-scene-file></details>
      <details><summary>Figure for a paper</summary><nf-figure-export></nf-figure-export></details>
      <details><summary>Theorem trials</summary><nf-trials></nf-trials></details>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'nf-scene-panel': NfScenePanel;
  }
}
