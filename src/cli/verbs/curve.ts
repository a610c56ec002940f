// `curve EQ`: everything Ninefold knows about a curve at once. For a cubic: smoothness, the components
// over Q, every singular point with its kind and tangents, Aronhold's S and T, the discriminant and j,
// the real components and the flexes. For degrees 1, 2, 4, 5, 6: degree, smoothness and the rational
// singular points; the cubic-only fields are named in "cubicOnly".
import type { Verb } from '../verb.ts';
import { InvalidInput } from '../../exact/errors.ts';
import { ratToString } from '../../exact/rational.ts';
import { formParse } from '../../poly/parse.ts';
import { formToText } from '../../poly/print.ts';
import { monomials, type Form } from '../../poly/form.ts';
import { pointToString } from '../../plane/parse-point.ts';
import { positionalAt } from '../args.ts';
import { cubicReport } from '../../cubic/curve-report.ts';
import { formSingularPoints } from '../../cubic/singular-general.ts';
import { conjugateMembers, type ConjugatePoints } from '../../cubic/conjugate-points.ts';
import { algebraicToDecimal } from '../../exact/algebraic.ts';
import { upolyToString } from '../../exact/upoly.ts';

/** An equation as text: affine unless the form contains the line at infinity (then homogeneous). */
export function equationText(f: Form, homogeneous = false): string {
  const zFree = f.coeffs.some((c, k) => c !== 0n && monomials(f.degree)[k][2] === 0);
  return `${formToText(f, { affine: !homogeneous && zFree })} = 0`;
}

const CUBIC_ONLY = ['reducible', 'components', 'S', 'T', 'discriminant', 'j', 'realComponents', 'flexes', 'milnor and tjurina of every point'];

export const curve: Verb = {
  name: 'curve',
  usage:
    'curve EQ — the curve described: {"degree", "smooth", "reducible", "components", "singular": [{"point", "approx", "kind", "tangents", "split", ...}], "S", "T", "discriminant", "j", "realComponents", "flexes"}',
  run(args) {
    const text = positionalAt(args, 0, 'the equation of the curve');
    if (args.positional.length > 1) {
      throw new InvalidInput(`one equation only; found an extra argument "${args.positional[1]}" (quote the equation if it has spaces)`, 'argument 2');
    }
    const { form: f, homogeneous } = formParse(text, 'argument 1');
    const eq = (g: Form) => equationText(g, homogeneous);
    if (f.degree === 3) return cubicJson(f, eq);
    const g = formSingularPoints(f);
    return {
      degree: f.degree,
      smooth: g.smooth,
      reduced: g.reduced,
      singular: [
        ...g.points.map((p) => ({
          point: pointToString(p.point),
          approx: p.approx,
          kind: p.kind,
          multiplicity: p.multiplicity,
          ordinary: p.ordinary,
          tangents: p.tangents.map(eq),
          split: p.split,
          realKind: p.realKind,
          milnor: p.milnor,
        })),
        ...(g.orbits ?? []).flatMap((o) =>
          conjugateMembers(o.orbit).map((m) => ({
            point: null,
            approx: m.approx.re,
            ...(m.real ? {} : { approxImag: m.approx.im }),
            real: m.real,
            kind: o.kind,
            split: null,
            conjugates: conjugatesJson(o.orbit),
            ...(m.root ? { root: { decimal: algebraicToDecimal(m.root, 15), lo: ratToString(m.root.lo), hi: ratToString(m.root.hi) } } : {}),
          })),
        ),
        ...g.repeatedLines.map((l) => ({ point: null, kind: l.multiplicity === 2 ? 'double line' : `line of multiplicity ${l.multiplicity}`, locus: eq({ degree: 1, coeffs: l.line }) })),
      ],
      tjurinaTotal: g.tjurinaTotal,
      note: !g.reduced
        ? 'the curve has a repeated component, so it is singular along a curve'
        : g.orbits === null
          ? 'rational singular points only are listed (general position not reached for the others); tjurinaTotal counts all of them over C'
          : 'every singular point is listed: rational ones exactly, the others by conjugate orbit; tjurinaTotal is their Σ τ over C',
      cubicOnly: CUBIC_ONLY,
    };
  },
};

/** An orbit of conjugate points as text: the polynomial in u and the three coordinates in u. */
function conjugatesJson(c: ConjugatePoints): unknown {
  return {
    poly: `${upolyToString(c.poly, 'u')} = 0`,
    coords: c.coords.map((x) => upolyToString(x, 'u')),
    note: 'the points (coords[0] : coords[1] : coords[2]) for the roots u of poly; "root" is the u of a real one',
  };
}

function cubicJson(f: Form, eq: (g: Form) => string): unknown {
  const r = cubicReport(f);
  const s = r.singularities;
  return {
    degree: 3,
    equation: eq(f),
    smooth: s.smooth,
    reducible: s.components.reducible,
    components: s.components.components.map((c) => eq(c.form)),
    componentDetails: s.components.components.map((c) => ({ equation: eq(c.form), multiplicity: c.multiplicity, kind: c.multiplicity === 2 ? 'double line' : c.multiplicity === 3 ? 'triple line' : c.kind })),
    shape: s.components.shape,
    description: s.components.description,
    singular: [
      ...s.points.map((p) => ({
        point: p.point ? pointToString(p.point) : null,
        approx: p.approx,
        ...(p.approxImag ? { approxImag: p.approxImag } : {}),
        real: p.real,
        kind: p.kind,
        multiplicity: p.multiplicity,
        ordinary: p.ordinary,
        tangents: p.tangents.map(eq),
        split: p.split,
        realKind: p.realKind,
        milnor: p.milnor,
        tjurina: p.tjurina,
        ...(p.conjugates ? { conjugates: conjugatesJson(p.conjugates) } : {}),
        ...(p.root ? { root: { decimal: algebraicToDecimal(p.root, 15), lo: ratToString(p.root.lo), hi: ratToString(p.root.hi) } } : {}),
      })),
      ...s.lines.map((l) => ({
        point: null,
        kind: l.multiplicity === 2 ? 'double line' : 'triple line',
        locus: eq({ degree: 1, coeffs: l.line }),
        milnor: null,
        note: 'singular all along this line (not an isolated singular point)',
      })),
    ],
    tjurinaTotal: s.tjurinaTotal,
    S: ratToString(r.invariants.S),
    T: ratToString(r.invariants.T),
    discriminant: ratToString(r.invariants.discriminant),
    j: r.invariants.j ? ratToString(r.invariants.j) : null,
    realComponents: r.realComponents,
    flexes: {
      rational: r.flexes.rational.map(pointToString),
      real: r.flexes.real,
      count: r.flexes.count,
      ...(r.flexes.degenerate ? { degenerate: r.flexes.degenerate } : {}),
    },
  };
}
