/// <reference types="vite/client" />
// The demo scenes of scenes/, bundled into the page (so they open in a built page too), and the default.
import { sceneParse } from '../../scene/load.ts';
import type { Scene } from '../../scene/scene.ts';

const FILES = import.meta.glob('../../../scenes/*.json', { query: '?raw', import: 'default', eager: true }) as Record<string, string>;

export interface DemoEntry {
  readonly file: string;
  readonly title: string;
  readonly shows: string;
}

const INDEX = JSON.parse(FILES['../../../scenes/index.json']) as { default: string; scenes: DemoEntry[] };

export const DEMO_SCENES: readonly DemoEntry[] = INDEX.scenes;
export const DEMO_DEFAULT: string = INDEX.default;

export function demoScene(file: string): Scene {
  const text = FILES[`../../../scenes/${file}`];
  if (text === undefined) throw new Error(`no demo scene ${file}`);
  return sceneParse(text);
}
