import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { linesConcurrent, pointsCollinear } from '../../../src/plane/incidence.ts';
import { cross, det3, dot, lineLineMeet, linePointIncident, pointPointJoin, triple, tripleIsZero, type Point } from '../../../src/plane/point.ts';
import { InvalidInput } from '../../../src/exact/errors.ts';

const arbInt = fc.bigInt({ min: -40n, max: 40n });
const arbPoint: fc.Arbitrary<Point> = fc
  .tuple(arbInt, arbInt, arbInt)
  .filter((t) => !tripleIsZero(t))
  .map(([a, b, c]) => triple(a, b, c));

/** The first non-zero 3x3 minor by brute force over i < j < k (definition). */
function firstMinor(ts: readonly Point[]): [number, number, number] | null {
  for (let i = 0; i < ts.length; i++)
    for (let j = i + 1; j < ts.length; j++)
      for (let k = j + 1; k < ts.length; k++) if (det3(ts[i], ts[j], ts[k]) !== 0n) return [i, j, k];
  return null;
}

describe('join and meet (projective duality: common practice)', () => {
  it('the join of two points contains both; the meet of two lines lies on both; they are dual', () => {
    fc.assert(
      fc.property(arbPoint, arbPoint, (p, q) => {
        fc.pre(!tripleIsZero(cross(p, q)));
        const l = pointPointJoin(p, q);
        expect(linePointIncident(l, p) && linePointIncident(l, q)).toBe(true);
        // Duality: the same cross product read as lines meeting gives back the same triple.
        expect(lineLineMeet(p, q)).toEqual(l);
        // A second line through p: join p to a coordinate point off l (one always exists since l is not zero).
        const off = ([[1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n]] as const).find((e) => dot(l, e) !== 0n)!;
        const m = lineLineMeet(l, pointPointJoin(p, triple(off[0], off[1], off[2])));
        expect(linePointIncident(l, m)).toBe(true);
      }),
    );
  });
});

describe('pointsCollinear / linesConcurrent', () => {
  it('agrees with the brute-force first minor on random configurations', () => {
    fc.assert(
      fc.property(fc.array(arbPoint, { minLength: 0, maxLength: 7 }), fc.boolean(), (pts, forceLine) => {
        // Half the time, put every point on the line through the first two.
        let ts = pts;
        if (forceLine && pts.length >= 2 && !tripleIsZero(cross(pts[0], pts[1]))) {
          const l = cross(pts[0], pts[1]);
          ts = pts.map((p, i) => (i < 2 ? p : (() => { const q = cross(l, p); return tripleIsZero(q) ? pts[0] : triple(q[0], q[1], q[2]); })()));
        }
        const v = pointsCollinear(ts);
        const brute = firstMinor(ts);
        expect(v.holds).toBe(brute === null);
        if (brute) {
          expect(v.minor!.indices).toEqual(brute);
          expect(v.minor!.determinant).toBe(det3(ts[brute[0]], ts[brute[1]], ts[brute[2]]));
          expect(v.minor!.determinant).not.toBe(0n);
        } else if (v.common) {
          for (const p of ts) expect(dot(v.common, p)).toBe(0n);
        }
        expect(linesConcurrent(ts).holds).toBe(v.holds);
      }),
      { numRuns: 300 },
    );
  });
  it('names the common line, repeated points and bad input', () => {
    const v = pointsCollinear([triple(1n, 1n, 1n), triple(2n, 2n, 2n), triple(0n, 0n, 1n), triple(3n, 3n, 1n)]);
    expect(v.holds).toBe(true);
    expect(v.common).toEqual([1n, -1n, 0n]);
    expect(v.distinct).toBe(3);
    expect(pointsCollinear([triple(1n, 1n, 1n), triple(2n, 2n, 2n)])).toEqual({ holds: true, minor: null, common: null, distinct: 1 });
    const c = linesConcurrent([triple(1n, 0n, 0n), triple(0n, 1n, 0n), triple(1n, 1n, -1n)]);
    expect(c.holds).toBe(false);
    expect(c.minor).toEqual({ indices: [0, 1, 2], determinant: -1n });
    expect(() => pointsCollinear([[0n, 0n, 0n]])).toThrow(InvalidInput);
    expect(() => pointsCollinear([[0n, 0n, 0n]])).toThrow(/point 1 is \(0:0:0\)/);
  });
});
