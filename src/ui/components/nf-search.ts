// Rational points: search the active curve by height in the worker, with progress and cancel; results on
// the canvas and in a sortable list, kept to the region drawn with the Region tool.
import { LitElement, css, html, nothing } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { rat, ratCmp, type Rational } from '../../exact/rational.ts';
import { pointParse } from '../../plane/parse-point.ts';
import { pointHeight } from '../../cubic/height.ts';
import { constructionAdd } from '../../construct/graph.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $region, $search } from '../stores/search.ts';
import { $selection, noticeShow, toolChoose } from '../stores/interaction.ts';
import { searchCancel, searchStart } from '../search-client.ts';
import { theme } from './theme.ts';

type SortKey = 'height' | 'x' | 'y';

interface Row {
  readonly at: string;
  readonly height: bigint;
  readonly x: Rational | null;
  readonly y: Rational | null;
}

function rowOf(at: string): Row {
  const p = pointParse(at);
  return { at, height: pointHeight(p), x: p[2] === 0n ? null : rat(p[0], p[2]), y: p[2] === 0n ? null : rat(p[1], p[2]) };
}

@customElement('nf-search')
export class NfSearch extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      .row { display: flex; gap: 6px; align-items: center; flex-wrap: wrap; }
      input.h { width: 64px; }
      progress { width: 100%; height: 10px; accent-color: var(--accent); }
      table { width: 100%; border-collapse: collapse; margin-top: 6px; }
      .scroll { max-height: 200px; overflow-y: auto; border: 1px solid var(--rule); border-radius: 4px; margin-top: 6px; }
      th, td { text-align: left; padding: 2px 6px; border-bottom: 1px solid #ece6d8; }
      th button { border: none; background: none; padding: 0; font-weight: 600; }
      td.mono { font-size: 12px; }
      .note { margin: 4px 0 0; }
    `,
  ];

  private readonly search = new StoreController(this, $search);
  private readonly region = new StoreController(this, $region);
  private readonly doc = new StoreController(this, $doc);
  @state() private height = '40';
  @state() private sort: SortKey = 'height';
  private rowsCache: { key: readonly string[]; rows: Row[] } = { key: [], rows: [] };

  protected override render(): unknown {
    const s = this.search.value;
    const r = this.region.value;
    if (this.rowsCache.key !== s.points) this.rowsCache = { key: s.points, rows: s.points.map(rowOf) };
    const rows = [...this.rowsCache.rows].sort((a, b) => this.compare(a, b));
    const running = s.phase === 'running';
    return html`
      <div class="row">
        <label>Height ≤ <input class="h" aria-label="Height bound" .value=${this.height} @input=${(e: Event) => (this.height = (e.target as HTMLInputElement).value)} @keydown=${(e: KeyboardEvent) => e.stopPropagation()} /></label>
        <button class="start" ?disabled=${running} @click=${this.start}>Search</button>
        <button class="cancel" ?disabled=${!running} @click=${searchCancel}>Cancel</button>
      </div>
      <div class="row">
        <span class="soft">${r ? `Region: x in [${Math.min(r.x0, r.x1).toFixed(2)}, ${Math.max(r.x0, r.x1).toFixed(2)}], y in [${Math.min(r.y0, r.y1).toFixed(2)}, ${Math.max(r.y0, r.y1).toFixed(2)}]` : 'Region: the whole plane'}</span>
        <button @click=${() => toolChoose('region')}>Draw region</button>
        ${r ? html`<button @click=${() => $region.set(null)}>Clear region</button>` : nothing}
      </div>
      ${running ? html`<progress aria-label="Search progress" max="1" .value=${s.progress}></progress>` : nothing}
      <p class="note soft" aria-live="polite">${this.phaseText()}</p>
      ${rows.length
        ? html`<div class="scroll"><table aria-label="Rational points found">
            <thead><tr>
              <th><button @click=${() => (this.sort = 'height')} aria-sort=${this.sort === 'height' ? 'ascending' : 'none'}>Height</button></th>
              <th><button @click=${() => (this.sort = 'x')} aria-sort=${this.sort === 'x' ? 'ascending' : 'none'}>x</button></th>
              <th><button @click=${() => (this.sort = 'y')} aria-sort=${this.sort === 'y' ? 'ascending' : 'none'}>y</button></th>
              <th></th>
            </tr></thead>
            <tbody>${rows.map(
              (row) => html`<tr>
                <td class="mono">${row.height}</td>
                <td class="mono">${row.x ? ratText(row.x) : '∞'}</td>
                <td class="mono">${row.y ? ratText(row.y) : row.at}</td>
                <td><button aria-label="Add ${row.at} as a point" @click=${() => this.add(row.at)}>Add</button></td>
              </tr>`,
            )}</tbody>
          </table></div>`
        : nothing}
    `;
  }

  private phaseText(): string {
    const s = this.search.value;
    if (s.phase === 'idle') return 'Finds every rational point up to the height bound (in the background).';
    if (s.phase === 'running') return `Searching up to height ${s.height}: ${Math.round(s.progress * 100)}%`;
    if (s.phase === 'cancelled') return 'Cancelled.';
    if (s.phase === 'failed') return `Stopped: ${s.note}`;
    return `${s.points.length} point${s.points.length === 1 ? '' : 's'}. ${s.note}`;
  }

  private compare(a: Row, b: Row): number {
    if (this.sort === 'height') return a.height < b.height ? -1 : a.height > b.height ? 1 : 0;
    const ka = this.sort === 'x' ? a.x : a.y;
    const kb = this.sort === 'x' ? b.x : b.y;
    if (!ka || !kb) return ka ? -1 : kb ? 1 : 0;
    return ratCmp(ka, kb);
  }

  private start(): void {
    const doc = this.doc.value;
    const id = doc.activeCurve;
    const v = id ? $values.get().get(id) : undefined;
    if (!id || !v || v.type !== 'curve') {
      noticeShow('error', 'The search needs an active curve: type an equation first.', 'search');
      return;
    }
    const h = Number(this.height);
    if (!Number.isInteger(h) || h < 1 || h > 5000) {
      noticeShow('error', `The height bound must be a whole number from 1 to 5000, not "${this.height}".`, 'search');
      return;
    }
    searchStart(id, v, h);
  }

  private add(at: string): void {
    const doc = $doc.get();
    const curve = this.search.value.curve;
    if (!curve || !doc.objects.some((o) => o.id === curve)) return;
    const r = constructionAdd(doc, { construction: { kind: 'point-on-curve', parents: [curve], params: { at } } });
    docCommit(r.doc);
    $selection.set([r.id]);
  }
}

function ratText(q: Rational): string {
  return q.den === 1n ? q.num.toString() : `${q.num}/${q.den}`;
}
