// Joining traced fragments into polylines. A junction where exactly two fragment ends meet and which is
// not a singular point is an ordinary point of the curve (a fold, or a point on a critical line that
// belongs to another branch's event): the two fragments continue each other there. Everywhere else a
// fragment end is a polyline end. Every fragment is used exactly once, so no branch is drawn twice.
// Canonical form: a closed polyline repeats its first vertex last.
import type { BranchEndKind } from './display-list.ts';

export interface Junction {
  readonly u: number;
  readonly v: number;
  singular: boolean;
  /** Index of the critical line it lies on (-2 for an unannounced fold found while following). */
  readonly line: number;
  /** Fragment ends at it: fragment index and which end (0 = start, 1 = end). */
  readonly ends: { frag: number; side: 0 | 1 }[];
}

export interface Fragment {
  /** Frame coordinates, flat. */
  readonly points: number[];
  /** Junction index at the first / last vertex, -1 when that end is on the window's border. */
  readonly start: number;
  readonly end: number;
}

export interface FrameEnd {
  readonly u: number;
  readonly v: number;
  readonly kind: BranchEndKind;
}

export interface AssembledPolyline {
  readonly points: number[];
  readonly closed: boolean;
  readonly ends: [FrameEnd, FrameEnd] | null;
}

export function piecesAssemble(frags: Fragment[], junctions: Junction[]): { polylines: AssembledPolyline[]; isolated: Junction[] } {
  for (let i = 0; i < frags.length; i++) {
    if (frags[i].start >= 0) junctions[frags[i].start].ends.push({ frag: i, side: 0 });
    if (frags[i].end >= 0) junctions[frags[i].end].ends.push({ frag: i, side: 1 });
  }
  const joins = (j: number): boolean => j >= 0 && !junctions[j].singular && junctions[j].ends.length === 2;
  // The fragment end that continues (frag, side) through its junction, if any.
  const across = (frag: number, side: 0 | 1): { frag: number; side: 0 | 1 } | null => {
    const j = side === 0 ? frags[frag].start : frags[frag].end;
    if (!joins(j)) return null;
    const [a, b] = junctions[j].ends;
    return a.frag === frag && a.side === side ? b : a;
  };
  const used = new Uint8Array(frags.length);
  const polylines: AssembledPolyline[] = [];
  for (let i = 0; i < frags.length; i++) {
    if (used[i]) continue;
    // Walk backwards to the chain's first fragment (or all the way round a closed chain).
    let f = i;
    let forward = true;
    for (let guard = 0; guard <= frags.length; guard++) {
      const prev = across(f, forward ? 0 : 1);
      if (!prev || prev.frag === i) break;
      f = prev.frag;
      forward = prev.side === 1;
    }
    const first = { frag: f, forward };
    const pts: number[] = [];
    let closed = false;
    for (let guard = 0; guard <= frags.length; guard++) {
      used[f] = 1;
      fragmentAppend(pts, frags[f].points, forward);
      const next = across(f, forward ? 1 : 0);
      if (!next) break;
      if (next.frag === first.frag && (next.side === 0) === first.forward) {
        closed = true;
        break;
      }
      if (used[next.frag]) break;
      f = next.frag;
      forward = next.side === 0;
    }
    if (closed) {
      polylines.push({ points: pts, closed: true, ends: null });
      continue;
    }
    const startJ = first.forward ? frags[first.frag].start : frags[first.frag].end;
    const endJ = forward ? frags[f].end : frags[f].start;
    const n = pts.length;
    polylines.push({
      points: pts,
      closed: false,
      ends: [
        { u: pts[0], v: pts[1], kind: endKind(junctions, startJ) },
        { u: pts[n - 2], v: pts[n - 1], kind: endKind(junctions, endJ) },
      ],
    });
  }
  const isolated = junctions.filter((j) => j.singular && j.ends.length === 0);
  return { polylines, isolated };
}

function endKind(junctions: Junction[], j: number): BranchEndKind {
  if (j < 0) return 'leaves-view';
  const J = junctions[j];
  return J.singular || J.ends.length > 2 ? 'singular' : 'open';
}

// Appends a fragment's vertices, skipping the first when it repeats the last one already there.
function fragmentAppend(pts: number[], frag: readonly number[], forward: boolean): void {
  const n = frag.length / 2;
  for (let k = 0; k < n; k++) {
    const i = forward ? k : n - 1 - k;
    const u = frag[2 * i];
    const v = frag[2 * i + 1];
    const m = pts.length;
    if (m >= 2 && pts[m - 2] === u && pts[m - 1] === v) continue;
    pts.push(u, v);
  }
}
