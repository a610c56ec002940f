// The singular point panel: each singular point of the active cubic with its kind and tangent lines, and
// for a nodal or cuspidal cubic the blow-up view — the lines through the singular point drawn on the
// canvas, a parameter slider moving a point along the curve, the parametrisation and its inverse, and
// the parameter values over the singular point.
import { LitElement, css, html, nothing } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { NinefoldError } from '../../exact/errors.ts';
import { rat, ratToString } from '../../exact/rational.ts';
import { formFromCoeffs, type Form } from '../../poly/form.ts';
import { formToText } from '../../poly/print.ts';
import { parametrisationAt } from '../../cubic/parametrise.ts';
import { parametrisationOf } from '../../construct/evaluate-exact.ts';
import { constructionAdd, constructionObject } from '../../construct/graph.ts';
import { ratSnap } from '../../construct/snap.ts';
import { f3Cross, f3FromBig, f3ToApprox } from '../../construct/float.ts';
import type { CurveValue } from '../../construct/types.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $blowup, $selection, noticeShow, type BlowupView } from '../stores/interaction.ts';
import { cubicReportOf, singularPointText } from '../report.ts';
import { theme } from './theme.ts';

function binaryText(b: readonly bigint[], names: readonly string[] = ['s^3', 's^2 t', 's t^2', 't^3']): string {
  const terms = b.map((c, i) => ({ c, m: names[i] })).filter((t) => t.c !== 0n);
  if (!terms.length) return '0';
  return terms
    .map((t, k) => {
      const sign = t.c < 0n ? (k ? ' - ' : '-') : k ? ' + ' : '';
      const a = t.c < 0n ? -t.c : t.c;
      return `${sign}${a === 1n ? '' : `${a} `}${t.m}`;
    })
    .join('');
}

