// The oracles answer at all: a missing or broken PARI/GP or Singular must fail here, loudly.
import { describe, expect, it } from 'vitest';
import { gp, singular } from './oracles.ts';

describe('reference systems are present', () => {
  it('PARI/GP answers (factor of x^2 - 1, PARI/GP)', () => {
    expect(gp('print(factor(x^2-1))')).toEqual(['[x - 1, 1; x + 1, 1]']);
  });
  it('Singular answers (Milnor number of the cusp y^2 = x^3 is 2, Singular sing.lib)', () => {
    expect(singular('LIB "sing.lib"; ring r=0,(x,y),ds; poly f=y2-x3; milnor(f);')).toEqual(['2']);
  });
});
