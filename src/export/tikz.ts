// Display list -> TikZ: a standalone LaTeX file (compiles on its own with pdflatex) and a snippet (one
// tikzpicture to paste into a paper that loads tikz). Units are points, the origin at the bottom left
// of the view, the drawing clipped to the view; colours are defined inside the picture, so the snippet
// carries everything it needs. Labels are escaped for LaTeX, so no label can run as a command. The exact
// facts of the scene are written as % comments, one line per object.
import type { DisplayItem } from '../../shaders-free-render/display-list.ts';
import { dotExactNote, dotShape, greyscaleDistinguish, inkOf, num, outlineInk, pageFrame, polylineThin, styleOf, type FigureFact, type FigureInput, type PageFrame } from './figure.ts';
import { factLine } from './svg.ts';

const LATEX_SPECIAL: Record<string, string> = {
  '\\': '\\textbackslash{}',
  '{': '\\{',
  '}': '\\}',
  $: '\\$',
  '&': '\\&',
  '#': '\\#',
  '^': '\\textasciicircum{}',
  _: '\\_',
  '%': '\\%',
  '~': '\\textasciitilde{}',
  '<': '\\textless{}',
  '>': '\\textgreater{}',
  '|': '\\textbar{}',
  '"': "''",
  '\u2212': '\\ensuremath{-}',
  '\u00b7': '\\ensuremath{\\cdot}',
  '\u00d7': '\\ensuremath{\\times}',
  '\u221e': '\\ensuremath{\\infty}',
  '\u2032': '\\ensuremath{\\prime}',
};

/** A label as LaTeX text: specials escaped, Latin-1 letters kept, other characters shown as '?'. */
export function latexText(s: string): string {
  let out = '';
  for (const ch of s.replace(/[\r\n\t]+/g, ' ')) {
    const code = ch.codePointAt(0)!;
    if (LATEX_SPECIAL[ch] !== undefined) out += LATEX_SPECIAL[ch];
    else if (code < 0x20 || code === 0x7f) continue;
    else if (code < 0x7f || (code >= 0xc0 && code <= 0xff && code !== 0xd7 && code !== 0xf7)) out += ch;
    else out += '?';
  }
  return out;
}

/** A comment line: no line break can end the comment early and start a command. */
function latexComment(s: string): string {
  return `% ${s.replace(/[\r\n]+/g, ' ')}`;
}

export function figureToTikzSnippet(given: FigureInput): string {
  const input = given.options?.greyscale ? { ...given, list: greyscaleDistinguish(given.list) } : given;
  const f = pageFrame(input.view, input.options);
  const facts = new Map(input.facts.map((x) => [x.id, x]));
  const colours = new Map<string, string>();
  const colour = (c: string): string => {
    const ink = (c === '#ffffff' ? c : inkOf(c, f.greyscale)).slice(1).toUpperCase();
    let name = colours.get(ink);
    if (!name) {
      name = `nf${String.fromCharCode(97 + (colours.size % 26))}${Math.floor(colours.size / 26) || ''}`;
      colours.set(ink, name);
    }
    return name;
  };
  const body: string[] = [];
  const order = (it: DisplayItem) => (it.kind === 'label' ? 2 : it.kind === 'dot' ? 1 : 0);
  for (const item of [...input.list.items].sort((a, b) => order(a) - order(b))) {
    body.push(...itemTikz(input, f, item, item.owner ? facts.get(item.owner) : undefined, colour));
  }
  const out: string[] = [];
  out.push('% Ninefold figure (TikZ). Needs \\usepackage{tikz} in the preamble.');
  const e = input.view.exact;
  out.push(latexComment(e ? `view ${e.xmin} <= x <= ${e.xmax}, ${e.ymin} <= y <= ${e.ymax}` : `view ${input.view.xmin} <= x <= ${input.view.xmax}, ${input.view.ymin} <= y <= ${input.view.ymax}`));
  out.push(latexComment(`page: ${num(f.widthPt)}pt x ${num(f.heightPt)}pt, 1 unit = 1pt; world (x, y) -> ((x - xmin) * ${num(f.widthPt / (input.view.xmax - input.view.xmin), 6)}, (y - ymin) * ${num(f.heightPt / (input.view.ymax - input.view.ymin), 6)})`));
  for (const fact of input.facts) out.push(latexComment(factLine(fact)));
  out.push('\\begin{tikzpicture}[x=1pt,y=1pt,line cap=round,line join=round]');
  for (const [ink, name] of colours) out.push(`\\definecolor{${name}}{HTML}{${ink}}`);
  out.push(`\\useasboundingbox (0,0) rectangle (${num(f.widthPt)},${num(f.heightPt)});`);
  out.push('\\begin{scope}');
  out.push(`\\clip (0,0) rectangle (${num(f.widthPt)},${num(f.heightPt)});`);
  out.push(...body);
  out.push('\\end{scope}');
  out.push('\\end{tikzpicture}');
  return out.join('\n') + '\n';
}

