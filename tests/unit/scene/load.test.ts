// Scene files: round trip, refusals naming the place in the file, size limit, unknown versions.
import { describe, expect, it } from 'vitest';
import { sampleScene } from './sample.ts';
import { sceneFileParse, sceneParse } from '../../../src/scene/load.ts';
import { sceneToFile, sceneToText, sceneFileName } from '../../../src/scene/save.ts';
import { NinefoldError } from '../../../src/exact/errors.ts';

function refusal(text: string): NinefoldError {
  try {
    sceneParse(text);
  } catch (e) {
    if (e instanceof NinefoldError) return e;
    throw e;
  }
  throw new Error('the file was accepted');
}

function edited(edit: (file: any) => void): string {
  const file = JSON.parse(sceneToText(sampleScene()));
  edit(file);
  return JSON.stringify(file);
}

describe('scene round trip', () => {
  it('save then open gives back the same scene, and the same bytes', () => {
    const s = sampleScene();
    const text = sceneToText(s);
    const back = sceneParse(text);
    expect(back).toEqual(s);
    expect(sceneToText(back)).toBe(text);
  });
  it('writes exact values as strings, never JSON numbers (only the version and the id counter)', () => {
    const text = sceneToText(sampleScene());
    const numbers: string[] = [];
    JSON.parse(text, (k, v) => {
      if (typeof v === 'number' && k !== 'nextId' && k !== 'version') numbers.push(k);
      return v;
    });
    expect(numbers).toEqual([]);
    expect(sceneToFile(sampleScene()).view.ymin).toBe('-15/2');
  });
  it('stores the curve coefficients in the monomial order of form.ts', () => {
    // y^2 = x^3 - 7x + 10 homogenised: X^3 - Y^2 Z - 7 X Z^2 + 10 Z^3, sign made positive on X^3.
    const file = sceneToFile(sampleScene());
    // order: X3, X2Y, X2Z, XY2, XYZ, XZ2, Y3, Y2Z, YZ2, Z3
    expect(file.objects[0].coefficients).toEqual(['1', '0', '0', '0', '0', '-7', '0', '-1', '0', '10']);
  });
  it('reorders a hand-edited file into construction order', () => {
    const text = edited((f) => f.objects.reverse());
    const back = sceneFileParse(text);
    expect(back.objects[0].id).toBe(sampleScene().doc.objects[0].id);
  });
  it('names download files from the title without markup', () => {
    expect(sceneFileName(sampleScene())).toBe('sample-b-scene-b.ninefold.json');
  });
});

describe('scene refusals name the place in the file', () => {
  const cases: [string, string, RegExp, string][] = [
    ['missing parent', edited((f) => (f.objects[4].parents[1] = 'nope')), /not the id/, 'objects[4].parents[1]'],
    ['cycle', edited((f) => (f.objects[1].parents = [f.objects[4].id])), /cycle|is a point/, 'objects[1].parents[0]'],
    ['equation that does not parse', edited((f) => (f.objects[0].params.equation = 'y^2 = x^3 + $')), /./, 'objects[0].params.equation, column 13'],
    ['coefficients disagree', edited((f) => (f.objects[0].coefficients[9] = '11')), /do not match/, 'objects[0].coefficients'],
    ['unknown version', edited((f) => (f.version = 7)), /version 7 is not known/, 'version'],
    ['not a scene', '{"hello": 1}', /not a Ninefold scene/, 'format'],
    ['a float where a rational goes', edited((f) => (f.view.xmin = -5)), /string/, 'view.xmin'],
    ['unknown kind', edited((f) => (f.objects[2].kind = 'point-magic')), /construction kind/, 'objects[2].kind'],
    ['unknown field', edited((f) => (f.objects[3].colour = 'red')), /./, 'objects[3]'],
    ['bad point', edited((f) => (f.objects[2].params.at = '1:x:1')), /./, 'objects[2].params.at, column 3'],
    ['type mismatch', edited((f) => (f.objects[5].type = 'point')), /is a line/, 'objects[5].type'],
    ['parent of the wrong type', edited((f) => (f.objects[5].parents[0] = f.objects[0].id)), /is a curve/, 'objects[5].parents[0]'],
    ['duplicate id', edited((f) => (f.objects[2].id = f.objects[1].id)), /used twice/, 'objects[2].id'],
    ['empty view', edited((f) => (f.view.xmax = f.view.xmin)), /xmin < xmax/, 'view.xmax'],
    ['broken JSON', '{\n  "format": "ninefold-scene",\n  "version": 2,,\n}', /not valid JSON/, 'line 3, column 16'],
  ];
  for (const [name, text, message, where] of cases) {
    it(name, () => {
      const e = refusal(text);
      expect(e.message).toMatch(message);
      expect(e.where).toBe(where);
    });
  }
  it('a 50 MB blob is refused before it is parsed', () => {
    const blob = '{"format":"ninefold-scene","notes":"' + 'x'.repeat(50 * 1024 * 1024) + '"}';
    const e = refusal(blob);
    expect(e.message).toMatch(/50\.0 MB; a scene file is at most 4\.0 MB/);
  });
  it('a deep nesting bomb is refused, not a crash', () => {
    const e = refusal('['.repeat(200_000) + ']'.repeat(200_000));
    expect(e).toBeInstanceOf(NinefoldError);
  });
});

describe('the README example (tests/fixtures/scene-readme-example.json)', () => {
  it('opens, and its check holds', async () => {
    const { readFileSync } = await import('node:fs');
    const { constructionEvaluate } = await import('../../../src/construct/evaluate.ts');
    const s = sceneParse(readFileSync(new URL('../../fixtures/scene-readme-example.json', import.meta.url), 'utf8'));
    expect(s.doc.objects.map((o) => o.label)).toEqual(['E', 'P', 'Q', 'P*Q', 'P*Q lies on E']);
    expect(constructionEvaluate(s.doc).get('k5')).toMatchObject({ verdict: 'holds' });
  });
});
