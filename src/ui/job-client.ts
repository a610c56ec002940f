// The page's side of the one job worker (src/worker/job-worker.ts, messages in src/worker/jobs.ts). Each
// feature that sends jobs (background evaluation, point search, theorem trials) holds a channel of its
// own, that is its own worker, because cancelling is ending the worker (jobs are synchronous inside it)
// and cancelling one feature must not stop another. A reply of an older job is dropped.
import type { JobReply, JobRequest } from '../worker/jobs.ts';

/** A request as a feature writes it; the channel numbers the job. */
export type JobAsk = JobRequest extends infer R ? (R extends JobRequest ? Omit<R, 'job'> : never) : never;

export class JobChannel {
  private worker: Worker | null = null;
  private job = 0;
  private running = false;

  /** `onReply` gets the current job's replies; `onFailure` a worker that broke (it is then started afresh). */
  constructor(
    private readonly onReply: (reply: JobReply) => void,
    private readonly onFailure: (message: string) => void,
  ) {}

  /** Is a job sent and not yet answered with its final reply? */
  public get busy(): boolean {
    return this.running;
  }

  /** Send a job (a busy channel's job is not ended: call cancel() first to replace it). */
  public send(ask: JobAsk): number {
    this.worker ??= this.workerStart();
    this.job += 1;
    this.running = true;
    this.worker.postMessage({ ...ask, job: this.job } as JobRequest);
    return this.job;
  }

  /** End the running job now by ending the worker; the next send starts a fresh one. */
  public cancel(): void {
    this.worker?.terminate();
    this.worker = null;
    this.job += 1;
    this.running = false;
  }

  private workerStart(): Worker {
    const w = new Worker(new URL('../worker/job-worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (e: MessageEvent<JobReply>) => {
      const r = e.data;
      if (r.job !== this.job) return; // a cancelled or replaced job's late message
      if (r.kind !== 'progress') this.running = false;
      this.onReply(r);
    };
    w.onerror = (e: ErrorEvent) => {
      e.preventDefault?.();
      w.terminate();
      if (this.worker === w) this.worker = null;
      this.running = false;
      this.onFailure(e.message || 'the worker stopped');
    };
    return w;
  }
}
