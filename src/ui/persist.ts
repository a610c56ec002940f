// Keeping the open scene in the browser: the whole scene as the page holds it (construction, title,
// notes, view; src/ui/scene-file/bridge.ts) written as one autosave record (src/scene/autosave.ts) a
// moment after each change, and read back at start. A stored record that does not load is kept aside and
// reported, never half-restored, and never crashes the page.
import { AUTOSAVE_KEY, sceneAutosaveRead, sceneAutosaveWrite, type AutosaveRead, type AutosaveStorage } from '../scene/autosave.ts';
import { $history } from './stores/construction.ts';
import { $view } from './stores/interaction.ts';
import { $sceneMeta, sceneCurrent, sceneOpen } from './scene-file/bridge.ts';

/** Wait after a change before writing, so a burst of changes (a pan, typing a title) is one write. */
export const PERSIST_DELAY_MS = 150;

/** Open the stored scene, if one loads (the stores' view must already have the canvas size). */
export function persistRestore(storage: AutosaveStorage): AutosaveRead {
  const r = sceneAutosaveRead(storage);
  if (r.kind === 'restored') sceneOpen(r.scene);
  return r;
}

/** Write the open scene now; false when it could not be written (the stored record is then unchanged). */
export function persistSaveNow(storage: AutosaveStorage): boolean {
  return sceneAutosaveWrite(storage, sceneCurrent(), new Date());
}

/**
 * Keep the open scene saved from now on: after any change of the construction, the view, the title or
 * the notes, write it once things have been still for `delayMs`. Returns the function that stops it.
 */
export function persistKeep(storage: AutosaveStorage, delayMs = PERSIST_DELAY_MS): () => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const later = (): void => {
    if (timer !== undefined) clearTimeout(timer);
    timer = setTimeout(() => {
      timer = undefined;
      persistSaveNow(storage);
    }, delayMs);
  };
  const stops = [$history.listen(later), $view.listen(later), $sceneMeta.listen(later)];
  return () => {
    if (timer !== undefined) clearTimeout(timer);
    for (const stop of stops) stop();
  };
}

/** Drop the stored record (a fresh start of the page). */
export function persistForget(storage: AutosaveStorage): void {
  try {
    storage.removeItem(AUTOSAVE_KEY);
  } catch {
    // storage refused: nothing was stored
  }
}

/** The browser's local storage, or a do-nothing store when the browser refuses it (private modes). */
export function persistStorage(): AutosaveStorage {
  try {
    const s = window.localStorage;
    if (s) return s;
  } catch {
    // fall through
  }
  return { getItem: () => null, setItem: () => undefined, removeItem: () => undefined };
}
