// Theorem trials: a drawn configuration as evidence. Every free point of a construction is re-drawn as a
// random exact point, the whole construction is recomputed exactly, and every check is decided again;
// this N times. A claim that is a theorem holds in every instance; a false one fails, and the first
// failing instance is kept as a construction that can be saved and opened.
//
// How points are re-drawn (each trial, from a seeded generator, so a run can be repeated):
//   point-free       a random rational point x = a/b, y = c/d of small height;
//   point-parameter  a random parameter (s:t) with small integers;
//   point-on-curve   a random rational point of the curve: on a line, the meet with a random line; on a
//                    conic, the second meet of a random line through a known rational point of it
//                    (F(λP + μD) = μ(λ D·∇F(P) + μ F(D)) when F(P) = 0); on a cubic, a random chord-and-
//                    tangent walk from the rational points of it the construction already holds
//                    (Silverman–Tate, ch. I: P*Q is rational when P, Q are), or, when the scene holds
//                    none, from the points of small height the point search finds. Where none can be made
//                    (no known rational point, degree > 3) it becomes the real algebraic point of the
//                    curve over a random rational abscissa near its own; checks on it are then decided
//                    only as the evaluator can on algebraic data (often 'undecided'), and the report says so.
// An instance where some object cannot be built (two random points fell together) is drawn again, up to
// a limit; checks of an instance that stays degenerate are counted as `degenerate`, never as held.
import { seededUniform } from '../exact/random.ts';
import { Degenerate, NinefoldError } from '../exact/errors.ts';
import { bitLength } from '../exact/integer.ts';
import { rat, ratAdd, ratParse, ratToString } from '../exact/rational.ts';
import { formEval, formGradientAt, type Form } from '../poly/form.ts';
import { cross, dot, triple, tripleIsZero, type Point } from '../plane/point.ts';
import { pointParse, pointToString } from '../plane/parse-point.ts';
import { cubicThirdPoint } from '../cubic/chord.ts';
import { cubicRationalPoints } from '../cubic/search.ts';
import { constructionEvaluate } from './evaluate.ts';
import type { CheckValue, ConstructionDoc, ConstructionObject, ObjectId, ObjectValue } from './types.ts';

export interface TrialOptions {
  /** Number of random instances (default 50). */
  readonly count?: number;
  /** Seed of the generator (default 1); the same seed gives the same instances. */
  readonly seed?: number;
  /** Largest numerator and denominator of a random coordinate (default 12 and 6). */
  readonly height?: number;
  /** After each instance: how many are done, and the tallies so far (a copy the caller may keep). */
  readonly onProgress?: (done: number, total: number, checks: readonly TrialCheckReport[]) => void;
  readonly isCancelled?: () => boolean;
}

export interface TrialFailure {
  /** 1-based number of the instance. */
  readonly trial: number;
  readonly certificate: string;
  /** The failing instance: the construction with every free point where that trial put it. */
  readonly doc: ConstructionDoc;
}

export interface TrialCheckReport {
  readonly id: ObjectId;
  readonly label: string;
  readonly claim: string;
  readonly held: number;
  readonly failed: number;
  /** Instances decided neither way (algebraic data). */
  readonly undecided: number;
  /** Instances where the check could not be built even after redrawing. */
  readonly degenerate: number;
  readonly firstFailure: TrialFailure | null;
}

export type RedrawWay =
  | 'random rational point'
  | 'random parameter'
  | 'random rational point of the curve'
  | 'random real algebraic point of the curve'
  | 'kept in place';

export interface TrialReport {
  readonly seed: number;
  readonly requested: number;
  readonly completed: number;
  readonly cancelled: boolean;
  /** How each free point was re-drawn (by id); 'kept in place' when no random exact point could be made
   * (a curve that is not exact in that instance). */
  readonly redrawn: Readonly<Record<ObjectId, RedrawWay>>;
  readonly checks: readonly TrialCheckReport[];
}

const REDRAW_ATTEMPTS = 25;
/** Points of a chord walk with larger coordinates are not reused: they would only slow the trials. */
const POOL_BITS = 256;
const POOL_SIZE = 200;
/** Height of the point search that seeds a cubic with no rational point in the scene (a few ms). */
const SEED_HEIGHT = 30;

