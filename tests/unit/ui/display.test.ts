// The display list of a construction: status marks that survive greyscale, lines clipped to the view,
// labels that never overlap, helpers and failures handled.
import { describe, expect, it } from 'vitest';
import { HIGHLIGHT_PREFIX, sceneDisplay, viewBounds } from '../../../src/ui/display.ts';
import { constructionDisplayList, lineClip } from '../../../src/export/display.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import type { View } from '../../../src/ui/stores/interaction.ts';

const view: View = { cx: 0, cy: 0, scale: 50, width: 600, height: 400 };
const none = { selection: new Set<string>(), hover: null, picks: [] };

function build() {
  let doc = constructionEmpty();
  const add = (kind: string, parents: string[], params: Record<string, string>): string => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params } });
    doc = r.doc;
    return r.id;
  };
  const e = add('curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' });
  const p = add('point-on-curve', [e], { at: '1:1:1' }); // exact
  const q = add('point-on-curve', [e], { x: '4', near: '7' }); // (4, √52): algebraic, off the view
  const r = add('point-on-curve', [e], { x: '-1/2', near: '2' }); // algebraic, inside the view
  const l = add('line-through-two', [p, r], {});
  const bad = add('line-through-two', [p, p], {}); // fails: one point twice
  return { doc, e, p, q, r, l, bad };
}

describe('sceneDisplay', () => {
  it('marks exact points with a disc and algebraic ones with a ring; draws the curve and the line', () => {
    const b = build();
    const values = constructionEvaluate(b.doc);
    const list = sceneDisplay(b.doc, values, view, none);
    const owned = (id: string) => list.items.filter((i) => i.owner === id);
    expect(owned(b.p).map((i) => i.kind)).toContain('dot');
    expect(owned(b.r).map((i) => i.kind)).toContain('polyline');
    expect(owned(b.r).map((i) => i.kind)).not.toContain('dot');
    expect(owned(b.e).filter((i) => i.kind === 'polyline').length).toBeGreaterThan(0);
    expect(owned(b.l).map((i) => i.kind)).toContain('segment');
    expect(owned(b.q)).toEqual([]); // outside the view
    expect(owned(b.bad)).toEqual([]); // a failed object draws nothing, and nothing breaks
  });
  it('dashes approximate points and lines while a point moves', () => {
    const b = build();
    const v1 = constructionEvaluate(b.doc);
    const v2 = constructionEvaluate(b.doc, { previous: v1, changed: new Set([b.p]), moving: new Map([[b.p, { x: 1.05, y: 1.0, finite: true }]]) });
    const list = sceneDisplay(b.doc, v2, view, none);
    const ringOfP = list.items.find((i) => i.owner === b.p && i.kind === 'polyline');
    expect(ringOfP && list.styles[ringOfP.style].dash.length).toBeGreaterThan(0);
    const seg = list.items.find((i) => i.owner === b.l && i.kind === 'segment');
    expect(seg && list.styles[seg.style].dash.length).toBeGreaterThan(0);
  });
  it('leaves out labels that would overlap, keeping the selected one', () => {
    let doc = constructionEmpty();
    const ids: string[] = [];
    for (let k = 0; k < 30; k++) {
      const r = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: `${k}:0:100` } } }); // 0.5 px apart
      doc = r.doc;
      ids.push(r.id);
    }
    const values = constructionEvaluate(doc);
    const chosen = ids[17];
    const list = sceneDisplay(doc, values, view, { ...none, selection: new Set([chosen]) });
    const labels = list.items.filter((i) => i.kind === 'label');
    expect(labels.length).toBeLessThan(5);
    expect(labels.some((l) => l.owner === chosen)).toBe(true);
  });
  it('clips lines to the view box', () => {
    const box = viewBounds(view); // x in [-6, 6], y in [-4, 4]
    const sorted = (s: number[] | null) => s && [[s[0], s[1]], [s[2], s[3]]].sort((a, b) => a[0] - b[0] || a[1] - b[1]).flat().map((v) => +v.toFixed(12) + 0);
    expect(sorted(lineClip([0, 1, -1], box))).toEqual([-6, 1, 6, 1]); // y = 1
    expect(sorted(lineClip([1, 0, 0], box))).toEqual([0, -4, 0, 4]); // x = 0
    expect(lineClip([0, 1, -10], box)).toBeNull(); // y = 10 misses the view
  });
});

