import { describe, expect, it } from 'vitest';
import { sievePoints, regionContains } from '../../../src/cubic/search-sieve.ts';
import { pointHeightCompare } from '../../../src/cubic/height.ts';
import { formEval, formFromCoeffs, type Form } from '../../../src/poly/form.ts';
import { triple, type Point } from '../../../src/plane/point.ts';
import { gcd } from '../../../src/exact/gcd.ts';
import { rat } from '../../../src/exact/rational.ts';
import { Cancelled } from '../../../src/exact/errors.ts';
import { seededRandom } from '../../reference/oracles.ts';

// Brute force over the whole box: the definition of "all points of height <= h", common practice.
function brute(f: Form, h: bigint): Point[] {
  const seen = new Map<string, Point>();
  for (let x = -h; x <= h; x++)
    for (let y = -h; y <= h; y++)
      for (let z = -h; z <= h; z++) {
        if (x === 0n && y === 0n && z === 0n) continue;
        if (gcd(gcd(x, y), z) !== 1n) continue;
        if (formEval(f, [x, y, z]) !== 0n) continue;
        const p = triple(x, y, z);
        seen.set(p.join(':'), p);
      }
  return [...seen.values()].sort(pointHeightCompare);
}

function randomCubic(rand: () => number): Form {
  const c = Array.from({ length: 10 }, () => BigInt(Math.floor(rand() * 11) - 5));
  return formFromCoeffs(3, c);
}

describe('sievePoints agrees with brute force over the box (common practice)', () => {
  it('on seeded random cubics (seed 606), including curves with many small points', () => {
    const seed = 606;
    const rand = seededRandom(seed);
    const curves: Form[] = [
      // X^3 - X Z^2 - Y^3 - Y Z^2 + Z^3, then random ones
      formFromCoeffs(3, [1n, 0n, 0n, 0n, 0n, -1n, -1n, 0n, -1n, 1n]),
      // Z (X^2 - X Z + Y^2): reducible, a conic and the line at infinity
      formFromCoeffs(3, [0n, 0n, 1n, 0n, 0n, -1n, 0n, 1n, 0n, 0n]),
    ];
    for (let k = 0; k < 8; k++) curves.push(randomCubic(rand));
    for (const f of curves) {
      if (f.coeffs.every((c) => c === 0n)) continue;
      const h = 6n;
      const got = sievePoints(f, h).sort(pointHeightCompare);
      const want = brute(f, h);
      expect(got.map((p) => p.join(':')), `seed ${seed}, curve ${f.coeffs.join(',')}`).toEqual(want.map((p) => p.join(':')));
    }
  });
  it('respects the positive region and a box', () => {
    const f = formFromCoeffs(3, [0n, 0n, 1n, 0n, 0n, -1n, 0n, 1n, 0n, 0n]);
    const all = brute(f, 5n);
    const pos = sievePoints(f, 5n, { region: { kind: 'positive' } }).sort(pointHeightCompare);
    expect(pos.map(String)).toEqual(all.filter((p) => regionContains({ kind: 'positive' }, p)).map(String));
    const box = { kind: 'box', xmin: rat(-1, 2), xmax: rat(2), ymin: rat(0), ymax: rat(3, 2) } as const;
    const inBox = sievePoints(f, 5n, { region: box }).sort(pointHeightCompare);
    expect(inBox.map(String)).toEqual(all.filter((p) => regionContains(box, p)).map(String));
    expect(inBox.length).toBeGreaterThan(0);
  });
  it('reports progress and stops with Cancelled when asked', () => {
    const f = formFromCoeffs(3, [1n, 0n, 0n, 0n, 0n, -1n, -1n, 0n, -1n, 1n]);
    const seen: number[] = [];
    sievePoints(f, 4n, { onProgress: (d, t) => seen.push(d / t) });
    expect(seen.at(-1)).toBe(1);
    let calls = 0;
    expect(() => sievePoints(f, 200n, { isCancelled: () => ++calls > 2 })).toThrow(Cancelled);
  });
});
