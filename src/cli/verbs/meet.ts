// `meet EQ1 EQ2`: every common point of two curves (degrees 1..6) with its intersection multiplicity,
// summing to the product of the degrees (Bézout); non-real points are counted and approximated.
import type { Verb } from '../verb.ts';
import { curveCurveMeet, type MeetPoint } from '../../cubic/meet.ts';
import { algebraicMeetPointDecimals } from '../../cubic/meet-decimal.ts';
import { algebraicToDecimal } from '../../exact/algebraic.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { ratToString } from '../../exact/rational.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { formParse } from '../../poly/parse.ts';
import { positionalAt } from '../args.ts';

function pointJson(m: MeetPoint): Record<string, unknown> {
  const out: Record<string, unknown> = {
    point: m.point ? pointToString(m.point) : null,
    approx: m.approx,
    multiplicity: m.multiplicity,
    real: m.real,
  };
  if (m.approxImag) out.approxImag = m.approxImag;
  const alg = m.algebraic;
  if (alg) {
    const a = alg.alpha;
    const root = { poly: a.poly, interval: [ratToString(a.lo), ratToString(a.hi)], decimal: algebraicToDecimal(a, 20) };
    // Exact: α is the root of poly in the interval; the point is α·p + q, or frame·(α, yNum(α)/yDen(α), 1).
    // 20 significant digits, each decided by interval refinement (meet-decimal.ts).
    out.decimal = algebraicMeetPointDecimals(alg, 20);
    out.algebraic =
      alg.kind === 'line'
        ? { kind: 'line', alpha: root, p: pointToString(alg.p), q: pointToString(alg.q) }
        : { kind: 'projection', alpha: root, yNum: alg.yNum, yDen: alg.yDen, frame: alg.frame };
  }
  return out;
}

export const meet: Verb = {
  name: 'meet',
  usage:
    'meet EQ1 EQ2 — the common points of two curves with multiplicities (Bézout, complex points counted): ' +
    '{"points": [{"point" or null, "approx", "multiplicity", "real", "decimal", "algebraic"}], "total", "commonComponent", "note"}',
  run(args) {
    for (const name of args.options.keys()) throw new InvalidInput(`meet takes no options, found --${name}`, `--${name}`);
    if (args.positional.length > 2) throw new InvalidInput(`meet takes two equations, found ${args.positional.length} arguments`, 'argument 3');
    const f = formParse(positionalAt(args, 0, 'the first equation'), 'argument 1').form;
    const g = formParse(positionalAt(args, 1, 'the second equation'), 'argument 2').form;
    for (const [h, where] of [[f, 'argument 1'], [g, 'argument 2']] as const) {
      if (h.degree < 1 || h.degree > 6) throw new InvalidInput(`meet handles curves of degree 1 to 6, this one has degree ${h.degree}`, where);
    }
    const r = curveCurveMeet(f, g);
    return { points: r.points.map(pointJson), total: r.total, commonComponent: r.commonComponent, note: r.note };
  },
};
