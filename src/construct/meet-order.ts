// The order of the points where two objects meet, which `point-meet`'s index refers to:
// finite points by increasing x, then increasing y; points at infinity last, by the angle of their
// direction in [0, π). Exact and float meets use the same order so an index names the same point before,
// during and after a drag (unless points pass each other, when the order swaps them, as it must).
import { f3ToApprox, type F3 } from './float.ts';
import type { PointApprox } from './types.ts';

export function meetCompare(a: PointApprox, b: PointApprox): number {
  if (a.finite !== b.finite) return a.finite ? -1 : 1;
  if (a.finite) return a.x - b.x || a.y - b.y;
  const angle = (p: PointApprox): number => {
    const t = Math.atan2(p.y, p.x);
    return t < 0 ? t + Math.PI : t >= Math.PI ? t - Math.PI : t;
  };
  return angle(a) - angle(b);
}

export function meetOrderFloat(points: readonly F3[]): F3[] {
  return points
    .map((p) => ({ p, a: f3ToApprox(p) }))
    .sort((u, v) => meetCompare(u.a, v.a))
    .map((u) => u.p);
}
