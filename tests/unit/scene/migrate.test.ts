// Migration of a saved version 1 file (tests/fixtures/scene-v1.json) to the current format.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { sceneFileParse, sceneParse } from '../../../src/scene/load.ts';
import { sceneToText } from '../../../src/scene/save.ts';
import { SCENE_VERSION } from '../../../src/scene/schema.ts';
import { NinefoldError } from '../../../src/exact/errors.ts';

const V1 = readFileSync(new URL('../../fixtures/scene-v1.json', import.meta.url), 'utf8');

describe('scene migration v1 -> v2', () => {
  it('turns affine "x,y" positions into primitive X:Y:Z', () => {
    const file = sceneFileParse(V1);
    expect(file.version).toBe(SCENE_VERSION);
    // 1/2, -3/4 -> (2 : -3 : 4) after clearing denominators (lcm 4); -1, 5/2 -> (-2 : 5 : 2) -> sign made positive.
    expect(file.objects[1].params.at).toBe('2:-3:4');
    expect(file.objects[2].params.at).toBe('2:-5:-2');
  });
  it('gives the equation its exact coefficients', () => {
    const file = sceneFileParse(V1);
    // 4y^2 + 4xy = 4x^3 - 8x^2 + 3 -> 4X^3 - 8X^2Z - 4XYZ - 4Y^2Z + 3Z^3, in the order of form.ts:
    // X3, X2Y, X2Z, XY2, XYZ, XZ2, Y3, Y2Z, YZ2, Z3.
    expect(file.objects[0].coefficients).toEqual(['4', '0', '-8', '0', '-4', '0', '0', '-4', '0', '3']);
  });
  it('keeps everything else: labels, styles, parents, view', () => {
    const s = sceneParse(V1);
    expect(s.doc.objects.map((o) => o.label)).toEqual(['E', 'P', 'Q', 'PQ']);
    expect(s.doc.objects[3].style.stroke).toBe('dashed');
    expect(s.doc.objects[3].style.width).toBe(1.25);
    expect(s.doc.objects[3].construction.parents).toEqual(['p2', 'p3']);
    expect(s.view.xmin).toEqual({ num: -4n, den: 1n });
  });
  it('the migrated scene saves as version 2 and reopens unchanged', () => {
    const s = sceneParse(V1);
    const text = sceneToText(s);
    expect(JSON.parse(text).version).toBe(2);
    expect(sceneParse(text)).toEqual(s);
  });
  it('a v1 file with a projective position is refused at that place', () => {
    const bad = V1.replace('"1/2,-3/4"', '"1:2:3"');
    try {
      sceneParse(bad);
      throw new Error('accepted');
    } catch (e) {
      expect(e).toBeInstanceOf(NinefoldError);
      expect((e as NinefoldError).where).toBe('objects[1].params.at');
    }
  });
  it('a v2 file is never migrated twice (a v2 field in a v1 file is refused)', () => {
    const bad = V1.replace('"parents": [],\n      "params": { "equation"', '"parents": [], "coefficients": ["1","1","1"],\n      "params": { "equation"');
    expect(() => sceneParse(bad)).toThrow(NinefoldError);
  });
});
