// The sink's drawing plan: batches by look that paint exactly what the list paints item by item. The
// rule checked is the painter's one (common practice for any painter's-algorithm renderer): two
// primitives that overlap keep their order; only primitives that touch nothing in between may be
// gathered into one earlier stroke or fill.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { DisplayItem, DisplayList, ItemStyle } from '../../../shaders-free-render/display-list.ts';
import { dotMarkParts, partBox, sinkPlan, type SinkPart } from '../../../shaders-free-render/sink-batch.ts';
import { viewportMake } from '../../../shaders-free-render/viewport.ts';

const st = (stroke: string, width: number, fill: string, radius: number, dash: number[] = []): ItemStyle => ({ stroke, width, fill, radius, dash, fontSize: 12 });
// 1 world unit = 10 px, origin at the centre of a 200 x 200 box.
const VP = viewportMake(0, 0, 0.1, 200, 200);

describe('dotMarkParts (the figure exporters\' rule, src/export/figure.ts dotShape)', () => {
  const table: [string, ItemStyle, 'isolated' | 'point', SinkPart[]][] = [
    ['exact point: disc with a paper rim', st('#fbf8f1', 1.25, '#b8321a', 4.5), 'point', ['disc', 'outline']],
    ['fill none: ring', st('#b8321a', 2, 'none', 4.5), 'point', ['ring']],
    ['isolated point of a curve: no rim', st('#1f5fa8', 2, '#123456', 2.5), 'isolated', ['disc']],
    ['rim of width 0: none', st('#f2c14e', 0, '#f2c14e', 10), 'point', ['disc']],
    ['rim ink equal to the fill: none', st('#5d4a8a', 1, '#5d4a8a', 2.5), 'point', ['disc']],
    ['ring of width 0: nothing', st('#000000', 0, 'none', 3), 'point', []],
  ];
  for (const [name, style, role, parts] of table) it(name, () => expect(dotMarkParts(style, role)).toEqual(parts));
});

