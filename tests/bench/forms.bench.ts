// Exact linear algebra, resultants and the parser against PARI/GP. PARI's times are taken inside gp with
// gettime() around a loop, so its start-up is not counted; ours are medians of repeated runs.
import { medianMs, type BenchFigure, type BenchSuite } from './bench.ts';
import { gp, randomBigInt, seededRandom } from '../reference/oracles.ts';
import { matDeterminant, matKernel, matMul, matRank } from '../../src/exact/linalg.ts';
import { formResultant } from '../../src/poly/resultant.ts';
import { formParse } from '../../src/poly/parse.ts';
import { monomialCount, monomials, type Form } from '../../src/poly/form.ts';

const REPS = 20;

function matrix(rand: () => number, rows: number, cols: number, digits: number): bigint[][] {
  return Array.from({ length: rows }, () => Array.from({ length: cols }, () => randomBigInt(rand, digits)));
}

const gpMatrix = (m: bigint[][]) => 'Mat([' + m.map((r) => r.join(',')).join(';') + '])';

function form(rand: () => number, d: number, digits: number): Form {
  return { degree: d, coeffs: Array.from({ length: monomialCount(d) }, () => randomBigInt(rand, digits) || 1n) };
}

const gpForm = (f: Form) =>
  monomials(f.degree).map((e, k) => `(${f.coeffs[k]})*x^${e[0]}*y^${e[1]}*z^${e[2]}`).join('+');

/** ms per call of a GP expression, timed inside gp over `reps` calls. */
function pariMs(setup: string, expr: string, reps: number): number {
  const out = gp(`${setup}\ngettime(); for(i=1,${reps}, ${expr}); print(gettime())`);
  return Number(out[out.length - 1]) / reps;
}

export const formsBench: BenchSuite = {
  name: 'forms',
  async run(): Promise<BenchFigure[]> {
    const rand = seededRandom(424242);
    const figures: BenchFigure[] = [];
    const square = matrix(rand, 20, 20, 20);
    const ours1 = medianMs(() => matDeterminant(square), REPS);
    const pari1 = pariMs(`M=${gpMatrix(square)};`, 'matdet(M)', 200);
    figures.push({ label: 'determinant 20x20, 20-digit entries', values: { ninefoldMs: ours1, pariMs: pari1, ratio: ours1 / pari1 } });

    const deficient = matMul(matrix(rand, 20, 12, 10), matrix(rand, 12, 28, 10));
    const ours2 = medianMs(() => matKernel(deficient), REPS);
    const pari2 = pariMs(`M=${gpMatrix(deficient)};`, 'matker(M)', 200);
    figures.push({ label: 'kernel 20x28 of rank 12, 20-digit entries', values: { ninefoldMs: ours2, pariMs: pari2, ratio: ours2 / pari2 } });
    const ours3 = medianMs(() => matRank(deficient), REPS);
    const pari3 = pariMs(`M=${gpMatrix(deficient)};`, 'matrank(M)', 200);
    figures.push({ label: 'rank 20x28 of rank 12', values: { ninefoldMs: ours3, pariMs: pari3, ratio: ours3 / pari3 } });

    const f3 = form(rand, 3, 6);
    const g3 = form(rand, 3, 6);
    const ours4 = medianMs(() => formResultant(f3, g3, 2), REPS);
    const pari4 = pariMs(`f=${gpForm(f3)}; g=${gpForm(g3)};`, 'polresultant(f,g,z)', 200);
    figures.push({ label: 'resultant of two cubics in z, 6-digit coefficients', values: { ninefoldMs: ours4, pariMs: pari4, ratio: ours4 / pari4 } });

    const f6 = form(rand, 6, 4);
    const g3b = form(rand, 3, 4);
    const ours5 = medianMs(() => formResultant(f6, g3b, 2), 7);
    const pari5 = pariMs(`f=${gpForm(f6)}; g=${gpForm(g3b)};`, 'polresultant(f,g,z)', 50);
    figures.push({ label: 'resultant sextic x cubic in z, 4-digit coefficients', values: { ninefoldMs: ours5, pariMs: pari5, ratio: ours5 / pari5 } });

    const big = '7'.repeat(5000);
    const text = `${big}y^2 + ${big}/3 xy = x^3 - ${big}x + 1.${big}`;
    const ours6 = medianMs(() => formParse(text), REPS);
    figures.push({ label: 'parse a cubic with four 5000-digit coefficients', values: { ninefoldMs: ours6, characters: text.length } });
    return figures;
  },
};
