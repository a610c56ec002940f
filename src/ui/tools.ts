// The construction tools: what each one asks the person to pick, its key, and the objects it adds.
// Pure (no DOM, no stores): the canvas controller feeds picks in and commits the document that comes out.
import { InvalidInput } from '../exact/errors.ts';
import { constructionAdd, constructionObject, type NewObject } from '../construct/graph.ts';
import { meetRealCount } from '../construct/evaluate-exact.ts';
import type { ConstructionDoc, ConstructionKind, ObjectId, ObjectType, ObjectValue } from '../construct/types.ts';
import type { ToolId } from './stores/interaction.ts';

export type PickKind = 'point' | 'line' | 'curve' | 'line-or-curve';

export interface ToolSpec {
  readonly id: ToolId;
  /** The button's words. */
  readonly name: string;
  /** The keyboard key (lower case). */
  readonly key: string;
  /** What to pick, in order; empty for tools that act on a place of the canvas. */
  readonly picks: readonly PickKind[];
  /** Names of the picks for the hint line ("base point O", "P", ...). */
  readonly pickNames: readonly string[];
  /** Does it act on the active curve? */
  readonly usesCurve: boolean;
  /** One line: what the tool does. */
  readonly help: string;
  /** Group on the tool rail. */
  readonly group: 'hand' | 'place' | 'lines' | 'group law' | 'models' | 'pencils' | 'search';
}

const eight = Array.from({ length: 8 }, (_, i) => `point ${i + 1} of 8`);

export const TOOLS: readonly ToolSpec[] = [
  { id: 'move', name: 'Pick and drag', key: 'v', picks: [], pickNames: [], usesCurve: false, group: 'hand', help: 'Select objects, drag free points and points on curves; drag empty space to pan, wheel to zoom.' },
  { id: 'point', name: 'Point', key: 'p', picks: [], pickNames: [], usesCurve: false, group: 'place', help: 'Click to place a free point; it snaps to the simplest rational in the pixel.' },
  { id: 'on-curve', name: 'On curve', key: 'c', picks: [], pickNames: [], usesCurve: true, group: 'place', help: 'Click near the active curve: snaps to a rational point of small height, else an algebraic point.' },
  { id: 'line', name: 'Line', key: 'l', picks: ['point', 'point'], pickNames: ['P', 'Q'], usesCurve: false, group: 'lines', help: 'The line through two points.' },
  { id: 'tangent', name: 'Tangent', key: 't', picks: ['point'], pickNames: ['the point of tangency'], usesCurve: true, group: 'lines', help: 'The tangent to the active curve at a smooth point of it.' },
  { id: 'meet', name: 'Meet', key: 'm', picks: ['line-or-curve', 'line-or-curve'], pickNames: ['the first line or curve', 'the second line or curve'], usesCurve: false, group: 'lines', help: 'Every real point where two lines or curves meet, with multiplicities.' },
  { id: 'third', name: 'Chord P*Q', key: 'x', picks: ['point', 'point'], pickNames: ['P', 'Q'], usesCurve: true, group: 'group law', help: 'The third point where the chord PQ (the tangent when P = Q) meets the active cubic.' },
  { id: 'sum', name: 'Sum P+Q', key: 's', picks: ['point', 'point', 'point'], pickNames: ['the base point O', 'P', 'Q'], usesCurve: true, group: 'group law', help: 'P + Q = O*(P*Q) on the active cubic, with the chord and the line through O drawn.' },
  { id: 'multiple', name: 'Multiple nP', key: 'n', picks: ['point', 'point'], pickNames: ['the base point O', 'P'], usesCurve: true, group: 'group law', help: 'nP with base point O, for the n typed beside the tool.' },
  { id: 'negative', name: 'Negative −P', key: 'i', picks: ['point', 'point'], pickNames: ['the base point O', 'P'], usesCurve: true, group: 'group law', help: '−P = P*(O*O), with the line drawn.' },
  { id: 'weierstrass', name: 'Model from O', key: 'w', picks: ['point'], pickNames: ['the rational point O of the active cubic'], usesCurve: true, group: 'models', help: 'The Weierstrass model W of the active smooth cubic from a rational point O on it (its minimal model, drawn as a curve).' },
  { id: 'model-image', name: 'Image on W', key: 'u', picks: ['curve', 'point'], pickNames: ['the Weierstrass model W', 'P'], usesCurve: false, group: 'models', help: 'The image of a point P of the cubic on its Weierstrass model W; O goes to the point at infinity.' },
  { id: 'ninth', name: 'Ninth point', key: '9', picks: Array.from({ length: 8 }, () => 'point' as const), pickNames: eight, usesCurve: false, group: 'pencils', help: 'The ninth base point of the pencil of cubics through eight points.' },
  { id: 'region', name: 'Region', key: 'r', picks: [], pickNames: [], usesCurve: false, group: 'search', help: 'Drag a rectangle on the canvas: the point search keeps to it.' },
];

export function toolSpec(id: ToolId): ToolSpec {
  return TOOLS.find((t) => t.id === id) ?? TOOLS[0];
}

export function toolByKey(key: string): ToolSpec | undefined {
  return TOOLS.find((t) => t.key === key.toLowerCase());
}

export function pickAccepts(kind: PickKind, type: ObjectType): boolean {
  return kind === 'line-or-curve' ? type === 'line' || type === 'curve' : kind === type;
}

const PICK_WORDS: Record<PickKind, string> = { point: 'a point', line: 'a line', curve: 'a curve', 'line-or-curve': 'a line or a curve' };

