// Keeping the open construction in the browser: written (as a scene file, src/scene) after every change,
// read back at start, so a reload or a crash loses nothing. A stored text that no longer loads is kept
// aside under another key and reported, never silently dropped.
import { NinefoldError } from '../exact/errors.ts';
import { ratToString } from '../exact/rational.ts';
import { ratSnap } from '../construct/snap.ts';
import { sceneParse } from '../scene/load.ts';
import { sceneToText } from '../scene/save.ts';
import type { Scene } from '../scene/scene.ts';
import type { ConstructionDoc } from '../construct/types.ts';
import type { View } from './stores/interaction.ts';
import { viewBounds } from './display.ts';
import { ratParse, ratToNumber } from '../exact/rational.ts';

export const STORAGE_KEY = 'ninefold.open-construction';
export const STORAGE_BROKEN_KEY = 'ninefold.open-construction.unreadable';

function boundText(x: number, view: View): string {
  return ratToString(ratSnap(x, 0.5 / view.scale));
}

export function persistText(doc: ConstructionDoc, view: View): string {
  const b = viewBounds(view);
  const scene: Scene = {
    title: 'Open construction',
    notes: '',
    doc,
    view: { xmin: ratParse(boundText(b.xmin, view)), xmax: ratParse(boundText(b.xmax, view)), ymin: ratParse(boundText(b.ymin, view)), ymax: ratParse(boundText(b.ymax, view)) },
  };
  return sceneToText(scene);
}

export function persistSave(storage: Storage, doc: ConstructionDoc, view: View): void {
  try {
    storage.setItem(STORAGE_KEY, persistText(doc, view));
  } catch {
    // Storage full or refused: the construction stays open; nothing to do but try again next change.
  }
}

export interface Restored {
  readonly doc: ConstructionDoc;
  /** Centre and scale for a canvas of the given size. */
  readonly view: Pick<View, 'cx' | 'cy' | 'scale'>;
}

/** The stored construction, null when there is none; throws NinefoldError (kept aside) when it does not load. */
export function persistRestore(storage: Storage, width: number, height: number): Restored | null {
  const text = storage.getItem(STORAGE_KEY);
  if (!text) return null;
  try {
    const scene = sceneParse(text);
    const [x0, x1, y0, y1] = [scene.view.xmin, scene.view.xmax, scene.view.ymin, scene.view.ymax].map(ratToNumber);
    const scale = Math.min(width / (x1 - x0), height / (y1 - y0));
    return { doc: scene.doc, view: { cx: (x0 + x1) / 2, cy: (y0 + y1) / 2, scale: Number.isFinite(scale) && scale > 0 ? scale : 60 } };
  } catch (e) {
    storage.setItem(STORAGE_BROKEN_KEY, text);
    storage.removeItem(STORAGE_KEY);
    if (e instanceof NinefoldError) throw e;
    throw new NinefoldError(`the stored construction could not be read: ${(e as Error).message}`, 'storage');
  }
}