@customElement('nf-blowup')
export class NfBlowup extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      dl { display: grid; grid-template-columns: max-content 1fr; gap: 3px 10px; margin: 0 0 6px; }
      dt { color: var(--ink-soft); }
      dd { margin: 0; min-width: 0; overflow-wrap: anywhere; }
      .slider { display: grid; grid-template-columns: max-content 1fr max-content; gap: 6px; align-items: center; margin: 6px 0; }
      input[type='range'] { width: 100%; min-width: 0; margin: 0; accent-color: var(--accent); }
      .slider .param { min-width: 48px; text-align: right; }
      .row { display: flex; gap: 6px; flex-wrap: wrap; }
    `,
  ];

  private readonly doc = new StoreController(this, $doc);
  private readonly values = new StoreController(this, $values);
  @state() private u = 0.5;
  @state() private open = false;
  private pendingBlowup: BlowupView | null = null;

  protected override updated(): void {
    const now = $blowup.get();
    const next = this.pendingBlowup;
    if (now === next) return;
    if (!next || !now || JSON.stringify(now) !== JSON.stringify(next)) $blowup.set(next);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    $blowup.set(null);
  }

  protected override render(): unknown {
    const doc = this.doc.value;
    const id = doc.activeCurve;
    const v = id ? this.values.value.get(id) : undefined;
    if (!id || !v || v.type !== 'curve' || !v.form) return html`<p class="soft">The active curve's singular points appear here.</p>`;
    const f = v.form;
    if (f.degree !== 3) return html`<p class="soft">Singular points are listed for cubics.</p>`;
    const report = cubicReportOf(f);
    if (typeof report === 'string') return html`<p class="soft">${report}</p>`;
    const sing = report.singularities;
    this.pendingBlowup = null;
    if (sing.smooth) {
      return html`<p>${constructionObject(doc, id)?.label} is smooth: no singular point.</p>`;
    }
    return html`<dl aria-label="Singular points">
        ${sing.points.map(
          (s) => html`<dt>Point</dt><dd class="singular">${singularPointText(s)}</dd>
            <dt>Tangents</dt><dd class="mono">${s.tangents.map((t) => `${formToText(t, { affine: true })} = 0`).join(';  ')}</dd>`,
        )}
        ${sing.lines.map((l) => html`<dt>Line</dt><dd class="mono">singular along ${l.line.join(':')}</dd>`)}
      </dl>
      ${this.parametrised(id, v, f)}`;
  }

  private parametrised(id: string, v: CurveValue, f: Form): unknown {
    let par;
    try {
      par = parametrisationOf(f, constructionObject($doc.get(), id)?.label);
    } catch (e) {
      if (e instanceof NinefoldError) return html`<p class="soft">${e.message}</p>`;
      throw e;
    }
    const q = ratSnap(this.u, 0.0005);
    const [s, t] = [q.num, q.den];
    let at: string;
    let approx;
    try {
      const p = parametrisationAt(par, s, t);
      at = p[2] === 0n ? `${p.join(':')} (at infinity)` : `(${ratToString(rat(p[0], p[2]))}, ${ratToString(rat(p[1], p[2]))}) = ${p.join(':')}`;
      approx = f3ToApprox(f3FromBig(p));
    } catch (e) {
      at = e instanceof NinefoldError ? e.message : String(e);
    }
    const sp = f3ToApprox(f3FromBig(par.singular));
    this.pendingBlowup = this.open ? { singular: sp, point: approx ?? null, tangents: tangentLines(f) } : null;
    const over = par.overRational.map(([a, b]) => (b === 0n ? '∞' : ratToString(rat(a, b))));
    return html`
      <dl aria-label="Parametrisation">
        <dt>Through</dt><dd class="mono">${par.singular.join(':')} (${par.kind})</dd>
        <dt>Map</dt><dd class="mono">X = ${binaryText(par.map[0])}<br />Y = ${binaryText(par.map[1])}<br />Z = ${binaryText(par.map[2])}</dd>
        <dt>Inverse</dt><dd class="mono">(s : t) = (${formToText(formFromCoeffs(1, [...par.inverse[0]]))} : ${formToText(formFromCoeffs(1, [...par.inverse[1]]))}) at (X : Y : Z)</dd>
        <dt>Over the point</dt><dd class="mono over">${over.length ? `s/t = ${over.join(', ')}` : `the roots of ${binaryText(par.overForm, ['s^2', 's t', 't^2'])} = 0 (not rational)`}</dd>
      </dl>
      <div class="row">
        <button aria-pressed=${this.open ? 'true' : 'false'} @click=${this.toggle}>${this.open ? 'Hide blow-up lines' : 'Show blow-up lines'}</button>
      </div>
      <div class="slider">
        <label for="u">s/t</label>
        <input id="u" type="range" min="-6" max="6" step="0.05" .value=${String(this.u)} aria-label="Parameter s/t" @input=${(e: Event) => (this.u = Number((e.target as HTMLInputElement).value))} @keydown=${(e: KeyboardEvent) => e.stopPropagation()} />
        <span class="mono param">${ratToString(q)}</span>
      </div>
      <dl><dt>Point</dt><dd class="mono param-point">${at}</dd></dl>
      <button @click=${() => this.place(id, `${s}:${t}`)}>Place this point</button>
    `;
  }

  private toggle(): void {
    this.open = !this.open;
  }

  private place(curve: string, at: string): void {
    try {
      const r = constructionAdd($doc.get(), { construction: { kind: 'point-parameter', parents: [curve], params: { at } } });
      docCommit(r.doc);
      $selection.set([r.id]);
      noticeShow('done', `${constructionObject(r.doc, r.id)?.label} placed at parameter ${at}.`, 'blowup');
    } catch (e) {
      if (e instanceof NinefoldError) noticeShow('error', e.message, 'blowup');
      else throw e;
    }
  }
}

/** The real tangent lines at the singular points, as float triples: rational lines as they are, a
 * conjugate pair a·X² + b·XY + ... (vertex P) split in floats along its directions (u : v : 0) with
 * a·u² + b·uv + d·v² = 0 (only for drawing; the exact pair is in the panel). */
function tangentLines(f: Form): (readonly [number, number, number])[] {
  const r = cubicReportOf(f);
  if (typeof r === 'string') return [];
  const out: (readonly [number, number, number])[] = [];
  for (const s of r.singularities.points) {
    if (!s.real) continue;
    for (const t of s.tangents) {
      if (t.degree === 1) out.push(f3FromBig(t.coeffs as readonly bigint[]));
      else if (t.degree === 2 && s.point && s.point[2] !== 0n) {
        const [a, b, , d] = t.coeffs.map(Number);
        const disc = b * b - 4 * a * d;
        if (disc < 0) continue; // an acnode: no real tangent
        const p = f3FromBig(s.point);
        const dirs: [number, number][] = a !== 0 ? [[(-b + Math.sqrt(disc)) / (2 * a), 1], [(-b - Math.sqrt(disc)) / (2 * a), 1]] : [[1, 0], [-d, b]];
        for (const [u, v] of dirs) out.push(f3Cross(p, [u, v, 0]));
      }
    }
  }
  return out;
}
