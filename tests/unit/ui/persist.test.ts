// Keeping the open construction in the browser's storage: written as a scene file, read back exactly,
// and an unreadable text kept aside with a message (never silently dropped).
import { describe, expect, it } from 'vitest';
import { STORAGE_BROKEN_KEY, STORAGE_KEY, persistRestore, persistSave } from '../../../src/ui/persist.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';

class MemoryStorage implements Storage {
  private m = new Map<string, string>();
  get length(): number {
    return this.m.size;
  }
  clear(): void {
    this.m.clear();
  }
  getItem(k: string): string | null {
    return this.m.get(k) ?? null;
  }
  key(i: number): string | null {
    return [...this.m.keys()][i] ?? null;
  }
  removeItem(k: string): void {
    this.m.delete(k);
  }
  setItem(k: string, v: string): void {
    this.m.set(k, v);
  }
}

describe('persist', () => {
  it('restores the construction and the view it saved', () => {
    let doc = constructionEmpty();
    doc = constructionAdd(doc, { construction: { kind: 'curve-equation', parents: [], params: { equation: 'y^2 = x^3 - 4x + 4' } } }).doc;
    doc = constructionAdd(doc, { construction: { kind: 'point-on-curve', parents: ['c1'], params: { at: '1:1:1' } } }).doc;
    const s = new MemoryStorage();
    persistSave(s, doc, { cx: 1, cy: -2, scale: 40, width: 800, height: 600 });
    const r = persistRestore(s, 800, 600);
    expect(r?.doc).toEqual(doc);
    expect(r?.view.cx).toBeCloseTo(1, 1);
    expect(r?.view.cy).toBeCloseTo(-2, 1);
    expect(r?.view.scale).toBeCloseTo(40, 0);
  });
  it('gives null with nothing stored, and keeps an unreadable text aside with a message', () => {
    const s = new MemoryStorage();
    expect(persistRestore(s, 800, 600)).toBeNull();
    s.setItem(STORAGE_KEY, '{"format": "ninefold-scene", "version": 2, "objects": 7}');
    expect(() => persistRestore(s, 800, 600)).toThrow();
    expect(s.getItem(STORAGE_KEY)).toBeNull();
    expect(s.getItem(STORAGE_BROKEN_KEY)).toMatch(/"objects": 7/);
  });
});
