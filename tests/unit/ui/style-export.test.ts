// A style set through constructionStyle reaches the one display list and the figure exporters: colour,
// dash pattern, width, hidden objects and hidden labels (the page and the figure read the same style).
import { describe, expect, it } from 'vitest';
import { constructionAdd, constructionEmpty, constructionStyle } from '../../../src/construct/graph.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { constructionDisplayList } from '../../../src/export/display.ts';
import { constructionFacts } from '../../../src/export/facts.ts';
import { figureToSvg } from '../../../src/export/svg.ts';
import { figureToTikzSnippet } from '../../../src/export/tikz.ts';
import type { ConstructionDoc } from '../../../src/construct/types.ts';

const view = { xmin: -4, xmax: 4, ymin: -3, ymax: 3 };

function build() {
  let doc = constructionEmpty();
  const add = (kind: string, params: Record<string, string>, label: string) => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents: [], params }, label });
    doc = r.doc;
    return r.id;
  };
  const e = add('curve-equation', { equation: 'y^2 = x^3 - 3x + 3' }, 'Curly');
  const l = add('line-equation', { at: '1:-2:1' }, 'Straight');
  return { doc, e, l };
}

function listOf(doc: ConstructionDoc) {
  return constructionDisplayList(doc, constructionEvaluate(doc), { ...view, widthPx: 640, heightPx: 480 });
}

function svgOf(doc: ConstructionDoc): string {
  const values = constructionEvaluate(doc);
  return figureToSvg({ list: constructionDisplayList(doc, values, { ...view, widthPx: 640, heightPx: 480 }), view, facts: constructionFacts(doc, values) });
}

describe('styles reach the display list and the figures', () => {
  it('draws a curve in its chosen colour, dash and width, in the list and in SVG and TikZ', () => {
    const b = build();
    const doc = constructionStyle(b.doc, b.e, { colour: '#7a1f3d', stroke: 'dashed', width: 3 });
    const list = listOf(doc);
    const curve = list.items.find((i) => i.owner === b.e && i.kind === 'polyline')!;
    expect(list.styles[curve.style]).toMatchObject({ stroke: '#7a1f3d', width: 3 });
    expect(list.styles[curve.style].dash.length).toBeGreaterThan(0);
    const plain = listOf(b.doc);
    expect(plain.styles[plain.items.find((i) => i.owner === b.e && i.kind === 'polyline')!.style].dash).toEqual([]);
    const svg = svgOf(doc);
    expect(svg.toLowerCase()).toContain('#7a1f3d');
    expect(svg).toMatch(/stroke-dasharray/);
    expect(svgOf(b.doc)).not.toMatch(/stroke-dasharray/);
    const values = constructionEvaluate(doc);
    const tikz = figureToTikzSnippet({ list: constructionDisplayList(doc, values, { ...view, widthPx: 640, heightPx: 480 }), view, facts: constructionFacts(doc, values) });
    expect(tikz.toLowerCase()).toMatch(/7a1f3d/);
    expect(tikz).toMatch(/dash/);
  });

  it('hides a label, then the object itself', () => {
    const b = build();
    const text = (doc: ConstructionDoc) => listOf(doc).items.filter((i) => i.kind === 'label').map((i) => (i as { text: string }).text);
    expect(text(b.doc)).toContain('Curly');
    const noLabel = constructionStyle(b.doc, b.e, { showLabel: false });
    expect(text(noLabel)).not.toContain('Curly');
    expect(listOf(noLabel).items.some((i) => i.owner === b.e && i.kind === 'polyline')).toBe(true);
    expect(svgOf(noLabel)).not.toMatch(/>Curly</);
    const hidden = constructionStyle(b.doc, b.l, { visible: false });
    expect(listOf(hidden).items.filter((i) => i.owner === b.l)).toEqual([]);
    expect(listOf(b.doc).items.filter((i) => i.owner === b.l).length).toBeGreaterThan(0);
  });
});