describe('the canvas draws the figure list plus highlights only', () => {
  // One builder decides how a construction is drawn (src/export/display.ts); the canvas adds page-only
  // layers under and over it. On every demo scene and under every kind of highlight, the canvas list minus
  // its highlight items must be the figure list of the same view, item for item and in order, with the
  // same styles (common practice: one display list feeds every backend, DESIGN.md).
  it('on every demo scene, with selection, hover, picks, search finds, blow-up and region', async () => {
    const { readFileSync, readdirSync } = await import('node:fs');
    const { sceneParse } = await import('../../../src/scene/load.ts');
    const dir = new URL('../../../scenes/', import.meta.url);
    const files = readdirSync(dir).filter((f) => f.endsWith('.json') && f !== 'index.json');
    expect(files.length).toBeGreaterThanOrEqual(6);
    const canvasView: View = { cx: 1.25, cy: 0.5, scale: 50, width: 640, height: 480 };
    for (const file of files) {
      const scene = sceneParse(readFileSync(new URL(file, dir), 'utf8'));
      const values = constructionEvaluate(scene.doc);
      const box = viewBounds(canvasView);
      const figureView = { ...box, widthPx: 640, heightPx: 480 };
      const figure = constructionDisplayList(scene.doc, values, figureView);
      const ids = scene.doc.objects.filter((o) => values.get(o.id)?.type !== 'failure').map((o) => o.id);
      const ofType = (t: string) => scene.doc.objects.filter((o) => o.type === t && figure.items.some((i) => i.owner === o.id)).map((o) => o.id);
      const [curve] = ofType('curve');
      const [point, other] = ofType('point');
      const [line] = ofType('line');
      const cases = [
        { name: 'no highlights', extras: { selection: new Set<string>(), hover: null, picks: [] } },
        {
          name: 'selection, hover, picks and page marks',
          extras: {
            selection: new Set([curve, point, line].filter(Boolean)),
            hover: other ?? curve ?? null,
            picks: ids.slice(0, 2),
            found: [{ x: 0.5, y: 0.25, finite: true }, { x: 1, y: 0, finite: false }],
            region: { x0: -1, y0: -1, x1: 2, y1: 1.5 },
            blowup: { singular: { x: 0, y: 0, finite: true }, point: { x: 1, y: 1, finite: true }, tangents: [[1, -1, 0], [1, 1, 0]] as [number, number, number][] },
          },
        },
      ];
      for (const c of cases) {
        const canvas = sceneDisplay(scene.doc, values, canvasView, c.extras);
        const base = constructionDisplayList(scene.doc, values, figureView, { labelFirst: c.extras.selection });
        const msg = `${file}, ${c.name}`;
        const isHighlight = (key: string) => key.startsWith(HIGHLIGHT_PREFIX);
        expect(canvas.items.filter((i) => !isHighlight(i.style)), msg).toEqual(base.items);
        for (const [k, st] of Object.entries(base.styles)) expect(canvas.styles[k], `${msg}, style ${k}`).toEqual(st);
        expect(Object.keys(base.styles).some(isHighlight), msg).toBe(false);
        // Highlights are marks, never labels, and each names a style of its own layer.
        const extra = canvas.items.filter((i) => isHighlight(i.style));
        expect(extra.every((i) => i.kind !== 'label' && canvas.styles[i.style] !== undefined), msg).toBe(true);
        if (c.name === 'no highlights') {
          expect(extra, msg).toEqual([]);
          expect(base, msg).toEqual(figure); // no selection: the very list a figure of this view draws
        } else {
          for (const id of [curve, point, line].filter(Boolean)) expect(extra.some((i) => i.owner === id), `${msg}: ${id} has a halo`).toBe(true);
          expect(extra.filter((i) => i.kind === 'dot' && i.owner === undefined).length, `${msg}: one finite search find`).toBe(1);
          expect(extra.some((i) => i.style === `${HIGHLIGHT_PREFIX}region`), msg).toBe(true);
        }
      }
    }
  });
  it('shows a point at infinity at the view edge in both lists, labelled as such', () => {
    let doc = constructionEmpty();
    const r = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: '1:1:0' } }, label: 'P' });
    doc = r.doc;
    const values = constructionEvaluate(doc);
    const box = viewBounds(view);
    const figure = constructionDisplayList(doc, values, { ...box, widthPx: view.width, heightPx: view.height });
    const mark = figure.items.find((i) => i.owner === r.id && i.kind === 'dot');
    expect(mark && mark.kind === 'dot' && mark.x > 0 && mark.y > 0 && mark.y <= box.ymax).toBe(true);
    expect(figure.items.some((i) => i.kind === 'label' && i.text === 'P at \u221e')).toBe(true);
    const canvas = sceneDisplay(doc, values, view, none);
    expect(canvas.items).toEqual(figure.items);
  });
});
