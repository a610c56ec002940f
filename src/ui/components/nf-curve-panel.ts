// The curve panel: type an equation (errors marked at their column), type a line (a:b:c or a linear
// equation), build a curve from points, choose the active curve, and read its report (smooth or not,
// singular points, components, invariants, flexes).
import { LitElement, css, html, nothing } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { InvalidInput, NinefoldError, ParseError } from '../../exact/errors.ts';
import { pointParse, pointToString } from '../../plane/parse-point.ts';
import type { Line } from '../../plane/point.ts';
import { formParse } from '../../poly/parse.ts';
import { formToText } from '../../poly/print.ts';
import { constructionAdd, constructionObject } from '../../construct/graph.ts';
import type { ConstructionDoc, ConstructionKind, CurveValue } from '../../construct/types.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $selection, noticeShow } from '../stores/interaction.ts';
import { curveReportText, type ReportLine } from '../report.ts';
import { theme } from './theme.ts';

/** Curves take the colours in turn, so two curves on the canvas are told apart at a glance. */
const CURVE_COLOURS = ['#1f5fa8', '#8a3b8f', '#2f7d4a', '#b5651d', '#4a4a86', '#8f2d2d'];

function curveColour(doc: ConstructionDoc): string {
  return CURVE_COLOURS[doc.objects.filter((o) => o.type === 'curve').length % CURVE_COLOURS.length];
}

