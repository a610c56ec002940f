// The scene panel's wiring into the app, imported once by src/ui/main.ts: registers the panel, puts it
// at the top of the app's side bar (unless the app's template already has it), and opens the default
// demo scene when the page started with nothing restored. The page's own store keeps the open scene
// saved (src/ui/persist.ts writes it as a scene file).
import { $doc } from '../stores/construction.ts';
import { $sceneMeta, sceneOpen, type SceneMeta } from './bridge.ts';
import { DEMO_DEFAULT, demoScene } from './demos.ts';
import './nf-scene-panel.ts';

/** The title and notes of the open scene, kept beside the page's stored construction. */
export const META_KEY = 'ninefold.open-scene-meta';

function metaKeep(restore: boolean): void {
  if (restore) {
    try {
      const raw = JSON.parse(localStorage.getItem(META_KEY) ?? 'null') as Partial<SceneMeta> | null;
      if (raw && typeof raw.title === 'string' && typeof raw.notes === 'string') {
        $sceneMeta.set({ title: raw.title.slice(0, 400), notes: raw.notes.slice(0, 20_000) });
      }
    } catch {
      // no readable stored title: keep the default
    }
  }
  const save = (m: SceneMeta): void => {
    try {
      localStorage.setItem(META_KEY, JSON.stringify(m));
    } catch {
      // storage refused: the title stays for this visit
    }
  };
  save($sceneMeta.get());
  $sceneMeta.listen(save);
}

/** Open the default demo scene when the construction is empty (a first visit, or nothing restored). */
export function sceneOpenDefaultIfEmpty(): boolean {
  if ($doc.get().objects.length > 0) return false;
  sceneOpen(demoScene(DEMO_DEFAULT));
  return true;
}

function panelPlace(tries = 0): void {
  const app = document.querySelector('nf-app');
  const aside = app?.shadowRoot?.querySelector('aside');
  if (!aside) {
    if (tries < 100) setTimeout(() => panelPlace(tries + 1), 20);
    return;
  }
  if (aside.querySelector('nf-scene-panel')) return;
  const details = document.createElement('details');
  details.open = true;
  const summary = document.createElement('summary');
  summary.append('Scene');
  const hint = document.createElement('span');
  hint.textContent = 'file, figure, trials';
  summary.append(hint);
  details.append(summary, document.createElement('nf-scene-panel'));
  aside.prepend(details);
}

// After the app's start (main.ts runs it synchronously once its imports are done).
setTimeout(() => {
  // A restored construction gets its stored title and notes back; a fresh start opens the default demo.
  const restored = !sceneOpenDefaultIfEmpty();
  metaKeep(restored);
  panelPlace();
}, 0);
