// SVG figures: markup-safe labels, exact facts in the metadata, world -> page coordinates, print styles.
import { describe, expect, it } from 'vitest';
import type { DisplayList } from '../../../shaders-free-render/display-list.ts';
import { figureToSvg, xmlText } from '../../../src/export/svg.ts';
import { inkOf, pageFrame, type FigureInput } from '../../../src/export/figure.ts';

const HOSTILE = [
  '<script>alert(1)</script>',
  '<svg onload="alert(1)"><image href="x" onerror="alert(2)"/></svg>',
  ']]><!-- -->&amp;"\'',
];

function input(label: string, extra: Partial<FigureInput> = {}): FigureInput {
  const list: DisplayList = {
    items: [
      { kind: 'polyline', points: [-2, -1, 0, 0, 2, 1, 3, 3], closed: false, ends: null, style: 's', owner: 'c1' },
      { kind: 'segment', x0: -4, y0: 0, x1: 4, y1: 0, style: 'd', owner: 'l1' },
      { kind: 'dot', x: 1, y: 2, role: 'point', style: 's', owner: 'p1' },
      { kind: 'dot', x: -1, y: -1, role: 'point', style: 'ring', owner: 'p2' },
      { kind: 'label', x: 1.1, y: 2.1, text: label, style: 's', owner: 'p1' },
    ],
    styles: {
      s: { stroke: '#fbf8f1', width: 2, fill: '#b8321a', radius: 3, dash: [], fontSize: 12 },
      ring: { stroke: '#b8321a', width: 2, fill: 'none', radius: 3, dash: [2.5, 2], fontSize: 12 },
      d: { stroke: '#5b6b2f', width: 1, fill: '#5b6b2f', radius: 3, dash: [6, 3], fontSize: 12 },
    },
  };
  return {
    list,
    view: { xmin: -4, xmax: 4, ymin: -3, ymax: 3, exact: { xmin: '-4', xmax: '4', ymin: '-3', ymax: '3' } },
    facts: [
      { id: 'p1', label, type: 'point', status: 'exact', exact: '1:2:1', approx: '(1, 2)' },
      { id: 'p2', label: 'Q', type: 'point', status: 'algebraic' },
      { id: 'c1', label: 'E', type: 'curve', status: 'exact', equation: 'y^2 = x^3 - x -- 1', coefficients: ['1', '0'] },
    ],
    ...extra,
  };
}

function metadataOf(svg: string): unknown {
  const m = /<metadata id="ninefold-facts">([^<]*)<\/metadata>/.exec(svg);
  const unescape = (s: string) => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, '&');
  return JSON.parse(unescape(m![1]));
}

