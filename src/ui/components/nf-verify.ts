// Verify: make a check from the selected objects; every check stays, is re-decided after each change and
// shows holds / fails with its exact certificate (or what floats saw, on algebraic data).
import { LitElement, css, html } from 'lit';
import { customElement } from 'lit/decorators.js';
import { StoreController } from '@nanostores/lit';
import { NinefoldError } from '../../exact/errors.ts';
import { constructionAdd, constructionObject } from '../../construct/graph.ts';
import type { CheckValue, ConstructionKind, ObjectId, ObjectType } from '../../construct/types.ts';
import { $doc, $values, docCommit } from '../stores/construction.ts';
import { $selection, noticeShow } from '../stores/interaction.ts';
import { theme } from './theme.ts';

interface CheckButton {
  readonly kind: ConstructionKind;
  readonly name: string;
  readonly needs: string;
  /** From the selection (in order) and the active curve: the parents, or a refusal in words. */
  readonly parents: (sel: { id: ObjectId; type: ObjectType }[], curve: ObjectId | null) => ObjectId[] | string;
}

const ofType = (sel: { id: ObjectId; type: ObjectType }[], t: ObjectType): ObjectId[] => sel.filter((s) => s.type === t).map((s) => s.id);

const CHECKS: readonly CheckButton[] = [
  { kind: 'check-collinear', name: 'Collinear?', needs: 'three or more points', parents: (s) => (ofType(s, 'point').length >= 3 ? ofType(s, 'point') : 'select three or more points') },
  { kind: 'check-concurrent', name: 'Concurrent?', needs: 'three or more lines', parents: (s) => (ofType(s, 'line').length >= 3 ? ofType(s, 'line') : 'select three or more lines') },
  {
    kind: 'check-on-curve', name: 'On the curve?', needs: 'a point (and a curve, else the active one)',
    parents: (s, c) => {
      const p = ofType(s, 'point');
      const cv = ofType(s, 'curve')[0] ?? c;
      return p.length === 1 && cv ? [p[0], cv] : 'select one point (and a curve, or make one active)';
    },
  },
  { kind: 'check-equal', name: 'Equal?', needs: 'two points', parents: (s) => (ofType(s, 'point').length === 2 ? ofType(s, 'point') : 'select exactly two points') },
  { kind: 'check-nine', name: 'Base of a pencil?', needs: 'nine points', parents: (s) => (ofType(s, 'point').length === 9 ? ofType(s, 'point') : 'select exactly nine points') },
  {
    kind: 'check-associative', name: '(P+Q)+R = P+(Q+R)?', needs: 'O, P, Q, R in that order',
    parents: (s, c) => {
      const p = ofType(s, 'point');
      return p.length === 4 && c ? [c, ...p] : 'select four points in order: the base point O, then P, Q, R (on the active cubic)';
    },
  },
];

@customElement('nf-verify')
export class NfVerify extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      .buttons { display: flex; flex-wrap: wrap; gap: 4px; }
      ul { list-style: none; margin: 8px 0 0; padding: 0; }
      li { border: 1px solid var(--rule); border-radius: 4px; padding: 5px 7px; margin-bottom: 5px; background: var(--paper); cursor: pointer; }
      li[aria-selected='true'] { border-color: var(--focus); }
      .claim { font-weight: 600; }
      .cert { margin-top: 2px; }
      .remark { margin-top: 2px; font-style: italic; }
    `,
  ];

  private readonly doc = new StoreController(this, $doc);
  private readonly values = new StoreController(this, $values);
  private readonly selection = new StoreController(this, $selection);

  protected override render(): unknown {
    const doc = this.doc.value;
    const checks = doc.objects.filter((o) => o.type === 'check');
    const sel = new Set(this.selection.value);
    return html`<div class="buttons" role="group" aria-label="Make a check from the selection">
        ${CHECKS.map((c) => html`<button data-check=${c.kind} title="Needs ${c.needs}" @click=${() => this.make(c)}>${c.name}</button>`)}
      </div>
      <ul aria-label="Checks" aria-live="polite">
        ${checks.map((o) => {
          const v = this.values.value.get(o.id);
          if (!v || v.type !== 'check') {
            return html`<li data-id=${o.id}><span class="claim">${o.label}</span> <span class="verdict-undecided">cannot be decided now</span>
              <div class="cert soft">${v?.type === 'failure' ? v.message : ''}</div></li>`;
          }
          const c = v as CheckValue;
          return html`<li data-id=${o.id} aria-selected=${sel.has(o.id) ? 'true' : 'false'} @click=${() => $selection.set([o.id])}>
            <div><span class="claim">${o.label}: ${c.claim}</span></div>
            <div><span class="verdict verdict-${c.verdict}">${c.verdict}</span> <span class="soft status-${c.status}">${c.status} data</span></div>
            <div class="cert mono">${c.certificate}</div>
            ${c.remark ? html`<div class="remark">${c.remark}</div>` : ''}
          </li>`;
        })}
      </ul>`;
  }

  private make(c: CheckButton): void {
    const doc = $doc.get();
    const sel = $selection.get()
      .map((id) => constructionObject(doc, id))
      .filter((o) => o !== undefined)
      .map((o) => ({ id: o.id, type: o.type }));
    const parents = c.parents(sel, doc.activeCurve);
    if (typeof parents === 'string') {
      noticeShow('error', `${c.name} needs ${c.needs}: ${parents}.`, 'verify');
      return;
    }
    try {
      const r = constructionAdd(doc, { construction: { kind: c.kind, parents, params: {} } });
      docCommit(r.doc);
      const v = $values.get().get(r.id);
      if (v?.type === 'check') noticeShow(v.verdict === 'fails' ? 'error' : 'done', `${v.claim}: ${v.verdict}.`, 'verify');
      else if (v?.type === 'failure') noticeShow('error', v.message, 'verify');
    } catch (e) {
      if (e instanceof NinefoldError) noticeShow('error', e.message, 'verify');
      else throw e;
    }
  }
}
