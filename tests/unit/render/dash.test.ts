// Dashes split by hand (the canvas renderer has none): lengths of the pieces follow the pattern across
// vertices, and a solid pattern returns the path unchanged (common practice for dashed strokes).
import { describe, expect, it } from 'vitest';
import { dashSplit } from '../../../shaders-free-render/dash.ts';

const length = (p: number[]): number => {
  let s = 0;
  for (let i = 2; i < p.length; i += 2) s += Math.hypot(p[i] - p[i - 2], p[i + 1] - p[i - 1]);
  return s;
};

describe('dashSplit', () => {
  it('cuts a straight path into on-pieces of the pattern', () => {
    const pieces = dashSplit([0, 0, 20, 0], [4, 2]);
    expect(pieces.map((p) => +length(p).toFixed(9))).toEqual([4, 4, 4, 2]);
    expect(pieces[1][0]).toBeCloseTo(6, 12);
  });
  it('carries the pattern across a corner', () => {
    const pieces = dashSplit([0, 0, 3, 0, 3, 3], [4, 1]);
    expect(pieces.length).toBe(2);
    expect(length(pieces[0])).toBeCloseTo(4, 12);
    expect(pieces[0].length).toBe(6);
    expect(length(pieces[1])).toBeCloseTo(1, 12);
  });
  it('returns a solid path whole', () => {
    expect(dashSplit([0, 0, 1, 1, 2, 0], [])).toEqual([[0, 0, 1, 1, 2, 0]]);
  });
});
