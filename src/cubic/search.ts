// Rational points of a plane cubic up to a height bound, with an honest statement of completeness.
//
// Canonical form: points are primitive triples sorted by height, then coordinates (height.ts);
// `complete` is true only when every point of height <= `height` in the region is provably listed, and
// `completeUpTo` is the largest bound for which that is proved.
//
// Methods, chosen by the curve:
//  - Irreducible singular cubic (node or cusp): its rational parametrisation (parametrise.ts) is a
//    bijection from P^1(Q) minus the parameters over the singular point P onto the curve minus P, with
//    inverse (s:t) = (ℓ0·X : ℓ1·X) for two integer lines ℓ0, ℓ1. A point X of height <= H therefore has a
//    primitive parameter of height <= B = max(|ℓ0|₁, |ℓ1|₁)·H (the gcd taken out only shrinks it), so
//    enumerating primitive (s:t) of height <= B and keeping images of height <= H, plus P, is complete.
//  - Any other cubic, H <= sieveLimit: the height sieve (search-sieve.ts), complete by construction.
//  - Smooth cubic, H > sieveLimit: the sieve to sieveLimit, then the closure under chords and tangents
//    (P, Q -> P*Q; this contains the group law's closure for any base point, since P + Q = O*(P*Q)),
//    keeping points of height <= H. Complete only up to sieveLimit; points of larger height are those
//    that closure reaches.
//  - Reducible cubic, H > sieveLimit: the sieve to sieveLimit only (complete up to there).
import { Cancelled, InvalidInput, NinefoldError } from '../exact/errors.ts';
import { bigAbs, gcd } from '../exact/integer.ts';
import { formEval, formIsZero, formPrimitive, type Form } from '../poly/form.ts';
import { tripleIsZero, type Point } from '../plane/point.ts';
import { formGradientAt } from '../poly/form.ts';
import { cubicThirdPoint } from './chord.ts';
import { pointHeight, pointHeightCompare } from './height.ts';
import { cubicParametrisation, parametrisationAt, type CubicParametrisation } from './parametrise.ts';
import { cubicSingularPoints } from './singular.ts';
import { regionContains, sievePoints, type SearchRegion, type SieveOptions } from './search-sieve.ts';

export type { SearchRegion } from './search-sieve.ts';

export interface PointSearchOptions extends SieveOptions {
  /** Height bound H >= 1: points with max(|X|, |Y|, |Z|) <= H. */
  readonly height: bigint | number;
  /** Largest H searched by the sieve (default 1000: about 2·10^6 pairs). */
  readonly sieveLimit?: bigint | number;
  /** Extra known points to start the chord-and-tangent closure from (smooth cubics, H > sieveLimit). */
  readonly known?: readonly Point[];
  /** At most this many points are kept by the closure before it stops (default 5000). */
  readonly closureLimit?: number;
  /**
   * For singular irreducible cubics, both routes are complete: 'auto' (default) takes the cheaper by the
   * count of candidates (B² parameters against about 4·H² sieve pairs, each pair costing about two
   * parameter evaluations as measured), or the parametrisation when H exceeds sieveLimit.
   */
  readonly method?: 'auto' | 'sieve' | 'parametrisation';
}

export type PointSearchMethod = 'parametrisation' | 'sieve' | 'sieve and closure';

export interface PointSearchResult {
  readonly points: Point[];
  readonly complete: boolean;
  readonly completeUpTo: bigint;
  readonly method: PointSearchMethod;
  /** In words: what was searched and what is proved complete. */
  readonly note: string;
}

function toBig(v: bigint | number, name: string): bigint {
  if (typeof v === 'number' && !Number.isInteger(v)) throw new InvalidInput(`${name} must be a whole number, got ${v}`, name);
  const b = BigInt(v);
  if (b < 1n) throw new InvalidInput(`${name} must be at least 1, got ${b}`, name);
  return b;
}

function uniqueSorted(points: readonly Point[]): Point[] {
  const seen = new Map<string, Point>();
  for (const p of points) seen.set(p.join(':'), p);
  return [...seen.values()].sort(pointHeightCompare);
}