describe('SVG export', () => {
  for (const label of HOSTILE) {
    it(`writes the label ${JSON.stringify(label)} as text, never as markup`, () => {
      const svg = figureToSvg(input(label));
      // Only the elements the exporter writes, and no attribute that could run code.
      const tags = new Set([...svg.matchAll(/<\/?([A-Za-z][\w:-]*)/g)].map((m) => m[1]));
      expect([...tags].sort()).toEqual(['circle', 'clipPath', 'defs', 'desc', 'g', 'line', 'metadata', 'path', 'rect', 'svg', 'text'].sort());
      expect(svg).not.toMatch(/\son\w+="/);
      expect(svg.match(/<svg/g)!.length).toBe(1);
      expect(svg).toContain(`>${xmlText(label)}</text>`);
      // Comments cannot be closed early by a label.
      for (const c of svg.match(/<!--[\s\S]*?-->/g) ?? []) expect(c.slice(4, -3)).not.toContain('--');
      expect((metadataOf(svg) as { objects: { label: string }[] }).objects[0].label).toBe(label);
    });
  }
  it('carries the exact facts of every object and the exact view', () => {
    const svg = figureToSvg(input('P'));
    const meta = metadataOf(svg) as { view: unknown; objects: unknown[] };
    expect(meta.view).toEqual({ xmin: '-4', xmax: '4', ymin: '-3', ymax: '3' });
    expect(meta.objects).toEqual(input('P').facts);
    expect(svg).toContain('data-exact="1:2:1"');
    expect(svg).toContain('coefficients (1, 0)');
  });
  it('writes no coordinates beside the mark of a point at infinity (it is drawn at the edge, not at its place)', () => {
    const base = input('P');
    const atInfinity: FigureInput = { ...base, facts: base.facts.map((f) => (f.id === 'p1' ? { ...f, exact: '1:2:0' } : f)) };
    const svg = figureToSvg(atInfinity);
    expect(svg).toMatch(/<circle data-owner="p1" cx="225" cy="45"/);
    expect(svg).not.toContain('data-exact=');
    expect(svg).toContain('1:2:0'); // the fact itself is still written
  });
  it('maps world to page points: 8 x 6 world units on 360 pt -> 45 pt per unit, y down', () => {
    const svg = figureToSvg(input('P'));
    expect(svg).toMatch(/width="360pt" height="270pt" viewBox="0 0 360 270"/);
    // the dot at (1, 2): u = (1 + 4) * 45 = 225, v = (3 - 2) * 45 = 45
    expect(svg).toMatch(/<circle data-owner="p1" data-exact="1:2:1" cx="225" cy="45"/);
    const f = pageFrame(input('P').view);
    expect([f.u(-4), f.u(4), f.v(3), f.v(-3)]).toEqual([0, 360, 0, 270]);
  });
  it('clips to the view, strokes in points, keeps dashes, draws dots as their style says (ring, disc)', () => {
    const svg = figureToSvg(input('P'));
    expect(svg).toContain('<clipPath id="view"><rect x="0" y="0" width="360" height="270"/></clipPath>');
    expect(svg).toContain('clip-path="url(#view)"');
    expect(svg).toMatch(/stroke-width="1.2"/); // 2 px * 0.6 pt/px
    expect(svg).toMatch(/stroke-dasharray="3.6 1.8"/);
    // the algebraic point is a ring (white fill), the exact one a disc
    expect(svg).toMatch(/<circle data-owner="p2" cx="135" cy="180" r="1.8" fill="none" stroke="#b8321a" stroke-width="1.2" stroke-dasharray="1.5 1.2"\/>/);
    // the exact point is a filled disc with a paper outline, which prints white
    expect(svg).toMatch(/<circle data-owner="p1" data-exact="1:2:1" cx="225" cy="45" r="1.8" fill="#b8321a" stroke="#ffffff"/);
  });
  it('greyscale print maps colours to greys, never lighter than 65%', () => {
    expect(inkOf('#b8321a', true)).toMatch(/^#([0-9a-f]{2})\1\1$/);
    expect(inkOf('#ffffff', true)).toBe('#a6a6a6');
    expect(inkOf('#000000', true)).toBe('#000000');
    const svg = figureToSvg(input('P', { options: { greyscale: true } }));
    const colours = new Set(svg.match(/(?:stroke|fill)="#[0-9a-f]{6}"/g));
    for (const c of colours) expect(c).toMatch(/"#([0-9a-f]{2})\1\1"$/);
  });
  it('escapes the five XML specials and drops control characters', () => {
    expect(xmlText('a<b>&"\'\u0001')).toBe('a&lt;b&gt;&amp;&quot;&apos;');
  });
});

describe('greyscale keeps strokes apart', () => {
  it('two solid curves of colours that turn into nearly the same grey get different dash patterns', async () => {
    const { greyscaleDistinguish } = await import('../../../src/export/figure.ts');
    const list: DisplayList = {
      items: [
        { kind: 'polyline', points: [0, 0, 1, 1], closed: false, ends: null, style: 'blue', owner: 'c1' },
        { kind: 'polyline', points: [0, 1, 1, 0], closed: false, ends: null, style: 'red', owner: 'c2' },
        { kind: 'segment', x0: 0, y0: 0, x1: 1, y1: 0, style: 'black', owner: 'l1' },
      ],
      styles: {
        blue: { stroke: '#1f5fa8', width: 2, fill: '#1f5fa8', radius: 2, dash: [], fontSize: 12 },
        red: { stroke: '#b8321a', width: 2, fill: '#b8321a', radius: 2, dash: [], fontSize: 12 },
        black: { stroke: '#000000', width: 1, fill: '#000000', radius: 2, dash: [], fontSize: 12 },
      },
    };
    const out = greyscaleDistinguish(list);
    expect(out.styles.blue.dash).toEqual([]);
    expect(out.styles.red.dash).not.toEqual([]);
    expect(out.styles.black.dash).toEqual([]); // black stays far from both greys
    // and the SVG in greyscale carries the pattern; in colour it does not
    const base = { view: { xmin: 0, xmax: 1, ymin: 0, ymax: 1 }, facts: [] };
    expect(figureToSvg({ ...base, list, options: { greyscale: true } })).toMatch(/data-owner="c2"[^>]*stroke-dasharray/);
    expect(figureToSvg({ ...base, list })).not.toMatch(/stroke-dasharray/);
  });
  it('never dashes a point mark: an algebraic point stays a solid ring beside a curve of the same grey', async () => {
    const { greyscaleDistinguish } = await import('../../../src/export/figure.ts');
    const { constructionDisplayList } = await import('../../../src/export/display.ts');
    const { constructionAdd, constructionEmpty } = await import('../../../src/construct/graph.ts');
    const { constructionEvaluate } = await import('../../../src/construct/evaluate.ts');
    let doc = constructionEmpty();
    const e = constructionAdd(doc, { construction: { kind: 'curve-equation', parents: [], params: { equation: 'y^2 = x^3 - 4x + 4' } }, style: { colour: '#1f5fa8' } });
    const p = constructionAdd(e.doc, { construction: { kind: 'point-on-curve', parents: [e.id], params: { x: '-1/2', near: '2' } }, style: { colour: '#b8321a' } });
    doc = p.doc;
    const list = constructionDisplayList(doc, constructionEvaluate(doc), { xmin: -4, xmax: 4, ymin: -3, ymax: 3, widthPx: 800, heightPx: 600 });
    const ring = list.items.find((i) => i.owner === p.id && i.kind === 'polyline');
    expect(ring && list.styles[ring.style].dash).toEqual([]); // algebraic: a solid ring
    const out = greyscaleDistinguish(list);
    expect(out.styles[ring!.style].dash).toEqual([]);
  });
});
