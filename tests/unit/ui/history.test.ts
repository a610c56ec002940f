// Undo and redo over immutable states.
import { describe, expect, it } from 'vitest';
import { historyPush, historyRedo, historyReplace, historyStart, historyUndo } from '../../../src/ui/history.ts';

describe('history', () => {
  it('undoes and redoes in order, and a new step drops the redo future', () => {
    let h = historyStart('a');
    h = historyPush(h, 'b');
    h = historyPush(h, 'c');
    expect(h.present).toBe('c');
    h = historyUndo(h);
    expect(h.present).toBe('b');
    h = historyUndo(h);
    expect(h.present).toBe('a');
    expect(historyUndo(h)).toBe(h); // nothing left to undo
    h = historyRedo(h);
    expect(h.present).toBe('b');
    h = historyPush(h, 'd');
    expect(h.future).toEqual([]);
    expect(historyRedo(h)).toBe(h);
    expect(h.past).toEqual(['a', 'b']);
  });
  it('makes no step for the same state and keeps at most the limit', () => {
    let h = historyStart(0);
    expect(historyPush(h, 0)).toBe(h);
    for (let i = 1; i <= 10; i++) h = historyPush(h, i, 4);
    expect(h.past).toEqual([6, 7, 8, 9]);
    expect(historyReplace(h, 99)).toMatchObject({ present: 99, past: [6, 7, 8, 9] });
  });
});
