// The exact facts a figure carries beside its drawing: for every object its label, status and exact
// value (point X:Y:Z, line a:b:c, curve equation and coefficients, check verdict with its certificate),
// taken from the same computed values the screen shows.
import type { ConstructionDoc, ObjectValue, ValueMap } from '../construct/types.ts';
import { formToText } from '../poly/print.ts';
import { pointToString } from '../plane/parse-point.ts';
import { ratToString } from '../exact/rational.ts';
import type { FigureFact, FigureView } from './figure.ts';
import type { SceneView } from '../scene/scene.ts';
import { ratToNumber } from '../exact/rational.ts';

export function constructionFacts(doc: ConstructionDoc, values: ValueMap): FigureFact[] {
  return doc.objects.filter((o) => o.style.visible || o.type === 'check').map((o) => factOf(o.id, o.label, o.type, values.get(o.id), o.construction.params.equation));
}

function factOf(id: string, label: string, type: FigureFact['type'], v: ObjectValue | undefined, typed?: string): FigureFact {
  if (!v || v.type === 'failure') return { id, label, type, status: 'failed', ...(v ? { note: `not built: ${v.message}` } : {}) };
  switch (v.type) {
    case 'point': {
      const approx = v.approx.finite ? `(${fix(v.approx.x)}, ${fix(v.approx.y)})` : `direction (${fix(v.approx.x)}, ${fix(v.approx.y)}) at infinity`;
      return { id, label, type, status: v.status, ...(v.exact ? { exact: pointToString(v.exact) } : {}), approx };
    }
    case 'line':
      return { id, label, type, status: v.status, ...(v.exact ? { exact: pointToString(v.exact) } : {}) };
    case 'curve': {
      if (!v.form) return { id, label, type, status: v.status };
      return {
        id,
        label,
        type,
        status: v.status,
        equation: typed ?? `${formToText(v.form)} = 0`,
        coefficients: v.form.coeffs.map((c) => c.toString()),
      };
    }
    case 'check':
      return { id, label, type, status: v.status, exact: `${v.verdict}: ${v.claim}; ${v.certificate}` };
  }
}

function fix(x: number): string {
  return Number.isFinite(x) ? Number(x.toPrecision(10)).toString() : String(x);
}

/** The scene's exact view as a figure view (floats for drawing, the exact bounds for the notes). */
export function figureViewOf(view: SceneView): FigureView {
  return {
    xmin: ratToNumber(view.xmin),
    xmax: ratToNumber(view.xmax),
    ymin: ratToNumber(view.ymin),
    ymax: ratToNumber(view.ymax),
    exact: { xmin: ratToString(view.xmin), xmax: ratToString(view.xmax), ymin: ratToString(view.ymin), ymax: ratToString(view.ymax) },
  };
}
