// "Try on random instances": every free point of the open scene re-drawn as a random exact point, every
// check decided again, N times, as a job of the job worker (src/worker), with a progress bar and a cancel
// button. The result says how
// many instances held; the first counterexample of a check opens or saves as a scene.
import { LitElement, css, html } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import type { TrialCheckReport, TrialReport } from '../../construct/trials.ts';
import { sceneCounterexample } from '../../scene/counterexample.ts';
import { sceneFileName, sceneToText } from '../../scene/save.ts';
import type { Scene } from '../../scene/scene.ts';
import { theme } from '../components/theme.ts';
import { sceneCurrent, sceneOpen } from '../scene-file/bridge.ts';
import { fileDownload } from '../scene-file/files.ts';
import type { JobReply } from '../../worker/jobs.ts';
import { JobChannel } from '../job-client.ts';

type Phase = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

@customElement('nf-trials')
export class NfTrials extends LitElement {
  static override styles = [
    theme,
    css`
      :host { display: block; }
      .row { display: flex; flex-wrap: wrap; gap: 6px; align-items: center; }
      input[type='number'] { width: 6em; }
      progress { width: 100%; margin: 6px 0; }
      table { border-collapse: collapse; width: 100%; margin-top: 4px; }
      th, td { text-align: left; padding: 2px 4px; border-bottom: 1px solid var(--rule); vertical-align: top; }
      td.n { text-align: right; font-variant-numeric: tabular-nums; }
      .holds { color: var(--holds); }
      .fails { color: var(--fails); }
      .note { color: var(--ink-soft); overflow-wrap: anywhere; }
    `,
  ];

  @state() private count = 50;
  @state() private seed = 1;
  @state() private phase: Phase = 'idle';
  @state() private done = 0;
  @state() private total = 0;
  @state() private checks: readonly TrialCheckReport[] = [];
  @state() private note = '';
  private readonly channel = new JobChannel(
    (r) => this.reply(r),
    (message) => {
      this.phase = 'failed';
      this.note = `The trials worker failed: ${message}`;
    },
  );
  /** The scene the running or last trials were made from (the counterexample keeps its title, view, styles). */
  private source: Scene | null = null;

  override disconnectedCallback(): void {
    this.channel.cancel();
    super.disconnectedCallback();
  }

  public start(): void {
    const scene = sceneCurrent();
    if (!scene.doc.objects.some((o) => o.type === 'check')) {
      this.phase = 'failed';
      this.note = 'The scene has no checks to try: add one (Verify) first.';
      return;
    }
    if (this.channel.busy) this.channel.cancel();
    this.source = scene;
    this.phase = 'running';
    this.done = 0;
    this.total = this.count;
    this.checks = [];
    this.note = '';
    this.channel.send({ kind: 'trials', doc: scene.doc, count: this.count, seed: this.seed });
  }

  public cancel(): void {
    if (this.phase !== 'running') return;
    this.channel.cancel();
    this.phase = 'cancelled';
    this.note = `Cancelled after ${this.done} of ${this.total} instances; the counts below are for those.`;
  }

  private reply(r: JobReply): void {
    if (r.kind === 'progress') {
      this.done = r.done;
      this.total = r.total;
      this.checks = r.checks ?? this.checks;
    } else if (r.kind === 'trials') {
      this.finish(r.report);
    } else if (r.kind === 'error') {
      this.phase = 'failed';
      this.note = `${r.message}${r.where ? ` (at ${r.where})` : ''}`;
    }
  }

  private finish(report: TrialReport): void {
    this.phase = 'done';
    this.done = report.completed;
    this.checks = report.checks;
    const ways = Object.values(report.redrawn);
    const alg = ways.filter((w) => w === 'random real algebraic point of the curve').length;
    const kept = ways.filter((w) => w === 'kept in place').length;
    const plural = (n: number) => `${n} point${n === 1 ? '' : 's'}`;
    this.note =
      `${report.completed} random instances (seed ${report.seed}).` +
      (alg ? ` ${plural(alg)} on curves with no known rational point became real algebraic points (checks on them may stay undecided).` : '') +
      (kept ? ` ${plural(kept)} on curves that are not exact kept ${kept === 1 ? 'its place' : 'their places'}.` : '');
  }

  private counterexample(c: TrialCheckReport): Scene | null {
    return c.firstFailure && this.source ? sceneCounterexample(this.source, c.label, c.firstFailure) : null;
  }

  private openFailure(c: TrialCheckReport): void {
    const s = this.counterexample(c);
    if (s) sceneOpen(s);
  }

  private saveFailure(c: TrialCheckReport): void {
    const s = this.counterexample(c);
    if (s) fileDownload(sceneFileName(s), sceneToText(s));
  }

  private int(e: Event, lo: number, hi: number, fallback: number): number {
    const v = Number((e.target as HTMLInputElement).value);
    return Number.isInteger(v) ? Math.min(hi, Math.max(lo, v)) : fallback;
  }

  protected override render() {
    const running = this.phase === 'running';
    return html`
      <div class="row">
        <label>Instances <input type="number" min="1" max="10000" .value=${String(this.count)} ?disabled=${running} @change=${(e: Event) => (this.count = this.int(e, 1, 10000, 50))} /></label>
        <label>Seed <input type="number" min="0" max="4294967295" .value=${String(this.seed)} ?disabled=${running} @change=${(e: Event) => (this.seed = this.int(e, 0, 4294967295, 1))} /></label>
        <button ?disabled=${running} @click=${() => this.start()}>Try on random instances</button>
        <button ?disabled=${!running} @click=${() => this.cancel()}>Cancel</button>
      </div>
      ${running || this.done > 0 ? html`<progress max=${this.total || 1} .value=${this.done} aria-label="Instances tried"></progress>` : ''}
      ${this.checks.length
        ? html`<table>
            <tr><th>Check</th><th>held</th><th>failed</th><th>other</th><th></th></tr>
            ${this.checks.map(
              (c) => html`<tr>
                <td>${c.label}</td>
                <td class="n holds">${c.held} ✓</td>
                <td class="n ${c.failed ? 'fails' : ''}">${c.failed} ${c.failed ? '✗' : ''}</td>
                <td class="n" title="undecided (algebraic data) / degenerate instances">${c.undecided + c.degenerate}</td>
                <td>${c.firstFailure && !running
                  ? html`<button @click=${() => this.openFailure(c)} title=${`instance ${c.firstFailure.trial}: ${c.firstFailure.certificate}`}>Open counterexample</button>
                      <button @click=${() => this.saveFailure(c)}>Save it</button>`
                  : ''}</td>
              </tr>`,
            )}
          </table>`
        : ''}
      <div class="note" role="status">${this.note}</div>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'nf-trials': NfTrials;
  }
}
