// Restyling one object (constructionStyle): a checked patch, one new document per real change, no change
// when nothing differs (so the store adds no undo step), and clear refusals of bad styles.
import { describe, expect, it } from 'vitest';
import { constructionAdd, constructionEmpty, constructionStyle, DEFAULT_STYLE } from '../../../src/construct/graph.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

function sample() {
  const a = constructionAdd(constructionEmpty(), { construction: { kind: 'curve-equation', parents: [], params: { equation: 'y^2 = x^3 - 5x + 7' } } });
  const b = constructionAdd(a.doc, { construction: { kind: 'point-free', parents: [], params: { at: '1:2:1' } } });
  const c = constructionAdd(b.doc, { construction: { kind: 'line-equation', parents: [], params: { at: '2:-3:5' } } });
  return { doc: c.doc, curve: a.id, point: b.id, line: c.id };
}

describe('constructionStyle', () => {
  it('changes the named fields of one object and keeps every other entry identical', () => {
    const { doc, curve, point, line } = sample();
    const next = constructionStyle(doc, curve, { colour: '#7a1f5c', stroke: 'dashed', width: 3 });
    const o = next.objects.find((x) => x.id === curve)!;
    expect(o.style).toEqual({ ...DEFAULT_STYLE.curve, colour: '#7a1f5c', stroke: 'dashed', width: 3 });
    expect(next.objects.find((x) => x.id === point)).toBe(doc.objects.find((x) => x.id === point));
    expect(next.objects.find((x) => x.id === line)).toBe(doc.objects.find((x) => x.id === line));
    expect(doc.objects.find((x) => x.id === curve)!.style).toEqual(DEFAULT_STYLE.curve); // the old document is untouched
  });

  it('hides an object or its label, points included', () => {
    const { doc, point } = sample();
    const next = constructionStyle(doc, point, { visible: false, showLabel: false });
    expect(next.objects.find((x) => x.id === point)!.style).toMatchObject({ visible: false, showLabel: false });
  });

  it('returns the same document when nothing changes, so a commit adds no undo step', () => {
    const { doc, curve } = sample();
    expect(constructionStyle(doc, curve, { ...DEFAULT_STYLE.curve })).toBe(doc);
    expect(constructionStyle(doc, curve, {})).toBe(doc);
    expect(constructionStyle(doc, curve, { colour: undefined })).toBe(doc);
  });

  it('refuses bad styles with a message naming the field', () => {
    const { doc, curve, point } = sample();
    const refuse = (f: () => unknown, where: string, words: RegExp) => {
      try {
        f();
        expect.unreachable('should refuse');
      } catch (e) {
        expect(e).toBeInstanceOf(InvalidInput);
        expect((e as InvalidInput).where).toBe(where);
        expect((e as Error).message).toMatch(words);
      }
    };
    refuse(() => constructionStyle(doc, curve, { colour: 'blue' }), 'style.colour', /#rrggbb/);
    refuse(() => constructionStyle(doc, curve, { width: 0 }), 'style.width', /between/);
    refuse(() => constructionStyle(doc, curve, { width: Number.NaN }), 'style.width', /between/);
    refuse(() => constructionStyle(doc, curve, { stroke: 'wavy' as never }), 'style.stroke', /unknown stroke/);
    refuse(() => constructionStyle(doc, point, { stroke: 'dashed' }), 'style.stroke', /only curves and lines/);
    refuse(() => constructionStyle(doc, point, { width: 2 }), 'style.width', /only curves and lines/);
    refuse(() => constructionStyle(doc, 'c99', { visible: false }), 'id', /no object/);
  });
});
