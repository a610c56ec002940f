// The verbs meet, ninth and nine: the JSON contract fields and the error shape for bad input.
import { describe, expect, it } from 'vitest';
import { argsParse } from '../../../src/cli/args.ts';
import { meet } from '../../../src/cli/verbs/meet.ts';
import { ninth } from '../../../src/cli/verbs/ninth.ts';
import { nine } from '../../../src/cli/verbs/nine.ts';
import { whereOf } from './where-of.ts';

const run = (verb: { run: (a: ReturnType<typeof argsParse>) => unknown }, argv: string[], switches: string[] = []) =>
  verb.run(argsParse(argv, new Set(switches))) as Record<string, unknown>;

describe('meet verb', () => {
  it('a tangent line and its third point, with the contract fields', () => {
    const out = run(meet, ['y^2 = x^3 - 4x + 4', 'x + 2y = 3']);
    expect(out.total).toBe(3);
    expect(out.points).toEqual([
      { point: '1:1:1', approx: [1, 1, 1], multiplicity: 2, real: true },
      expect.objectContaining({ point: '14:-19:-8', multiplicity: 1, real: true }),
    ]);
  });
  it('names the argument that does not parse', () => {
    expect(whereOf(() => run(meet, ['y^2 = x^3 + 1', 'x + + ']))).toMatch(/argument 2/);
    expect(whereOf(() => run(meet, ['y^2 = x^3 + 1']))).toMatch(/argument 2/);
  });
});

describe('ninth and nine verbs', () => {
  it('ninth of eight points of the grid of three lines by three lines is the ninth grid point', () => {
    const out = run(ninth, ['0,0', '0,1', '0,2', '1,0', '1,1', '1,2', '-1,0', '-1,1']);
    expect(out.point).toBe('1:-2:-1');
    expect(out.dimension).toBe(1);
  });
  it('four on a line: point null and the reason in words', () => {
    const out = run(ninth, ['0,0', '1,0', '2,0', '5,0', '1,3', '-2,7', '4,-5', '3,11']);
    expect(out.point).toBeNull();
    expect(String(out.reason)).toMatch(/line/);
  });
  it('nine: the grid holds', () => {
    const out = run(nine, ['0,0', '0,1', '0,2', '1,0', '1,1', '1,2', '-1,0', '-1,1', '-1,2']);
    expect([out.dimension, out.holds]).toEqual([1, true]);
  });
  it('wrong counts and bad points name the argument', () => {
    expect(whereOf(() => run(ninth, ['0,0', '1,0']))).toBe('argument 3');
    expect(whereOf(() => run(nine, ['0,0', '1,0', '2,0', '5,0', '1,3', '-2,7', '4,-5', '3,11', 'x,1']))).toMatch(/argument 9/);
  });
});
