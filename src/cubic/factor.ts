// The components of a plane cubic over Q, and what they are over Q̄.
//
// Canonical form: `components` are the irreducible factors over Q, each a primitive form with its
// multiplicity, lines first (in the order found), so that F = Π componentᵢ^mᵢ exactly (F primitive). The
// `shape` names the configuration over Q̄ in the trade's words.
//
// Method (MATH.md, singular points): a cubic is reducible over Q iff it has a rational linear factor
// (src/cubic/linear-factors.ts). A conic left over is a smooth conic (rank 3) or, when its matrix has rank 2,
// a pair of lines conjugate over a quadratic field meeting in a rational vertex. A cubic irreducible over Q
// can still be three lines over Q̄, conjugate over a cubic field: concurrent exactly when F is a cone (its
// three partials are linearly dependent, the dependency being the vertex), and a triangle exactly when
// the Hessian is a non-zero multiple of F (every point a flex: only unions of lines do this in
// characteristic 0; Fulton, Algebraic Curves, ch. 5 §3, flexes as H ∩ F).
import { InvalidInput } from '../exact/errors.ts';
import { matKernel, matRank } from '../exact/linalg.ts';
import { det3, triple, type Line, type Point } from '../plane/point.ts';
import { formGradient, type Form } from '../poly/form.ts';
import { formOnLine } from '../poly/substitute.ts';
import { cubicHessian } from './flex.ts';
import { formLinearFactors, lineForm } from './linear-factors.ts';

export type ComponentKind = 'line' | 'conic' | 'conjugate line pair' | 'cubic' | 'conjugate line triple';

export interface CubicComponent {
  readonly form: Form;
  readonly multiplicity: number;
  /** Over Q̄: a line, a smooth conic, two conjugate lines (irreducible over Q), an irreducible cubic, or
   * three lines conjugate over a cubic field. */
  readonly kind: ComponentKind;
}

export type CubicShape =
  | 'irreducible'
  | 'three conjugate concurrent lines'
  | 'three conjugate lines'
  | 'line and conic'
  | 'line and tangent conic'
  | 'line and conjugate line pair'
  | 'three concurrent lines'
  | 'three lines'
  | 'double line and line'
  | 'triple line';

export interface CubicComponents {
  /** Reducible over Q. */
  readonly reducible: boolean;
  readonly components: readonly CubicComponent[];
  readonly shape: CubicShape;
  /** The vertex of a conjugate line pair or of three concurrent lines, when there is one. */
  readonly vertex: Point | null;
  /** One sentence in words. */
  readonly description: string;
}

/** Symmetric matrix 2·(conic) of aX² + bXY + cXZ + dY² + eYZ + fZ². */
export function conicMatrix(q: Form): bigint[][] {
  const [a, b, c, d, e, f] = q.coeffs;
  return [
    [2n * a, b, c],
    [b, 2n * d, e],
    [c, e, 2n * f],
  ];
}

/** The rational vertex of a rank-2 conic (assumes rank 2). */
function conicVertex(q: Form): Point {
  const [v] = matKernel(conicMatrix(q));
  return triple(v[0], v[1], v[2]);
}

/** Are the two lines of a rank-2 conic with vertex V real? Sign of the discriminant on a line missing V. */
export function linePairIsReal(q: Form, vertex: Point): boolean {
  const [d1, d2] = vertex[2] !== 0n ? [[1n, 0n, 0n], [0n, 1n, 0n]] : vertex[0] !== 0n ? [[0n, 1n, 0n], [0n, 0n, 1n]] : [[1n, 0n, 0n], [0n, 0n, 1n]];
  const [a, b, c] = formOnLine(q, d1, d2);
  return b * b - 4n * a * c > 0n;
}

/** g = λf for some λ ≠ 0 (both non-zero forms of one degree). */
function formProportional(f: Form, g: Form): boolean {
  if (f.degree !== g.degree) return false;
  const k = f.coeffs.findIndex((c) => c !== 0n);
  if (k < 0 || g.coeffs[k] === 0n) return false;
  return f.coeffs.every((c, i) => c * g.coeffs[k] === g.coeffs[i] * f.coeffs[k]);
}

/** The vertex of a cone: the dependency a·F_X + b·F_Y + c·F_Z = 0 among the partials, or null. */
export function formConeVertex(f: Form): Point | null {
  const rows = formGradient(f).map((g) => g.coeffs);
  // Columns are the partials: the kernel of the transpose is the dependency.
  const cols = rows[0].map((_, k) => [rows[0][k], rows[1][k], rows[2][k]]);
  if (matRank(cols) === 3) return null;
  const [v] = matKernel(cols, 3);
  return triple(v[0], v[1], v[2]);
}

