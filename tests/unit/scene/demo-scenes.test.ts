// The demo scenes in scenes/: each listed in scenes/index.json, opens without error, builds every
// object, every check holds, and saves back to the same bytes.
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { sceneParse } from '../../../src/scene/load.ts';
import { sceneToText } from '../../../src/scene/save.ts';
import { constructionEvaluate } from '../../../src/construct/evaluate.ts';

const DIR = new URL('../../../scenes/', import.meta.url);
const index = JSON.parse(readFileSync(new URL('index.json', DIR), 'utf8')) as { default: string; scenes: { file: string; title: string }[] };

describe('demo scenes', () => {
  it('index.json lists every scene file, at least six, and a default among them', () => {
    const files = readdirSync(DIR).filter((f) => f.endsWith('.json') && f !== 'index.json').sort();
    expect(index.scenes.map((s) => s.file).sort()).toEqual(files);
    expect(files.length).toBeGreaterThanOrEqual(6);
    expect(files).toContain(index.default);
  });
  for (const entry of index.scenes) {
    it(`${entry.file} opens, builds every object, every check holds, and round-trips`, () => {
      const text = readFileSync(new URL(entry.file, DIR), 'utf8');
      const scene = sceneParse(text);
      expect(scene.title).toBe(entry.title);
      const values = constructionEvaluate(scene.doc);
      const failed = scene.doc.objects.filter((o) => values.get(o.id)?.type === 'failure').map((o) => `${o.label}: ${(values.get(o.id) as { message: string }).message}`);
      expect(failed).toEqual([]);
      const checks = scene.doc.objects.filter((o) => o.type === 'check');
      expect(checks.length).toBeGreaterThan(0);
      for (const c of checks) expect(values.get(c.id), c.label).toMatchObject({ type: 'check', status: 'exact', verdict: 'holds' });
      expect(sceneToText(scene)).toBe(text);
    });
  }
});
