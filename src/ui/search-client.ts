// The page's side of the point search: a job of the job worker; follows its progress, cancels by ending it.
import { ratToString } from '../exact/rational.ts';
import { ratSnap } from '../construct/snap.ts';
import type { CurveValue } from '../construct/types.ts';
import type { JobReply } from '../worker/jobs.ts';
import { $region, $search } from './stores/search.ts';
import { noticeShow } from './stores/interaction.ts';
import { JobChannel } from './job-client.ts';

function searchReply(r: JobReply): void {
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

const channel = new JobChannel(searchReply, (message) => {
  $search.set({ ...$search.get(), phase: 'failed', note: `the search worker failed: ${message}` });
});

export function searchStart(curveId: string, curve: CurveValue, height: number): void {
  if (!curve.form) {
    noticeShow('error', 'the curve is not exact now, so it cannot be searched', 'search');
    return;
  }
  const r = $region.get();
  const q = (x: number): string => ratToString(ratSnap(x, Math.abs(x) * 1e-9 + 1e-9));
  const box = r ? { xmin: q(Math.min(r.x0, r.x1)), xmax: q(Math.max(r.x0, r.x1)), ymin: q(Math.min(r.y0, r.y1)), ymax: q(Math.max(r.y0, r.y1)) } : null;
  $search.set({ phase: 'running', progress: 0, points: [], curve: curveId, height, note: '' });
  if (channel.busy) channel.cancel(); // a new search replaces the running one at once
  channel.send({ kind: 'search', coeffs: curve.form.coeffs.map(String), height, box });
}

export function searchCancel(): void {
  if ($search.get().phase !== 'running') return;
  channel.cancel();
  $search.set({ ...$search.get(), phase: 'cancelled', note: 'cancelled: nothing was kept' });
  noticeShow('info', 'Search cancelled.', 'search');
}
