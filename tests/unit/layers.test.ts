// The import direction of DESIGN.md, enforced: a layer imports only layers below it, nothing below
// src/ui imports lit, pixi or nanostores, and shaders-free-render imports no src/ module.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve, dirname } from 'node:path';

const ROOT = resolve(__dirname, '../..');
const CORE = ['exact', 'poly', 'plane', 'cubic', 'construct', 'scene'];
// For each layer, the layers it may import (itself included).
const ALLOWED: Record<string, string[]> = {
  exact: ['exact'],
  poly: ['exact', 'poly'],
  plane: ['exact', 'poly', 'plane'],
  cubic: ['exact', 'poly', 'plane', 'cubic'],
  construct: ['exact', 'poly', 'plane', 'cubic', 'construct'],
  scene: ['exact', 'poly', 'plane', 'cubic', 'construct', 'scene'],
  export: ['exact', 'poly', 'plane', 'cubic', 'construct', 'scene', 'export', 'render'],
  worker: ['exact', 'poly', 'plane', 'cubic', 'construct', 'scene', 'worker', 'render'],
  cli: ['exact', 'poly', 'plane', 'cubic', 'construct', 'scene', 'export', 'cli', 'render'],
  ui: ['exact', 'poly', 'plane', 'cubic', 'construct', 'scene', 'export', 'worker', 'ui', 'render'],
  render: ['render'],
};
const UI_LIBRARIES = /^(lit|lit\/|@lit\/|pixi\.js|@pixi\/|nanostores|@nanostores\/)/;

function filesUnder(dir: string): string[] {
  const out: string[] = [];
  let entries: string[] = [];
  try {
    entries = readdirSync(dir);
  } catch {
    return out;
  }
  for (const name of entries) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...filesUnder(p));
    else if (/\.ts$/.test(name)) out.push(p);
  }
  return out;
}

function layerOf(file: string): string | null {
  const rel = relative(ROOT, file).split('\\').join('/');
  if (rel.startsWith('shaders-free-render/')) return 'render';
  const m = /^src\/([^/]+)\//.exec(rel);
  return m ? m[1] : null;
}

function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const specs: string[] = [];
  const re = /(?:^|\n)\s*(?:import|export)\s[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)|(?:^|\n)\s*import\s*['"]([^'"]+)['"]/g;
  for (let m = re.exec(text); m; m = re.exec(text)) specs.push(m[1] ?? m[2] ?? m[3]);
  return specs;
}

describe('layers (DESIGN.md: imports point down only)', () => {
  const files = [...filesUnder(join(ROOT, 'src')), ...filesUnder(join(ROOT, 'shaders-free-render'))];
  it('finds the source tree', () => {
    expect(files.length).toBeGreaterThan(5);
  });
  it('every relative import goes to an allowed layer', () => {
    const bad: string[] = [];
    for (const f of files) {
      const from = layerOf(f);
      if (!from || !ALLOWED[from]) continue;
      for (const spec of importsOf(f)) {
        if (spec.startsWith('.')) {
          const to = layerOf(resolve(dirname(f), spec));
          if (to && !ALLOWED[from].includes(to)) bad.push(`${relative(ROOT, f)} imports ${spec} (${from} -> ${to})`);
        } else if (UI_LIBRARIES.test(spec) && from !== 'ui' && !(from === 'render' && spec.startsWith('pixi'))) {
          bad.push(`${relative(ROOT, f)} imports ${spec}: only src/ui (and the Pixi sink) may`);
        } else if (spec.startsWith('node:') && CORE.includes(from)) {
          bad.push(`${relative(ROOT, f)} imports ${spec}: the core runs without Node's built-ins too`);
        }
      }
    }
    expect(bad).toEqual([]);
  });
});
