// Editing a construction as a graph: add, relabel, restyle, change params, redefine, delete with
// dependents, validate a document read from outside.
//
// Canonical form (types.ts): objects in construction order (parents before children), unique ids.
// Every function here takes a canonical document and returns a new canonical one; documents are never
// mutated, so undo is keeping the old one.
import { InvalidInput } from '../exact/errors.ts';
import { KINDS, kindIsKnown } from './kinds.ts';
import type { Construction, ConstructionDoc, ConstructionObject, ObjectId, ObjectType, Style } from './types.ts';

export function constructionEmpty(): ConstructionDoc {
  return { objects: [], activeCurve: null, nextId: 1 };
}

const PREFIX: Record<ObjectType, string> = { curve: 'c', point: 'p', line: 'l', check: 'k' };

export const DEFAULT_STYLE: Readonly<Record<ObjectType, Style>> = {
  curve: { colour: '#1f5fa8', visible: true, showLabel: true, stroke: 'solid', width: 2 },
  point: { colour: '#b8321a', visible: true, showLabel: true },
  line: { colour: '#5b6b2f', visible: true, showLabel: false, stroke: 'solid', width: 1.25 },
  check: { colour: '#444444', visible: true, showLabel: false },
};

export function constructionObject(doc: ConstructionDoc, id: ObjectId): ConstructionObject | undefined {
  return doc.objects.find((o) => o.id === id);
}

export interface NewObject {
  readonly construction: Construction;
  readonly label?: string;
  readonly style?: Partial<Style>;
  readonly helperOf?: ObjectId;
}

/** Add one object at the end (its parents must already be there). Returns the new document and its id. */
export function constructionAdd(doc: ConstructionDoc, spec: NewObject): { doc: ConstructionDoc; id: ObjectId } {
  const { construction } = spec;
  constructionCheckShape(doc.objects, construction, 'new object');
  const type = KINDS[construction.kind].type;
  const id = `${PREFIX[type]}${doc.nextId}`;
  const label = spec.label ?? labelNext(doc, type);
  const obj: ConstructionObject = {
    id,
    type,
    label,
    style: { ...DEFAULT_STYLE[type], ...spec.style },
    construction: { kind: construction.kind, parents: [...construction.parents], params: { ...construction.params } },
    ...(spec.helperOf ? { helperOf: spec.helperOf } : {}),
  };
  const activeCurve = doc.activeCurve ?? (type === 'curve' ? id : null);
  return { doc: { objects: [...doc.objects, obj], activeCurve, nextId: doc.nextId + 1 }, id };
}

/** Labels: points A, B, ..., Z, A1, ...; lines l1, l2, ...; curves E1, ...; checks #1, ... */
function labelNext(doc: ConstructionDoc, type: ObjectType): string {
  const used = new Set(doc.objects.map((o) => o.label));
  for (let n = 0; ; n++) {
    let label: string;
    if (type === 'point') {
      const letter = String.fromCharCode(65 + (n % 26));
      label = n < 26 ? letter : `${letter}${Math.floor(n / 26)}`;
    } else if (type === 'line') label = `l${n + 1}`;
    else if (type === 'curve') label = `E${n + 1}`;
    else label = `#${n + 1}`;
    if (!used.has(label)) return label;
  }
}

/** Does `construction` fit its kind's table, with parents present among `before` and of the right types? */
export function constructionCheckShape(
  before: readonly ConstructionObject[],
  construction: Construction,
  where: string,
): void {
  if (!kindIsKnown(construction.kind)) throw new InvalidInput(`unknown construction kind "${construction.kind}"`, `${where}.kind`);
  const spec = KINDS[construction.kind];
  const parents = construction.parents;
  const fixed = spec.parents.length;
  if (spec.more ? parents.length < fixed + spec.more.min : parents.length !== fixed) {
    const want = spec.more ? `at least ${fixed + spec.more.min}` : `${fixed}`;
    throw new InvalidInput(`${spec.words} needs ${want} parent objects, got ${parents.length}`, `${where}.parents`);
  }
  const types = new Map(before.map((o) => [o.id, o.type]));
  parents.forEach((p, k) => {
    const t = types.get(p);
    if (t === undefined) throw new InvalidInput(`parent "${p}" is not an earlier object`, `${where}.parents[${k}]`);
    const allowed = k < fixed ? spec.parents[k] : [spec.more!.type];
    if (!allowed.includes(t)) {
      throw new InvalidInput(`${spec.words} needs a ${allowed.join(' or ')} here, but "${p}" is a ${t}`, `${where}.parents[${k}]`);
    }
  });
  for (const name of spec.params) {
    if (typeof construction.params[name] !== 'string') {
      throw new InvalidInput(`${spec.words} needs the parameter "${name}"`, `${where}.params.${name}`);
    }
  }
}

