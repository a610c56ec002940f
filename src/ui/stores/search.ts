// The rational point search on the active curve: its state, progress, results and region.
import { atom } from 'nanostores';

export interface SearchState {
  readonly phase: 'idle' | 'running' | 'done' | 'cancelled' | 'failed';
  /** 0..1 while running. */
  readonly progress: number;
  /** Points found, "X:Y:Z", by height. */
  readonly points: readonly string[];
  /** The curve searched. */
  readonly curve: string | null;
  readonly height: number;
  readonly note: string;
}

export const SEARCH_IDLE: SearchState = { phase: 'idle', progress: 0, points: [], curve: null, height: 0, note: '' };

export const $search = atom<SearchState>(SEARCH_IDLE);
/** The region drawn on the canvas (world coordinates), or null for the whole plane. */
export const $region = atom<{ x0: number; y0: number; x1: number; y1: number } | null>(null);
