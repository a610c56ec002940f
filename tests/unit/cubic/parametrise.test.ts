// Parametrisation of nodal and cuspidal cubics through the singular point: the map lands on the curve,
// inverse ∘ map and map ∘ inverse are the identity (fast-check over seeded curves and parameters), the
// parameters over the singular point are the roots of the cone, and the normal form gives the slope shape.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { seededRandom } from '../../reference/oracles.ts';
import { formParse } from '../../../src/poly/parse.ts';
import { formToText } from '../../../src/poly/print.ts';
import { formEval } from '../../../src/poly/form.ts';
import { binaryEval, binaryIsZero } from '../../../src/poly/binary.ts';
import { formOnParametrisation } from '../../../src/poly/substitute.ts';
import { triple, tripleEquals } from '../../../src/plane/point.ts';
import { cubicParametrisation, parametrisationAt, parametrisationInverse } from '../../../src/cubic/parametrise.ts';
import { Degenerate, InvalidInput, NotOnCurve } from '../../../src/exact/errors.ts';
import { singularSample } from './singular-samples.ts';

const F = (t: string) => formParse(t).form;

function sameParameter(a: readonly bigint[], b: readonly bigint[]): boolean {
  return a[0] * b[1] === a[1] * b[0];
}

describe('parametrisation of seeded nodal and cuspidal cubics', () => {
  const seed = 4242;
  const rand = seededRandom(seed);
  // Families 0, 1, 2 of the samples: node, node with a mixed term, cusp; moved by unimodular matrices.
  const curves = Array.from({ length: 24 }, (_, n) => singularSample(rand, n % 3));
  const pars = curves.map((s) => cubicParametrisation(s.curve));
  it(`map lands on the curve, F(X(s,t)) ≡ 0 as a binary form of degree 9 (seed ${seed})`, () => {
    for (const s of curves) {
      const par = cubicParametrisation(s.curve);
      const comp = formOnParametrisation(s.curve, par.map[0], par.map[1], par.map[2]);
      expect(comp.length, formToText(s.curve)).toBe(10);
      expect(binaryIsZero(comp), formToText(s.curve)).toBe(true);
      expect(tripleEquals(par.singular, s.rational[0].point), formToText(s.curve)).toBe(true);
      expect(par.kind, formToText(s.curve)).toBe(s.rational[0].kind);
    }
  });
  it('inverse ∘ map = id away from the parameters over P; map ∘ inverse = id on the points (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: curves.length - 1 }),
        fc.bigInt({ min: -50n, max: 50n }),
        fc.bigInt({ min: -50n, max: 50n }),
        (k, s, t) => {
          fc.pre(s !== 0n || t !== 0n);
          const par = pars[k];
          fc.pre(binaryEval(par.overForm, s, t) !== 0n);
          const x = parametrisationAt(par, s, t);
          expect(formEval(par.curve, x)).toBe(0n);
          const back = parametrisationInverse(par, x);
          expect(sameParameter(back, [s, t]), `seed ${seed}, curve ${k}: ${formToText(par.curve)} at ${s}:${t}`).toBe(true);
          expect(tripleEquals(parametrisationAt(par, back[0], back[1]), x)).toBe(true);
        },
      ),
      { seed, numRuns: 300 },
    );
  });
  it('the parameters over P map to P: two for a node, one double for a cusp', () => {
    for (const s of curves) {
      const par = cubicParametrisation(s.curve);
      const disc = par.overForm[1] * par.overForm[1] - 4n * par.overForm[0] * par.overForm[2];
      expect(disc === 0n, formToText(s.curve)).toBe(par.kind === 'cusp');
      for (const [a, b] of par.overRational) expect(tripleEquals(parametrisationAt(par, a, b), par.singular)).toBe(true);
      if (s.rational[0].split === true) expect(par.overRational.length).toBe(2);
      if (s.rational[0].split === false) expect(par.overRational.length).toBe(0);
    }
  });
});

describe('shape and refusals', () => {
  it('y² = x³ + c x² gives the slope parametrisation x = m² − c, y = m(m² − c), m = t/s (common practice)', () => {
    for (const c of [6n, -11n, 9n]) {
      const par = cubicParametrisation(F(`y^2 = x^3 + ${c}x^2`));
      for (const m of [1n, 2n, -3n, 7n]) {
        expect(tripleEquals(parametrisationAt(par, 1n, m), triple(m * m - c, m * (m * m - c), 1n))).toBe(true);
      }
    }
  });
  it('the cusp 3y² = 2x³: parameter over the cusp is (1:0) (double)', () => {
    const par = cubicParametrisation(F('3y^2 = 2x^3'));
    expect(par.kind).toBe('cusp');
    expect(par.overRational).toEqual([[1n, 0n]]);
  });
  it('refuses smooth and reducible cubics, off-curve points and the singular point, saying why', () => {
    expect(() => cubicParametrisation(F('y^2 = x^3 - 4x + 7'))).toThrow(/smooth/);
    expect(() => cubicParametrisation(F('(y - x)(x^2 + y^2 - 5) = 0'))).toThrow(InvalidInput);
    expect(() => cubicParametrisation(F('x^2 + y^2 = 3'))).toThrow(InvalidInput);
    const par = cubicParametrisation(F('y^2 = x^3 + 6x^2'));
    expect(() => parametrisationInverse(par, [1n, 1n, 1n])).toThrow(NotOnCurve);
    expect(() => parametrisationInverse(par, [0n, 0n, 1n])).toThrow(Degenerate);
  });
});