/** Run the trials. A construction with no checks gives an empty list; one with no free point repeats itself. */
export function constructionTrials(doc: ConstructionDoc, opts: TrialOptions = {}): TrialReport {
  const count = Math.max(0, Math.floor(opts.count ?? 50));
  const seed = Math.floor(opts.seed ?? 1) >>> 0;
  const rand = seededUniform(seed);
  const height = Math.max(2, Math.floor(opts.height ?? 12));
  const checks = doc.objects.filter((o) => o.type === 'check');
  const tallies = checks.map((o) => ({ id: o.id, label: o.label, claim: o.label, held: 0, failed: 0, undecided: 0, degenerate: 0, firstFailure: null as TrialFailure | null }));
  const pools = new Map<ObjectId, Point[]>();
  const redrawn: Record<ObjectId, RedrawWay> = {};
  let completed = 0;
  let cancelled = false;
  for (let t = 1; t <= count; t++) {
    if (opts.isCancelled?.()) {
      cancelled = true;
      break;
    }
    let instance: ConstructionDoc = doc;
    let values: Map<ObjectId, ObjectValue> = new Map();
    for (let attempt = 0; attempt < REDRAW_ATTEMPTS; attempt++) {
      instance = instanceDraw(doc, rand, height, pools, redrawn);
      values = constructionEvaluate(instance);
      if (checks.every((c) => values.get(c.id)?.type === 'check')) break;
    }
    checks.forEach((c, k) => {
      const v = values.get(c.id);
      const tally = tallies[k];
      if (!v || v.type !== 'check') {
        tally.degenerate++;
        return;
      }
      tally.claim = (v as CheckValue).claim;
      if (v.verdict === 'holds') tally.held++;
      else if (v.verdict === 'fails') {
        tally.failed++;
        if (!tally.firstFailure) tally.firstFailure = { trial: t, certificate: v.certificate, doc: instance };
      } else tally.undecided++;
    });
    completed = t;
    opts.onProgress?.(t, count, tallies.map((x) => ({ ...x })));
  }
  return { seed, requested: count, completed, cancelled, redrawn, checks: tallies };
}

/** One random instance: a copy of doc with every free point re-drawn (curves evaluated as needed). */
function instanceDraw(
  doc: ConstructionDoc,
  rand: () => number,
  height: number,
  pools: Map<ObjectId, Point[]>,
  redrawn: Record<ObjectId, RedrawWay>,
): ConstructionDoc {
  const objects: ConstructionObject[] = [];
  const curves = new Map<ObjectId, Form | null>();
  const curveForm = (id: ObjectId): Form | null => {
    if (!curves.has(id)) {
      const v = constructionEvaluate({ ...doc, objects }).get(id);
      curves.set(id, v?.type === 'curve' && v.form ? v.form : null);
    }
    return curves.get(id)!;
  };
  for (const o of doc.objects) {
    const c = o.construction;
    let at: string | null = null;
    if (c.kind === 'point-free') {
      at = pointToString(randomPoint(rand, height));
      redrawn[o.id] ??= 'random rational point';
    } else if (c.kind === 'point-parameter') {
      at = randomParameter(rand, height);
      redrawn[o.id] ??= 'random parameter';
    } else if (c.kind === 'point-on-curve') {
      const f = curveForm(c.parents[0]);
      const p = f ? curvePointRandom(f, poolOf(pools, doc, c.parents[0], f), rand, height) : null;
      if (p) {
        at = pointToString(p);
        redrawn[o.id] ??= 'random rational point of the curve';
      } else if (f) {
        // No rational point can be made: the real point of the curve over a random rational abscissa
        // near the saved one, an exact real algebraic point (src/construct/on-curve.ts).
        objects.push({ ...o, construction: { ...c, params: algebraicPlace(c.params, rand, height) } });
        redrawn[o.id] = 'random real algebraic point of the curve';
        continue;
      } else redrawn[o.id] = 'kept in place';
    }
    if (at === null) objects.push(o);
    else {
      // A place "at" replaces any other way of placing the point (x or y with near).
      const { x: _x, y: _y, near: _near, ...rest } = c.params;
      objects.push({ ...o, construction: { ...c, params: { ...rest, at } } });
    }
  }
  return { ...doc, objects };
}

/** Params {x, near} for a point on a curve: x the saved abscissa moved by a random rational in [-1, 1]. */
function algebraicPlace(params: Readonly<Record<string, string>>, rand: () => number, height: number): Record<string, string> {
  let x0 = rat(0n);
  let y0 = rat(0n);
  try {
    if (params.at !== undefined) {
      const p = pointParse(params.at);
      if (p[2] !== 0n) {
        x0 = rat(p[0], p[2]);
        y0 = rat(p[1], p[2]);
      }
    } else if (params.x !== undefined) {
      x0 = ratParse(params.x);
      y0 = ratParse(params.near ?? '0');
    }
  } catch {
    // an unreadable saved place: start from the origin
  }
  const d = BigInt(1 + Math.floor(rand() * height));
  const n = BigInt(Math.floor(rand() * (2 * Number(d) + 1))) - d;
  return { x: ratToString(ratAdd(x0, rat(n, d))), near: ratToString(y0) };
}

