// All singular points of a plane cubic, exactly, with their kind, tangent cone, Milnor and Tjurina
// numbers; and the singular line of a cubic with a repeated component.
//
// Canonical form: rational points are primitive triples (src/plane/point.ts); a Galois orbit of points
// that are not rational is given exactly as polynomial coordinates over the roots θ of an irreducible
// polynomial (src/cubic/conjugate-points.ts), real members with θ as a real algebraic number; every point
// carries an approximation for display.
//
// Method (MATH.md; Fulton, Algebraic Curves, ch. 3 and 5): factor over Q first (src/cubic/factor.ts);
// the singular points of a reducible cubic are those of its components and the points where they meet.
// An absolutely irreducible cubic has at most one singular point and it is rational; it is found from
// the Jacobian ideal by linear algebra (src/cubic/jacobian.ts): a node is the meet of the lines through
// it, a cusp the common root of the partials on its tangent. Kinds from the tangent cone
// (src/cubic/tangent-cone.ts): rank 2 a node (split over Q iff its discriminant is a square; crunode or
// acnode over R), a double line not in the curve a cusp, a double line in the curve (conic + tangent
// line) a tacnode, multiplicity 3 a triple point. Milnor = Tjurina number (cubic singularities are
// quasi-homogeneous): A1 node 1, A2 cusp 2, A3 tacnode 3, D4 ordinary triple point 4 (Arnold's list;
// Greuel, Lossen, Shustin, Introduction to Singularities and Deformations, I.2).
import { InvalidInput, NinefoldError } from '../exact/errors.ts';
import { matKernel } from '../exact/linalg.ts';
import { isqrt, isSquare } from '../exact/integer.ts';
import { cross, triple, type Line, type Point } from '../plane/point.ts';
import { formGradientAt, formPartial, formPrimitive, type Form } from '../poly/form.ts';
import { formOnLine } from '../poly/substitute.ts';
import type { RealAlgebraic } from '../exact/algebraic.ts';
import { pointApprox, type Approx } from './approx.ts';
import { conjugateMembers, conjugatesOnLine, triangleVertices, type ConjugatePoints } from './conjugate-points.ts';
import { cubicComponents, lineSpan, linePairIsReal, type CubicComponents } from './factor.ts';
import { jacobianDual, jacobianSaturationLines } from './jacobian.ts';
import { lineForm } from './linear-factors.ts';
import { doublePointShape, formTangentCone, splitNodeTangents, tangentIsOrdinaryCusp } from './tangent-cone.ts';

export type SingularKind = 'node' | 'cusp' | 'tacnode' | 'triple point';

export interface SingularPoint {
  /** The point when rational, else null. */
  readonly point: Point | null;
  /** For a point that is not rational: the exact orbit it belongs to (src/cubic/conjugate-points.ts). */
  readonly conjugates: ConjugatePoints | null;
  /** For a real point that is not rational: its θ in the orbit, as a real algebraic number. */
  readonly root: RealAlgebraic | null;
  readonly approx: Approx;
  /** Imaginary parts of the approximation, for a complex point; null for a real one. */
  readonly approxImag: Approx | null;
  readonly real: boolean;
  readonly multiplicity: 2 | 3;
  readonly kind: SingularKind;
  /** Triple points: three distinct tangents. Always true for the double points of a cubic. */
  readonly ordinary: boolean;
  /** Nodes at rational points: both tangents rational. Null elsewhere. */
  readonly split: boolean | null;
  /** Nodes at real points: two real branches (crunode) or an isolated real point (acnode). */
  readonly realKind: 'crunode' | 'acnode' | null;
  /** The tangent cone as a product of forms irreducible over Q (lines, or a conjugate pair as one form). */
  readonly tangents: readonly Form[];
  readonly milnor: number;
  readonly tjurina: number;
}

/** A cubic with a repeated line is singular all along it (non-isolated: Milnor number infinite). */
export interface SingularLine {
  readonly line: Line;
  readonly multiplicity: 2 | 3;
}

export interface CubicSingularities {
  readonly smooth: boolean;
  readonly points: readonly SingularPoint[];
  readonly lines: readonly SingularLine[];
  readonly components: CubicComponents;
  /** Σ τ over the singular points from the Jacobian ideal (null when the singular locus is a line). */
  readonly tjurinaTotal: number | null;
}

const NUMBERS: Record<string, number> = { node: 1, cusp: 2, tacnode: 3, 'triple point': 4 };

function rationalPoint(p: Point, rest: Omit<SingularPoint, 'point' | 'conjugates' | 'root' | 'approx' | 'approxImag' | 'real' | 'milnor' | 'tjurina'>): SingularPoint {
  const n = NUMBERS[rest.kind];
  return { point: p, conjugates: null, root: null, approx: pointApprox(p), approxImag: null, real: true, milnor: n, tjurina: n, ...rest };
}

