import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { curvesThroughPoints, monomialRow } from '../../../src/plane/linear-system.ts';
import { conicThroughFive, conicRank } from '../../../src/plane/conic.ts';
import { triple, tripleIsZero, type Point } from '../../../src/plane/point.ts';
import { formEval, formEquals, monomialCount } from '../../../src/poly/form.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { matRank } from '../../../src/exact/linalg.ts';
import { Degenerate, InvalidInput } from '../../../src/exact/errors.ts';

const P = (x: bigint, y: bigint, z = 1n): Point => triple(x, y, z);
const arbInt = fc.bigInt({ min: -25n, max: 25n });
const arbPoint = fc.tuple(arbInt, arbInt, arbInt).filter((t) => !tripleIsZero(t)).map(([a, b, c]) => triple(a, b, c));

describe('curvesThroughPoints (Fulton, Algebraic Curves §5.2: k general points impose k conditions)', () => {
  it('the basis passes through the points, is independent, and dimension + conditions = N - 1', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3 }), fc.array(arbPoint, { minLength: 0, maxLength: 10 }), (d, pts) => {
        const sys = curvesThroughPoints(d, pts);
        expect(sys.dimension + 1 + sys.conditions).toBe(monomialCount(d));
        for (const f of sys.basis) for (const p of pts) expect(formEval(f, p)).toBe(0n);
        if (sys.basis.length > 0) expect(matRank(sys.basis.map((f) => [...f.coeffs]))).toBe(sys.basis.length);
        expect(sys.conditions).toBe(matRank(pts.map((p) => monomialRow(d, p))));
      }),
      { numRuns: 150 },
    );
  });
  it('eight points on a cubic of our own give a pencil containing that cubic', () => {
    // y^2 + 3y = x^3 - 5x + 4 (our own curve) and eight of its rational points (found by a search).
    const f = formParse('y^2 + 3y = x^3 - 5x + 4').form;
    const pts = [P(0n, -4n), P(0n, 1n), P(1n, -3n), P(1n, 0n), P(15n, -59n), P(15n, 56n), P(0n, 1n, 0n), P(-42n, 46n, 27n)].filter(
      (p) => formEval(f, p) === 0n,
    );
    expect(pts.length).toBe(8);
    const sys = curvesThroughPoints(3, pts);
    expect(sys.dimension).toBe(1);
    expect(sys.special).toBe(false);
    // f is in the span of the basis: the 3 x 10 matrix [basis; f] has rank 2.
    expect(matRank([...sys.basis.map((g) => [...g.coeffs]), [...f.coeffs]])).toBe(2);
  });
  it('nine general points fix one cubic; ten usually none', () => {
    const nine = [P(0n, 0n), P(1n, 0n), P(0n, 1n), P(2n, 3n), P(-1n, 4n), P(5n, -2n), P(3n, 7n), P(-6n, 1n), P(4n, 4n, 3n)];
    const s9 = curvesThroughPoints(3, nine);
    expect(s9.dimension).toBe(0);
    const s10 = curvesThroughPoints(3, [...nine, P(11n, 13n)]);
    expect(s10.dimension).toBe(-1);
    expect(s10.notes).toContain('no curve of degree 3 passes through all the points');
  });
  it('reports five on a line and seven on a conic for cubics, and repeated points', () => {
    const onLine = [P(0n, 0n), P(1n, 1n), P(2n, 2n), P(3n, 3n), P(-5n, -5n)];
    const sys = curvesThroughPoints(3, [...onLine, P(1n, 0n), P(0n, 1n), P(2n, 7n)]);
    expect(sys.special).toBe(true);
    expect(sys.dimension).toBe(2);
    expect(sys.collinear).toEqual([[0, 1, 2, 3, 4]]);
    expect(sys.notes.join('\n')).toMatch(/points 1, 2, 3, 4, 5 lie on one line: 5 > 3 points/);
    // Seven points on the unit circle x^2 + y^2 = 1 (rational points from Pythagorean triples) and one off it.
    const circle = [P(1n, 0n), P(0n, 1n), P(-1n, 0n), P(0n, -1n), P(3n, 4n, 5n), P(-3n, 4n, 5n), P(5n, 12n, 13n)];
    const s = curvesThroughPoints(3, [...circle, P(2n, 3n)]);
    expect(s.onConic).toEqual([[0, 1, 2, 3, 4, 5, 6]]);
    expect(s.notes.join('\n')).toMatch(/lie on one conic: 7 > 6 points/);
    const r = curvesThroughPoints(2, [P(1n, 2n), P(2n, 4n, 2n), P(0n, 1n)]);
    expect(r.repeated).toEqual([[0, 1]]);
    expect(r.dimension).toBe(3);
    expect(r.notes[0]).toBe('points 1, 2 are the same point, so they count once');
  });
  it('refuses bad degrees and zero points', () => {
    expect(() => curvesThroughPoints(7, [])).toThrow(/from 1 to 6/);
    expect(() => curvesThroughPoints(2, [[0n, 0n, 0n]])).toThrow(InvalidInput);
  });
});

describe('conicThroughFive', () => {
  it('the circle x^2 + y^2 = 25 through five of its rational points (our own example)', () => {
    const c = conicThroughFive([P(5n, 0n), P(3n, 4n), P(-4n, 3n), P(0n, -5n), P(4n, -3n)]);
    expect(formEquals(c.conic, formParse('x^2 + y^2 = 25').form)).toBe(true);
    expect(c.kind).toBe('smooth');
    expect(conicRank(c.conic)).toBe(3);
  });
  it('three collinear among five give a line pair, named', () => {
    const c = conicThroughFive([P(0n, 0n), P(1n, 1n), P(3n, 3n), P(0n, 2n), P(5n, 2n)]);
    expect(c.kind).toBe('line pair');
    expect(c.lines).toEqual([[1n, -1n, 0n], [0n, 1n, -2n]]);
    expect(formEquals(c.conic, formParse('(x - y)(y - 2) = 0').form)).toBe(true);
    expect(c.notes.join('\n')).toMatch(/points 1, 2, 3 lie on one line/);
  });
  it('four on a line or a repeated point: no unique conic, said in words', () => {
    const four = [P(0n, 0n), P(1n, 0n), P(2n, 0n), P(7n, 0n), P(1n, 5n)];
    expect(() => conicThroughFive(four)).toThrow(Degenerate);
    expect(() => conicThroughFive(four)).toThrow(/family of dimension 1 \(points 1, 2, 3, 4 lie on one line/);
    const rep = [P(0n, 0n), P(1n, 0n), P(2n, 2n, 2n), P(1n, 1n), P(1n, 5n)];
    expect(() => conicThroughFive(rep)).toThrow(/points 3, 4 are the same point/);
    expect(() => conicThroughFive(rep.slice(0, 4))).toThrow(/exactly five points/);
  });
});
