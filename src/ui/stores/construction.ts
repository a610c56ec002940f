// The open construction and its computed values, with undo and redo.
//
// $history holds every committed document; $doc is its present. $values is recomputed after each commit
// from what changed (objects whose entry is a new object: the graph functions keep unchanged entries
// identical), and during a drag from the moving points alone, without a commit (one undo step per drag).
import { atom, computed } from 'nanostores';
import { constructionEvaluate } from '../../construct/evaluate.ts';
import { constructionEmpty } from '../../construct/graph.ts';
import type { ConstructionDoc, ConstructionObject, ObjectId, ObjectValue, PointApprox } from '../../construct/types.ts';
import { kindIsHeavy } from '../../construct/kinds.ts';
import { historyPush, historyRedo, historyStart, historyUndo, type History } from '../history.ts';

export const $history = atom<History<ConstructionDoc>>(historyStart(constructionEmpty()));
export const $doc = computed($history, (h) => h.present);
export const $values = atom<ReadonlyMap<ObjectId, ObjectValue>>(new Map());
export const $canUndo = computed($history, (h) => h.past.length > 0);
export const $canRedo = computed($history, (h) => h.future.length > 0);

let evaluatedDoc: ConstructionDoc | null = null;

/** Computes a whole document exactly somewhere else (the page installs a worker) and calls back. */
export type Background = (doc: ConstructionDoc, done: (values: ReadonlyMap<ObjectId, ObjectValue>) => void) => void;
let background: Background | null = null;

/** Heavy objects go to the background when one is installed (tests and the CLI compute everything here). */
export function docBackgroundInstall(b: Background | null): void {
  background = b;
}

function heavy(o: ConstructionObject, doc: ConstructionDoc): boolean {
  const types = o.construction.parents.map((p) => doc.objects.find((q) => q.id === p)?.type ?? 'point');
  return kindIsHeavy(o.construction.kind, types, o.construction.params);
}

/** Ids whose entries differ between two documents (new or changed objects). */
export function docChanged(before: ConstructionDoc | null, after: ConstructionDoc): Set<ObjectId> {
  const old = new Map((before?.objects ?? []).map((o) => [o.id, o]));
  return new Set(after.objects.filter((o) => old.get(o.id) !== o).map((o) => o.id));
}

function evaluate(doc: ConstructionDoc, moving?: ReadonlyMap<ObjectId, PointApprox>): void {
  const changed = docChanged(evaluatedDoc, doc);
  const previous = evaluatedDoc ? $values.get() : undefined;
  const defer = background ? heavy : undefined;
  const values = constructionEvaluate(doc, { ...(previous ? { previous, changed } : {}), ...(moving ? { moving } : {}), ...(defer ? { defer } : {}) });
  $values.set(values);
  evaluatedDoc = doc;
  if (background && doc.objects.some((o) => changed.has(o.id) && heavy(o, doc))) {
    background(doc, (exact) => {
      // Only the document still open gets the answer; a later commit has asked again.
      if ($history.get().present === doc && evaluatedDoc === doc) $values.set(exact);
    });
  }
}

/** Make `next` the present (one undo step) and recompute what changed. */
export function docCommit(next: ConstructionDoc): void {
  const h = $history.get();
  if (next === h.present) return;
  $history.set(historyPush(h, next));
  evaluate(next);
}

/** Start afresh from a document (a restored or loaded construction): no undo past it. */
export function docReset(doc: ConstructionDoc): void {
  $history.set(historyStart(doc));
  evaluatedDoc = null;
  evaluate(doc);
}

export function docUndo(): boolean {
  const h = $history.get();
  if (h.past.length === 0) return false;
  const next = historyUndo(h);
  $history.set(next);
  evaluate(next.present);
  return true;
}

export function docRedo(): boolean {
  const h = $history.get();
  if (h.future.length === 0) return false;
  const next = historyRedo(h);
  $history.set(next);
  evaluate(next.present);
  return true;
}

/** Live values while points move (no commit): the moving points and their dependents become approximate. */
export function docPreview(moving: ReadonlyMap<ObjectId, PointApprox>): void {
  const doc = $history.get().present;
  const previous = $values.get();
  $values.set(constructionEvaluate(doc, { previous, changed: new Set(moving.keys()), moving }));
  evaluatedDoc = doc;
}

/** Recompute the present from scratch, ending any preview. */
export function docRefresh(): void {
  evaluatedDoc = null;
  evaluate($history.get().present);
}
