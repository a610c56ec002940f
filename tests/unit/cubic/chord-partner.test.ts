// The prepared chord with a fixed point gives exactly the integer triple of chordThirdRaw (not only the
// same projective point), and its one-gcd content of S × X equals the content of the cross product
// (the unimodular-basis argument at the head of src/cubic/chord-partner.ts). Seeded random cubics
// through random points; the partner X also scaled by a random factor (chains pass non-primitive triples).
import { describe, expect, it } from 'vitest';
import { randomBigInt, seededRandom } from '../../reference/oracles.ts';
import { randomPoint, randomSmoothCubicThrough } from './group-samples.ts';
import { chordPartnerMake, chordPartnerThirdPoint, chordPartnerThirdRaw } from '../../../src/cubic/chord-partner.ts';
import { chordThirdRaw } from '../../../src/cubic/chord.ts';
import { groupMake, groupMultipleIn } from '../../../src/cubic/group.ts';
import { content } from '../../../src/exact/integer.ts';
import { gcd } from '../../../src/exact/gcd.ts';
import { cross, dot, triple, tripleProportional, type Point } from '../../../src/plane/point.ts';

describe('chordPartnerThirdRaw', () => {
  it('equals chordThirdRaw(f, X, S) entry for entry, X primitive or scaled', () => {
    for (let seed = 1; seed <= 30; seed++) {
      const rand = seededRandom(seed);
      const pts = [randomPoint(rand, 1), randomPoint(rand, 1), randomPoint(rand, 1)];
      const f = randomSmoothCubicThrough(rand, pts, 1);
      const g = groupMake(f, pts[0]);
      const s = pts[1];
      const c = chordPartnerMake(f, s);
      expect(dot(c.l2, s), `seed ${seed}`).toBe(0n);
      expect(dot(c.l3, s), `seed ${seed}`).toBe(0n);
      const l = cross(c.l2, c.l3);
      expect(tripleProportional(l, s) && content(l) === 1n, `seed ${seed}: ℓ2 × ℓ3 = ${l}, S = ${s}`).toBe(true);
      for (let n = 1; n <= 12; n++) {
        const x0 = groupMultipleIn(g, pts[2], BigInt(n));
        if (tripleProportional(x0, s)) continue;
        const k = randomBigInt(rand, 3) || 1n;
        for (const x of [x0, x0.map((v) => v * k)]) {
          const info = `seed ${seed}, n ${n}, f = ${f.coeffs.join(',')}, S = ${s}, X = ${x}`;
          expect(chordPartnerThirdRaw(c, x), info).toEqual(chordThirdRaw(f, x, s));
          expect(gcd(dot(c.l2, x), dot(c.l3, x)), info).toBe(content(cross(s, x)));
        }
      }
    }
  });

  it('partners with zero leading entries, (0:0:1) and (0:1:0), and with a zero in the middle', () => {
    for (const [seed, s] of [[41, [0n, 0n, 1n]], [42, [0n, 1n, 0n]], [43, [3n, 0n, -2n]]] as Array<[number, Point]>) {
      const rand = seededRandom(seed);
      const t: Point = s[0] < 0n ? [-s[0], -s[1], -s[2]] : s;
      const pts = [t, randomPoint(rand, 1), randomPoint(rand, 1)];
      const f = randomSmoothCubicThrough(rand, pts, 1);
      const c = chordPartnerMake(f, t);
      const g = groupMake(f, pts[1]);
      for (let n = 1; n <= 8; n++) {
        const x = groupMultipleIn(g, pts[2], BigInt(n));
        if (tripleProportional(x, t)) continue;
        const info = `seed ${seed}, n ${n}, f = ${f.coeffs.join(',')}, S = ${t}, X = ${x}`;
        expect(chordPartnerThirdRaw(c, x), info).toEqual(chordThirdRaw(f, x, t));
        expect(gcd(dot(c.l2, x), dot(c.l3, x)), info).toBe(content(cross(t, x)));
      }
    }
  });

  it('chordPartnerThirdPoint is the primitive triple of chordThirdRaw, X primitive, scaled or negated', () => {
    // Scaled X makes the division by k³ fall back to a full primitive (R carries k² only), so both branches run.
    let checked = 0;
    for (let seed = 51; seed <= 80; seed++) {
      const rand = seededRandom(seed);
      const pts = [randomPoint(rand, 1), randomPoint(rand, 1), randomPoint(rand, 1)];
      const f = randomSmoothCubicThrough(rand, pts, 1);
      const g = groupMake(f, pts[0]);
      for (const s of [pts[0], pts[1]]) {
        const c = chordPartnerMake(f, s);
        for (let n = 1; n <= 10; n++) {
          const x0 = groupMultipleIn(g, pts[2], BigInt(n));
          if (tripleProportional(x0, s)) continue;
          const k = (randomBigInt(rand, 3) || 1n) * (rand() < 0.5 ? -1n : 1n);
          for (const x of [x0, x0.map((v) => v * k), x0.map((v) => -v)]) {
            const info = `seed ${seed}, n ${n}, f = ${f.coeffs.join(',')}, S = ${s}, X = ${x}`;
            const r = chordThirdRaw(f, x, s);
            expect(chordPartnerThirdPoint(c, x), info).toEqual(triple(r[0], r[1], r[2]));
            checked++;
          }
        }
      }
    }
    expect(checked).toBeGreaterThan(1000);
  });

  it('prepares a unimodular M = (ℓ1; ℓ2; ℓ3) with MS = e1 and its inverse, for seeded S and coordinate points', () => {
    const f = randomSmoothCubicThrough(seededRandom(90), [[0n, 0n, 1n]], 1);
    const rand = seededRandom(91);
    const ss: Point[] = [[0n, 0n, 1n], [0n, 1n, 0n], [1n, 0n, 0n], [3n, 0n, -2n], [0n, 5n, -7n]];
    for (let k = 0; k < 40; k++) ss.push(randomPoint(rand, 4));
    for (const s of ss) {
      const c = chordPartnerMake(f, s);
      const m = [c.l1, c.l2, c.l3];
      expect(m.map((l) => dot(l, s)), `S = ${s}`).toEqual([1n, 0n, 0n]);
      for (let i = 0; i < 3; i++) {
        for (let j = 0; j < 3; j++) expect(dot(m[i], c.inverse[j]), `S = ${s}, ℓ${i + 1}·w${j + 1}`).toBe(i === j ? 1n : 0n);
      }
    }
  });
});
