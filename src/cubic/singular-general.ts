// Singular points of a plane curve of any degree up to 6: whether it is smooth (exactly), its rational
// singular points with multiplicity, tangent cone and kind, and how much of the singular locus is not
// rational. Cubics get the complete treatment in src/cubic/singular.ts; this is the general face.
//
// Canonical form: rational points primitive (src/plane/point.ts), sorted as found (by projection, then
// (0:1:0) last); kinds in the trade's words.
//
// Method: smoothness is decided by the Jacobian ideal (src/cubic/jacobian.ts: J_k = S_k exactly for a
// smooth curve, k = 3(d − 2) + 1). A rational singular point other than (0:1:0) projects from (0:1:0) to a
// rational root (X:Z) of the resultant Res_Y(F_X + aF_Z, F_Y + bF_Z) (E2's formResultant), which is not
// identically zero for small a, b unless the partials share a curve, i.e. the curve has a repeated
// component; each root's vertical line is then searched exactly for common zeros of the partials.
import { InvalidInput } from '../exact/errors.ts';
import { triple, tripleEquals, type Point } from '../plane/point.ts';
import { binaryFormRoots } from '../poly/binary-roots.ts';
import { binaryIsZero } from '../poly/binary.ts';
import { formAdd, formGradient, formGradientAt, formPrimitive, formScale, type Form } from '../poly/form.ts';
import { formResultant } from '../poly/resultant.ts';
import { formTransform, pointTransform, unimodularTrial } from '../poly/transform.ts';
import { formOnLine } from '../poly/substitute.ts';
import { pointApprox, type Approx } from './approx.ts';
import { jacobianDual } from './jacobian.ts';
import { formSingularOrbits, type SingularOrbit } from './singular-orbits.ts';
import { formLinearFactors, lineForm } from './linear-factors.ts';
import { binaryCubicDiscriminant, doublePointShape, formTangentCone, splitNodeTangents, tangentIsOrdinaryCusp } from './tangent-cone.ts';

export interface GeneralSingularPoint {
  readonly point: Point;
  readonly approx: Approx;
  readonly multiplicity: number;
  /** node, cusp (ordinary, A2), 'double point with one tangent (A3 or beyond)', triple point, or
   * 'point of multiplicity m'. */
  readonly kind: string;
  readonly ordinary: boolean;
  readonly split: boolean | null;
  readonly realKind: 'crunode' | 'acnode' | null;
  readonly cone: Form;
  readonly tangents: readonly Form[];
  /** Known for nodes (1), ordinary cusps (2) and ordinary m-fold points ((m − 1)²); else null. */
  readonly milnor: number | null;
}

export interface GeneralSingularities {
  readonly degree: number;
  readonly smooth: boolean;
  /** False when the curve has a repeated component (singular along a curve). */
  readonly reduced: boolean;
  readonly points: readonly GeneralSingularPoint[];
  /** Rational lines contained in the curve more than once. */
  readonly repeatedLines: readonly { line: Point; multiplicity: number }[];
  /** Σ τ over all singular points (rational or not), from the Jacobian ideal; null when not reduced. */
  readonly tjurinaTotal: number | null;
  /** The singular points that are not rational, exactly, by kind (src/cubic/singular-orbits.ts); null
   * when general position was not reached (then only tjurinaTotal speaks for them). */
  readonly orbits: readonly SingularOrbit[] | null;
}

function classify(f: Form, p: Point): GeneralSingularPoint {
  const { multiplicity: m, cone } = formTangentCone(f, p);
  const base = { point: p, approx: pointApprox(p), multiplicity: m, cone };
  if (m === 2) {
    const shape = doublePointShape(p, cone);
    if (shape.shape === 'node') {
      const tangents = shape.split ? splitNodeTangents(p, cone).map(lineForm) : [cone];
      return { ...base, kind: 'node', ordinary: true, split: shape.split, realKind: shape.real, tangents, milnor: 1 };
    }
    const cusp = tangentIsOrdinaryCusp(f, p, shape.tangent);
    return {
      ...base, kind: cusp ? 'cusp' : 'double point with one tangent (A3 or beyond)', ordinary: cusp,
      split: null, realKind: null, tangents: [lineForm(shape.tangent)], milnor: cusp ? 2 : null,
    };
  }
  const { lines, rest } = formLinearFactors(cone);
  // Each rational tangent listed as often as it divides the cone; the rest (irrational tangents) as one form.
  const tangents = [...lines.flatMap((l) => Array.from({ length: l.multiplicity }, () => lineForm(l.line))), ...(rest.degree > 0 ? [rest] : [])];
  let ordinary = lines.every((l) => l.multiplicity === 1);
  if (m === 3 && ordinary) {
    // The cone restricted to a pencil is a binary cubic: distinct tangents iff its discriminant ≠ 0.
    const [d1, d2] = p[2] !== 0n ? [[1n, 0n, 0n], [0n, 1n, 0n]] : p[0] !== 0n ? [[0n, 1n, 0n], [0n, 0n, 1n]] : [[1n, 0n, 0n], [0n, 0n, 1n]];
    ordinary = binaryCubicDiscriminant(formOnLine(cone, d1, d2)) !== 0n;
  } else if (m > 3 && ordinary && rest.degree > 0) {
    ordinary = false; // not decided beyond rational tangents: reported as not known to be ordinary
  }
  return {
    ...base, kind: m === 3 ? 'triple point' : `point of multiplicity ${m}`, ordinary, split: null, realKind: null,
    tangents, milnor: ordinary ? (m - 1) * (m - 1) : null,
  };
}

