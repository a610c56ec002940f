// TikZ figures: LaTeX-safe labels, comments that cannot end early, a self-contained snippet.
import { describe, expect, it } from 'vitest';
import type { DisplayList } from '../../../shaders-free-render/display-list.ts';
import { figureToTikzSnippet, figureToTikzStandalone, latexText } from '../../../src/export/tikz.ts';
import type { FigureInput } from '../../../src/export/figure.ts';

function input(label: string): FigureInput {
  const pts: number[] = [];
  for (let k = 0; k <= 2000; k++) pts.push(-4 + (8 * k) / 2000, Math.sin(k / 100));
  const list: DisplayList = {
    items: [
      { kind: 'polyline', points: pts, closed: false, ends: null, style: 's', owner: 'c1' },
      { kind: 'dot', x: 1, y: 2, role: 'point', style: 's', owner: 'p1' },
      { kind: 'label', x: 1.1, y: 2.1, text: label, style: 's', owner: 'p1' },
    ],
    styles: { s: { stroke: '#1f5fa8', width: 2, fill: '#1f5fa8', radius: 3, dash: [6, 3], fontSize: 12 } },
  };
  return {
    list,
    view: { xmin: -4, xmax: 4, ymin: -3, ymax: 3 },
    facts: [{ id: 'p1', label: `${label}\n\\input{evil}`, type: 'point', status: 'exact', exact: '1:2:1' }],
  };
}

describe('TikZ export', () => {
  it('escapes every LaTeX special in labels', () => {
    expect(latexText('\\input{/etc/passwd} $x^2_1$ 100% #1 & ~')).toBe(
      '\\textbackslash{}input\\{/etc/passwd\\} \\$x\\textasciicircum{}2\\_1\\$ 100\\% \\#1 \\& \\textasciitilde{}',
    );
    expect(latexText('P\u2212Q \u00e9\u00d7\u{1F600}')).toBe('P\\ensuremath{-}Q \u00e9\\ensuremath{\\times}?');
  });
  it('writes the label as a node text with nothing left unescaped', () => {
    const t = figureToTikzSnippet(input('\\write18{rm -rf /}'));
    expect(t).toContain('{\\textbackslash{}write18\\{rm -rf /\\}};');
    // A line break in a fact cannot end the comment and start a command.
    for (const line of t.split('\n')) expect(line.startsWith('\\input')).toBe(false);
  });
  it('is a tikzpicture in points, clipped to the view, with colours defined inside', () => {
    const t = figureToTikzSnippet(input('P'));
    expect(t).toMatch(/^% Ninefold figure/);
    expect(t).toContain('\\begin{tikzpicture}[x=1pt,y=1pt');
    expect(t).toContain('\\definecolor{nfa}{HTML}{1F5FA8}');
    expect(t).toContain('\\clip (0,0) rectangle (360,270);');
    expect(t).toContain('dash pattern=on 3.6pt off 1.8pt');
    // the dot at (1, 2): u = 225, v from the bottom = (2 + 3) * 45 = 225
    expect(t).toContain('\\filldraw[fill=nfa, draw=none] (225,225) circle[radius=1.8pt]; % P');
    expect(t).toContain('% point P \\input{evil} [p1]; exact; 1:2:1');
  });
  it('writes long curves in pieces TeX can hold', () => {
    const t = figureToTikzSnippet(input('P'));
    const draws = t.split('\n').filter((l) => l.startsWith('\\draw'));
    expect(draws.length).toBeGreaterThan(1);
    for (const d of draws) expect(d.split(' -- ').length).toBeLessThanOrEqual(301);
  });
  it('the standalone file wraps the snippet in a document', () => {
    const s = figureToTikzStandalone(input('P'));
    expect(s.startsWith('\\documentclass[tikz,border=2pt]{standalone}')).toBe(true);
    expect(s).toContain(figureToTikzSnippet(input('P')).trimEnd());
    expect(s.trimEnd().endsWith('\\end{document}')).toBe(true);
  });
});
