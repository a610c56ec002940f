// Which real meet point a 'point-meet' object names: the rule of types.ts (MEET IDENTITY) — after a drag
// the exact point nearest where the drag left it, else the one nearest params.near, else params.index —
// and the step that writes params.near when a drag ends, so a saved or recomputed scene (the worker, a
// reload) keeps the same point without the drag's float values.
//
// Canonical form: params.near is a primitive integer triple "X:Y:Z" (pointToString), a rational point
// within about 1e-9 (relative) of the meet point, never a float; params.index stays as it was.
import { InvalidInput } from '../exact/errors.ts';
import { pointParse, pointToString } from '../plane/parse-point.ts';
import { triple, type Point } from '../plane/point.ts';
import { rat, type Rational } from '../exact/rational.ts';
import { ratSimplestBetween, ratFromNumber } from './snap.ts';
import { f3FromApprox, f3FromBig, f3Sine, type F3 } from './float.ts';
import type { ConstructionDoc, ObjectId, ObjectValue, PointApprox } from './types.ts';

/** What the choice needs of a meet point: its float position (unit triple or any scale). */
export interface MeetCandidate {
  readonly approx: readonly [number, number, number];
}

function unit(v: readonly number[]): F3 {
  const n = Math.hypot(v[0], v[1], v[2]);
  return [v[0] / n, v[1] / n, v[2] / n];
}

/** Index of the candidate nearest `target` (angle between unit vectors); -1 when there is none. */
export function meetNearest(candidates: readonly MeetCandidate[], target: F3): number {
  let best = -1;
  let bestSine = Infinity;
  candidates.forEach((c, k) => {
    const s = f3Sine(unit(c.approx), target);
    if (s < bestSine) {
      best = k;
      bestSine = s;
    }
  });
  return best;
}

/** "near" names a meet point only when it lies within this share of the least distance between two of
 * them: after a drop the point has moved by about a pixel, far less than that; in a new instance (theorem
 * trials) near is usually far from all of them and the index decides, so that two meet objects of the same
 * curves do not both take the point nearest a stale place. */
const NEAR_SHARE = 0.25;

function meetSeparation(real: readonly MeetCandidate[]): number {
  let least = Infinity;
  for (let i = 0; i < real.length; i++) for (let j = i + 1; j < real.length; j++) least = Math.min(least, f3Sine(unit(real[i].approx), unit(real[j].approx)));
  return least;
}

/**
 * The index (into `real`, the exact real meet points in meet.ts order) named by a meet object, by the rule
 * of types.ts; `previous` is the object's last value. Returns -1 when params.index names no point.
 */
export function meetPointChoose(real: readonly MeetCandidate[], params: Readonly<Record<string, string>>, previous?: ObjectValue): number {
  if (real.length === 0) return -1;
  if (previous?.type === 'point' && previous.status === 'approximate') return meetNearest(real, f3FromApprox(previous.approx));
  if (params.near !== undefined) {
    const near = f3FromBig(pointParse(params.near, 'near'));
    const k = meetNearest(real, near);
    if (real.length === 1 || f3Sine(unit(real[k].approx), near) < NEAR_SHARE * meetSeparation(real)) return k;
  }
  const k = Number(params.index);
  if (!Number.isInteger(k) || k < 0) throw new InvalidInput(`the meet index is a whole number from 0, got "${params.index}"`, 'index');
  return k < real.length ? k : -1;
}

/** A rational point within ~1e-9 (relative) of a float position, as a primitive triple. */
export function pointNear(a: PointApprox): Point {
  const snap = (x: number, scale: number): Rational => {
    const r = 1e-9 * scale;
    return ratSimplestBetween(ratFromNumber(x - r), ratFromNumber(x + r));
  };
  if (a.finite) {
    const s = Math.max(1, Math.abs(a.x), Math.abs(a.y));
    return rationalTriple(snap(a.x, s), snap(a.y, s), rat(1n));
  }
  const m = Math.max(Math.abs(a.x), Math.abs(a.y));
  return rationalTriple(snap(a.x / m, 1), snap(a.y / m, 1), rat(0n));
}

function rationalTriple(x: Rational, y: Rational, z: Rational): Point {
  const d = x.den * y.den;
  return triple(x.num * y.den, y.num * x.den, z.num * d);
}

/**
 * The document with params.near of each meet object in `ids` (all meet objects when omitted) set to where
 * its value puts it: its exact point, or a rational point next to its float position. Call it when a drag
 * ends, with the drag's last values, before committing: the exact evaluation anywhere then keeps the
 * points that were followed. Objects without a point value are left as they are.
 */
export function constructionMeetsSettle(doc: ConstructionDoc, values: ReadonlyMap<ObjectId, ObjectValue>, ids?: ReadonlySet<ObjectId>): ConstructionDoc {
  let changed = false;
  const objects = doc.objects.map((o) => {
    if (o.construction.kind !== 'point-meet' || (ids && !ids.has(o.id))) return o;
    const v = values.get(o.id);
    if (!v || v.type !== 'point') return o;
    const p = v.exact ?? pointNear(v.approx);
    const near = pointToString(p);
    if (o.construction.params.near === near) return o;
    changed = true;
    return { ...o, construction: { ...o.construction, params: { ...o.construction.params, near } } };
  });
  return changed ? { ...doc, objects } : doc;
}
