// The active curve's report as lines of words: what the core says about it, nothing recomputed here.
// Cubics get the full report (src/cubic/curve-report.ts); other degrees their equation and degree.
import { NinefoldError } from '../exact/errors.ts';
import { ratToString } from '../exact/rational.ts';
import { formToText } from '../poly/print.ts';
import type { Form } from '../poly/form.ts';
import { cubicReport, type CubicReport } from '../cubic/curve-report.ts';
import type { SingularPoint } from '../cubic/singular.ts';
import type { CurveValue } from '../construct/types.ts';

export interface ReportLine {
  readonly term: string;
  readonly text: string;
  readonly mono?: boolean;
}

const REPORTS = new WeakMap<Form, CubicReport | string>();

/** The cubic's report, made once per form; a string when the core refuses (with its message). */
export function cubicReportOf(f: Form): CubicReport | string {
  let r = REPORTS.get(f);
  if (r === undefined) {
    try {
      r = cubicReport(f);
    } catch (e) {
      if (!(e instanceof NinefoldError)) throw e;
      r = e.message;
    }
    REPORTS.set(f, r);
  }
  return r;
}

export function singularPointText(s: SingularPoint): string {
  const where = s.point ? s.point.join(':') : `≈ (${s.approx.map((x) => x.toPrecision(5)).join(' : ')})${s.real ? '' : ', not real'}`;
  const kind = s.kind === 'node' && s.realKind ? `${s.kind} (${s.realKind}${s.split === true ? ', split' : s.split === false ? ', tangents conjugate' : ''})` : s.kind;
  return `${kind} at ${where}; Milnor number ${s.milnor}`;
}

export function curveReportText(v: CurveValue): ReportLine[] {
  if (!v.form) return [{ term: 'Status', text: 'being moved: the report returns when it is exact again' }];
  const f = v.form;
  const lines: ReportLine[] = [{ term: 'Equation', text: `${formToText(f, { affine: true })} = 0`, mono: true }, { term: 'Degree', text: String(f.degree) }];
  if (f.degree !== 3) {
    lines.push({ term: 'Report', text: 'singular points, invariants and flexes are reported for cubics' });
    return lines;
  }
  const r = cubicReportOf(f);
  if (typeof r === 'string') return [...lines, { term: 'Report', text: r }];
  const sing = r.singularities;
  lines.push({ term: 'Smooth', text: sing.smooth ? 'yes' : 'no' });
  lines.push({ term: 'Components', text: sing.components.description });
  for (const s of sing.points) lines.push({ term: 'Singular point', text: singularPointText(s) });
  for (const l of sing.lines) lines.push({ term: 'Singular line', text: `${l.line.join(':')} (multiplicity ${l.multiplicity})`, mono: true });
  lines.push({ term: 'Discriminant', text: ratToString(r.invariants.discriminant), mono: true });
  lines.push({ term: 'j-invariant', text: r.invariants.j ? ratToString(r.invariants.j) : 'none (singular)', mono: true });
  if (r.realComponents) lines.push({ term: 'Real components', text: String(r.realComponents) });
  const fl = r.flexes;
  lines.push({
    term: 'Flexes',
    text: fl.degenerate ?? `${fl.count} over C, ${fl.real} real, ${fl.rational.length} rational${fl.rational.length ? ': ' + fl.rational.map((p) => p.join(':')).join(', ') : ''}`,
  });
  return lines;
}
