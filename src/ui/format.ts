// Objects as text to read and copy: plain text and LaTeX, exact where the value is exact.
import { rat, ratToString, type Rational } from '../exact/rational.ts';
import { formToLatex, formToText } from '../poly/print.ts';
import { formFromCoeffs } from '../poly/form.ts';
import { pointHeight } from '../cubic/height.ts';
import { KINDS } from '../construct/kinds.ts';
import type { ConstructionDoc, ConstructionObject, ObjectValue } from '../construct/types.ts';

function latexRat(q: Rational): string {
  if (q.den === 1n) return q.num.toString();
  return `${q.num < 0n ? '-' : ''}\\frac{${q.num < 0n ? -q.num : q.num}}{${q.den}}`;
}

/** Plain text and LaTeX of an object's value, or null when there is nothing exact to show. */
export function valueText(v: ObjectValue): { text: string; latex: string } | null {
  if (v.type === 'point') {
    if (v.exact) {
      const [x, y, z] = v.exact;
      if (z === 0n) return { text: `(${x}:${y}:0) at infinity`, latex: `(${x}:${y}:0)` };
      const qx = rat(x, z);
      const qy = rat(y, z);
      return { text: `(${ratToString(qx)}, ${ratToString(qy)})`, latex: `\\left(${latexRat(qx)}, ${latexRat(qy)}\\right)` };
    }
    const a = v.approx;
    const t = a.finite ? `(${a.x.toPrecision(12)}, ${a.y.toPrecision(12)})` : `direction (${a.x.toPrecision(8)} : ${a.y.toPrecision(8)} : 0)`;
    return { text: `≈ ${t}`, latex: `\\approx ${t}` };
  }
  if (v.type === 'line') {
    if (!v.exact) {
      const [a, b, c] = v.approx.map((t) => t.toPrecision(8));
      return { text: `≈ (${a})x + (${b})y + (${c}) = 0`, latex: '' };
    }
    const f = formFromCoeffs(1, [...v.exact]);
    return { text: `${formToText(f, { affine: true })} = 0`, latex: `${formToLatex(f, { affine: true })} = 0` };
  }
  if (v.type === 'curve') {
    if (!v.form) return null;
    return { text: `${formToText(v.form, { affine: true })} = 0`, latex: `${formToLatex(v.form, { affine: true })} = 0` };
  }
  if (v.type === 'check') return { text: `${v.claim}: ${v.verdict} (${v.certificate})`, latex: '' };
  return null;
}

export function pointHeightText(v: ObjectValue): string | null {
  return v.type === 'point' && v.exact ? pointHeight(v.exact).toString() : null;
}

/** How the object was built, in words with its parents' labels. */
export function builtText(doc: ConstructionDoc, o: ConstructionObject): string {
  const spec = KINDS[o.construction.kind];
  const names = o.construction.parents.map((p) => doc.objects.find((q) => q.id === p)?.label ?? p);
  const params = Object.entries(o.construction.params)
    .filter(([k]) => k !== 'equation')
    .map(([k, v]) => `${k} = ${v}`);
  const parts = [spec.words];
  if (names.length) parts.push(`from ${names.join(', ')}`);
  if (params.length) parts.push(`(${params.join('; ')})`);
  return parts.join(' ');
}