/** A rational double point of f classified from its cone (f is known to be reduced at P). */
function doublePointAt(f: Form, p: Point, tangentInCurve: boolean): SingularPoint {
  const { cone } = formTangentCone(f, p);
  const shape = doublePointShape(p, cone);
  if (shape.shape === 'node') {
    const tangents = shape.split ? splitNodeTangents(p, cone).map(lineForm) : [cone];
    return rationalPoint(p, { multiplicity: 2, kind: 'node', ordinary: true, split: shape.split, realKind: shape.real, tangents });
  }
  const kind: SingularKind = tangentInCurve || !tangentIsOrdinaryCusp(f, p, shape.tangent) ? 'tacnode' : 'cusp';
  return rationalPoint(p, { multiplicity: 2, kind, ordinary: true, split: null, realKind: null, tangents: [lineForm(shape.tangent)] });
}

function triplePointAt(p: Point, tangents: Form[]): SingularPoint {
  return rationalPoint(p, { multiplicity: 3, kind: 'triple point', ordinary: true, split: null, realKind: null, tangents });
}

/** The nodes of an orbit of conjugate points (each a node with the given tangent forms). */
function conjugateNodes(orbit: ConjugatePoints, tangents: Form[], realKind: 'crunode' | 'acnode' = 'crunode'): SingularPoint[] {
  return conjugateMembers(orbit).map((m) => ({
    point: null,
    conjugates: orbit,
    root: m.root,
    approx: m.approx.re,
    approxImag: m.real ? null : m.approx.im,
    real: m.real,
    multiplicity: 2 as const,
    kind: 'node' as const,
    ordinary: true,
    split: null,
    realKind: m.real ? realKind : null,
    tangents,
    milnor: 1,
    tjurina: 1,
  }));
}

/** The two conjugate points where the rational line l meets a form q (irreducible on l). */
function conjugatePair(l: Line, q: Form, tangents: Form[]): SingularPoint[] {
  const [a, b] = lineSpan(l);
  return conjugateNodes(conjugatesOnLine(a, b, formOnLine(q, a, b)), tangents);
}

/** The singular point of an absolutely irreducible cubic, or null when it is smooth. */
export function irreducibleCubicSingularPoint(f: Form): { point: Point; tjurina: number } | null {
  const dual = jacobianDual(f);
  const tau = dual.functionals.length;
  if (tau === 0) return null;
  const ls = jacobianSaturationLines(dual);
  let p: Point;
  if (ls.length === 2) {
    const c = cross(ls[0], ls[1]);
    p = triple(c[0], c[1], c[2]);
  } else if (ls.length === 1) {
    p = commonRootOfPartialsOn(f, [ls[0][0], ls[0][1], ls[0][2]]);
  } else {
    throw new NinefoldError(`internal error: the Jacobian ideal of an irreducible cubic gave ${ls.length} lines`, 'singular');
  }
  if (!formGradientAt(f, p).every((x) => x === 0n)) {
    throw new NinefoldError('internal error: the point found is not singular', 'singular');
  }
  return { point: p, tjurina: tau };
}

/** The unique common zero of the three partials on the line l (assumes there is exactly one). */
function commonRootOfPartialsOn(f: Form, l: Line): Point {
  const [a, b] = lineSpan(l);
  const fx = formOnLineGradient(f, a, b);
  // Each restricted partial c0 s² + c1 st + c2 t² vanishes at the root: (s², st, t²) spans the kernel.
  const ker = matKernel(fx, 3);
  let s: bigint;
  let t: bigint;
  if (ker.length === 1) {
    const [v0, v1, v2] = ker[0];
    [s, t] = v0 !== 0n ? [v0, v1] : [v1, v2];
  } else {
    const row = fx.find((r) => r.some((x) => x !== 0n)) as bigint[];
    [s, t] = row[0] !== 0n ? [-row[1], 2n * row[0]] : [1n, 0n];
  }
  return triple(s * a[0] + t * b[0], s * a[1] + t * b[1], s * a[2] + t * b[2]);
}

function formOnLineGradient(f: Form, a: Point, b: Point): bigint[][] {
  return ([0, 1, 2] as const).map((v) => formOnLine(formPartial(f, v), a, b));
}

