// What the person is doing right now: the tool, the objects picked for it so far, the selection, the
// object under the pointer, the message shown in place, and the view of the plane.
import { atom } from 'nanostores';
import type { ObjectId, PointApprox } from '../../construct/types.ts';

export type ToolId =
  | 'move'
  | 'point'
  | 'on-curve'
  | 'line'
  | 'tangent'
  | 'meet'
  | 'third'
  | 'sum'
  | 'multiple'
  | 'negative'
  | 'ninth'
  | 'weierstrass'
  | 'model-image'
  | 'parameter'
  | 'region';

export interface Notice {
  readonly kind: 'error' | 'info' | 'done';
  readonly text: string;
  /** Where it belongs: 'canvas', 'equation', 'tool', 'search', or an object id. */
  readonly where: string;
}

/** The view: the world point at the centre, pixels per world unit, and the canvas size in CSS pixels. */
export interface View {
  readonly cx: number;
  readonly cy: number;
  readonly scale: number;
  readonly width: number;
  readonly height: number;
}

/** What the blow-up view draws: the singular point, the moving point, the rational tangent lines. */
export interface BlowupView {
  readonly singular: PointApprox;
  readonly point: PointApprox | null;
  readonly tangents: readonly (readonly [number, number, number])[];
}

export const $blowup = atom<BlowupView | null>(null);
export const $tool = atom<ToolId>('move');
export const $picks = atom<readonly ObjectId[]>([]);
export const $selection = atom<readonly ObjectId[]>([]);
export const $hover = atom<ObjectId | null>(null);
export const $notice = atom<Notice | null>(null);
export const $view = atom<View>({ cx: 0, cy: 0, scale: 60, width: 800, height: 600 });
/** The integer n of the multiple tool, as typed. */
export const $multipleN = atom<string>('2');

export function worldToScreen(v: View, x: number, y: number): [number, number] {
  return [v.width / 2 + (x - v.cx) * v.scale, v.height / 2 - (y - v.cy) * v.scale];
}

export function screenToWorld(v: View, sx: number, sy: number): [number, number] {
  return [v.cx + (sx - v.width / 2) / v.scale, v.cy - (sy - v.height / 2) / v.scale];
}

export function noticeShow(kind: Notice['kind'], text: string, where = 'canvas'): void {
  $notice.set({ kind, text, where });
}

export function toolChoose(tool: ToolId): void {
  $tool.set(tool);
  $picks.set([]);
}
