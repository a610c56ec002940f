import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { through } from '../../../src/cli/verbs/through.ts';
import { argsParse } from '../../../src/cli/args.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formEval } from '../../../src/poly/form.ts';
import { pointParse } from '../../../src/plane/parse-point.ts';
import { matRank } from '../../../src/exact/linalg.ts';

const run = (...argv: string[]) => through.run(argsParse(argv)) as Record<string, unknown>;

describe('through verb', () => {
  it('eight points of a cubic of our own: a pencil whose members pass through them and span the cubic', () => {
    const pts = ['0,-4', '0,1', '1,-3', '1,0', '15,-59', '15,56', '0:1:0', '-42:46:27'];
    const out = run(...pts);
    expect(out.degree).toBe(3);
    expect(out.dimension).toBe(1);
    expect(out.special).toBe(false);
    const basis = (out.basis as string[]).map((t) => formParse(t).form);
    expect(basis.length).toBe(2);
    for (const f of basis) for (const p of pts) expect(formEval(f, pointParse(p))).toBe(0n);
    const cubic = formParse('y^2 + 3y = x^3 - 5x + 4').form;
    expect(matRank([...basis.map((f) => [...f.coeffs]), [...cubic.coeffs]])).toBe(2);
  });
  it('conics: a line pair is named, four on a line is special, negative points are positionals', () => {
    const pair = run('0,0', '1,1', '3,3', '0,2', '-5,2', '--degree', '2');
    expect(pair.conic).toBe('line pair');
    expect(pair.dimension).toBe(0);
    const four = run('0,0', '1,0', '2,0', '-7,0', '1,5', '--degree=2');
    expect(four.special).toBe(true);
    expect(four.dimension).toBe(1);
    expect((four.notes as string[])[0]).toMatch(/points 1, 2, 3, 4 lie on one line/);
  });
  it('bad input names the argument', () => {
    expect(() => run('1,2', 'q,3')).toThrow(expect.objectContaining({ where: 'argument 2, column 1' }));
    expect(() => run('1,2', '--degree', '9')).toThrow(/between 1 and 6/);
    expect(() => run('--degree', '2')).toThrow(/at least one point/);
    expect(() => run('1,2', '--deg', '2')).toThrow(/unknown option --deg/);
  });
  it('exits 2 with the message on stderr (spawned)', () => {
    const bad = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'through', '1,2', '0:0:0'], { encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).error).toEqual({ message: '0:0:0 is not a point of the projective plane', where: 'argument 2' });
  });
});
