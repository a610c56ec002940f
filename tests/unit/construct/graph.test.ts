// The construction graph: shapes checked, dependents found, cycles refused, documents validated.
import { describe, expect, it } from 'vitest';
import {
  constructionAdd,
  constructionDelete,
  constructionDependents,
  constructionEmpty,
  constructionOrder,
  constructionRedefine,
  constructionUpdate,
  constructionValidate,
} from '../../../src/construct/graph.ts';
import type { ConstructionDoc } from '../../../src/construct/types.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

function sample(): { doc: ConstructionDoc; ids: Record<string, string> } {
  let doc = constructionEmpty();
  const ids: Record<string, string> = {};
  const add = (name: string, kind: string, parents: string[] = [], params: Record<string, string> = {}, helperOf?: string) => {
    const r = constructionAdd(doc, { construction: { kind: kind as never, parents, params }, ...(helperOf ? { helperOf } : {}) });
    doc = r.doc;
    ids[name] = r.id;
  };
  add('E', 'curve-equation', [], { equation: 'y^2 = x^3 - 2x + 3' });
  add('A', 'point-free', [], { at: '1:1:1' });
  add('B', 'point-free', [], { at: '2:-1:1' });
  add('C', 'point-free', [], { at: '0:3:1' });
  add('l', 'line-through-two', [ids.A, ids.B]);
  add('m', 'line-through-two', [ids.B, ids.C]);
  add('X', 'point-meet', [ids.l, ids.m], { index: '0' });
  add('k', 'check-collinear', [ids.A, ids.B, ids.X]);
  return { doc, ids };
}

describe('constructionAdd', () => {
  it('gives fresh ids, default labels and makes the first curve active', () => {
    const { doc, ids } = sample();
    expect(new Set(Object.values(ids)).size).toBe(8);
    expect(doc.activeCurve).toBe(ids.E);
    expect(doc.objects.filter((o) => o.type === 'point').map((o) => o.label)).toEqual(['A', 'B', 'C', 'D']);
  });
  it('refuses a parent of the wrong type, naming the place', () => {
    const { doc, ids } = sample();
    expect(() => constructionAdd(doc, { construction: { kind: 'line-through-two', parents: [ids.A, ids.l], params: {} } })).toThrow(
      /needs a point here, but "l\d+" is a line/,
    );
    try {
      constructionAdd(doc, { construction: { kind: 'line-through-two', parents: [ids.A, ids.l], params: {} } });
    } catch (e) {
      expect(e).toBeInstanceOf(InvalidInput);
      expect((e as InvalidInput).where).toBe('new object.parents[1]');
    }
  });
  it('refuses a wrong number of parents, a missing parent and a missing param', () => {
    const { doc, ids } = sample();
    expect(() => constructionAdd(doc, { construction: { kind: 'line-through-two', parents: [ids.A], params: {} } })).toThrow(/needs 2 parent/);
    expect(() => constructionAdd(doc, { construction: { kind: 'check-collinear', parents: [ids.A, ids.B], params: {} } })).toThrow(/at least 3/);
    expect(() => constructionAdd(doc, { construction: { kind: 'line-through-two', parents: [ids.A, 'p999'], params: {} } })).toThrow(/not an earlier object/);
    expect(() => constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: {} } })).toThrow(/parameter "at"/);
  });
});

describe('dependents, delete, redefine', () => {
  it('finds dependents transitively, in order', () => {
    const { doc, ids } = sample();
    expect(constructionDependents(doc, ids.B)).toEqual([ids.l, ids.m, ids.X, ids.k]);
    expect(constructionDependents(doc, ids.C)).toEqual([ids.m, ids.X, ids.k]);
    expect(constructionDependents(doc, ids.k)).toEqual([]);
  });
  it('deletes an object with its dependents and keeps the rest', () => {
    const { doc, ids } = sample();
    const after = constructionDelete(doc, ids.C);
    expect(after.objects.map((o) => o.id)).toEqual([ids.E, ids.A, ids.B, ids.l]);
    expect(after.nextId).toBe(doc.nextId);
  });
  it('deletes helpers with their owner even when they were made first', () => {
    let { doc, ids } = sample();
    const h = constructionAdd(doc, { construction: { kind: 'line-through-two', parents: [ids.A, ids.C], params: {} } });
    doc = h.doc;
    const owner = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: '5:5:1' } } });
    doc = constructionUpdate(owner.doc, owner.id, {});
    const withHelper = { ...doc, objects: doc.objects.map((o) => (o.id === h.id ? { ...o, helperOf: owner.id } : o)) };
    expect(constructionDependents(withHelper, owner.id)).toEqual([h.id]);
    expect(constructionDelete(withHelper, owner.id).objects.some((o) => o.id === h.id)).toBe(false);
  });
  it('refuses a redefinition that would make a cycle', () => {
    const { doc, ids } = sample();
    // A as the meet of l and m: but l is built from A.
    expect(() => constructionRedefine(doc, ids.A, { kind: 'point-meet', parents: [ids.l, ids.m], params: { index: '0' } })).toThrow(/cycle/);
  });
  it('reorders after a legal redefinition so parents come first', () => {
    const { doc, ids } = sample();
    const n = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: '7:1:1' } } });
    const after = constructionRedefine(n.doc, ids.A, { kind: 'point-meet', parents: [ids.m, ids.m], params: { index: '0' } });
    const pos = new Map(after.objects.map((o, k) => [o.id, k]));
    for (const o of after.objects) for (const p of o.construction.parents) expect(pos.get(p)!).toBeLessThan(pos.get(o.id)!);
  });
  it('refuses to change an object type', () => {
    const { doc, ids } = sample();
    expect(() => constructionRedefine(doc, ids.A, { kind: 'line-through-two', parents: [ids.B, ids.C], params: {} })).toThrow(/must stay one/);
  });
  it('orders a shuffled list parents first', () => {
    const { doc } = sample();
    const shuffled = [...doc.objects].reverse();
    const ordered = constructionOrder(shuffled);
    const pos = new Map(ordered.map((o, k) => [o.id, k]));
    for (const o of ordered) for (const p of o.construction.parents) expect(pos.get(p)!).toBeLessThan(pos.get(o.id)!);
  });
});

describe('constructionValidate', () => {
  it('accepts its own documents after a JSON round trip', () => {
    const { doc } = sample();
    expect(constructionValidate(JSON.parse(JSON.stringify(doc)))).toEqual(doc);
  });
  it('names the path of a bad entry', () => {
    const { doc } = sample();
    const bad = JSON.parse(JSON.stringify(doc));
    bad.objects[4].construction.parents[1] = 'nope';
    expect(() => constructionValidate(bad)).toThrow(/not an earlier object/);
    try {
      constructionValidate(bad);
    } catch (e) {
      expect((e as InvalidInput).where).toBe('objects[4].construction.parents[1]');
    }
    const dup = JSON.parse(JSON.stringify(doc));
    dup.objects[2].id = dup.objects[1].id;
    expect(() => constructionValidate(dup)).toThrow(/used twice/);
    const float = JSON.parse(JSON.stringify(doc));
    float.objects[1].construction.params.at = 0.5;
    expect(() => constructionValidate(float)).toThrow(/params are strings/);
    expect(() => constructionValidate({})).toThrow(/objects/);
  });
});
