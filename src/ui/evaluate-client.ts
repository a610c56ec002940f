// Heavy objects (meets of two curves, large multiples) computed in a worker: the page's thread only sends
// the document and takes the values back. A newer document ends the busy worker and starts afresh.
import type { ConstructionDoc, ObjectId, ObjectValue } from '../construct/types.ts';
import type { EvaluateRequest, JobReply } from '../worker/jobs.ts';
import { noticeShow } from './stores/interaction.ts';
import type { Background } from './stores/construction.ts';

let worker: Worker | null = null;
let busy = false;
let job = 0;
let waiting: ((values: ReadonlyMap<ObjectId, ObjectValue>) => void) | null = null;

function workerStart(): Worker {
  const w = new Worker(new URL('../worker/job-worker.ts', import.meta.url), { type: 'module' });
  w.onmessage = (e: MessageEvent<JobReply>) => {
    const r = e.data;
    if (r.job !== job) return;
    busy = false;
    if (r.kind === 'values') {
      waiting?.(r.values);
      noticeShow('done', 'The heavy objects are computed.', 'canvas');
    }
    else if (r.kind === 'error') noticeShow('error', r.message, 'canvas');
    waiting = null;
  };
  w.onerror = (e) => {
    busy = false;
    worker = null;
    noticeShow('error', `the background computation failed: ${e.message}`, 'canvas');
  };
  return w;
}

export const workerBackground: Background = (doc: ConstructionDoc, done) => {
  if (busy && worker) {
    worker.terminate();
    worker = null;
  }
  if (!worker) worker = workerStart();
  job += 1;
  busy = true;
  waiting = done;
  const req: EvaluateRequest = { kind: 'evaluate', job, doc };
  worker.postMessage(req);
  noticeShow('info', 'Computing the heavy objects in the background…', 'canvas');
};
