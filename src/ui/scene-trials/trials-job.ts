// The theorem-trials job: the messages between the page and its worker, and the run itself (the same
// code in the worker and in Node tests). Plain data only: the construction travels as its JSON shape.
// Cancellation ends the worker; the page keeps the tallies of the last progress message.
import { NinefoldError } from '../../exact/errors.ts';
import { constructionTrials, type TrialCheckReport, type TrialReport } from '../../construct/trials.ts';
import type { ConstructionDoc } from '../../construct/types.ts';

export interface TrialsRequest {
  readonly kind: 'trials';
  readonly job: number;
  readonly doc: ConstructionDoc;
  readonly count: number;
  readonly seed: number;
}

export type TrialsReply =
  | { readonly kind: 'progress'; readonly job: number; readonly done: number; readonly total: number; readonly checks: readonly TrialCheckReport[] }
  | { readonly kind: 'done'; readonly job: number; readonly report: TrialReport }
  | { readonly kind: 'error'; readonly job: number; readonly message: string; readonly where: string };

export function trialsJobRun(req: TrialsRequest, post: (reply: TrialsReply) => void): void {
  try {
    const report = constructionTrials(req.doc, {
      count: req.count,
      seed: req.seed,
      onProgress: (done, total, checks) => post({ kind: 'progress', job: req.job, done, total, checks }),
    });
    post({ kind: 'done', job: req.job, report });
  } catch (e) {
    if (e instanceof NinefoldError) post({ kind: 'error', job: req.job, message: e.message, where: e.where });
    else post({ kind: 'error', job: req.job, message: `the trials stopped: ${(e as Error).message}`, where: 'trials' });
  }
}