/** Every rational point of height <= H on the cubic F = 0 that this search can prove or reach; see the top. */
export function cubicRationalPoints(f0: Form, options: PointSearchOptions): PointSearchResult {
  if (f0.degree !== 3) throw new InvalidInput(`the point search is for cubics, got degree ${f0.degree}`, 'curve');
  if (formIsZero(f0)) throw new InvalidInput('the zero form is not a curve', 'curve');
  const f = formPrimitive(f0);
  const h = toBig(options.height, 'height');
  const limit = toBig(options.sieveLimit ?? 1000, 'sieveLimit');
  const region: SearchRegion | undefined = options.region;
  const sing = cubicSingularPoints(f);
  const irreducible = sing.components.shape === 'irreducible';
  if (irreducible && !sing.smooth) {
    const par = cubicParametrisation(f);
    const bound = parameterBound(par, h);
    const method = options.method ?? 'auto';
    const useParametrisation = method === 'parametrisation' || (method === 'auto' && (h > limit || bound * bound <= 4n * h * h));
    if (useParametrisation) {
      const points = parametrisedPoints(par, bound, h, options);
      return {
        points, complete: true, completeUpTo: h, method: 'parametrisation',
        note: `all ${points.length} points of height <= ${h}${region ? ' in the region' : ''}: the singular cubic is enumerated through its rational parametrisation, all parameters of height <= ${bound} (the bound its inverse gives)`,
      };
    }
  }
  if (h <= limit) {
    const points = uniqueSorted(sievePoints(f, h, options));
    return {
      points, complete: true, completeUpTo: h, method: 'sieve',
      note: `all ${points.length} points of height <= ${h}${region ? ' in the region' : ''}: every x = X/Z with |X|, |Z| <= ${h} was solved exactly for y`,
    };
  }
  const base = sievePoints(f, limit, { onProgress: options.onProgress, isCancelled: options.isCancelled });
  if (!irreducible || !sing.smooth) {
    const points = uniqueSorted(base.filter((p) => regionContains(region, p)));
    return {
      points, complete: false, completeUpTo: limit, method: 'sieve',
      note: `${irreducible ? 'the sieve was asked for' : `the cubic is not irreducible (${sing.components.description})`}; searched completely up to height ${limit} only (raise sieveLimit to go further)`,
    };
  }
  const closed = chordClosure(f, [...base, ...(options.known ?? [])], h, options);
  const points = uniqueSorted(closed.filter((p) => regionContains(region, p)));
  return {
    points, complete: false, completeUpTo: limit, method: 'sieve and closure',
    note: `complete up to height ${limit} (sieve); points of height ${limit + 1n} to ${h} are those reached by chords and tangents from the sieved points, which need not be all of them`,
  };
}

/** B = max(|ℓ0|₁, |ℓ1|₁)·H: every point of height <= H other than P has a primitive parameter of height <= B. */
function parameterBound(par: CubicParametrisation, h: bigint): bigint {
  const norm = (l: readonly bigint[]) => bigAbs(l[0]) + bigAbs(l[1]) + bigAbs(l[2]);
  const a = norm(par.inverse[0]);
  const b = norm(par.inverse[1]);
  return (a > b ? a : b) * h;
}

// Assumes par is the parametrisation of the curve and bound = parameterBound(par, h).
function parametrisedPoints(par: CubicParametrisation, bound: bigint, h: bigint, options: PointSearchOptions): Point[] {
  const f = par.curve;
  const out: Point[] = [];
  const keep = (p: Point): void => {
    if (pointHeight(p) <= h && regionContains(options.region, p)) out.push(p);
  };
  keep(par.singular);
  keep(parametrisationAt(par, 1n, 0n));
  const total = Number(bound);
  let polled = 0;
  for (let t = 1n; t <= bound; t++) {
    for (let s = -bound; s <= bound; s++) {
      if (++polled % 2000 === 0 && options.isCancelled?.()) throw new Cancelled('rational point search');
      if (gcd(s, t) !== 1n) continue;
      keep(parametrisationAt(par, s, t));
    }
    options.onProgress?.(Number(t), total);
  }
  for (const p of out) if (formEval(f, p) !== 0n) throw new NinefoldError('internal: a parametrised point is off the curve');
  return uniqueSorted(out);
}

// Assumes f smooth and irreducible; every seed on f.
function chordClosure(f: Form, seeds: readonly Point[], h: bigint, options: PointSearchOptions): Point[] {
  const cap = options.closureLimit ?? 5000;
  const found = new Map<string, Point>();
  for (const p of seeds) {
    if (formEval(f, p) !== 0n) throw new InvalidInput(`the known point ${p.join(':')} is not on the curve`, 'known');
    if (tripleIsZero(formGradientAt(f, p))) continue;
    found.set(p.join(':'), p);
  }
  const list = [...found.values()];
  let polled = 0;
  // Pairs (i, j) with j <= i, processed in order as the list grows: every pair is tried exactly once.
  for (let i = 0; i < list.length && list.length < cap; i++) {
    for (let j = 0; j <= i && list.length < cap; j++) {
      if (++polled % 500 === 0 && options.isCancelled?.()) throw new Cancelled('rational point search');
      const r = cubicThirdPoint(f, list[i], list[j]);
      const key = r.join(':');
      if (!found.has(key) && pointHeight(r) <= h) {
        found.set(key, r);
        list.push(r);
      }
    }
  }
  return list.filter((p) => pointHeight(p) <= h);
}