/** The factorisation of a cubic over Q and the configuration over Q̄. */
export function cubicComponents(f: Form): CubicComponents {
  if (f.degree !== 3) throw new InvalidInput(`a cubic is needed, got a curve of degree ${f.degree}`, 'curve');
  if (f.coeffs.every((c) => c === 0n)) throw new InvalidInput('the zero form defines no curve', 'curve');
  const { lines, rest } = formLinearFactors(f);
  const lineComps: CubicComponent[] = lines.map((l) => ({ form: lineForm(l.line), multiplicity: l.multiplicity, kind: 'line' }));
  const count = lines.reduce((s, l) => s + l.multiplicity, 0);
  if (count === 0) return irreducibleOverQ(rest);
  if (count === 1) {
    const line = lines[0].line;
    const rank = matRank(conicMatrix(rest));
    if (rank === 3) {
      const [a, b, c] = formOnConicLine(rest, line);
      const tangent = b * b - 4n * a * c === 0n;
      return {
        reducible: true,
        components: [...lineComps, { form: rest, multiplicity: 1, kind: 'conic' }],
        shape: tangent ? 'line and tangent conic' : 'line and conic',
        vertex: null,
        description: tangent
          ? 'a smooth conic and a line tangent to it (reducible over Q)'
          : 'a smooth conic and a line meeting it in two points (reducible over Q)',
      };
    }
    const vertex = conicVertex(rest);
    const real = linePairIsReal(rest, vertex);
    const through = line[0] * vertex[0] + line[1] * vertex[1] + line[2] * vertex[2] === 0n;
    return {
      reducible: true,
      components: [...lineComps, { form: rest, multiplicity: 1, kind: 'conjugate line pair' }],
      shape: through ? 'three concurrent lines' : 'line and conjugate line pair',
      vertex,
      description:
        `a rational line and two ${real ? 'real' : 'complex'} lines conjugate over a quadratic field` +
        (through ? ', all three through one rational point' : ', the pair meeting in a rational point off the line'),
    };
  }
  // Three rational lines, counted with multiplicity.
  if (lines.length === 1) {
    return { reducible: true, components: lineComps, shape: 'triple line', vertex: null, description: 'a line counted three times' };
  }
  if (lines.length === 2) {
    return {
      reducible: true,
      components: lineComps,
      shape: 'double line and line',
      vertex: null,
      description: 'a double line and another line: singular all along the double line',
    };
  }
  const [l1, l2, l3] = lines.map((l) => l.line);
  const concurrent = det3(l1, l2, l3) === 0n;
  return {
    reducible: true,
    components: lineComps,
    shape: concurrent ? 'three concurrent lines' : 'three lines',
    vertex: concurrent ? triple(...cross3(l1, l2)) : null,
    description: concurrent ? 'three rational lines through one point' : 'three rational lines, not through one point (a triangle)',
  };
}

function cross3(a: Line, b: Line): [bigint, bigint, bigint] {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Two points spanning a line (any line ≠ 0). */
export function lineSpan(l: Line): [Point, Point] {
  const pts: Point[] = [];
  for (const e of [[1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n]] as const) {
    const c = cross3(l, e);
    if (c.some((x) => x !== 0n)) pts.push(triple(...c));
  }
  const a = pts[0];
  const b = pts.find((p) => cross3(a, p).some((x) => x !== 0n)) as Point;
  return [a, b];
}

/** The conic on the line l, as a binary quadratic in the parameter of `lineSpan(l)`. */
function formOnConicLine(q: Form, l: Line): bigint[] {
  const [a, b] = lineSpan(l);
  return formOnLine(q, a, b);
}

function irreducibleOverQ(f: Form): CubicComponents {
  const vertex = formConeVertex(f);
  if (vertex) {
    return {
      reducible: false,
      components: [{ form: f, multiplicity: 1, kind: 'conjugate line triple' }],
      shape: 'three conjugate concurrent lines',
      vertex,
      description: 'irreducible over Q, but three lines over a cubic field, all through one rational point',
    };
  }
  if (formProportional(f, cubicHessian(f))) {
    return {
      reducible: false,
      components: [{ form: f, multiplicity: 1, kind: 'conjugate line triple' }],
      shape: 'three conjugate lines',
      vertex: null,
      description: 'irreducible over Q, but three lines over a cubic field, meeting in three conjugate points',
    };
  }
  return {
    reducible: false,
    components: [{ form: f, multiplicity: 1, kind: 'cubic' }],
    shape: 'irreducible',
    vertex: null,
    description: 'irreducible over Q̄',
  };
}
