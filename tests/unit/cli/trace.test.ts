// The `trace` verb: options in both spellings (negative numbers included), the JSON shape, and bad input
// refused with a message naming the option.
import { describe, expect, it } from 'vitest';
import { argsParse } from '../../../src/cli/args.ts';
import { trace } from '../../../src/cli/verbs/trace.ts';
import { whereOf } from './where-of.ts';

type TraceOut = { polylines: number[][]; closed: boolean[]; dots: number[][]; ends: unknown[]; ms: number; landmarks: { shear: string } };
const run = (argv: string[]): TraceOut => trace.run(argsParse(argv, new Set(trace.switches))) as TraceOut;

describe('trace verb', () => {
  it('traces a nodal cubic of our own in a view given as "--view -3,-2,3,2"', () => {
    // y^2 = x^3 - 3x + 2 = (x - 1)^2 (x + 2): a node at (1, 0) (factored by hand).
    const out = run(['y^2 = x^3 - 3x + 2', '--view', '-3,-2,3,2', '--pixels', '300,200']);
    expect(out.polylines.length).toBe(3);
    expect(out.closed).toEqual([false, false, false]);
    expect(out.dots).toEqual([]);
    expect(typeof out.ms).toBe('number');
    expect(out.landmarks.shear).toBe('1/7');
    for (const p of out.polylines) {
      for (let i = 0; i < p.length; i += 2) {
        expect(p[i]).toBeGreaterThanOrEqual(-3 - 1e-9);
        expect(p[i]).toBeLessThanOrEqual(3 + 1e-9);
      }
    }
  });
  it('accepts --view=... and the same answer comes out', () => {
    const a = run(['y^2 = x^3 - 3x + 2', '--view=-3,-2,3,2', '--pixels=300,200']);
    const b = run(['y^2 = x^3 - 3x + 2', '--view', '-3,-2,3,2', '--pixels', '300,200']);
    expect(a.polylines).toEqual(b.polylines);
  });
  it('gives an acnode as a dot', () => {
    const out = run(['y^2 = (x - 1)^2 (x - 2)', '--view', '-1,-3,4,3']);
    expect(out.dots.length).toBe(1);
    expect(out.dots[0][0]).toBeCloseTo(1, 9);
  });
  it('draws a cubic with a repeated line as the set it is (the line once)', () => {
    // (x - y)^2 (x + 1): the line y = x counted twice and the line x = -1, meeting at (-1, -1).
    const out = run(['(x - y)^2 (x + 1) = 0', '--view', '-3,-3,3,3']) as TraceOut & { reduced: boolean };
    expect(out.reduced).toBe(true);
    expect(out.polylines.length).toBe(4);
  });
  it('refuses a bad view, bad pixels and a bad equation with the place named', () => {
    const where = (argv: string[]): string => whereOf(() => run(argv));
    expect(where(['x^2 + y^2 = 1', '--view', '1,2,3'])).toBe('--view');
    expect(where(['x^2 + y^2 = 1', '--view', '1,2,0,3'])).toBe('--view');
    expect(where(['x^2 + y^2 = 1', '--view', 'a,2,3,4'])).toBe('--view');
    expect(where(['x^2 + y^2 = 1', '--pixels', '0,10'])).toBe('--pixels');
    expect(where(['x^2 + y^2 = '])).toMatch(/argument 1/);
  });
});
