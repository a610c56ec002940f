// The construction's display list: lines clipped to the view, points as dots, labels as given.
import { describe, expect, it } from 'vitest';
import { lineClip, constructionDisplayList } from '../../../src/export/display.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { seededUniform } from '../../../src/exact/random.ts';

const VIEW = { xmin: -4, xmax: 4, ymin: -3, ymax: 3, widthPx: 800, heightPx: 600 };

describe('lineClip', () => {
  it('clips y = x/2 + 1 to the view (table; values by hand)', () => {
    // x - 2y + 2 = 0 meets x = -4 at y = -1 and x = 4 at y = 3.
    const s = lineClip([1, -2, 2], VIEW)!;
    const ends = [[s[0], s[1]], [s[2], s[3]]].sort((a, b) => a[0] - b[0]);
    expect(ends[0][0]).toBeCloseTo(-4, 9);
    expect(ends[0][1]).toBeCloseTo(-1, 9);
    expect(ends[1][0]).toBeCloseTo(4, 9);
    expect(ends[1][1]).toBeCloseTo(3, 9);
  });
  it('gives null for a line that misses the view and for the line at infinity', () => {
    expect(lineClip([0, 1, -10], VIEW)).toBeNull();
    expect(lineClip([0, 0, 1], VIEW)).toBeNull();
  });
  it('keeps both ends on the border and on the line (seeded loop)', () => {
    const seed = 424242;
    const rand = seededUniform(seed);
    for (let k = 0; k < 200; k++) {
      const l: [number, number, number] = [rand() * 2 - 1, rand() * 2 - 1, (rand() * 2 - 1) * 4];
      const s = lineClip(l, VIEW);
      if (!s) continue;
      for (const [x, y] of [[s[0], s[1]], [s[2], s[3]]]) {
        const msg = `seed ${seed}, line ${l}`;
        expect(Math.abs(l[0] * x + l[1] * y + l[2]), msg).toBeLessThan(1e-9);
        const onBorder = Math.min(Math.abs(x - VIEW.xmin), Math.abs(x - VIEW.xmax), Math.abs(y - VIEW.ymin), Math.abs(y - VIEW.ymax));
        expect(onBorder, msg).toBeLessThan(1e-9);
      }
    }
  });
});

describe('constructionDisplayList', () => {
  it('draws curves, lines, points and labels of visible objects, checks never', () => {
    let doc = constructionEmpty();
    const add = (kind: string, parents: string[], params: Record<string, string>, label: string, style = {}) => {
      const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params }, label, style });
      doc = r.doc;
      return r.id;
    };
    const e = add('curve-equation', [], { equation: 'y^2 = x^3 - x' }, 'E');
    const p = add('point-on-curve', [e], { at: '0:0:1' }, '<b>P</b>');
    const q = add('point-on-curve', [e], { at: '1:0:1' }, 'Q', { visible: false });
    add('line-through-two', [p, q], {}, 'axis');
    add('check-on-curve', [p, e], {}, 'check');
    const list = constructionDisplayList(doc, constructionEvaluate(doc), VIEW);
    const kinds = list.items.map((i) => `${i.kind}:${i.owner}`);
    expect(kinds.filter((k) => k.startsWith('polyline')).length).toBeGreaterThanOrEqual(2); // oval and unbounded branch
    expect(kinds).toContain(`dot:${p}`);
    expect(kinds).not.toContain(`dot:${q}`);
    expect(kinds.some((k) => k.startsWith('segment'))).toBe(true);
    expect(list.items.some((i) => i.kind === 'label' && i.text === '<b>P</b>')).toBe(true);
    expect(kinds.some((k) => k.endsWith(':k5'))).toBe(false);
    // labels come last, so they are drawn over everything
    const firstLabel = list.items.findIndex((i) => i.kind === 'label');
    expect(list.items.slice(firstLabel).every((i) => i.kind === 'label')).toBe(true);
    // every vertex of the traced curve is on the curve to drawing accuracy
    for (const it of list.items) {
      if (it.kind !== 'polyline') continue;
      for (let k = 0; k < it.points.length; k += 2) {
        const x = it.points[k];
        const y = it.points[k + 1];
        expect(Math.abs(y * y - (x * x * x - x))).toBeLessThan(0.05 * (1 + Math.abs(x) ** 3));
      }
    }
  });
});
