// Running one job (evaluation, point search, theorem trials): the same code inside the worker and in Node
// tests. Pure apart from the `post` callback.
import { NinefoldError } from '../exact/errors.ts';
import { ratParse } from '../exact/rational.ts';
import { formFromCoeffs, monomialCount } from '../poly/form.ts';
import { pointToString } from '../plane/parse-point.ts';
import { cubicRationalPoints } from '../cubic/search.ts';
import type { JobReply, JobRequest } from './jobs.ts';
import { constructionEvaluate } from '../construct/evaluate.ts';
import { constructionValidate } from '../construct/graph.ts';
import { constructionTrials } from '../construct/trials.ts';

export function jobRun(req: JobRequest, post: (reply: JobReply) => void): void {
  try {
    if (req.kind === 'evaluate') {
      post({ kind: 'values', job: req.job, values: constructionEvaluate(constructionValidate(req.doc)) });
      return;
    }
    if (req.kind === 'trials') {
      const report = constructionTrials(constructionValidate(req.doc), {
        count: req.count,
        seed: req.seed,
        onProgress: (done, total, checks) => post({ kind: 'progress', job: req.job, done, total, checks }),
      });
      post({ kind: 'trials', job: req.job, report });
      return;
    }
    const n = req.coeffs.length;
    const degree = [1, 2, 3, 4, 5, 6].find((d) => monomialCount(d) === n);
    if (degree === undefined) throw new NinefoldError(`a curve with ${n} coefficients has no degree`, 'curve');
    const f = formFromCoeffs(degree, req.coeffs.map((c) => BigInt(c)));
    const region = req.box
      ? { kind: 'box' as const, xmin: ratParse(req.box.xmin), xmax: ratParse(req.box.xmax), ymin: ratParse(req.box.ymin), ymax: ratParse(req.box.ymax) }
      : undefined;
    let last = 0;
    const r = cubicRationalPoints(f, {
      height: req.height,
      ...(region ? { region } : {}),
      onProgress: (done, total) => {
        // At most about a hundred progress messages per job.
        if (done === total || done - last >= total / 100) {
          last = done;
          post({ kind: 'progress', job: req.job, done, total });
        }
      },
    });
    post({ kind: 'found', job: req.job, points: r.points.map(pointToString), note: r.note, complete: r.complete });
  } catch (e) {
    if (e instanceof NinefoldError) post({ kind: 'error', job: req.job, message: e.message, where: e.where });
    else post({ kind: 'error', job: req.job, message: `the ${JOB_WORDS[req.kind]} stopped: ${(e as Error).message}`, where: req.kind });
  }
}

const JOB_WORDS: Record<JobRequest['kind'], string> = { search: 'search', evaluate: 'computation', trials: 'trials' };
