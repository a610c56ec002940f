// The autosave record the page keeps in local storage: the current scene file wrapped with the time it
// was saved, so a reload or a crash loses nothing. Reading one goes through the same validation as
// opening a file (sceneFileParse), so a damaged record is refused, never half-restored.
//
// Canonical form: { "format": "ninefold-autosave", "savedAt": ISO-8601 UTC, "scene": <scene file v2> }.
import { InvalidInput } from '../exact/errors.ts';
import { sceneFromFile, sceneFileParse } from './load.ts';
import { sceneToFile } from './save.ts';
import type { Scene } from './scene.ts';

export const AUTOSAVE_FORMAT = 'ninefold-autosave';
/** The local-storage key; a new key per scene format version keeps older records readable by older builds. */
export const AUTOSAVE_KEY = 'ninefold.autosave';

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
