// The autosave record the page keeps in local storage: the whole open scene (construction, title, notes,
// view) as a scene file wrapped with the time it was saved, under one key, so a reload or a crash loses
// nothing. Reading one goes through the same validation as opening a file (sceneFileParse), so a damaged
// record is refused, never half-restored; a refused text is kept aside under a second key, and a write
// that cannot be made leaves the stored record as it was.
//
// Canonical form: { "format": "ninefold-autosave", "savedAt": ISO-8601 UTC, "scene": <scene file v2> }.
// Storage is any key-value store with the three methods below (the browser's localStorage in the page,
// a Map in tests); every call into it is guarded, since a browser may refuse storage altogether.
import { InvalidInput, NinefoldError } from '../exact/errors.ts';
import { sceneFromFile, sceneFileParse, sceneParse } from './load.ts';
import { sceneToFile } from './save.ts';
import type { Scene } from './scene.ts';

export const AUTOSAVE_FORMAT = 'ninefold-autosave';
/** The local-storage key; a new key per scene format version keeps older records readable by older builds. */
export const AUTOSAVE_KEY = 'ninefold.autosave';
/** Where a stored text that does not load is kept (the latest one), so nothing is silently dropped. */
export const AUTOSAVE_UNREADABLE_KEY = 'ninefold.autosave.unreadable';
/** The page's keys before the autosave record: the construction as a scene file, and title and notes as JSON. */
export const LEGACY_SCENE_KEY = 'ninefold.open-construction';
export const LEGACY_META_KEY = 'ninefold.open-scene-meta';

export interface AutosaveStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export type AutosaveRead =
  | { readonly kind: 'none' }
  | { readonly kind: 'restored'; readonly scene: Scene; readonly savedAt: Date; readonly migrated: boolean }
  /** The stored text did not load: it is kept under AUTOSAVE_UNREADABLE_KEY and nothing is restored. */
  | { readonly kind: 'unreadable'; readonly error: NinefoldError };

export function sceneAutosaveText(scene: Scene, savedAt: Date): string {
  return JSON.stringify({ format: AUTOSAVE_FORMAT, savedAt: savedAt.toISOString(), scene: sceneToFile(scene) });
}

export function sceneAutosaveParse(text: string): { savedAt: Date; scene: Scene } {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw new InvalidInput('the autosaved scene is not valid JSON', 'autosave');
  }
  const r = raw as { format?: unknown; savedAt?: unknown; scene?: unknown };
  if (!r || typeof r !== 'object' || r.format !== AUTOSAVE_FORMAT) throw new InvalidInput('not a Ninefold autosave record', 'autosave.format');
  const savedAt = typeof r.savedAt === 'string' ? new Date(r.savedAt) : new Date(NaN);
  if (Number.isNaN(savedAt.getTime())) throw new InvalidInput('the autosave record has no valid time', 'autosave.savedAt');
  try {
    return { savedAt, scene: sceneFromFile(sceneFileParse(JSON.stringify(r.scene ?? null))) };
  } catch (e) {
    if (e instanceof InvalidInput || (e instanceof Error && 'where' in e)) {
      const err = e as InvalidInput;
      throw new InvalidInput(err.message, `autosave.scene.${err.where}`);
    }
    throw e;
  }
}

/**
 * Write the scene's record. Returns false, leaving the stored record untouched, when the scene cannot be
 * written as a file or the storage refuses (full, or switched off).
 */
export function sceneAutosaveWrite(storage: AutosaveStorage, scene: Scene, now: Date): boolean {
  let text: string;
  try {
    text = sceneAutosaveText(scene, now);
  } catch {
    return false;
  }
  return guarded(() => {
    storage.setItem(AUTOSAVE_KEY, text);
    return true;
  }, false);
}

/**
 * The stored scene. A record in the page's older keys (construction, then title and notes beside it) is
 * read once, written as an autosave record and its keys removed. Never throws.
 */
export function sceneAutosaveRead(storage: AutosaveStorage): AutosaveRead {
  const text = guarded(() => storage.getItem(AUTOSAVE_KEY), null);
  if (text !== null) {
    try {
      const { scene, savedAt } = sceneAutosaveParse(text);
      return { kind: 'restored', scene, savedAt, migrated: false };
    } catch (e) {
      return keptAside(storage, AUTOSAVE_KEY, text, e);
    }
  }
  const legacy = guarded(() => storage.getItem(LEGACY_SCENE_KEY), null);
  if (legacy === null) return { kind: 'none' };
  let scene: Scene;
  try {
    scene = sceneParse(legacy);
  } catch (e) {
    guarded(() => storage.removeItem(LEGACY_META_KEY), undefined);
    return keptAside(storage, LEGACY_SCENE_KEY, legacy, e);
  }
  scene = { ...scene, ...legacyMeta(guarded(() => storage.getItem(LEGACY_META_KEY), null)) };
  const now = new Date();
  if (sceneAutosaveWrite(storage, scene, now)) {
    guarded(() => {
      storage.removeItem(LEGACY_SCENE_KEY);
      storage.removeItem(LEGACY_META_KEY);
    }, undefined);
  }
  return { kind: 'restored', scene, savedAt: now, migrated: true };
}

/** Title and notes from the older page's JSON beside the construction; nothing when it does not read. */
function legacyMeta(text: string | null): { title?: string; notes?: string } {
  try {
    const m = JSON.parse(text ?? 'null') as { title?: unknown; notes?: unknown } | null;
    if (!m || typeof m.title !== 'string' || typeof m.notes !== 'string') return {};
    return { title: m.title.slice(0, 400), notes: m.notes.slice(0, 20_000) };
  } catch {
    return {};
  }
}

function keptAside(storage: AutosaveStorage, key: string, text: string, e: unknown): AutosaveRead {
  guarded(() => {
    storage.setItem(AUTOSAVE_UNREADABLE_KEY, text);
    storage.removeItem(key);
  }, undefined);
  const error = e instanceof NinefoldError ? e : new NinefoldError(`the stored scene could not be read: ${(e as Error)?.message ?? String(e)}`, 'autosave');
  return { kind: 'unreadable', error };
}

/** Runs a storage call; a browser that refuses storage throws, which must not stop the page. */
function guarded<T>(f: () => T, fallback: T): T {
  try {
    return f();
  } catch {
    return fallback;
  }
}
