// Forms against PARI/GP run live: resultants of seeded random ternary forms with respect to each variable
// agree with polresultant(f, g, v), and F(sP + tQ) agrees with substvec. Also a transform check against
// substvec with a matrix.
import { describe, expect, it } from 'vitest';
import { gp, gpVector, randomBigInt, seededRandom } from './oracles.ts';
import { monomialCount, monomials, type Form } from '../../src/poly/form.ts';
import { formResultant, type Variable } from '../../src/poly/resultant.ts';
import { formOnLine } from '../../src/poly/substitute.ts';
import { formTransform, type Matrix3 } from '../../src/poly/transform.ts';

const SEED = 7310;
const VARS = ['x', 'y', 'z'];

function randomForm(rand: () => number, d: number, digits: number, fullIn?: Variable): Form {
  const m = monomials(d);
  const coeffs = Array.from({ length: monomialCount(d) }, (_, k) => {
    if (fullIn !== undefined && m[k][fullIn] === d) {
      const c = randomBigInt(rand, digits);
      return c === 0n ? 1n : c;
    }
    return rand() < 0.2 ? 0n : randomBigInt(rand, digits);
  });
  return { degree: d, coeffs };
}

function gpForm(f: Form): string {
  const terms = monomials(f.degree)
    .map((e, k) => (f.coeffs[k] === 0n ? '' : `(${f.coeffs[k]})*x^${e[0]}*y^${e[1]}*z^${e[2]}`))
    .filter((t) => t !== '');
  return terms.length === 0 ? '0' : terms.join('+');
}

describe('forms agree with PARI/GP', () => {
  it('Res_v(F, G) equals polresultant(F, G, v) for random forms of degree 1..6 (full degree in v)', () => {
    const rand = seededRandom(SEED);
    const cases: { f: Form; g: Form; v: Variable }[] = [];
    for (let k = 0; k < 45; k++) {
      const v = (k % 3) as Variable;
      const d1 = 1 + Math.floor(rand() * 6);
      const d2 = 1 + Math.floor(rand() * (d1 >= 5 ? 3 : 6));
      cases.push({ f: randomForm(rand, d1, 1 + Math.floor(rand() * 12), v), g: randomForm(rand, d2, 1 + Math.floor(rand() * 12), v), v });
    }
    const script = cases
      .map(({ f, g, v }) => {
        const [a, b] = VARS.filter((_, i) => i !== v);
        const D = f.degree * g.degree;
        return `R=polresultant(${gpForm(f)},${gpForm(g)},${VARS[v]}); print(vector(${D + 1},i,polcoeff(polcoeff(R,${D}-(i-1),${a}),i-1,${b})))`;
      })
      .join('\n');
    const out = gp(script);
    expect(out.length).toBe(cases.length);
    cases.forEach(({ f, g, v }, i) => {
      const ours = formResultant(f, g, v).map(String);
      expect(ours, `seed ${SEED}, case ${i}: f=${gpForm(f)} g=${gpForm(g)} v=${VARS[v]}`).toEqual(gpVector(out[i]));
    });
  });

  it('with a vanishing top coefficient in v, Res_v is the formal-degree resultant: polresultant(F + e·v^d1, G + e·v^d2, v) at e = 0', () => {
    // Adding e·v^d makes PARI's actual degree the formal one; the resultant is a polynomial in e, and its
    // value at e = 0 is the Sylvester determinant with formal degrees (Cox, Little, O'Shea, ch. 3 §6).
    const rand = seededRandom(SEED + 3);
    const cases: { f: Form; g: Form; v: Variable }[] = [];
    for (let k = 0; k < 24; k++) {
      const v = (k % 3) as Variable;
      const d1 = 1 + Math.floor(rand() * 4);
      const d2 = 1 + Math.floor(rand() * 4);
      const zeroTop = (f: Form) => ({ degree: f.degree, coeffs: f.coeffs.map((c, i) => (monomials(f.degree)[i][v] === f.degree ? 0n : c)) });
      const f = zeroTop(randomForm(rand, d1, 6));
      const g0 = randomForm(rand, d2, 6, v);
      cases.push({ f, g: k % 4 === 3 ? zeroTop(g0) : g0, v });
    }
    const script = cases
      .map(({ f, g, v }) => {
        const [a, b] = VARS.filter((_, i) => i !== v);
        const D = f.degree * g.degree;
        const w = VARS[v];
        return `R=subst(polresultant(${gpForm(f)}+e*${w}^${f.degree},${gpForm(g)}+e*${w}^${g.degree},${w}),e,0); print(vector(${D + 1},i,polcoeff(polcoeff(R,${D}-(i-1),${a}),i-1,${b})))`;
      })
      .join('\n');
    const out = gp(script);
    cases.forEach(({ f, g, v }, i) => {
      const ours = formResultant(f, g, v).map(String);
      expect(ours, `seed ${SEED + 3}, case ${i}: f=${gpForm(f)} g=${gpForm(g)} v=${VARS[v]}`).toEqual(gpVector(out[i]));
    });
  });

  it('F(sP + tQ) equals substvec(F, [x,y,z], s*P + t*Q)', () => {
    const rand = seededRandom(SEED + 1);
    const cases: { f: Form; p: bigint[]; q: bigint[] }[] = [];
    for (let k = 0; k < 60; k++) {
      const d = 1 + Math.floor(rand() * 6);
      const pt = () => [0, 1, 2].map(() => randomBigInt(rand, 1 + Math.floor(rand() * 15)));
      cases.push({ f: randomForm(rand, d, 1 + Math.floor(rand() * 20)), p: pt(), q: pt() });
    }
    const script = cases
      .map(({ f, p, q }) => {
        const sub = [0, 1, 2].map((i) => `s*(${p[i]})+t*(${q[i]})`).join(',');
        return `B=substvec(${gpForm(f)},[x,y,z],[${sub}]); print(vector(${f.degree + 1},i,polcoeff(polcoeff(B,${f.degree}-(i-1),s),i-1,t)))`;
      })
      .join('\n');
    const out = gp(script);
    cases.forEach(({ f, p, q }, i) => {
      expect(formOnLine(f, p, q).map(String), `seed ${SEED + 1}, case ${i}: f=${gpForm(f)} P=${p} Q=${q}`).toEqual(gpVector(out[i]));
    });
  });

  it('F∘M equals substvec(F, [x,y,z], M·[x,y,z]~)', () => {
    const rand = seededRandom(SEED + 2);
    const cases: { f: Form; m: Matrix3 }[] = [];
    for (let k = 0; k < 30; k++) {
      const d = 1 + Math.floor(rand() * 6);
      const row = () => [randomBigInt(rand, 3), randomBigInt(rand, 3), randomBigInt(rand, 3)] as const;
      cases.push({ f: randomForm(rand, d, 8), m: [row(), row(), row()] });
    }
    const script = cases
      .map(({ f, m }) => {
        const lin = m.map((r) => `(${r[0]})*x+(${r[1]})*y+(${r[2]})*z`).join(',');
        const mons = monomials(f.degree).map((e) => `[${e.join(',')}]`).join(',');
        return `G=substvec(${gpForm(f)},[x,y,z],[${lin}]); E=[${mons}]; print(vector(#E,k,polcoeff(polcoeff(polcoeff(G,E[k][1],x),E[k][2],y),E[k][3],z)))`;
      })
      .join('\n');
    const out = gp(script);
    cases.forEach(({ f, m }, i) => {
      expect(formTransform(f, m).coeffs.map(String), `seed ${SEED + 2}, case ${i}: f=${gpForm(f)}`).toEqual(gpVector(out[i]));
    });
  });
});