/** The hint for the next pick, e.g. "Sum P+Q: pick P (2 of 3)". */
export function toolHint(tool: ToolSpec, picked: number): string {
  if (tool.picks.length === 0) return `${tool.name}: ${tool.help}`;
  const k = Math.min(picked, tool.picks.length - 1);
  return `${tool.name}: pick ${tool.pickNames[k]} (${k + 1} of ${tool.picks.length}). ${tool.help}`;
}

/** Why an object cannot be the next pick, in words; null when it can. */
export function pickRefusal(tool: ToolSpec, picked: number, type: ObjectType, label: string): string | null {
  const kind = tool.picks[picked];
  if (!kind) return null;
  if (pickAccepts(kind, type)) return null;
  return `${tool.name} needs ${PICK_WORDS[kind]} here (${tool.pickNames[picked]}), but ${label} is a ${type}.`;
}

const HELPER_LINE = { colour: '#8a8577', stroke: 'dashed' as const, width: 1, showLabel: false };
const HELPER_POINT = { colour: '#8a8577', showLabel: false };

export interface ToolContext {
  readonly doc: ConstructionDoc;
  readonly values: ReadonlyMap<ObjectId, ObjectValue>;
  /** The integer n of the multiple tool, as typed. */
  readonly n: string;
}

/** The document with the tool's objects added, and the id of the main one. Throws InvalidInput in words. */
export function toolBuild(tool: ToolSpec, picks: readonly ObjectId[], ctx: ToolContext): { doc: ConstructionDoc; made: ObjectId[] } {
  let doc = ctx.doc;
  const made: ObjectId[] = [];
  const add = (kind: ConstructionKind, parents: readonly ObjectId[], params: Record<string, string> = {}, extra: Partial<NewObject> = {}): ObjectId => {
    const r = constructionAdd(doc, { construction: { kind, parents, params }, ...extra });
    doc = r.doc;
    made.push(r.id);
    return r.id;
  };
  const curve = (): ObjectId => {
    const c = doc.activeCurve;
    if (!c) throw new InvalidInput(`${tool.name} works on the active curve: type an equation first`, 'tool');
    return c;
  };
  const label = (id: ObjectId): string => constructionObject(doc, id)?.label ?? id;
  switch (tool.id) {
    case 'line': {
      const [p, q] = picks;
      if (p === q) throw new InvalidInput(`pick two different points: ${label(p)} twice fixes no line`, 'tool');
      add('line-through-two', [p, q]);
      break;
    }
    case 'tangent':
      add('line-tangent', [curve(), picks[0]]);
      break;
    case 'meet': {
      const [a, b] = picks;
      if (a === b) throw new InvalidInput(`pick two different objects: ${label(a)} meets itself everywhere`, 'tool');
      const va = ctx.values.get(a);
      const vb = ctx.values.get(b);
      if (!va || !vb || va.type === 'failure' || vb.type === 'failure') throw new InvalidInput('one of the two cannot be built now, so neither can their meet', 'tool');
      const n = meetRealCount(va, vb);
      if (n === 0) throw new InvalidInput(`${label(a)} and ${label(b)} have no real point in common`, 'tool');
      for (let k = 0; k < n; k++) add('point-meet', [a, b], { index: String(k) });
      break;
    }
    case 'third': {
      const c = curve();
      const [p, q] = picks;
      const t = add('point-third', [c, p, q]);
      if (p !== q) add('line-through-two', [p, q], {}, { helperOf: t, style: HELPER_LINE });
      else add('line-tangent', [c, p], {}, { helperOf: t, style: HELPER_LINE });
      break;
    }
    case 'sum': {
      const c = curve();
      const [o, p, q] = picks;
      const s = add('point-sum', [c, o, p, q]);
      const t = add('point-third', [c, p, q], {}, { helperOf: s, style: HELPER_POINT, label: `${label(p)}*${label(q)}` });
      if (p !== q) add('line-through-two', [p, q], {}, { helperOf: s, style: HELPER_LINE });
      else add('line-tangent', [c, p], {}, { helperOf: s, style: HELPER_LINE });
      add('line-through-two', [o, t], {}, { helperOf: s, style: HELPER_LINE });
      // The main object is the sum; put it first in `made` (it is already).
      break;
    }
    case 'multiple': {
      if (!/^[+-]?\d+$/.test(ctx.n.trim())) throw new InvalidInput(`type an integer n for the multiple, not "${ctx.n}"`, 'n');
      const [o, p] = picks;
      add('point-multiple', [curve(), o, p], { n: ctx.n.trim() }, { label: `${ctx.n.trim()}${label(p)}` });
      break;
    }
    case 'negative': {
      const c = curve();
      const [o, p] = picks;
      const m = add('point-negative', [c, o, p], {}, { label: `−${label(p)}` });
      const oo = add('point-third', [c, o, o], {}, { helperOf: m, style: HELPER_POINT, label: `${label(o)}*${label(o)}` });
      add('line-through-two', [p, oo], {}, { helperOf: m, style: HELPER_LINE });
      break;
    }
    case 'weierstrass':
      add('curve-weierstrass', [curve(), picks[0]], {}, { label: 'W' });
      break;
    case 'model-image': {
      const [w, p] = picks;
      const model = constructionObject(doc, w);
      if (!model || model.construction.kind !== 'curve-weierstrass') {
        throw new InvalidInput(`${label(w)} is not a Weierstrass model: make one with Model from O first`, 'tool');
      }
      const [c, o] = model.construction.parents;
      add('point-weierstrass-image', [c, o, p], {}, { label: `W(${label(p)})` });
      break;
    }
    case 'ninth':
      if (new Set(picks).size !== 8) throw new InvalidInput('pick eight different points', 'tool');
      add('point-ninth', picks);
      break;
    default:
      throw new InvalidInput(`${tool.name} does not take picks`, 'tool');
  }
  return { doc, made };
}