/** Every object built (directly or not) from `id`, in construction order, `id` excluded. Helpers made for an
 * object count as its dependents. */
export function constructionDependents(doc: ConstructionDoc, id: ObjectId): ObjectId[] {
  const gone = new Set([id]);
  // A helper is made before its owner, so one pass in order is not enough: repeat until nothing is added.
  for (let grew = true; grew; ) {
    grew = false;
    for (const o of doc.objects) {
      if (gone.has(o.id)) continue;
      if (o.construction.parents.some((p) => gone.has(p)) || (o.helperOf !== undefined && gone.has(o.helperOf))) {
        gone.add(o.id);
        grew = true;
      }
    }
  }
  return doc.objects.filter((o) => o.id !== id && gone.has(o.id)).map((o) => o.id);
}

/** Remove `id` and all its dependents. */
export function constructionDelete(doc: ConstructionDoc, id: ObjectId): ConstructionDoc {
  if (!constructionObject(doc, id)) throw new InvalidInput(`no object "${id}"`, 'id');
  const gone = new Set([id, ...constructionDependents(doc, id)]);
  const objects = doc.objects.filter((o) => !gone.has(o.id));
  const activeCurve = doc.activeCurve && !gone.has(doc.activeCurve) ? doc.activeCurve : (objects.find((o) => o.type === 'curve')?.id ?? null);
  return { ...doc, objects, activeCurve };
}

/** Change label, style or params of one object (its kind and parents stay). `params`, when given, replaces
 * the params as a whole (a point on a curve may switch between "at" and "x"/"near"). */
export function constructionUpdate(
  doc: ConstructionDoc,
  id: ObjectId,
  patch: { label?: string; style?: Partial<Style>; params?: Record<string, string> },
): ConstructionDoc {
  const objects = doc.objects.map((o) => {
    if (o.id !== id) return o;
    return {
      ...o,
      label: patch.label ?? o.label,
      style: patch.style ? { ...o.style, ...patch.style } : o.style,
      construction: patch.params ? { ...o.construction, params: { ...patch.params } } : o.construction,
    };
  });
  if (!objects.some((o) => o.id === id)) throw new InvalidInput(`no object "${id}"`, 'id');
  return { ...doc, objects };
}

/** Stroke widths (CSS pixels) a style may carry: thin enough to read a figure, never zero. */
export const STYLE_WIDTH_MIN = 0.5;
export const STYLE_WIDTH_MAX = 8;

/** Restyle one object. The patch is checked (colour "#rrggbb", width within bounds, stroke and width only on
 * curves and lines, since points show their status by shape); a patch that changes nothing returns `doc`
 * itself, so a store commit of it adds no undo step. */
export function constructionStyle(doc: ConstructionDoc, id: ObjectId, style: Partial<Style>): ConstructionDoc {
  const obj = constructionObject(doc, id);
  if (!obj) throw new InvalidInput(`no object "${id}"`, 'id');
  if (style.colour !== undefined && !/^#[0-9a-fA-F]{6}$/.test(style.colour)) {
    throw new InvalidInput(`a colour is written #rrggbb, found "${style.colour}"`, 'style.colour');
  }
  const stroked = obj.type === 'curve' || obj.type === 'line';
  if (style.stroke !== undefined) {
    if (!stroked) throw new InvalidInput(`"${obj.label}" is a ${obj.type}: only curves and lines have a stroke pattern`, 'style.stroke');
    if (!['solid', 'dashed', 'dotted'].includes(style.stroke)) throw new InvalidInput(`unknown stroke pattern "${style.stroke}"`, 'style.stroke');
  }
  if (style.width !== undefined) {
    if (!stroked) throw new InvalidInput(`"${obj.label}" is a ${obj.type}: only curves and lines have a stroke width`, 'style.width');
    if (!Number.isFinite(style.width) || style.width < STYLE_WIDTH_MIN || style.width > STYLE_WIDTH_MAX) {
      throw new InvalidInput(`a stroke width is between ${STYLE_WIDTH_MIN} and ${STYLE_WIDTH_MAX} pixels, found ${style.width}`, 'style.width');
    }
  }
  const keys = Object.keys(style) as (keyof Style)[];
  if (keys.every((k) => style[k] === undefined || style[k] === obj.style[k])) return doc;
  const defined = Object.fromEntries(keys.filter((k) => style[k] !== undefined).map((k) => [k, style[k]])) as Partial<Style>;
  return constructionUpdate(doc, id, { style: defined });
}

