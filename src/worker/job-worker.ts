// The job worker: heavy work off the page's thread. One job at a time; replies as in jobs.ts.
import { jobRun } from './job-run.ts';
import type { JobReply, JobRequest } from './jobs.ts';

const scope = self as unknown as { onmessage: ((e: MessageEvent<JobRequest>) => void) | null; postMessage(m: JobReply): void };

scope.onmessage = (e) => jobRun(e.data, (reply) => scope.postMessage(reply));