export function figureToTikzStandalone(input: FigureInput): string {
  const title = input.options?.title;
  return [
    '\\documentclass[tikz,border=2pt]{standalone}',
    ...(title ? [latexComment(`title: ${title}`)] : []),
    '\\begin{document}',
    figureToTikzSnippet(input).trimEnd(),
    '\\end{document}',
    '',
  ].join('\n');
}

/** TeX keeps a whole path in memory: long curves are written in pieces that join end to end. */
const CHUNK = 300;

function itemTikz(input: FigureInput, f: PageFrame, item: DisplayItem, fact: FigureFact | undefined, colour: (c: string) => string): string[] {
  const s = styleOf(input.list, item);
  const V = (y: number) => f.heightPt - f.v(y);
  const width = `line width=${num(Math.max(0.1, s.width * f.ptPerPx), 2)}pt`;
  const dash = s.dash.length > 0 ? `, dash pattern=${s.dash.map((d, k) => `${k % 2 ? 'off' : 'on'} ${num(d * f.ptPerPx, 2)}pt`).join(' ')}` : '';
  const opts = `draw=${colour(s.stroke)}, ${width}${dash}`;
  switch (item.kind) {
    case 'polyline': {
      const pts = polylineThin(item.points, f.u, V, 0.5);
      if (pts.length < 4) return [];
      const lines: string[] = [];
      const n = pts.length / 2;
      for (let start = 0; start < n - 1; start += CHUNK) {
        const end = Math.min(n - 1, start + CHUNK);
        const coords: string[] = [];
        for (let k = start; k <= end; k++) coords.push(`(${num(pts[2 * k], 2)},${num(pts[2 * k + 1], 2)})`);
        const close = item.closed && end === n - 1 && start === 0 ? ' -- cycle' : '';
        lines.push(`\\draw[${opts}] ${coords.join(' -- ')}${close};`);
      }
      return lines;
    }
    case 'segment':
      return [`\\draw[${opts}] (${num(f.u(item.x0), 2)},${num(V(item.y0), 2)}) -- (${num(f.u(item.x1), 2)},${num(V(item.y1), 2)});`];
    case 'dot': {
      const r = num(Math.max(0.6, s.radius * f.ptPerPx), 2);
      const at = `(${num(f.u(item.x), 2)},${num(V(item.y), 2)})`;
      const exact = dotExactNote(fact, item.role);
      const note = exact ? ` % ${fact!.label.replace(/[\r\n]+/g, ' ')} = ${exact}` : '';
      const shape = dotShape(s, item.role);
      if (shape.ring) return [`\\draw[${opts}] ${at} circle[radius=${r}pt];${note}`];
      const outline = shape.outline ? `, draw=${colour(outlineInk(s.stroke, f.greyscale))}, ${width}` : '';
      return [`\\filldraw[fill=${colour(s.fill)}${outline || ', draw=none'}] ${at} circle[radius=${r}pt];${note}`];
    }
    case 'label':
      return [
        `\\node[anchor=base west, inner sep=0pt, text=${colour(s.stroke)}, font=\\fontsize{${num(f.fontSizePt, 1)}}{${num(f.fontSizePt * 1.2, 1)}}\\selectfont] at (${num(f.u(item.x), 2)},${num(V(item.y), 2)}) {${latexText(item.text)}};`,
      ];
  }
}
