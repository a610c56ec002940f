// Kept label Texts: a label keeps the Text already showing its string in its look, takes a free Text of
// its look otherwise, and a new one only when none is free; no Text shows two labels.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { labelMatch, type LabelKey } from '../../../shaders-free-render/sink-labels.ts';

const k = (look: string, text: string): LabelKey => ({ look, text });

describe('labelMatch', () => {
  it('keeps each string on its own Text when the order of labels changes', () => {
    const kept = [k('14', 'A'), k('14', 'B'), k('14', 'C')];
    expect(labelMatch(kept, [k('14', 'C'), k('14', 'A'), k('14', 'B')])).toEqual({ use: [2, 0, 1], retext: [false, false, false] });
  });
  it('gives a new string a free Text of its look, and asks for a new Text when none is free', () => {
    const kept = [k('14', 'A'), k('11', 'x'), k('14', 'B')];
    expect(labelMatch(kept, [k('14', 'B'), k('14', 'Z'), k('14', 'Y')])).toEqual({ use: [2, 0, -1], retext: [false, true, false] });
  });
  it('never shares a Text between labels of one string', () => {
    expect(labelMatch([k('14', 'A')], [k('14', 'A'), k('14', 'A')])).toEqual({ use: [0, -1], retext: [false, false] });
  });
  it('matches only within a look (a Text\'s style is fixed)', () => {
    expect(labelMatch([k('11', 'A')], [k('14', 'A')])).toEqual({ use: [-1], retext: [false] });
  });
  it('uses each kept Text at most once and keeps every unchanged one (seeded)', () => {
    const key = fc.record({ look: fc.constantFrom('a', 'b'), text: fc.constantFrom('P', 'Q', 'R', 'S') });
    fc.assert(
      fc.property(fc.array(key, { maxLength: 12 }), fc.array(key, { maxLength: 12 }), (kept, wants) => {
        const { use, retext } = labelMatch(kept, wants);
        const seen = new Set<number>();
        use.forEach((u, i) => {
          if (u < 0) return;
          expect(seen.has(u)).toBe(false);
          seen.add(u);
          expect(kept[u].look).toBe(wants[i].look);
          expect(retext[i]).toBe(kept[u].text !== wants[i].text);
        });
        // A label is made new only when every kept Text of its look is taken.
        use.forEach((u, i) => {
          if (u >= 0) return;
          const freeOfLook = kept.some((x, j) => x.look === wants[i].look && !seen.has(j));
          expect(freeOfLook).toBe(false);
        });
        // As many labels keep their string as the multisets allow.
        const count = (xs: LabelKey[]): Map<string, number> => xs.reduce((m, x) => m.set(`${x.look}|${x.text}`, (m.get(`${x.look}|${x.text}`) ?? 0) + 1), new Map<string, number>());
        const a = count(kept);
        let best = 0;
        for (const [s, n] of count(wants)) best += Math.min(n, a.get(s) ?? 0);
        expect(use.filter((u, i) => u >= 0 && !retext[i]).length).toBe(best);
      }),
      { seed: 4242, numRuns: 300 },
    );
  });
});
