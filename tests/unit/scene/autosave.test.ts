// The autosave record: round trip, damaged records refused with the place named, the keeping in a
// key-value store (one key, the older page keys moved once, damaged entries kept aside, refusals survived).
import { describe, expect, it } from 'vitest';
import { AUTOSAVE_KEY, AUTOSAVE_UNREADABLE_KEY, LEGACY_META_KEY, LEGACY_SCENE_KEY, sceneAutosaveParse, sceneAutosaveRead, sceneAutosaveText, sceneAutosaveWrite, type AutosaveStorage } from '../../../src/scene/autosave.ts';
import { sceneToText } from '../../../src/scene/save.ts';
import { sampleScene } from './sample.ts';
import { NinefoldError } from '../../../src/exact/errors.ts';

describe('autosave', () => {
  it('restores exactly what was saved, with the time', () => {
    const t = new Date(Date.UTC(2026, 11, 1, 22, 30, 0));
    const back = sceneAutosaveParse(sceneAutosaveText(sampleScene(), t));
    expect(back.savedAt.toISOString()).toBe('2026-12-01T22:30:00.000Z');
    expect(back.scene).toEqual(sampleScene());
  });
  it('refuses a damaged record and names the place inside the scene', () => {
    const text = sceneAutosaveText(sampleScene(), new Date(0)).replace('"parents":["c1"]', '"parents":["zz"]');
    try {
      sceneAutosaveParse(text);
      throw new Error('accepted');
    } catch (e) {
      expect(e).toBeInstanceOf(NinefoldError);
      expect((e as NinefoldError).where).toBe('autosave.scene.objects[1].parents[0]');
    }
    expect(() => sceneAutosaveParse('{')).toThrow(/not valid JSON/);
    expect(() => sceneAutosaveParse('{"format":"other"}')).toThrow(/not a Ninefold autosave/);
    expect(() => sceneAutosaveParse('{"format":"ninefold-autosave","savedAt":"yesterday","scene":{}}')).toThrow(/no valid time/);
  });
});

/** A key-value store like the browser's; `refuse` makes every call throw, as a browser with storage off does. */
class MemoryStorage implements AutosaveStorage {
  readonly m = new Map<string, string>();
  refuse = false;
  getItem(k: string): string | null {
    if (this.refuse) throw new Error('SecurityError: storage is switched off');
    return this.m.get(k) ?? null;
  }
  setItem(k: string, v: string): void {
    if (this.refuse) throw new Error('QuotaExceededError');
    this.m.set(k, v);
  }
  removeItem(k: string): void {
    if (this.refuse) throw new Error('SecurityError: storage is switched off');
    this.m.delete(k);
  }
}

