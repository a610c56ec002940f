// The tools "Model from O" and "Image on W": they add the construction kinds curve-weierstrass and
// point-weierstrass-image, whose values are checked against src/cubic/weierstrass.ts in
// tests/unit/construct/weierstrass-kinds.test.ts. Here: what the tools build, and their refusals.
// C: y^2 = x^3 - 4x + 4 is our own; O = (0, 2) is not a flex (common practice: a flex has its tangent
// meeting the curve three times there; the tangent at (0, 2) is y = 2 - x, meeting again at (1, 1)).
import { beforeEach, describe, expect, it } from 'vitest';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { $doc, $values, docCommit, docReset } from '../../../src/ui/stores/construction.ts';
import { toolBuild, toolByKey, toolSpec } from '../../../src/ui/tools.ts';
import { weierstrassMap, weierstrassModel } from '../../../src/cubic/weierstrass.ts';
import { formParse } from '../../../src/poly/parse.ts';
import type { CurveValue, PointValue } from '../../../src/construct/types.ts';

function setup() {
  docReset(constructionEmpty());
  let doc = $doc.get();
  const add = (kind: string, parents: string[], params: Record<string, string>, label: string) => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params }, label });
    doc = r.doc;
    return r.id;
  };
  const E = add('curve-equation', [], { equation: 'y^2 = x^3 - 4x + 4' }, 'E');
  const O = add('point-on-curve', [E], { at: '0:2:1' }, 'O');
  const P = add('point-on-curve', [E], { at: '2:2:1' }, 'P');
  docCommit(doc);
  return { E, O, P };
}

describe('Weierstrass tools', () => {
  beforeEach(() => docReset(constructionEmpty()));

  it('Model from O adds the model of the active cubic, and Image on W the image of P on it', () => {
    const { O, P } = setup();
    expect(toolByKey('w')?.id).toBe('weierstrass');
    expect(toolByKey('u')?.id).toBe('model-image');
    const w = toolBuild(toolSpec('weierstrass'), [O], { doc: $doc.get(), values: $values.get(), n: '2' });
    docCommit(w.doc);
    const W = w.made[0];
    expect(($values.get().get(W) as CurveValue).status).toBe('exact');
    const img = toolBuild(toolSpec('model-image'), [W, P], { doc: $doc.get(), values: $values.get(), n: '2' });
    docCommit(img.doc);
    const v = $values.get().get(img.made[0]) as PointValue;
    expect(v.status).toBe('exact');
    // The same point as the engine's own map gives (affine image (x, y) on the model, projectively x:y:1).
    const model = weierstrassModel(formParse('y^2 = x^3 - 4x + 4').form, [0n, 2n, 1n]);
    const image = weierstrassMap(model, [2n, 2n, 1n]);
    expect(image).not.toBe('infinity');
    if (image !== 'infinity') {
      const { x, y } = image;
      expect(v.exact![0] * x.den * y.den).toBe(v.exact![2] * x.num * y.den);
      expect(v.exact![1] * x.den * y.den).toBe(v.exact![2] * y.num * x.den);
    }
    expect($doc.get().objects.find((o) => o.id === img.made[0])?.label).toBe('W(P)');
  });

  it('Image on W refuses a curve that is not a Weierstrass model, in words', () => {
    const { E, P } = setup();
    expect(() => toolBuild(toolSpec('model-image'), [E, P], { doc: $doc.get(), values: $values.get(), n: '2' })).toThrow(
      /not a Weierstrass model/,
    );
  });
});
