// The scene as the page holds it: the construction in the canvas's stores ($doc, $values, $view) plus
// the scene's own title and notes. Converting between the canvas view (centre, scale, pixels) and the
// file's exact view (rational bounds), and opening a scene without touching the stores when it fails.
import { atom } from 'nanostores';
import { ratSnap } from '../../construct/snap.ts';
import { ratToNumber } from '../../exact/rational.ts';
import type { ValueMap } from '../../construct/types.ts';
import type { Scene, SceneView } from '../../scene/scene.ts';
import { $doc, $values, docReset } from '../stores/construction.ts';
import { $view, type View } from '../stores/interaction.ts';

export interface SceneMeta {
  readonly title: string;
  readonly notes: string;
}

/** The title and notes of a page that has not opened a scene. */
export const SCENE_META_DEFAULT: SceneMeta = Object.freeze({ title: 'Untitled scene', notes: '' });

export const $sceneMeta = atom<SceneMeta>(SCENE_META_DEFAULT);

/** The canvas view as exact bounds: each edge snapped to the simplest rational within a tenth of a pixel. */
export function viewToScene(v: View): SceneView {
  const hw = v.width / 2 / v.scale;
  const hh = v.height / 2 / v.scale;
  const tol = 0.1 / v.scale;
  return {
    xmin: ratSnap(v.cx - hw, tol),
    xmax: ratSnap(v.cx + hw, tol),
    ymin: ratSnap(v.cy - hh, tol),
    ymax: ratSnap(v.cy + hh, tol),
  };
}

/** A canvas view of the given size showing all of the scene's bounds (centred, same scale both ways). */
export function viewFromScene(s: SceneView, width: number, height: number): View {
  const xmin = ratToNumber(s.xmin);
  const xmax = ratToNumber(s.xmax);
  const ymin = ratToNumber(s.ymin);
  const ymax = ratToNumber(s.ymax);
  const scale = Math.min(width / (xmax - xmin), height / (ymax - ymin));
  return { cx: (xmin + xmax) / 2, cy: (ymin + ymax) / 2, scale, width, height };
}

export function sceneCurrent(): Scene {
  const m = $sceneMeta.get();
  return { title: m.title, notes: m.notes, doc: $doc.get(), view: viewToScene($view.get()) };
}

export function sceneValues(): ValueMap {
  return $values.get();
}

/** Make `scene` the open scene (no undo past it). Callers parse first, so a refused file never gets here. */
export function sceneOpen(scene: Scene): void {
  const v = $view.get();
  $sceneMeta.set({ title: scene.title, notes: scene.notes });
  $view.set(viewFromScene(scene.view, v.width, v.height));
  docReset(scene.doc);
}
