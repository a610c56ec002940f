// Points that are not rational, exactly: a Galois orbit of points of P^2 over a number field Q(θ).
//
// Canonical form: { poly, coords } stands for the points (X(θ) : Y(θ) : Z(θ)), one for each root θ of
// `poly` (irreducible over Q, primitive, UPoly order), with X, Y, Z integer polynomials in θ of degree
// below deg poly and no common content. A real point carries its θ as a real algebraic number (isolating interval), so it is
// exact and refinable; a complex one is marked and approximated.
//
// Two sources on a cubic: the meets of a rational line AB with a curve along an irreducible binary form
// (θ = s/t, point θA + B), and the vertices of three lines conjugate over a cubic field. For the latter,
// with g(θ) = F(θA + B) = g3θ³ + g2θ² + g1θ + g0 on a rational line missing the vertices, the line through
// θA + B is Lθ = ∇F(θA + B) = a + bθ + cθ² (the tangent along a line component), and the vertex
// opposite Lθi is Lθj × Lθk = (θk − θj)[a×b + (θj + θk)a×c + θjθk b×c]; Vieta gives θj + θk and θjθk
// in Q(θi), so  V(θ) = g3 a×b − (g2 + g3θ) a×c + (g1 + g2θ + g3θ²) b×c  (common practice: symmetric
// functions of the other roots). Every such orbit is checked exactly: ∇F(V(θ)) ≡ 0 mod g.
import { NinefoldError } from '../exact/errors.ts';
import { content } from '../exact/integer.ts';
import { algebraicRealRoots, algebraicToNumber, type RealAlgebraic } from '../exact/algebraic.ts';
import { upolyPrimitive, upolyPseudoRem, upolyTrim, type UPoly } from '../exact/upoly.ts';
import { cross, type Point } from '../plane/point.ts';
import { binaryToUPolyInS } from '../poly/binary.ts';
import { formEval, formGradient, type Form } from '../poly/form.ts';
import { formOnLine, formOnParametrisation } from '../poly/substitute.ts';
import { complexNormalise, polyRootsApprox, type ComplexApprox, type ComplexNumber } from './approx.ts';
import { binaryCubicDiscriminant } from './tangent-cone.ts';

export interface ConjugatePoints {
  readonly poly: UPoly;
  readonly coords: readonly [UPoly, UPoly, UPoly];
}

/** Divide the three coordinate polynomials by their common content (the points do not change). */
function orbitPrimitive(poly: UPoly, coords: readonly UPoly[]): ConjugatePoints {
  const g = content(coords.flat());
  const c = g > 1n ? coords.map((x) => x.map((v) => v / g)) : coords;
  return { poly, coords: [c[0], c[1], c[2]] };
}

export interface ConjugateMember {
  readonly orbit: ConjugatePoints;
  /** θ of this member when it is real, else null. */
  readonly root: RealAlgebraic | null;
  readonly approx: ComplexApprox;
  readonly real: boolean;
}

function evalComplex(p: readonly bigint[], z: ComplexNumber): ComplexNumber {
  let re = 0;
  let im = 0;
  for (let i = p.length - 1; i >= 0; i--) {
    const nr = re * z[0] - im * z[1] + Number(p[i]);
    im = re * z[1] + im * z[0];
    re = nr;
  }
  return [re, im];
}

/** The members of an orbit: real ones with their exact θ (in increasing order), then the complex ones. */
export function conjugateMembers(orbit: ConjugatePoints): ConjugateMember[] {
  const reals = algebraicRealRoots(orbit.poly);
  const out: ConjugateMember[] = reals.map((root) => {
    const t = algebraicToNumber(root);
    return { orbit, root, approx: complexNormalise(orbit.coords.map((c) => evalComplex(c, [t, 0]))), real: true };
  });
  const nonReal = orbit.poly.length - 1 - reals.length;
  if (nonReal > 0) {
    const zs = polyRootsApprox(orbit.poly.map(Number))
      .sort((u, v) => Math.abs(v[1]) - Math.abs(u[1]))
      .slice(0, nonReal)
      .sort((u, v) => v[1] - u[1]);
    for (const z of zs) out.push({ orbit, root: null, approx: complexNormalise(orbit.coords.map((c) => evalComplex(c, z))), real: false });
  }
  return out;
}

/** The points θA + B for the roots (θ : 1) of an irreducible binary form on the rational line AB. */
export function conjugatesOnLine(a: Point, b: Point, binary: readonly bigint[]): ConjugatePoints {
  const poly = upolyPrimitive(binaryToUPolyInS(binary));
  const coords = [0, 1, 2].map((i) => upolyTrim([b[i], a[i]])) as [UPoly, UPoly, UPoly];
  return orbitPrimitive(poly, coords);
}

const TRIAL_LINES: readonly (readonly [Point, Point])[] = [
  [[1n, 0n, 0n], [0n, 1n, 0n]],
  [[0n, 1n, 0n], [0n, 0n, 1n]],
  [[1n, 0n, 0n], [0n, 0n, 1n]],
  [[1n, 1n, 0n], [0n, 1n, 1n]],
  [[1n, 2n, 3n], [3n, -1n, 2n]],
  [[2n, -3n, 1n], [1n, 1n, -2n]],
  [[1n, -2n, 5n], [4n, 1n, -3n]],
];

/** Is the orbit singular on f: every partial at (X(θ):Y(θ):Z(θ)) divisible by poly? */
export function orbitIsSingular(f: Form, orbit: ConjugatePoints): boolean {
  const e = Math.max(...orbit.coords.map((c) => c.length - 1), 0);
  const asBinary = orbit.coords.map((c) => Array.from({ length: e + 1 }, (_, i) => c[e - i] ?? 0n));
  return formGradient(f).every((g) => {
    const v = binaryToUPolyInS(formOnParametrisation(g, asBinary[0], asBinary[1], asBinary[2]));
    return v.length === 0 || upolyPseudoRem(v, orbit.poly).length === 0;
  });
}

/** The three vertices of a cubic that is three lines conjugate over a cubic field (not concurrent). */
export function triangleVertices(f: Form): ConjugatePoints {
  for (const [a, b] of TRIAL_LINES) {
    if (formEval(f, a as [bigint, bigint, bigint]) === 0n) continue;
    const g = formOnLine(f, a, b);
    if (binaryCubicDiscriminant(g) === 0n) continue;
    const [g3, g2, g1] = g;
    // ∇F(θA + B) = a0 + a1θ + a2θ²: BinaryForm order puts the θ² coefficient (s = θ) first.
    const parts = formGradient(f).map((p) => formOnLine(p, a, b));
    const c2 = parts.map((p) => p[0]);
    const c1 = parts.map((p) => p[1]);
    const c0 = parts.map((p) => p[2]);
    const ab = cross(c0, c1);
    const ac = cross(c0, c2);
    const bc = cross(c1, c2);
    const coords = [0, 1, 2].map((i) =>
      upolyTrim([g3 * ab[i] - g2 * ac[i] + g1 * bc[i], -g3 * ac[i] + g2 * bc[i], g3 * bc[i]]),
    ) as [UPoly, UPoly, UPoly];
    const orbit = orbitPrimitive(upolyPrimitive(binaryToUPolyInS(g)), coords);
    if (orbitIsSingular(f, orbit)) return orbit;
  }
  throw new NinefoldError('internal error: no vertex orbit verified for three conjugate lines', 'singular');
}
