// The page's side of the point search: starts the worker, follows its progress, cancels by ending it.
import { ratToString } from '../exact/rational.ts';
import { ratSnap } from '../construct/snap.ts';
import type { CurveValue } from '../construct/types.ts';
import type { JobReply, SearchRequest } from '../worker/jobs.ts';
import { $region, $search } from './stores/search.ts';
import { noticeShow } from './stores/interaction.ts';

let worker: Worker | null = null;
let job = 0;

function workerStart(): Worker {
  const w = new Worker(new URL('../worker/job-worker.ts', import.meta.url), { type: 'module' });
  w.onmessage = (e: MessageEvent<JobReply>) => searchReply(e.data);
  w.onerror = (e) => {
    $search.set({ ...$search.get(), phase: 'failed', note: `the search worker failed: ${e.message}` });
    worker = null;
  };
  return w;
}

function searchReply(r: JobReply): void {
  if (r.job !== job) return; // a cancelled job's late message
  const s = $search.get();
  if (r.kind === 'progress') $search.set({ ...s, progress: r.total ? r.done / r.total : 0 });
  else if (r.kind === 'found') {
    $search.set({ ...s, phase: 'done', progress: 1, points: r.points, note: r.note });
    noticeShow('done', `Search done: ${r.points.length} point${r.points.length === 1 ? '' : 's'} of height ≤ ${s.height}.`, 'search');
  } else if (r.kind === 'error') {
    $search.set({ ...s, phase: 'failed', note: r.message });
    noticeShow('error', r.message, 'search');
  }
}

export function searchStart(curveId: string, curve: CurveValue, height: number): void {
  if (!curve.form) {
    noticeShow('error', 'the curve is not exact now, so it cannot be searched', 'search');
    return;
  }
  if (!worker) worker = workerStart();
  job += 1;
  const r = $region.get();
  const q = (x: number): string => ratToString(ratSnap(x, Math.abs(x) * 1e-9 + 1e-9));
  const box = r ? { xmin: q(Math.min(r.x0, r.x1)), xmax: q(Math.max(r.x0, r.x1)), ymin: q(Math.min(r.y0, r.y1)), ymax: q(Math.max(r.y0, r.y1)) } : null;
  const req: SearchRequest = { kind: 'search', job, coeffs: curve.form.coeffs.map(String), height, box };
  $search.set({ phase: 'running', progress: 0, points: [], curve: curveId, height, note: '' });
  worker.postMessage(req);
}

export function searchCancel(): void {
  if ($search.get().phase !== 'running') return;
  worker?.terminate();
  worker = null;
  job += 1;
  $search.set({ ...$search.get(), phase: 'cancelled', note: 'cancelled: nothing was kept' });
  noticeShow('info', 'Search cancelled.', 'search');
}