/** The known rational points of a curve in the construction (its points' saved places that lie on it). */
function poolOf(pools: Map<ObjectId, Point[]>, doc: ConstructionDoc, curve: ObjectId, f: Form): Point[] {
  let pool = pools.get(curve);
  if (!pool) {
    pool = [];
    for (const o of doc.objects) {
      const c = o.construction;
      if (c.kind !== 'point-on-curve' || c.parents[0] !== curve || c.params.at === undefined) continue;
      try {
        const p = pointParse(c.params.at);
        if (formEval(f, p) === 0n && !tripleIsZero(formGradientAt(f, p))) pool.push(p);
      } catch {
        // an unreadable saved place is simply not a seed
      }
    }
    if (pool.length === 0 && f.degree === 3) pool.push(...searchSeeds(f));
    pools.set(curve, pool);
  }
  return pool;
}

/** Smooth rational points of small height found by the point search, when the scene holds none. */
function searchSeeds(f: Form): Point[] {
  try {
    const found = cubicRationalPoints(f, { height: SEED_HEIGHT }).points;
    return found.filter((p) => !tripleIsZero(formGradientAt(f, p))).slice(0, POOL_SIZE);
  } catch (e) {
    if (e instanceof NinefoldError) return [];
    throw e;
  }
}

/**
 * A random rational point of the curve f, or null when this module cannot make one. For a cubic the
 * pool of known smooth rational points grows with every point made, so later trials reach further.
 */
export function curvePointRandom(f: Form, pool: Point[], rand: () => number, height: number): Point | null {
  for (let attempt = 0; attempt < REDRAW_ATTEMPTS; attempt++) {
    try {
      const p = curvePointOnce(f, pool, rand, height);
      if (p === null) return null;
      if (formEval(f, p) !== 0n) continue; // never happens for the formulas above; a guard, not a tolerance
      if (f.degree === 3 && pool.length < POOL_SIZE && p.every((x) => bitLength(x) < POOL_BITS)) {
        if (!pool.some((q) => tripleIsZero(cross(p, q))) && !tripleIsZero(formGradientAt(f, p))) pool.push(p);
      }
      return p;
    } catch (e) {
      if (!(e instanceof NinefoldError)) throw e;
      // a chord inside the curve or a singular point: draw again
    }
  }
  return null;
}

function curvePointOnce(f: Form, pool: Point[], rand: () => number, height: number): Point | null {
  if (f.degree === 1) {
    const l = f.coeffs as readonly bigint[];
    const m = cross([l[0], l[1], l[2]], randomTriple(rand, height));
    return tripleIsZero(m) ? curvePointOnce(f, pool, rand, height) : triple(m[0], m[1], m[2]);
  }
  if (pool.length === 0) return null;
  const p0 = pool[Math.floor(rand() * pool.length)];
  if (f.degree === 2) {
    const d = randomTriple(rand, height);
    const fd = formEval(f, d);
    const gd = dot(d, formGradientAt(f, p0));
    const x = [fd * p0[0] - gd * d[0], fd * p0[1] - gd * d[1], fd * p0[2] - gd * d[2]];
    if (tripleIsZero(x)) throw new Degenerate('the random line missed the conic');
    return triple(x[0], x[1], x[2]);
  }
  if (f.degree === 3) {
    // A short walk: P := P * Q for one or two random Q of the pool (Q = P is the tangent).
    let p = p0;
    const steps = 1 + Math.floor(rand() * 2);
    for (let s = 0; s < steps; s++) p = cubicThirdPoint(f, p, pool[Math.floor(rand() * pool.length)]);
    return p;
  }
  return null;
}

function randomInt(rand: () => number, lo: number, hi: number): bigint {
  return BigInt(lo + Math.floor(rand() * (hi - lo + 1)));
}

function randomPoint(rand: () => number, height: number): Point {
  const dh = Math.max(1, Math.floor(height / 2));
  const a = randomInt(rand, -height, height);
  const b = randomInt(rand, 1, dh);
  const c = randomInt(rand, -height, height);
  const d = randomInt(rand, 1, dh);
  return triple(a * d, c * b, b * d);
}

function randomTriple(rand: () => number, height: number): Point {
  for (;;) {
    const t = [randomInt(rand, -height, height), randomInt(rand, -height, height), randomInt(rand, -height, height)] as const;
    if (!tripleIsZero(t)) return triple(t[0], t[1], t[2]);
  }
}

function randomParameter(rand: () => number, height: number): string {
  for (;;) {
    const s = randomInt(rand, -height, height);
    const t = randomInt(rand, -height, height);
    if (s !== 0n || t !== 0n) return `${s}:${t}`;
  }
}

