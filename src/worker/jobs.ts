// The messages between the page and the job worker: background evaluation, point search, theorem trials.
// Plain data only (structured clone keeps bigints, maps and arrays); points as "X:Y:Z" in search replies,
// the construction as its JSON shape.
//
// Cancellation is by ending the worker (the page then starts a fresh one): jobs are synchronous inside
// the worker, so a message could not interrupt them, and ending it frees the thread at once.
import type { ConstructionDoc, ObjectId, ObjectValue } from '../construct/types.ts';
import type { TrialCheckReport, TrialReport } from '../construct/trials.ts';

export interface SearchRequest {
  readonly kind: 'search';
  readonly job: number;
  /** The curve's coefficients as decimal strings, in the order of src/poly/form.ts. */
  readonly coeffs: readonly string[];
  readonly height: number;
  /** Affine box as rationals "-17/4", or null for the whole plane. */
  readonly box: { readonly xmin: string; readonly xmax: string; readonly ymin: string; readonly ymax: string } | null;
}

/** Evaluate a whole construction exactly (its heavy objects included). */
export interface EvaluateRequest {
  readonly kind: 'evaluate';
  readonly job: number;
  readonly doc: ConstructionDoc;
}

/** Try the scene's checks on `count` random instances (src/construct/trials.ts). */
export interface TrialsRequest {
  readonly kind: 'trials';
  readonly job: number;
  readonly doc: ConstructionDoc;
  readonly count: number;
  readonly seed: number;
}

export type JobRequest = SearchRequest | EvaluateRequest | TrialsRequest;

/** Every reply but 'progress' ends its job. */

export type JobReply =
  /** Trials send their tallies so far with each step, so a cancelled run keeps them. */
  | { readonly kind: 'progress'; readonly job: number; readonly done: number; readonly total: number; readonly checks?: readonly TrialCheckReport[] }
  | { readonly kind: 'trials'; readonly job: number; readonly report: TrialReport }
  | { readonly kind: 'found'; readonly job: number; readonly points: readonly string[]; readonly note: string; readonly complete: boolean }
  | { readonly kind: 'values'; readonly job: number; readonly values: ReadonlyMap<ObjectId, ObjectValue> }
  | { readonly kind: 'error'; readonly job: number; readonly message: string; readonly where: string };
