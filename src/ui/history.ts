// Undo and redo over immutable documents: the past, the present and the undone future.
//
// Canonical form: `past` oldest first, `future` nearest first; at most `limit` past states are kept.
// Pushing a state equal (by identity) to the present does nothing, so an idle commit makes no step.
export interface History<T> {
  readonly past: readonly T[];
  readonly present: T;
  readonly future: readonly T[];
}

export const HISTORY_LIMIT = 500;

export function historyStart<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

export function historyPush<T>(h: History<T>, next: T, limit = HISTORY_LIMIT): History<T> {
  if (next === h.present) return h;
  const past = [...h.past, h.present];
  return { past: past.length > limit ? past.slice(past.length - limit) : past, present: next, future: [] };
}

export function historyUndo<T>(h: History<T>): History<T> {
  if (h.past.length === 0) return h;
  return { past: h.past.slice(0, -1), present: h.past[h.past.length - 1], future: [h.present, ...h.future] };
}

export function historyRedo<T>(h: History<T>): History<T> {
  if (h.future.length === 0) return h;
  return { past: [...h.past, h.present], present: h.future[0], future: h.future.slice(1) };
}

/** Replace the present without making an undo step (the live positions of a drag in progress). */
export function historyReplace<T>(h: History<T>, present: T): History<T> {
  return { ...h, present };
}
