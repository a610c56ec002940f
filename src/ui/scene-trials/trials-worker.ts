// The worker entry of the theorem trials: one job at a time, replies as in trials-job.ts.
import { trialsJobRun, type TrialsReply, type TrialsRequest } from './trials-job.ts';

const scope = self as unknown as { onmessage: ((e: MessageEvent<TrialsRequest>) => void) | null; postMessage(m: TrialsReply): void };

scope.onmessage = (e) => trialsJobRun(e.data, (reply) => scope.postMessage(reply));
