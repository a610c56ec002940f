// The verb points: contract fields, regions, and errors naming the option.
import { describe, expect, it } from 'vitest';
import { argsParse } from '../../../src/cli/args.ts';
import { points } from '../../../src/cli/verbs/points.ts';
import { whereOf } from './where-of.ts';

const run = (argv: string[]) => points.run(argsParse(argv, new Set(points.switches ?? []))) as Record<string, unknown>;

describe('points verb', () => {
  it('lists the points of height <= H by height, complete, on y^2 + y = x^3 - 2x + 1', () => {
    const out = run(['y^2 + y = x^3 - 2x + 1', '--height', '30']);
    expect(out.points).toEqual(['0:1:0', '1:-1:-1', '1:-1:1', '1:0:1', '1:2:-1', '2:3:8', '2:-11:8']);
    expect([out.count, out.complete, out.method]).toEqual([7, true, 'sieve']);
  });
  it('--positive keeps x, y > 0; --box keeps a closed rectangle (filtering the list above by hand)', () => {
    expect(run(['y^2 + y = x^3 - 2x + 1', '--height', '30', '--positive']).points).toEqual(['2:3:8']);
    expect(run(['y^2 + y = x^3 - 2x + 1', '--height', '30', '--box', '-2,1/2,-1,1']).points).toEqual(['1:-1:-1', '2:3:8']);
  });
  it('a singular cubic goes through its parametrisation', () => {
    expect(run(['y^2 = (x - 1)^2 (x + 2)', '--height', '20']).method).toBe('parametrisation');
  });
  it('errors name the option or argument', () => {
    expect(whereOf(() => run(['y^2 = x^3 + 1']))).toBe('--height');
    expect(whereOf(() => run(['y^2 = x^3 + 1', '--height', 'ten']))).toBe('--height');
    expect(whereOf(() => run(['x^2 + y^2 = 1', '--height', '5']))).toBe('argument 1');
    expect(whereOf(() => run(['y^2 = x^3 + 1', '--height', '5', '--box', '1,2']))).toBe('--box');
    expect(whereOf(() => run(['y^2 = x^3 + 1', '--height', '5', '--colour', 'red']))).toBe('--colour');
  });
});