@customElement('nf-curve-panel')
export class NfCurvePanel extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      form { display: flex; gap: 6px; }
      input.eq { flex: 1; min-width: 0; font-family: 'DejaVu Sans Mono', monospace; }
      input.eq[aria-invalid='true'] { border-color: var(--fails); background: #fff4f1; }
      .error { color: var(--fails); margin: 4px 0 0; }
      .caret { font-family: 'DejaVu Sans Mono', monospace; white-space: pre; color: var(--fails); margin: 4px 0 0; font-size: 12px; overflow-x: auto; }
      .build { display: flex; flex-wrap: wrap; gap: 4px; margin: 6px 0; }
      .curves { display: flex; flex-wrap: wrap; gap: 4px; margin: 6px 0; }
      .curves button[aria-pressed='true'] { border-color: var(--accent); background: var(--accent-soft); font-weight: 600; }
      dl { display: grid; grid-template-columns: max-content 1fr; gap: 3px 10px; margin: 6px 0 0; }
      dt { color: var(--ink-soft); }
      dd { margin: 0; min-width: 0; overflow-wrap: anywhere; }
      form.line { margin-top: 6px; }
      input.ln { flex: 1; min-width: 0; font-family: 'DejaVu Sans Mono', monospace; }
      input.ln[aria-invalid='true'] { border-color: var(--fails); background: #fff4f1; }
      .swatch { display: inline-block; width: 10px; height: 10px; border-radius: 2px; margin-right: 4px; vertical-align: -1px; }
    `,
  ];

  private readonly doc = new StoreController(this, $doc);
  private readonly values = new StoreController(this, $values);
  @state() private error: { message: string; column: number; text: string } | null = null;
  @state() private lineError: { message: string; column: number; text: string } | null = null;

  protected override render(): unknown {
    const doc = this.doc.value;
    const curves = doc.objects.filter((o) => o.type === 'curve');
    const active = doc.activeCurve ? constructionObject(doc, doc.activeCurve) : undefined;
    const value = active ? this.values.value.get(active.id) : undefined;
    return html`
      <form @submit=${this.submit} aria-label="New curve from an equation">
        <input
          class="eq"
          name="equation"
          aria-label="Equation of a curve, e.g. y^2 + xy = x^3 - 5x + 7"
          placeholder="y^2 + xy = x^3 - 5x + 7"
          aria-invalid=${this.error ? 'true' : 'false'}
          aria-describedby="eq-error"
          @keydown=${(e: KeyboardEvent) => e.stopPropagation()}
          @input=${() => (this.error = null)}
        />
        <button type="submit">Add curve</button>
      </form>
      ${this.error
        ? html`<pre class="caret" aria-hidden="true">${this.error.text}
${' '.repeat(Math.max(0, this.error.column - 1))}^</pre>
            <p class="error" id="eq-error" role="alert">At column ${this.error.column}: ${this.error.message}</p>`
        : nothing}
      <form class="line" @submit=${this.submitLine} aria-label="New line from its equation">
        <input
          class="ln"
          name="line"
          aria-label="Line a:b:c or ax + by + c = 0"
          placeholder="Line a:b:c or ax + by + c = 0"
          aria-invalid=${this.lineError ? 'true' : 'false'}
          aria-describedby="line-error"
          @keydown=${(e: KeyboardEvent) => e.stopPropagation()}
          @input=${() => (this.lineError = null)}
        />
        <button type="submit">Add line</button>
      </form>
      ${this.lineError
        ? html`<pre class="caret" aria-hidden="true">${this.lineError.text}
${' '.repeat(Math.max(0, this.lineError.column - 1))}^</pre>
            <p class="error line-error" id="line-error" role="alert">At column ${this.lineError.column}: ${this.lineError.message}</p>`
        : nothing}
      <div class="build" aria-label="Curves from the selected points">
        <button @click=${() => this.fromPoints('conic-through-five', 5)} title="Select five points first">Conic through 5</button>
        <button @click=${() => this.fromPoints('cubic-through-nine', 9)} title="Select nine points first">Cubic through 9</button>
        <button @click=${() => this.fromPoints('pencil-member', 8)} title="Select eight points first">Pencil member through 8</button>
      </div>
      ${curves.length > 1
        ? html`<div class="curves" role="group" aria-label="Active curve">
            ${curves.map(
              (c) => html`<button aria-pressed=${c.id === doc.activeCurve ? 'true' : 'false'} @click=${() => docCommit({ ...doc, activeCurve: c.id })}>
                <span class="swatch" style="background:${c.style.colour}"></span>${c.label}
              </button>`,
            )}
          </div>`
        : nothing}
      ${active && value ? this.report(active.label, value) : html`<p class="soft">No curve yet: type an equation above.</p>`}
    `;
  }

  private report(label: string, value: unknown): unknown {
    const v = value as CurveValue | { type: 'failure'; message: string };
    if (v.type === 'failure') return html`<p class="error">${label} cannot be built now: ${v.message}</p>`;
    const lines: ReportLine[] = curveReportText(v);
    return html`<dl aria-label="Report on ${label}">
      <dt>Curve</dt><dd><strong>${label}</strong> <span class="status-${v.status}">${v.status}</span></dd>
      ${lines.map((l) => html`<dt>${l.term}</dt><dd class=${l.mono ? 'mono' : ''}>${l.text}</dd>`)}
    </dl>`;
  }

  private submit(e: Event): void {
    e.preventDefault();
    const input = (e.currentTarget as HTMLFormElement).elements.namedItem('equation') as HTMLInputElement;
    const text = input.value;
    try {
      const parsed = formParse(text, 'equation');
      const r = constructionAdd(this.doc.value, { construction: { kind: 'curve-equation', parents: [], params: { equation: text } }, style: { colour: curveColour(this.doc.value) } });
      docCommit({ ...r.doc, activeCurve: r.id });
      this.error = null;
      input.value = '';
      noticeShow('done', `${constructionObject(r.doc, r.id)?.label}: ${formToText(parsed.form, { affine: true })} = 0 added and made active.`, 'equation');
    } catch (err) {
      if (err instanceof ParseError) this.error = { message: err.message, column: err.column, text };
      else if (err instanceof NinefoldError) this.error = { message: err.message, column: 1, text };
      else throw err;
    }
  }

  private submitLine(e: Event): void {
    e.preventDefault();
    const input = (e.currentTarget as HTMLFormElement).elements.namedItem('line') as HTMLInputElement;
    const text = input.value;
    try {
      const at = lineTextParse(text);
      const r = constructionAdd(this.doc.value, { construction: { kind: 'line-equation', parents: [], params: { at: pointToString(at) } } });
      docCommit(r.doc);
      $selection.set([r.id]);
      this.lineError = null;
      input.value = '';
      noticeShow('done', `${constructionObject(r.doc, r.id)?.label}: the line ${at.join(':')} added.`, 'equation');
    } catch (err) {
      if (err instanceof ParseError) this.lineError = { message: err.message, column: err.column, text };
      else if (err instanceof NinefoldError) this.lineError = { message: err.message, column: 1, text };
      else throw err;
    }
  }

  private fromPoints(kind: ConstructionKind, n: number): void {
    const doc = this.doc.value;
    const sel = $selection.get().filter((id) => constructionObject(doc, id)?.type === 'point');
    if (sel.length !== n) {
      noticeShow('error', `Select exactly ${n} points first (shift-click on the canvas); ${sel.length} selected.`, 'equation');
      return;
    }
    try {
      const r = constructionAdd(doc, { construction: { kind, parents: sel, params: kind === 'pencil-member' ? { member: '1:0' } : {} }, style: { colour: curveColour(doc) } });
      docCommit({ ...r.doc, activeCurve: r.id });
      const v = $values.get().get(r.id);
      if (v?.type === 'failure') noticeShow('error', v.message, 'equation');
      else noticeShow('done', `${constructionObject(r.doc, r.id)?.label} built from ${n} points.`, 'equation');
    } catch (err) {
      if (err instanceof NinefoldError) noticeShow('error', err.message, 'equation');
      else throw err;
    }
  }
}

/** A typed line: coefficients "a:b:c" (rationals allowed; the line aX + bY + cZ = 0) or a linear equation
 * in x, y (or X, Y, Z). Anything of another degree is refused, naming its degree. */
function lineTextParse(text: string): Line {
  const t = text.trim();
  if (t.includes(':') && !t.includes('=')) {
    if (t.split(':').length !== 3) throw new ParseError(`expected three coefficients a:b:c, found ${t.split(':').length}`, 1, 'line');
    try {
      return pointParse(t, 'line');
    } catch (err) {
      // pointParse speaks of points; all-zero coefficients are the one shape error left for a line.
      if (err instanceof ParseError || !(err instanceof InvalidInput)) throw err;
      throw new InvalidInput('all three coefficients are zero, and 0:0:0 is no line', 'line');
    }
  }
  const { form } = formParse(text, 'line');
  if (form.degree !== 1) {
    throw new InvalidInput(`not a line: this equation has degree ${form.degree}; a line is ax + by + c = 0 (or a:b:c)`, 'line');
  }
  // Degree-1 monomials in the order X, Y, Z (src/poly/form.ts), so the coefficients are a:b:c as they stand.
  return pointParse(form.coeffs.map(String).join(':'), 'line');
}