describe('autosave in a key-value store', () => {
  it('writes the whole scene under one key and reads it back exactly', () => {
    const s = new MemoryStorage();
    expect(sceneAutosaveRead(s)).toEqual({ kind: 'none' });
    expect(sceneAutosaveWrite(s, sampleScene(), new Date(Date.UTC(2026, 0, 2)))).toBe(true);
    expect([...s.m.keys()]).toEqual([AUTOSAVE_KEY]);
    const r = sceneAutosaveRead(s);
    expect(r.kind).toBe('restored');
    if (r.kind !== 'restored') return;
    expect(r.scene).toEqual(sampleScene());
    expect(r.migrated).toBe(false);
    expect(r.savedAt.toISOString()).toBe('2026-01-02T00:00:00.000Z');
  });
  it('moves an entry of the older page keys (scene file + title and notes) once into the record', () => {
    const s = new MemoryStorage();
    const old = { ...sampleScene(), title: 'Open construction', notes: '' };
    s.setItem(LEGACY_SCENE_KEY, sceneToText(old));
    s.setItem(LEGACY_META_KEY, JSON.stringify({ title: 'Chords on a cubic', notes: 'kept from before' }));
    const r = sceneAutosaveRead(s);
    expect(r.kind).toBe('restored');
    if (r.kind !== 'restored') return;
    expect(r.migrated).toBe(true);
    expect(r.scene).toEqual({ ...sampleScene(), title: 'Chords on a cubic', notes: 'kept from before' });
    expect([...s.m.keys()]).toEqual([AUTOSAVE_KEY]);
    const again = sceneAutosaveRead(s);
    expect(again.kind === 'restored' && !again.migrated && again.scene.title === 'Chords on a cubic').toBe(true);
  });
  it('an older entry with no readable title keeps the one in its scene file', () => {
    const s = new MemoryStorage();
    s.setItem(LEGACY_SCENE_KEY, sceneToText(sampleScene()));
    s.setItem(LEGACY_META_KEY, '{"title": 7');
    const r = sceneAutosaveRead(s);
    expect(r.kind === 'restored' && r.scene.title).toBe(sampleScene().title);
  });
  const damaged: [string, string][] = [
    ['not JSON', '{"format": "ninefold-autosave", '],
    ['another format', '{"format": "something-else"}'],
    ['a dangling parent', sceneAutosaveText(sampleScene(), new Date(0)).replace('"parents":["c1"]', '"parents":["zz"]')],
    ['a scene that is not an object', '{"format":"ninefold-autosave","savedAt":"2026-01-01T00:00:00Z","scene":7}'],
    ['JSON null', 'null'],
    ['a huge number for the next id', sceneAutosaveText(sampleScene(), new Date(0)).replace(/"nextId":\d+/, '"nextId":1e999')],
  ];
  for (const [what, text] of damaged) {
    it(`keeps a damaged record (${what}) aside with a message, never half-restored, never throwing`, () => {
      const s = new MemoryStorage();
      s.setItem(AUTOSAVE_KEY, text);
      const r = sceneAutosaveRead(s);
      expect(r.kind, what).toBe('unreadable');
      if (r.kind === 'unreadable') expect(r.error).toBeInstanceOf(NinefoldError);
      expect(s.getItem(AUTOSAVE_UNREADABLE_KEY)).toBe(text);
      expect(s.getItem(AUTOSAVE_KEY)).toBeNull();
    });
  }
  it('keeps a damaged older entry aside too', () => {
    const s = new MemoryStorage();
    s.setItem(LEGACY_SCENE_KEY, '{"format": "ninefold-scene", "version": 2, "objects": 7}');
    s.setItem(LEGACY_META_KEY, '{"title":"t","notes":""}');
    expect(sceneAutosaveRead(s).kind).toBe('unreadable');
    expect(s.getItem(AUTOSAVE_UNREADABLE_KEY)).toMatch(/"objects": 7/);
    expect(s.m.has(LEGACY_SCENE_KEY) || s.m.has(LEGACY_META_KEY)).toBe(false);
  });
  it('a refused storage neither throws nor loses the stored record; a scene that cannot be written leaves it as it was', () => {
    const s = new MemoryStorage();
    sceneAutosaveWrite(s, sampleScene(), new Date(0));
    const good = s.getItem(AUTOSAVE_KEY);
    s.refuse = true;
    expect(sceneAutosaveRead(s)).toEqual({ kind: 'none' });
    expect(sceneAutosaveWrite(s, sampleScene(), new Date(1))).toBe(false);
    s.refuse = false;
    expect(s.getItem(AUTOSAVE_KEY)).toBe(good);
    // An equation that no longer parses cannot be written as a file: the good record stays.
    const broken = sampleScene();
    const objects = broken.doc.objects.map((o, i) => (i === 0 ? { ...o, construction: { ...o.construction, params: { equation: 'y^2 = x^^3' } } } : o));
    expect(sceneAutosaveWrite(s, { ...broken, doc: { ...broken.doc, objects } }, new Date(2))).toBe(false);
    expect(s.getItem(AUTOSAVE_KEY)).toBe(good);
  });
});
