// The display list of a construction: status marks that survive greyscale, lines clipped to the view,
// labels that never overlap, helpers and failures handled.
import { describe, expect, it } from 'vitest';
import { lineClip, sceneDisplay, viewBounds } from '../../../src/ui/display.ts';
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
    expect(lineClip([0, 1, -1], box)).toEqual([-6, 1, 6, 1]); // y = 1
    expect(lineClip([1, 0, 0], box)?.map((v) => v + 0)).toEqual([0, -4, 0, 4]); // x = 0
    expect(lineClip([0, 1, -10], box)).toBeNull(); // y = 10 misses the view
  });
});
