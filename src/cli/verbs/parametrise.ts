// `parametrise EQ [--at S:T]`: the rational parametrisation of a nodal or cuspidal cubic through its
// singular point, or the point with parameter S:T.
import type { Verb } from '../verb.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { lcm, primitive } from '../../exact/integer.ts';
import { RAT_ONE, ratParse } from '../../exact/rational.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { formToText } from '../../poly/print.ts';
import { binaryFormRoots } from '../../poly/binary-roots.ts';
import { algebraicToDecimal } from '../../exact/algebraic.ts';
import { optionString } from '../args.ts';
import { argCubic, argsNoMore } from '../cubic-args.ts';
import { cubicParametrisation, parametrisationAt, type CubicParametrisation } from '../../cubic/parametrise.ts';
import { equationText } from './curve.ts';

/** A binary form as text in s, t ("s^3 - 2st^2"). */
export function binaryText(b: readonly bigint[]): string {
  const d = b.length - 1;
  const terms: string[] = [];
  b.forEach((c, i) => {
    if (c === 0n) return;
    const se = d - i;
    const te = i;
    const mono = (se ? (se === 1 ? 's' : `s^${se}`) : '') + (te ? (te === 1 ? 't' : `t^${te}`) : '');
    const abs = c < 0n ? -c : c;
    const body = mono === '' ? `${abs}` : abs === 1n ? mono : `${abs}${mono}`;
    terms.push(terms.length === 0 ? (c < 0n ? `-${body}` : body) : c < 0n ? ` - ${body}` : ` + ${body}`);
  });
  return terms.length ? terms.join('') : '0';
}

/** S:T with rational S, T (denominators cleared), or a single rational u meaning u:1. */
function parameterArg(text: string): [bigint, bigint] {
  const parts = text.split(':');
  if (parts.length > 2) throw new InvalidInput(`expected a parameter S:T (e.g. 2:-3 or 1/2:5), found "${text}"`, '--at');
  const [s, t] = parts.length === 2 ? parts.map((x) => ratParse(x, '--at')) : [ratParse(parts[0], '--at'), RAT_ONE];
  if (s.num === 0n && t.num === 0n) throw new InvalidInput('0:0 is not a parameter', '--at');
  const l = lcm(s.den, t.den);
  return [(s.num * l) / s.den, (t.num * l) / t.den];
}

/** The parameters over the singular point: "s:t" strings when rational, else the quadratic and its roots. */
function overJson(par: CubicParametrisation): unknown[] {
  if (par.overRational.length > 0) {
    const r = par.overRational.map(([s, t]) => `${s}:${t}`);
    return par.kind === 'cusp' ? [r[0], r[0]] : r;
  }
  const q = par.overForm;
  const found = binaryFormRoots(q);
  const real = found.roots.filter((r) => r.real).map((r) => algebraicToDecimal(r.real!, 12));
  return [{ roots: binaryText(q), real: real.length > 0, approxST: real.length > 0 ? real : null, note: 's/t runs over the roots of this quadratic form (conjugate over Q)' }];
}

export const parametrise: Verb = {
  name: 'parametrise',
  usage:
    'parametrise EQ [--at S:T] — the parametrisation of a nodal or cuspidal cubic through its singular point: {"singular", "kind", "map", "over", "inverse"}; with --at, {"point"}',
  run(args) {
    const f = argCubic(args);
    argsNoMore(args, 1);
    let par: CubicParametrisation;
    try {
      par = cubicParametrisation(f);
    } catch (e) {
      // The library names "curve"; on the command line the curve is argument 1.
      if (e instanceof InvalidInput) throw new InvalidInput(e.message, 'argument 1');
      throw e;
    }
    const at = optionString(args, 'at');
    if (at !== undefined) {
      const [s, t] = parameterArg(at);
      return { point: pointToString(parametrisationAt(par, s, t)), parameter: `${primitive([s, t]).join(':')}` };
    }
    return {
      singular: pointToString(par.singular),
      kind: par.kind,
      map: par.map.map(binaryText),
      over: overJson(par),
      inverse: par.inverse.map((l) => formToText({ degree: 1, coeffs: l })),
      inverseNote: 'for a point X ≠ the singular point, (s:t) = (first form at X : second form at X)',
      pencil: par.basis.map(pointToString),
      equation: equationText(par.curve),
    };
  },
};
