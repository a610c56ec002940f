// Display list -> SVG figure. Page units are points; the drawing is clipped to the view; every label is
// written as escaped text (a label "<script>" stays those characters, it never becomes markup); the exact
// facts of the scene go into <metadata> (as JSON) and into one comment line per object.
import type { DisplayItem } from '../../shaders-free-render/display-list.ts';
import { dotExactNote, dotShape, greyscaleDistinguish, inkOf, num, outlineInk, pageFrame, polylineThin, styleOf, type FigureFact, type FigureInput, type PageFrame } from './figure.ts';

/** Text for XML content and attribute values: the five special characters escaped, control characters dropped. */
export function xmlText(s: string): string {
  return s
    .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]/g, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/** A comment may not contain "--" nor end in "-". */
function xmlComment(s: string): string {
  return `<!-- ${xmlText(s).replace(/-(?=-)/g, '- ').replace(/-$/, '- ')} -->`;
}

export function figureToSvg(given: FigureInput): string {
  const input = given.options?.greyscale ? { ...given, list: greyscaleDistinguish(given.list) } : given;
  const f = pageFrame(input.view, input.options);
  const facts = new Map(input.facts.map((x) => [x.id, x]));
  const out: string[] = [];
  const W = num(f.widthPt);
  const H = num(f.heightPt);
  out.push('<?xml version="1.0" encoding="UTF-8"?>');
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${W}pt" height="${H}pt" viewBox="0 0 ${W} ${H}">`,
  );
  const title = input.options?.title;
  if (title) out.push(`<title>${xmlText(title)}</title>`);
  out.push(`<desc>${xmlText(viewWords(input))}</desc>`);
  out.push(`<metadata id="ninefold-facts">${xmlText(JSON.stringify({ view: input.view.exact ?? null, objects: input.facts }))}</metadata>`);
  for (const fact of input.facts) out.push(xmlComment(factLine(fact)));
  out.push(`<defs><clipPath id="view"><rect x="0" y="0" width="${W}" height="${H}"/></clipPath></defs>`);
  out.push('<rect x="0" y="0" width="100%" height="100%" fill="#ffffff"/>');
  out.push('<g clip-path="url(#view)" stroke-linecap="round" stroke-linejoin="round">');
  // Strokes first, then dots, then labels on top: what a reader must find is never hidden.
  const order = (it: DisplayItem) => (it.kind === 'label' ? 2 : it.kind === 'dot' ? 1 : 0);
  const items = [...input.list.items].sort((a, b) => order(a) - order(b));
  for (const item of items) out.push(itemSvg(input, f, item, item.owner ? facts.get(item.owner) : undefined));
  out.push('</g>');
  out.push('</svg>');
  return out.join('\n') + '\n';
}

function itemSvg(input: FigureInput, f: PageFrame, item: DisplayItem, fact: FigureFact | undefined): string {
  const s = styleOf(input.list, item);
  const owner = item.owner ? ` data-owner="${xmlText(item.owner)}"` : '';
  const stroke = inkOf(s.stroke, f.greyscale);
  const width = num(Math.max(0.1, s.width * f.ptPerPx), 2);
  const dash = s.dash.length > 0 ? ` stroke-dasharray="${s.dash.map((d) => num(d * f.ptPerPx, 2)).join(' ')}"` : '';
  switch (item.kind) {
    case 'polyline': {
      const pts = polylineThin(item.points, f.u, f.v, 0.15);
      if (pts.length < 4) return '';
      let d = `M${num(pts[0])} ${num(pts[1])}`;
      for (let k = 2; k < pts.length; k += 2) d += `L${num(pts[k])} ${num(pts[k + 1])}`;
      if (item.closed) d += 'Z';
      return `<path${owner} d="${d}" fill="none" stroke="${stroke}" stroke-width="${width}"${dash}/>`;
    }
    case 'segment':
      return `<line${owner} x1="${num(f.u(item.x0))}" y1="${num(f.v(item.y0))}" x2="${num(f.u(item.x1))}" y2="${num(f.v(item.y1))}" stroke="${stroke}" stroke-width="${width}"${dash}/>`;
    case 'dot': {
      const r = num(Math.max(0.6, s.radius * f.ptPerPx), 2);
      const at = `cx="${num(f.u(item.x))}" cy="${num(f.v(item.y))}" r="${r}"`;
      const note = dotExactNote(fact, item.role);
      const exact = note ? ` data-exact="${xmlText(note)}"` : '';
      const shape = dotShape(s, item.role);
      if (shape.ring) return `<circle${owner}${exact} ${at} fill="none" stroke="${stroke}" stroke-width="${width}"${dash}/>`;
      const fill = inkOf(s.fill, f.greyscale);
      const outline = shape.outline ? ` stroke="${outlineInk(s.stroke, f.greyscale)}" stroke-width="${width}"` : '';
      return `<circle${owner}${exact} ${at} fill="${fill}"${outline}/>`;
    }
    case 'label':
      return `<text${owner} x="${num(f.u(item.x))}" y="${num(f.v(item.y))}" font-family="${xmlText(f.fontFamily)}" font-size="${num(f.fontSizePt, 2)}" fill="${stroke}">${xmlText(item.text)}</text>`;
  }
}

/** One line of text per object: what a reader of the file needs to redo the figure exactly. */
export function factLine(x: FigureFact): string {
  const parts = [`${x.type} ${x.label} [${x.id}]`, x.status];
  if (x.equation) parts.push(`equation ${x.equation}`);
  if (x.coefficients) parts.push(`coefficients (${x.coefficients.join(', ')})`);
  if (x.exact) parts.push(x.exact);
  if (x.approx) parts.push(`approx ${x.approx}`);
  if (x.note) parts.push(x.note);
  return parts.join('; ');
}

function viewWords(input: FigureInput): string {
  const e = input.view.exact;
  return e ? `view ${e.xmin} <= x <= ${e.xmax}, ${e.ymin} <= y <= ${e.ymax}` : `view ${input.view.xmin} <= x <= ${input.view.xmax}, ${input.view.ymin} <= y <= ${input.view.ymax}`;
}
