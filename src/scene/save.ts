// Writing a scene file (version 2). The text is stable — the same scene always gives the same bytes —
// so files diff well in version control, and `sceneParse(sceneToText(s))` gives back `s` exactly.
import { ratToString } from '../exact/rational.ts';
import type { ConstructionObject } from '../construct/types.ts';
import { coefficientsOf } from './migrate.ts';
import { scenePathText } from './path.ts';
import { SCENE_FORMAT, SCENE_VERSION, type SceneFile, type SceneObject } from './schema.ts';
import type { Scene } from './scene.ts';

export function sceneToFile(scene: Scene): SceneFile {
  return {
    format: SCENE_FORMAT,
    version: SCENE_VERSION as 2,
    title: scene.title,
    notes: scene.notes,
    objects: scene.doc.objects.map((o, i) => objectToFile(o, i)),
    activeCurve: scene.doc.activeCurve,
    nextId: scene.doc.nextId,
    view: {
      xmin: ratToString(scene.view.xmin),
      xmax: ratToString(scene.view.xmax),
      ymin: ratToString(scene.view.ymin),
      ymax: ratToString(scene.view.ymax),
    },
  };
}

export function sceneToText(scene: Scene): string {
  return JSON.stringify(sceneToFile(scene), null, 2) + '\n';
}

/** A file name for a download, from the title: letters, digits and dashes only. */
export function sceneFileName(scene: Scene): string {
  const base = scene.title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60);
  return `${base || 'scene'}.ninefold.json`;
}

function objectToFile(o: ConstructionObject, i: number): SceneObject {
  const s = o.style;
  const out: SceneObject = {
    id: o.id,
    type: o.type,
    label: o.label,
    kind: o.construction.kind,
    parents: [...o.construction.parents],
    params: { ...o.construction.params },
    style: {
      colour: s.colour,
      visible: s.visible,
      showLabel: s.showLabel,
      ...(s.stroke !== undefined ? { stroke: s.stroke } : {}),
      ...(s.width !== undefined ? { width: widthText(s.width) } : {}),
    },
    ...(o.helperOf !== undefined ? { helperOf: o.helperOf } : {}),
  };
  if (o.construction.kind === 'curve-equation') {
    const eq = o.construction.params.equation ?? '';
    return { ...out, coefficients: coefficientsOf(eq, scenePathText(['objects', i, 'params', 'equation'])) };
  }
  return out;
}

/** Widths are written with at most three decimals, in the range the schema reads back. */
function widthText(w: number): string {
  const clamped = Math.min(99, Math.max(0, Number.isFinite(w) ? w : 1));
  return String(Math.round(clamped * 1000) / 1000);
}
