// Keeping the open scene in the browser: the page's stores (construction, title, notes, view) written as
// one autosave record after a change and opened again at start; a damaged record never replaces the scene
// that is open, and is kept aside.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { persistForget, persistKeep, persistRestore } from '../../../src/ui/persist.ts';
import { AUTOSAVE_KEY, AUTOSAVE_UNREADABLE_KEY, sceneAutosaveParse, type AutosaveStorage } from '../../../src/scene/autosave.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';
import { $doc, docCommit, docReset } from '../../../src/ui/stores/construction.ts';
import { $view } from '../../../src/ui/stores/interaction.ts';
import { $sceneMeta, SCENE_META_DEFAULT } from '../../../src/ui/scene-file/bridge.ts';

class MemoryStorage implements AutosaveStorage {
  readonly m = new Map<string, string>();
  getItem(k: string): string | null {
    return this.m.get(k) ?? null;
  }
  setItem(k: string, v: string): void {
    this.m.set(k, v);
  }
  removeItem(k: string): void {
    this.m.delete(k);
  }
}

function twoObjects() {
  let doc = constructionEmpty();
  doc = constructionAdd(doc, { construction: { kind: 'curve-equation', parents: [], params: { equation: 'y^2 = x^3 - 4x + 4' } } }).doc;
  doc = constructionAdd(doc, { construction: { kind: 'point-on-curve', parents: ['c1'], params: { at: '1:1:1' } } }).doc;
  return doc;
}

describe('persist', () => {
  let stop: (() => void) | undefined;
  beforeEach(() => {
    vi.useFakeTimers();
    docReset(constructionEmpty());
    $sceneMeta.set(SCENE_META_DEFAULT);
    $view.set({ cx: 0, cy: 0, scale: 60, width: 800, height: 600 });
  });
  afterEach(() => {
    stop?.();
    vi.useRealTimers();
  });

  it('writes construction, title, notes and view as one record after a change, and opens it again', () => {
    const s = new MemoryStorage();
    stop = persistKeep(s, 150);
    docCommit(twoObjects());
    $sceneMeta.set({ title: 'Chords of a cubic', notes: 'two points, so far' });
    $view.set({ ...$view.get(), cx: 1, cy: -2, scale: 40 });
    expect(s.m.size).toBe(0); // nothing until things are still
    vi.advanceTimersByTime(200);
    expect([...s.m.keys()]).toEqual([AUTOSAVE_KEY]);
    const record = sceneAutosaveParse(s.getItem(AUTOSAVE_KEY)!);
    expect(record.scene.title).toBe('Chords of a cubic');
    stop();
    stop = undefined;
    // A new visit: empty stores, then the restore.
    docReset(constructionEmpty());
    $sceneMeta.set(SCENE_META_DEFAULT);
    $view.set({ cx: 0, cy: 0, scale: 60, width: 800, height: 600 });
    const r = persistRestore(s);
    expect(r.kind).toBe('restored');
    expect($doc.get()).toEqual(twoObjects());
    expect($sceneMeta.get()).toEqual({ title: 'Chords of a cubic', notes: 'two points, so far' });
    expect($view.get().cx).toBeCloseTo(1, 2);
    expect($view.get().cy).toBeCloseTo(-2, 2);
    expect($view.get().scale).toBeCloseTo(40, 1);
  });
  it('a damaged record leaves the open scene as it is and is kept aside; the next save writes the open scene', () => {
    const s = new MemoryStorage();
    docCommit(twoObjects());
    $sceneMeta.set({ title: 'Good scene', notes: '' });
    const bad = '{"format":"ninefold-autosave","savedAt":"2026-01-01T00:00:00Z","scene":{"format":"ninefold-scene","version":2,"objects":7}}';
    s.setItem(AUTOSAVE_KEY, bad);
    const r = persistRestore(s);
    expect(r.kind).toBe('unreadable');
    expect($doc.get()).toEqual(twoObjects());
    expect($sceneMeta.get().title).toBe('Good scene');
    expect(s.getItem(AUTOSAVE_UNREADABLE_KEY)).toBe(bad);
    stop = persistKeep(s, 150);
    $sceneMeta.set({ title: 'Good scene', notes: 'edited' });
    vi.advanceTimersByTime(200);
    expect(sceneAutosaveParse(s.getItem(AUTOSAVE_KEY)!).scene.doc).toEqual(twoObjects());
    expect(s.getItem(AUTOSAVE_UNREADABLE_KEY)).toBe(bad);
  });
  it('forgets the record on a fresh start', () => {
    const s = new MemoryStorage();
    stop = persistKeep(s, 10);
    docCommit(twoObjects());
    vi.advanceTimersByTime(20);
    expect(s.m.has(AUTOSAVE_KEY)).toBe(true);
    persistForget(s);
    expect(s.m.has(AUTOSAVE_KEY)).toBe(false);
  });
});
