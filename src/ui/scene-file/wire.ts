// The scene panel's wiring into the app, imported once by src/ui/main.ts: registers the panel, puts it
// at the top of the app's side bar (unless the app's template already has it), and opens the default
// demo scene when the page started with nothing restored. src/ui/persist.ts keeps the whole open scene
// (construction, title, notes, view) saved as one autosave record.
import { $doc } from '../stores/construction.ts';
import { sceneOpen } from './bridge.ts';
import { DEMO_DEFAULT, demoScene } from './demos.ts';
import './nf-scene-panel.ts';

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
  // A fresh start (nothing restored) opens the default demo.
  sceneOpenDefaultIfEmpty();
  panelPlace();
}, 0);
