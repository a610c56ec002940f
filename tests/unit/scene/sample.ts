// A small scene for the scene tests: a cubic, four points on it, a sum, a chord and a check.
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import type { ConstructionDoc } from '../../../src/construct/types.ts';
import { rat } from '../../../src/exact/rational.ts';
import type { Scene } from '../../../src/scene/scene.ts';

export function sampleScene(): Scene {
  let doc: ConstructionDoc = constructionEmpty();
  const add = (kind: string, parents: string[], params: Record<string, string> = {}, label?: string) => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params }, label });
    doc = r.doc;
    return r.id;
  };
  const e = add('curve-equation', [], { equation: 'y^2 = x^3 - 7x + 10' }, 'E');
  const o = add('point-on-curve', [e], { at: '1:2:1' }, 'O');
  const p = add('point-on-curve', [e], { at: '-1:4:1' }, 'P');
  const q = add('point-on-curve', [e], { at: '3:4:1' }, 'Q');
  const s = add('point-sum', [e, o, p, q], {}, 'P+Q');
  add('line-through-two', [p, q], {}, 'chord');
  add('check-on-curve', [s, e], {}, 'P+Q lies on E');
  return { title: 'Sample <b>scene</b>', notes: 'a "note"\nwith two lines', doc, view: { xmin: rat(-5n), xmax: rat(7n), ymin: rat(-15n, 2n), ymax: rat(15n, 2n) } };
}
