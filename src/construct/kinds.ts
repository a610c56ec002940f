// The shape of each construction kind: the type of object it makes, the types of its parents in order,
// and the params it needs. The graph (graph.ts) checks every object against this table; the evaluators
// (evaluate-*.ts) assume an object that passed.
import type { ConstructionKind, ObjectType } from './types.ts';

export interface KindSpec {
  readonly type: ObjectType;
  /** Allowed types of each parent, in order. */
  readonly parents: readonly (readonly ObjectType[])[];
  /** When set, any number (at least `min`) of further parents of this type may follow. */
  readonly more?: { readonly type: ObjectType; readonly min: number };
  /** Required params. */
  readonly params: readonly string[];
  /** Words for the sidebar: what this kind is, e.g. "sum P + Q". */
  readonly words: string;
}

const C: readonly ObjectType[] = ['curve'];
const P: readonly ObjectType[] = ['point'];
const L: readonly ObjectType[] = ['line'];
const LC: readonly ObjectType[] = ['line', 'curve'];
const points = (n: number): (readonly ObjectType[])[] => Array.from({ length: n }, () => P);

export const KINDS: Readonly<Record<ConstructionKind, KindSpec>> = {
  'curve-equation': { type: 'curve', parents: [], params: ['equation'], words: 'curve from its equation' },
  'conic-through-five': { type: 'curve', parents: points(5), params: [], words: 'conic through five points' },
  'cubic-through-nine': { type: 'curve', parents: points(9), params: [], words: 'cubic through nine points' },
  'pencil-member': { type: 'curve', parents: points(8), params: ['member'], words: 'member of the pencil through eight points' },
  'curve-weierstrass': { type: 'curve', parents: [C, P], params: [], words: 'Weierstrass model of a cubic from a rational point' },
  'point-free': { type: 'point', parents: [], params: ['at'], words: 'free point' },
  'point-on-curve': { type: 'point', parents: [C], params: [], words: 'point on a curve' },
  'point-meet': { type: 'point', parents: [LC, LC], params: ['index'], words: 'meet point' },
  'point-third': { type: 'point', parents: [C, P, P], params: [], words: 'third point P*Q of a chord' },
  'point-sum': { type: 'point', parents: [C, P, P, P], params: [], words: 'sum P + Q (base point O)' },
  'point-multiple': { type: 'point', parents: [C, P, P], params: ['n'], words: 'multiple nP (base point O)' },
  'point-negative': { type: 'point', parents: [C, P, P], params: [], words: 'negative −P (base point O)' },
  'point-ninth': { type: 'point', parents: points(8), params: [], words: 'ninth base point of the pencil through eight' },
  'point-parameter': { type: 'point', parents: [C], params: ['at'], words: 'point from a parameter value' },
  'point-weierstrass-image': { type: 'point', parents: [C, P, P], params: [], words: 'image on the Weierstrass model (base point O)' },
  'line-through-two': { type: 'line', parents: [P, P], params: [], words: 'line through two points' },
  'line-tangent': { type: 'line', parents: [C, P], params: [], words: 'tangent at a point' },
  'line-equation': { type: 'line', parents: [], params: ['at'], words: 'line from its coefficients' },
  'check-collinear': { type: 'check', parents: [], more: { type: 'point', min: 3 }, params: [], words: 'collinear?' },
  'check-concurrent': { type: 'check', parents: [], more: { type: 'line', min: 3 }, params: [], words: 'concurrent?' },
  'check-on-curve': { type: 'check', parents: [P, C], params: [], words: 'on the curve?' },
  'check-equal': { type: 'check', parents: [P, P], params: [], words: 'equal?' },
  'check-nine': { type: 'check', parents: points(9), params: [], words: 'base of a pencil of cubics?' },
  'check-associative': { type: 'check', parents: [C, P, P, P, P], params: [], words: '(P+Q)+R = P+(Q+R)?' },
};

export function kindIsKnown(kind: string): kind is ConstructionKind {
  return Object.prototype.hasOwnProperty.call(KINDS, kind);
}

/**
 * Is this object heavy enough to compute off the page's thread? Meets of two curves (resultants of
 * degree up to 36) and multiples nP with |n| above 64 (heights grow like n²). `types` gives the types of
 * the parents.
 */
export function kindIsHeavy(kind: ConstructionKind, parentTypes: readonly ObjectType[], params: Readonly<Record<string, string>>): boolean {
  if (kind === 'point-meet') return parentTypes[0] === 'curve' && parentTypes[1] === 'curve';
  if (kind === 'point-multiple') {
    const n = Number(params.n);
    return !Number.isFinite(n) || Math.abs(n) > 64;
  }
  return false;
}
