// Heavy objects (meets of two curves, large multiples) computed in the job worker: the page's thread only
// sends the document and takes the values back. A newer document ends the busy job and starts afresh.
import type { ConstructionDoc, ObjectId, ObjectValue } from '../construct/types.ts';
import type { JobReply } from '../worker/jobs.ts';
import { noticeShow } from './stores/interaction.ts';
import type { Background } from './stores/construction.ts';
import { JobChannel } from './job-client.ts';

let waiting: ((values: ReadonlyMap<ObjectId, ObjectValue>) => void) | null = null;

function evaluateReply(r: JobReply): void {
  if (r.kind === 'values') {
    waiting?.(r.values);
    noticeShow('done', 'The heavy objects are computed.', 'canvas');
  } else if (r.kind === 'error') noticeShow('error', r.message, 'canvas');
  if (r.kind !== 'progress') waiting = null;
}

const channel = new JobChannel(evaluateReply, (message) => {
  waiting = null;
  noticeShow('error', `the background computation failed: ${message}`, 'canvas');
});

export const workerBackground: Background = (doc: ConstructionDoc, done) => {
  if (channel.busy) channel.cancel();
  waiting = done;
  channel.send({ kind: 'evaluate', doc });
  noticeShow('info', 'Computing the heavy objects in the background…', 'canvas');
};
