// A scene in memory: the construction (E7's ConstructionDoc, exact string params), the view as exact
// rationals, a title and notes. This is what load.ts returns and save.ts writes.
//
// Canonical form: `doc.objects` in construction order (parents first); view bounds with xmin < xmax,
// ymin < ymax.
import type { ConstructionDoc } from '../construct/types.ts';
import { rat, type Rational } from '../exact/rational.ts';

export interface SceneView {
  readonly xmin: Rational;
  readonly xmax: Rational;
  readonly ymin: Rational;
  readonly ymax: Rational;
}

export interface Scene {
  readonly title: string;
  readonly notes: string;
  readonly doc: ConstructionDoc;
  readonly view: SceneView;
}

export const SCENE_DEFAULT_VIEW: SceneView = Object.freeze({
  xmin: rat(-6n),
  xmax: rat(6n),
  ymin: rat(-4n),
  ymax: rat(4n),
});

export function sceneEmpty(title = 'Untitled scene'): Scene {
  return { title, notes: '', doc: { objects: [], activeCurve: null, nextId: 1 }, view: SCENE_DEFAULT_VIEW };
}
