// The page's single wiring point: restore the open scene, keep it saved, mount the app, and expose
// a small hook for the browser tests (window.__ninefold).
import { constructionEmpty, constructionObject, constructionValidate } from '../construct/graph.ts';
import type { ObjectValue } from '../construct/types.ts';
import { $doc, $values, docBackgroundInstall, docReset } from './stores/construction.ts';
import { workerBackground } from './evaluate-client.ts';
import { $selection, $tool, $view, noticeShow, worldToScreen } from './stores/interaction.ts';
import { $search } from './stores/search.ts';
import { persistForget, persistKeep, persistRestore, persistStorage } from './persist.ts';
import { $sceneMeta, SCENE_META_DEFAULT } from './scene-file/bridge.ts';
import { frameLog, frameParts } from './components/nf-canvas.ts';
import './components/nf-app.ts';
import './scene-file/wire.ts'; // E8 wiring: scene panel (file, figure, trials) in the side bar; default demo scene when nothing was restored

function start(): void {
  document.body.style.margin = '0';
  docBackgroundInstall(workerBackground);
  const width = Math.max(200, window.innerWidth - 550);
  const height = Math.max(200, window.innerHeight - 44);
  $view.set({ ...$view.get(), width, height });
  const storage = persistStorage();
  docReset(constructionEmpty());
  const restored = persistRestore(storage);
  if (restored.kind === 'restored') {
    noticeShow('info', `Restored the open scene "${restored.scene.title}" (${restored.scene.doc.objects.length} objects)${restored.migrated ? ', moved from the older storage' : ''}.`, 'canvas');
  } else if (restored.kind === 'unreadable') {
    const e = restored.error;
    noticeShow('error', `The stored scene could not be restored (${e.message}${e.where ? `, at ${e.where}` : ''}); it is kept aside in the browser's storage.`, 'canvas');
  }
  persistKeep(storage);
  document.body.appendChild(document.createElement('nf-app'));
  installTestHook();
}

function installTestHook(): void {
  const canvasRect = (): DOMRect | null => {
    const app = document.querySelector('nf-app');
    const c = app?.shadowRoot?.querySelector('nf-canvas');
    return c ? c.getBoundingClientRect() : null;
  };
  const json = (v: unknown): unknown => JSON.parse(JSON.stringify(v, (_k, x) => (typeof x === 'bigint' ? x.toString() : x)));
  (window as unknown as Record<string, unknown>).__ninefold = {
    doc: () => json($doc.get()),
    value: (id: string): unknown => json($values.get().get(id) as ObjectValue | undefined),
    idOf: (label: string): string | null => $doc.get().objects.find((o) => o.label === label)?.id ?? null,
    labelOf: (id: string): string | null => constructionObject($doc.get(), id)?.label ?? null,
    /** Page coordinates of a world point. */
    worldToPage: (x: number, y: number): [number, number] | null => {
      const r = canvasRect();
      if (!r) return null;
      const [sx, sy] = worldToScreen($view.get(), x, y);
      return [r.left + sx, r.top + sy];
    },
    view: () => $view.get(),
    setView: (cx: number, cy: number, scale: number) => $view.set({ ...$view.get(), cx, cy, scale }),
    selection: () => $selection.get(),
    tool: () => $tool.get(),
    search: () => json($search.get()),
    frames: () => frameLog.slice(),
    frameParts: () => frameParts.slice(),
    /** Open a construction given as JSON (validated as a scene file's construction would be). */
    load: (doc: unknown) => {
      docReset(constructionValidate(doc));
    },
    /** Start from an empty construction with the default view (tests begin from a known state). */
    reset: () => {
      persistForget(persistStorage());
      docReset(constructionEmpty());
      $sceneMeta.set(SCENE_META_DEFAULT);
      $selection.set([]);
      $view.set({ ...$view.get(), cx: 0, cy: 0, scale: 60 });
    },
  };
}

start();
