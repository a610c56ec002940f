// What is under the pointer: the nearest object within a few pixels, points first, then lines, then
// curves (by |F| / |∇F|, the first-order distance to the curve). Floats only: this chooses, never decides.
import { floatFormEval, formGradientFloat, type FloatForm } from '../construct/float.ts';
import type { ConstructionDoc, ObjectId, ObjectValue } from '../construct/types.ts';
import { worldToScreen, type View } from './stores/interaction.ts';

export const HIT_POINT_PX = 9;
export const HIT_LINE_PX = 6;
export const HIT_CURVE_PX = 7;

export function curveFloat(coeffs: readonly number[]): FloatForm {
  return { degree: Math.round((Math.sqrt(8 * coeffs.length + 1) - 3) / 2), coeffs };
}

/** Distance in pixels from the screen point to the curve, to first order (Infinity when unknown). */
export function curveDistancePx(coeffs: readonly number[], view: View, x: number, y: number): number {
  const f = curveFloat(coeffs);
  const v = floatFormEval(f, x, y, 1);
  const g = formGradientFloat(f, [x, y, 1]);
  const n = Math.hypot(g[0], g[1]);
  if (!(n > 0)) return Math.abs(v) === 0 ? 0 : Infinity;
  return (Math.abs(v) / n) * view.scale;
}

export interface Hit {
  readonly id: ObjectId;
  readonly distance: number;
}

export function hitTest(
  doc: ConstructionDoc,
  values: ReadonlyMap<ObjectId, ObjectValue>,
  view: View,
  sx: number,
  sy: number,
  accept: (type: string) => boolean = () => true,
): Hit | null {
  const x = view.cx + (sx - view.width / 2) / view.scale;
  const y = view.cy - (sy - view.height / 2) / view.scale;
  let best: Hit | null = null;
  let bestRank = 9;
  for (const o of doc.objects) {
    if (!o.style.visible || !accept(o.type)) continue;
    const v = values.get(o.id);
    if (!v || v.type === 'failure') continue;
    let d = Infinity;
    let rank = 9;
    if (v.type === 'point' && v.approx.finite) {
      const [px, py] = worldToScreen(view, v.approx.x, v.approx.y);
      d = Math.hypot(px - sx, py - sy);
      rank = d <= HIT_POINT_PX ? (o.helperOf ? 1 : 0) : 9;
    } else if (v.type === 'line') {
      const [a, b, c] = v.approx;
      const n = Math.hypot(a, b);
      d = n > 0 ? (Math.abs(a * x + b * y + c) / n) * view.scale : Infinity;
      rank = d <= HIT_LINE_PX ? 2 : 9;
    } else if (v.type === 'curve') {
      d = curveDistancePx(v.approx, view, x, y);
      rank = d <= HIT_CURVE_PX ? 3 : 9;
    }
    if (rank === 9) continue;
    if (rank < bestRank || (rank === bestRank && best && d < best.distance)) {
      best = { id: o.id, distance: d };
      bestRank = rank;
    }
  }
  return best;
}