/** Every singular point of a cubic (and its singular line when a component is repeated). */
export function cubicSingularPoints(f0: Form): CubicSingularities {
  if (f0.degree !== 3) throw new InvalidInput(`a cubic is needed, got a curve of degree ${f0.degree}`, 'curve');
  const f = formPrimitive(f0);
  const comps = cubicComponents(f);
  const points: SingularPoint[] = [];
  const lines: SingularLine[] = [];
  const lineComps = comps.components.filter((c) => c.kind === 'line');
  const rest = comps.components.find((c) => c.kind !== 'line');
  const lineOf = (c: { form: Form }): Line => [c.form.coeffs[0], c.form.coeffs[1], c.form.coeffs[2]];
  switch (comps.shape) {
    case 'irreducible': {
      const s = irreducibleCubicSingularPoint(f);
      if (s) {
        const pt = doublePointAt(f, s.point, false);
        if (pt.tjurina !== s.tjurina) {
          throw new NinefoldError(`internal error: ${pt.kind} with Tjurina number ${s.tjurina} from the Jacobian ideal`, 'singular');
        }
        points.push(pt);
      }
      break;
    }
    case 'three conjugate concurrent lines':
      points.push(triplePointAt(comps.vertex as Point, [f]));
      break;
    case 'three conjugate lines': {
      // The orbit is indexed by the lines (a vertex is opposite its line): a real vertex lies on two real
      // lines when all three are real, else on two complex conjugate ones (an isolated real point).
      const orbit = triangleVertices(f);
      const allReal = conjugateMembers(orbit).every((m) => m.real);
      points.push(...conjugateNodes(orbit, [f], allReal ? 'crunode' : 'acnode'));
      break;
    }
    case 'line and conic': {
      const l = lineOf(lineComps[0]);
      const q = (rest as { form: Form }).form;
      const [a, b] = lineSpan(l);
      const [c0, c1, c2] = formOnLine(q, a, b);
      const disc = c1 * c1 - 4n * c0 * c2;
      if (isSquare(disc)) {
        for (const p of rationalRootsOfSquareQuadratic(c0, c1, c2, a, b)) points.push(doublePointAt(f, p, false));
      } else {
        points.push(...conjugatePair(l, q, [lineForm(l), q]));
      }
      break;
    }
    case 'line and tangent conic': {
      const l = lineOf(lineComps[0]);
      const q = (rest as { form: Form }).form;
      const [a, b] = lineSpan(l);
      const [c0, c1, c2] = formOnLine(q, a, b);
      const [p] = rationalRootsOfSquareQuadratic(c0, c1, c2, a, b);
      points.push(doublePointAt(f, p, true));
      break;
    }
    case 'line and conjugate line pair': {
      const l = lineOf(lineComps[0]);
      const q = (rest as { form: Form }).form;
      const v = comps.vertex as Point;
      const real = linePairIsReal(q, v);
      points.push(rationalPoint(v, { multiplicity: 2, kind: 'node', ordinary: true, split: false, realKind: real ? 'crunode' : 'acnode', tangents: [q] }));
      points.push(...conjugatePair(l, q, [lineForm(l), q]));
      break;
    }
    case 'three concurrent lines':
      points.push(triplePointAt(comps.vertex as Point, comps.components.map((c) => c.form)));
      break;
    case 'three lines': {
      const ls = lineComps.map(lineOf);
      for (const [i, j] of [[0, 1], [0, 2], [1, 2]]) {
        const c = cross(ls[i], ls[j]);
        points.push(rationalPoint(triple(c[0], c[1], c[2]), {
          multiplicity: 2, kind: 'node', ordinary: true, split: true, realKind: 'crunode', tangents: [lineForm(ls[i]), lineForm(ls[j])],
        }));
      }
      break;
    }
    case 'double line and line':
    case 'triple line':
      for (const c of lineComps) if (c.multiplicity > 1) lines.push({ line: lineOf(c), multiplicity: c.multiplicity as 2 | 3 });
      break;
  }
  const tjurinaTotal = lines.length > 0 ? null : jacobianDual(f).functionals.length;
  return { smooth: points.length === 0 && lines.length === 0, points, lines, components: comps, tjurinaTotal };
}

/** The rational roots (as points sA + tB) of c0 s² + c1 st + c2 t² with a square discriminant. */
function rationalRootsOfSquareQuadratic(c0: bigint, c1: bigint, c2: bigint, a: Point, b: Point): Point[] {
  const disc = c1 * c1 - 4n * c0 * c2;
  const r = isqrt(disc);
  const roots: [bigint, bigint][] = c0 !== 0n ? [[-c1 + r, 2n * c0], [-c1 - r, 2n * c0]] : [[1n, 0n], [-c2, c1]];
  const pts = roots.map(([s, t]) => triple(s * a[0] + t * b[0], s * a[1] + t * b[1], s * a[2] + t * b[2]));
  return disc === 0n ? [pts[0]] : pts;
}

