// The CLI verbs third, sum, negate, multiple, order, weierstrass: fields of the contract, the default base
// point (a rational flex), and bad input named by argument. Values are checked against the core (the
// verbs are thin faces over it) and, for the model, against the invariants.
import { describe, expect, it } from 'vitest';
import { argsParse } from '../../../src/cli/args.ts';
import { third } from '../../../src/cli/verbs/third.ts';
import { sum } from '../../../src/cli/verbs/sum.ts';
import { negate } from '../../../src/cli/verbs/negate.ts';
import { multiple } from '../../../src/cli/verbs/multiple.ts';
import { order } from '../../../src/cli/verbs/order.ts';
import { weierstrass } from '../../../src/cli/verbs/weierstrass.ts';
import { Degenerate, InvalidInput, NinefoldError, NotOnCurve, ParseError, SingularPoint } from '../../../src/exact/errors.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { groupAdd, groupMultiple } from '../../../src/cubic/group.ts';
import { pointParse } from '../../../src/plane/parse-point.ts';

const run = (verb: { run(a: ReturnType<typeof argsParse>): unknown }, ...argv: string[]) => verb.run(argsParse(argv)) as Record<string, unknown>;
// Curves of our own: a general cubic with no rational flex known to us, and a Weierstrass cubic.
const GENERAL = 'x^3 - x = y^3 - 2y^2 + 3y';
const WEIER = 'y^2 + 3y = x^3 - 5x + 4';

function errorOf(f: () => unknown): NinefoldError {
  try {
    f();
  } catch (e) {
    if (e instanceof NinefoldError) return e;
    throw e;
  }
  throw new Error('expected a NinefoldError');
}

describe('group-law verbs', () => {
  it('third, sum, negate, multiple, order print primitive X:Y:Z points and the base used', () => {
    expect(run(third, GENERAL, '0,0', '1,0')).toEqual({ point: '1:0:-1' });
    const f = formParse(GENERAL).form;
    const o = pointParse('0,0');
    const p = pointParse('1,0');
    const s = run(sum, GENERAL, '1,0', '-1,0', '--base', '0,0');
    expect(s.point).toBe(groupAdd(f, o, p, pointParse('-1,0')).join(':'));
    expect(s.base).toBe('0:0:1');
    expect(run(multiple, GENERAL, '1,0', '-7', '--base', '0,0').point).toBe(groupMultiple(f, o, p, -7).join(':'));
    expect(run(order, GENERAL, '1,0', '--base', '0,0').order).toBe('infinite');
    const n = run(negate, WEIER, '1,0');
    expect(n).toEqual({ point: '1:-3:1', base: '0:1:0' });
  });

  it('without --base the rational flex is used; with none the error asks for --base', () => {
    expect(run(sum, WEIER, '1,0', '0,1').base).toBe('0:1:0');
    const e = errorOf(() => run(sum, GENERAL, '1,0', '1,0'));
    expect(e).toBeInstanceOf(InvalidInput);
    expect(e.where).toBe('--base');
  });

  it('weierstrass gives the contract fields; --map gives the image', () => {
    const w = run(weierstrass, GENERAL, '--point', '0,0');
    for (const k of ['a', 'c4', 'c6', 'discriminant', 'j', 'minimal', 'forward', 'inverse']) expect(w, k).toHaveProperty(k);
    expect((w.forward as string[]).length).toBe(3);
    expect(w.flex).toBe(false);
    const m = run(weierstrass, GENERAL, '--point', '0,0', '--map', '0,0');
    expect(m.image).toBe('infinity');
    const im = run(weierstrass, GENERAL, '--point', '0,0', '--map', '1,0').image as string[];
    expect(im.length).toBe(2);
  });

  it('bad input is named by argument', () => {
    expect(errorOf(() => run(sum, GENERAL, '2,0', '1,0', '--base', '0,0')).where).toBe('argument 2');
    expect(errorOf(() => run(sum, GENERAL, '2,0', '1,0', '--base', '0,0'))).toBeInstanceOf(NotOnCurve);
    expect(errorOf(() => run(sum, GENERAL, '1,0', '1,0', '--base', '5,5')).where).toBe('--base');
    expect(errorOf(() => run(third, '2y^2 = 3x^3', '0,0', '2,3')).constructor).toBe(SingularPoint);
    expect(errorOf(() => run(third, 'y^2 = x^3 +', '0,0', '2,3'))).toBeInstanceOf(ParseError);
    expect(errorOf(() => run(third, 'y = x^2', '0,0', '1,1')).where).toBe('argument 1');
    expect(errorOf(() => run(multiple, WEIER, '1,0', 'ten')).where).toBe('argument 3');
    expect(errorOf(() => run(third, GENERAL, '0,0')).where).toBe('argument 3');
    expect(errorOf(() => run(weierstrass, GENERAL)).where).toBe('--point');
    // A cubic with a line component: the law is refused, naming the curve.
    const reducible = errorOf(() => run(sum, '(x + y - 1)(x^2 + 2y^2 - 9)', '2,-1', '3,-2', '--base', '3,0'));
    expect(reducible).toBeInstanceOf(Degenerate);
    expect(reducible.where).toBe('argument 1');
  });
});
