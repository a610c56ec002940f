// `form EQ`: the equation read and normalised — the primitive integer form as homogeneous and affine
// text and LaTeX, its degree, and how it was written.
import type { Verb } from '../verb.ts';
import { formParse } from '../../poly/parse.ts';
import { formToLatex, formToText } from '../../poly/print.ts';
import { monomials } from '../../poly/form.ts';
import { positionalAt } from '../args.ts';
import { InvalidInput } from '../../exact/errors.ts';

export const form: Verb = {
  name: 'form',
  usage:
    'form EQ — the equation normalised to a primitive integer form: ' +
    '{"degree", "homogeneous", "affine", "latex", "latexHomogeneous", "written", "coefficients", "containsLineAtInfinity"}',
  run(args) {
    const text = positionalAt(args, 0, 'the equation');
    if (args.positional.length > 1) {
      throw new InvalidInput(
        `one equation only; found an extra argument "${args.positional[1]}" (quote the equation if it has spaces)`,
        'argument 2',
      );
    }
    const { form: f, homogeneous } = formParse(text, 'argument 1');
    // Affine text sets Z = 1, which drops a factor Z (the line at infinity as a component).
    const zFree = f.coeffs.some((c, k) => c !== 0n && monomials(f.degree)[k][2] === 0);
    return {
      degree: f.degree,
      homogeneous: formToText(f),
      affine: formToText(f, { affine: true }),
      latex: formToLatex(f, { affine: true }) + ' = 0',
      latexHomogeneous: formToLatex(f) + ' = 0',
      written: homogeneous ? 'homogeneous' : 'affine',
      // Coefficients in the monomial order X^d, X^(d-1)Y, X^(d-1)Z, X^(d-2)Y^2, ... (src/poly/form.ts).
      coefficients: f.coeffs.map(String),
      containsLineAtInfinity: !zFree,
    };
  },
};