/** Rational common zeros of the partials on the vertical line through (x:0:z) (assumed not all zero there). */
function singularOnVertical(f: Form, grads: readonly Form[], x: bigint, z: bigint): Point[] {
  const a: Point = [x, 0n, z];
  const b: Point = [0n, 1n, 0n];
  const restricted = grads.map((g) => formOnLine(g, a, b)).find((r) => !binaryIsZero(r));
  if (!restricted) return [];
  const out: Point[] = [];
  for (const r of binaryFormRoots(restricted).roots) {
    if (!r.point) continue;
    const [s, t] = r.point;
    const p = triple(s * a[0] + t * b[0], s * a[1] + t * b[1], s * a[2] + t * b[2]);
    if (formGradientAt(f, p).every((c) => c === 0n)) out.push(p);
  }
  return out;
}

/**
 * Every rational singular point, or null when the partials share a curve (a repeated component). The
 * formal resultant in Y vanishes when (0:1:0) is on every partial, so coordinates are changed by
 * unimodular matrices G = F∘M until it does not; points of G go back to F as M·p.
 */
function rationalSingularPoints(f: Form): Point[] | null {
  for (let trial = 0; trial < 8; trial++) {
    const m = unimodularTrial(trial);
    const g = trial === 0 ? f : formTransform(f, m);
    const grads = formGradient(g);
    for (const [a, b] of [[0n, 0n], [1n, 0n], [0n, 1n], [1n, 2n], [-2n, 3n], [3n, -1n]]) {
      const r = formResultant(formAdd(grads[0], formScale(grads[2], a)), formAdd(grads[1], formScale(grads[2], b)), 1);
      if (binaryIsZero(r)) continue;
      const found: Point[] = [];
      const add = (p: Point) => {
        const q = trial === 0 ? p : (pointTransform(p, m) as Point);
        if (!found.some((x) => tripleEquals(x, q))) found.push(q);
      };
      for (const root of binaryFormRoots(r).roots) {
        if (root.point) for (const p of singularOnVertical(g, grads, root.point[0], root.point[1])) add(p);
      }
      if (formGradientAt(g, [0n, 1n, 0n]).every((c) => c === 0n)) add([0n, 1n, 0n]);
      return found;
    }
  }
  return null;
}

/** Smoothness, rational singular points and the total Tjurina number of a curve of degree 2..6. */
export function formSingularPoints(f0: Form): GeneralSingularities {
  const d = f0.degree;
  if (d < 1 || d > 6) throw new InvalidInput(`curves of degree 1 to 6 are handled, got degree ${d}`, 'curve');
  const f = formPrimitive(f0);
  const repeatedLines = formLinearFactors(f).lines.filter((l) => l.multiplicity > 1);
  if (d === 1) return { degree: 1, smooth: true, reduced: true, points: [], repeatedLines: [], tjurinaTotal: 0, orbits: [] };
  const found = rationalSingularPoints(f);
  if (!found) {
    return { degree: d, smooth: false, reduced: false, points: [], repeatedLines: repeatedLines.map((l) => ({ line: l.line, multiplicity: l.multiplicity })), tjurinaTotal: null, orbits: null };
  }
  const tjurinaTotal = jacobianDual(f).functionals.length;
  return {
    degree: d,
    smooth: tjurinaTotal === 0,
    reduced: true,
    points: found.map((p) => classify(f, p)),
    repeatedLines: [],
    tjurinaTotal,
    orbits: tjurinaTotal === 0 ? [] : formSingularOrbits(f),
  };
}