describe('sinkPlan', () => {
  const list = (items: DisplayItem[], styles: Record<string, ItemStyle>): DisplayList => ({ items, styles });
  const red = st('#aa0000', 1.5, '#aa0000', 2);
  const blue = st('#0000aa', 1.5, '#0000aa', 2);
  const seg = (x0: number, y0: number, x1: number, y1: number, style: string): DisplayItem => ({ kind: 'segment', x0, y0, x1, y1, style });

  it('gathers items of one look and leaves labels out', () => {
    const l = list([seg(-5, 0, 5, 0, 'r'), seg(-5, 1, 5, 1, 'r2'), { kind: 'label', x: 0, y: 0, text: 'P', style: 'r' }], { r: red, r2: { ...red, dash: [3, 2] } });
    const plan = sinkPlan(l, VP);
    expect(plan).toEqual([{ mode: 'stroke', color: '#aa0000', width: 1.5, members: [{ item: 0, part: 'path' }, { item: 1, part: 'path' }] }]);
  });
  it('moves a primitive back past others only when it touches none of them', () => {
    const far = list([seg(-9, -9, -8, -9, 'r'), seg(8, 8, 9, 8, 'b'), seg(-9, -7, -8, -7, 'r')], { r: red, b: blue });
    expect(sinkPlan(far, VP).map((b) => b.members.map((m) => m.item))).toEqual([[0, 2], [1]]);
    const crossing = list([seg(-5, 0, 5, 0, 'r'), seg(0, -5, 0, 5, 'b'), seg(-5, 0.1, 5, 0.1, 'r')], { r: red, b: blue });
    expect(sinkPlan(crossing, VP).map((b) => b.members.map((m) => m.item))).toEqual([[0], [1], [2]]);
  });
  it('keeps a disc over the rim of an overlapping earlier disc', () => {
    const exact = st('#fbf8f1', 1.25, '#b8321a', 4.5);
    const l = list([{ kind: 'dot', x: 0, y: 0, role: 'point', style: 'p' }, { kind: 'dot', x: 0.5, y: 0, role: 'point', style: 'p' }, { kind: 'dot', x: 5, y: 5, role: 'point', style: 'p' }], { p: exact });
    const plan = sinkPlan(l, VP);
    expect(plan.map((b) => `${b.mode}:${b.members.map((m) => m.item).join(',')}`)).toEqual(['fill:0', 'stroke:0', 'fill:1,2', 'stroke:1,2']);
  });
  it('falls back to the curve style, then to a dark default, for an unknown style key', () => {
    const plan = sinkPlan(list([seg(0, 0, 1, 1, 'missing')], {}), VP);
    expect(plan[0]).toMatchObject({ mode: 'stroke', color: '#222222', width: 1.5 });
  });

  it('paints overlapping primitives in list order (random lists, seeded)', () => {
    const looks = [red, blue, st('#fbf8f1', 1.25, '#aa0000', 3), st('#0000aa', 2, 'none', 3, [2, 2])];
    const styles = Object.fromEntries(looks.map((s, i) => [`s${i}`, s]));
    const coord = fc.double({ min: -12, max: 12, noNaN: true });
    const item = fc.oneof(
      fc.record({ kind: fc.constant('segment' as const), x0: coord, y0: coord, x1: coord, y1: coord, style: fc.constantFrom('s0', 's1', 's3') }),
      fc.record({ kind: fc.constant('dot' as const), x: coord, y: coord, role: fc.constantFrom('point' as const, 'isolated' as const), style: fc.constantFrom('s0', 's2', 's3') }),
    );
    fc.assert(
      fc.property(fc.array(item, { maxLength: 40 }), (items) => {
        const l = list(items as DisplayItem[], styles);
        const plan = sinkPlan(l, VP);
        // Where each primitive landed, and the list's own primitive order.
        const at = new Map<string, number>();
        plan.forEach((b, k) => b.members.forEach((m) => at.set(`${m.item}:${m.part}`, k)));
        const prims: { key: string; box: number[] }[] = [];
        l.items.forEach((it, i) => {
          const s = l.styles[it.style];
          const parts: SinkPart[] = it.kind === 'dot' ? dotMarkParts(s, it.role) : ['path'];
          for (const part of parts) {
            const box = [0, 0, 0, 0];
            partBox(it, s, part, VP, box);
            prims.push({ key: `${i}:${part}`, box });
          }
        });
        expect(at.size).toBe(prims.length);
        expect(plan.reduce((n, b) => n + b.members.length, 0)).toBe(prims.length);
        for (let p = 0; p < prims.length; p++) {
          for (let q = p + 1; q < prims.length; q++) {
            const a = prims[p].box;
            const b = prims[q].box;
            const overlap = a[0] <= b[2] && b[0] <= a[2] && a[1] <= b[3] && b[1] <= a[3];
            const bp = at.get(prims[p].key)!;
            const bq = at.get(prims[q].key)!;
            if (overlap && bp !== bq && !(bp < bq)) throw new Error(`${prims[q].key} drawn before ${prims[p].key} though they overlap`);
          }
        }
      }),
      { seed: 20261201, numRuns: 300 },
    );
  });
});

describe('partBox', () => {
  it('widens a dot by its radius and a pixel, a stroke by half its width and a pixel', () => {
    const out = [0, 0, 0, 0];
    partBox({ kind: 'dot', x: 1, y: 1, role: 'point', style: 'p' }, st('#fff', 2, '#000', 4), 'disc', VP, out);
    expect(out).toEqual([105, 85, 115, 95]);
    partBox({ kind: 'dot', x: 1, y: 1, role: 'point', style: 'p' }, st('#fff', 2, '#000', 4), 'outline', VP, out);
    expect(out).toEqual([104, 84, 116, 96]);
    partBox({ kind: 'segment', x0: -1, y0: 0, x1: 2, y1: 3, style: 'p' }, st('#000', 2, '#000', 0), 'path', VP, out);
    expect(out).toEqual([88, 68, 122, 102]);
  });
  it('takes a box that is not finite as the whole plane', () => {
    const out = [0, 0, 0, 0];
    partBox({ kind: 'segment', x0: 0, y0: 0, x1: Infinity, y1: 0, style: 'p' }, st('#000', 1, '#000', 0), 'path', VP, out);
    expect(out).toEqual([-Infinity, -Infinity, Infinity, Infinity]);
  });
});
