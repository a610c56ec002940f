// The page's channel to the job worker, with a stand-in Worker that runs the real jobs (src/worker/job-run.ts)
// and hands each reply over in its own task: replies reach the feature, a final reply ends the job, a
// cancelled or replaced job's late replies are dropped even when the worker is slow to end, and a broken
// worker is reported and replaced.
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { jobRun } from '../../../src/worker/job-run.ts';
import type { JobReply, JobRequest } from '../../../src/worker/jobs.ts';
import { JobChannel } from '../../../src/ui/job-client.ts';
import { constructionAdd, constructionEmpty } from '../../../src/construct/graph.ts';

class StandInWorker {
  static made: StandInWorker[] = [];
  onmessage: ((e: { data: JobReply }) => void) | null = null;
  onerror: ((e: { message: string; preventDefault(): void }) => void) | null = null;
  terminated = false;
  readonly url: string;
  constructor(url: URL | string) {
    this.url = String(url);
    StandInWorker.made.push(this);
  }
  postMessage(req: JobRequest): void {
    const replies: JobReply[] = [];
    jobRun(structuredClone(req), (r) => replies.push(structuredClone(r)));
    // Deliberately keeps delivering after terminate(): the channel must drop old jobs by their number.
    for (const r of replies) setTimeout(() => this.onmessage?.({ data: r }), 0);
  }
  terminate(): void {
    this.terminated = true;
  }
  fail(message: string): void {
    this.onerror?.({ message, preventDefault() {} });
  }
}

const ticks = (n = 50) => new Promise<void>((res) => setTimeout(res, n));

function claimDoc() {
  let doc = constructionEmpty();
  const a = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at: '0:0:1' } }, label: 'A' });
  const b = constructionAdd(a.doc, { construction: { kind: 'point-free', parents: [], params: { at: '1:2:1' } }, label: 'B' });
  const c = constructionAdd(b.doc, { construction: { kind: 'point-free', parents: [], params: { at: '2:4:1' } }, label: 'C' });
  doc = constructionAdd(c.doc, { construction: { kind: 'check-collinear', parents: [a.id, b.id, c.id], params: {} }, label: 'ABC collinear' }).doc;
  return doc;
}

describe('JobChannel', () => {
  const g = globalThis as { Worker?: unknown };
  let saved: unknown;
  beforeEach(() => {
    saved = g.Worker;
    g.Worker = StandInWorker;
    StandInWorker.made = [];
  });
  afterEach(() => {
    g.Worker = saved;
  });

  it('runs a point search on the job worker: progress, then the points; the final reply ends the job', async () => {
    const got: JobReply[] = [];
    const ch = new JobChannel((r) => got.push(r), () => undefined);
    ch.send({ kind: 'search', coeffs: ['1', '0', '0', '0', '0', '-4', '0', '-1', '0', '4'], height: 3, box: null });
    expect(ch.busy).toBe(true);
    expect(StandInWorker.made.map((w) => w.url.endsWith('/worker/job-worker.ts'))).toEqual([true]);
    await ticks();
    expect(got.some((r) => r.kind === 'progress')).toBe(true);
    expect(got[got.length - 1]).toMatchObject({ kind: 'found' });
    expect(ch.busy).toBe(false);
  });
  it('runs the theorem trials as a job of the same worker, with tallies in its progress', async () => {
    const got: JobReply[] = [];
    const ch = new JobChannel((r) => got.push(r), () => undefined);
    ch.send({ kind: 'trials', doc: claimDoc(), count: 5, seed: 4 });
    await ticks();
    expect(got.map((r) => r.kind)).toEqual(['progress', 'progress', 'progress', 'progress', 'progress', 'trials']);
    const last = got[4];
    const tally = last.kind === 'progress' ? last.checks?.[0] : undefined;
    expect(tally && tally.held + tally.failed).toBe(5);
    const done = got[5];
    expect(done.kind === 'trials' && done.report.completed).toBe(5);
  });
  it('cancel ends the worker and drops the late replies of the cancelled job; the next job gets a fresh worker', async () => {
    const got: JobReply[] = [];
    const ch = new JobChannel((r) => got.push(r), () => undefined);
    ch.send({ kind: 'trials', doc: claimDoc(), count: 20, seed: 1 });
    ch.cancel();
    expect(ch.busy).toBe(false);
    expect(StandInWorker.made[0].terminated).toBe(true);
    await ticks();
    expect(got).toEqual([]);
    ch.send({ kind: 'trials', doc: claimDoc(), count: 2, seed: 1 });
    expect(StandInWorker.made).toHaveLength(2);
    await ticks();
    expect(got.map((r) => r.kind)).toEqual(['progress', 'progress', 'trials']);
    expect(new Set(got.map((r) => r.job)).size).toBe(1);
  });
  it('a broken worker is reported and replaced at the next job', async () => {
    const failures: string[] = [];
    const ch = new JobChannel(() => undefined, (m) => failures.push(m));
    ch.send({ kind: 'evaluate', doc: claimDoc() });
    StandInWorker.made[0].fail('out of memory');
    expect(failures).toEqual(['out of memory']);
    expect(ch.busy).toBe(false);
    ch.send({ kind: 'evaluate', doc: claimDoc() });
    expect(StandInWorker.made).toHaveLength(2);
    await ticks();
  });
});