/** Give `id` a new construction of the same object type. Refused when it would make a cycle (a new parent
 * built from `id`); the objects are then re-ordered so parents come first. */
export function constructionRedefine(doc: ConstructionDoc, id: ObjectId, construction: Construction): ConstructionDoc {
  const obj = constructionObject(doc, id);
  if (!obj) throw new InvalidInput(`no object "${id}"`, 'id');
  if (!kindIsKnown(construction.kind) || KINDS[construction.kind].type !== obj.type) {
    throw new InvalidInput(`"${obj.label}" is a ${obj.type} and must stay one`, 'construction.kind');
  }
  const below = new Set([id, ...constructionDependents(doc, id)]);
  construction.parents.forEach((p, k) => {
    if (below.has(p)) {
      const name = constructionObject(doc, p)?.label ?? p;
      throw new InvalidInput(`"${name}" is built from "${obj.label}", so it cannot become its parent (a cycle)`, `parents[${k}]`);
    }
  });
  const others = doc.objects.filter((o) => o.id !== id);
  constructionCheckShape(others, construction, id);
  const changed = doc.objects.map((o) => (o.id === id ? { ...o, construction } : o));
  return { ...doc, objects: constructionOrder(changed) };
}

/** Construction order (parents first), stable otherwise. Assumes the graph has no cycle. */
export function constructionOrder(objects: readonly ConstructionObject[]): ConstructionObject[] {
  const byId = new Map(objects.map((o) => [o.id, o]));
  const placed = new Set<ObjectId>();
  const out: ConstructionObject[] = [];
  const visit = (o: ConstructionObject, depth: number): void => {
    if (placed.has(o.id)) return;
    if (depth > objects.length) throw new InvalidInput('the construction has a cycle', o.id);
    for (const p of o.construction.parents) {
      const q = byId.get(p);
      if (q) visit(q, depth + 1);
    }
    placed.add(o.id);
    out.push(o);
  };
  for (const o of objects) visit(o, 0);
  return out;
}

/**
 * Check a document read from outside (a scene file, storage): unique ids, known kinds, parents earlier and of
 * the right types, params present and strings. Throws InvalidInput naming the path, e.g.
 * "objects[3].construction.parents[1]".
 */
export function constructionValidate(doc: unknown): ConstructionDoc {
  const d = doc as ConstructionDoc;
  if (!d || typeof d !== 'object' || !Array.isArray(d.objects)) throw new InvalidInput('a construction needs an "objects" list', 'objects');
  const seen: ConstructionObject[] = [];
  const ids = new Set<string>();
  (d.objects as ConstructionObject[]).forEach((o, k) => {
    const where = `objects[${k}]`;
    if (!o || typeof o !== 'object') throw new InvalidInput('an object must be a JSON object', where);
    if (typeof o.id !== 'string' || o.id === '') throw new InvalidInput('an object needs a string id', `${where}.id`);
    if (ids.has(o.id)) throw new InvalidInput(`the id "${o.id}" is used twice`, `${where}.id`);
    if (typeof o.label !== 'string') throw new InvalidInput('an object needs a string label', `${where}.label`);
    if (!o.construction || typeof o.construction !== 'object' || !Array.isArray(o.construction.parents)) {
      throw new InvalidInput('an object needs a construction with a parents list', `${where}.construction`);
    }
    const params = o.construction.params ?? {};
    for (const [name, value] of Object.entries(params)) {
      if (typeof value !== 'string') throw new InvalidInput(`params are strings (exact values), "${name}" is not`, `${where}.construction.params.${name}`);
    }
    constructionCheckShape(seen, { ...o.construction, params }, `${where}.construction`);
    if (KINDS[o.construction.kind].type !== o.type) {
      throw new InvalidInput(`a ${o.construction.kind} object is a ${KINDS[o.construction.kind].type}, not a ${o.type}`, `${where}.type`);
    }
    ids.add(o.id);
    seen.push({ ...o, style: { ...DEFAULT_STYLE[o.type], ...(o.style ?? {}) }, construction: { ...o.construction, params } });
  });
  const activeCurve = d.activeCurve ?? null;
  if (activeCurve !== null && !seen.some((o) => o.id === activeCurve && o.type === 'curve')) {
    throw new InvalidInput(`the active curve "${String(activeCurve)}" is not a curve of the construction`, 'activeCurve');
  }
  const maxId = Math.max(0, ...seen.map((o) => Number(/\d+$/.exec(o.id)?.[0] ?? 0)));
  const nextId = typeof d.nextId === 'number' && d.nextId > maxId ? d.nextId : maxId + 1;
  return { objects: seen, activeCurve, nextId };
}
