import { describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { form } from '../../../src/cli/verbs/form.ts';
import { argsParse } from '../../../src/cli/args.ts';
import { ParseError, InvalidInput } from '../../../src/exact/errors.ts';

const run = (...argv: string[]) => form.run(argsParse(argv)) as Record<string, unknown>;

describe('form verb', () => {
  it('normalises an affine equation with rational coefficients (our own cubic)', () => {
    const out = run('y^2 + xy = x^3 - 3x + 7/2');
    expect(out).toEqual({
      degree: 3,
      homogeneous: '2X^3 - 2XYZ - 6XZ^2 - 2Y^2Z + 7Z^3',
      affine: '2x^3 - 2xy - 2y^2 - 6x + 7',
      latex: '2x^{3} - 2xy - 2y^{2} - 6x + 7 = 0',
      latexHomogeneous: '2X^{3} - 2XYZ - 6XZ^{2} - 2Y^{2}Z + 7Z^{3} = 0',
      written: 'affine',
      coefficients: ['2', '0', '0', '0', '-2', '-6', '0', '-2', '0', '7'],
      containsLineAtInfinity: false,
    });
  });
  it('says when the affine text drops the line at infinity', () => {
    const out = run('X Y Z + Y^2 Z = X^2 Z');
    expect(out.written).toBe('homogeneous');
    expect(out.containsLineAtInfinity).toBe(true);
    expect(out.affine).toBe('x^2 - xy - y^2');
  });
  it('bad input: a ParseError naming argument and column, or a missing/extra argument', () => {
    expect(() => run('x^3 + q')).toThrow(ParseError);
    expect(() => run('x^3 + q')).toThrow(expect.objectContaining({ where: 'argument 1, column 7' }));
    expect(() => run()).toThrow(InvalidInput);
    expect(() => run('x^3', 'y')).toThrow(/one equation only/);
  });
  it('the command line prints one JSON document, and exits 2 on bad input (spawned)', () => {
    const ok = execFileSync('npx', ['tsx', 'src/cli/main.ts', 'form', '-x^2 + 4y = 1'], { encoding: 'utf8' });
    expect(JSON.parse(ok).affine).toBe('x^2 - 4y + 1');
    const bad = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'form', 'y^2 = x^^3'], { encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).error.where).toBe('argument 1, column 9');
  });
});
