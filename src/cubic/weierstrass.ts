// The Weierstrass model of a smooth plane cubic from a rational point O (flex or not), with both maps.
//
// Construction (MATH.md; Cassels, LMS Student Texts 24, ch. 8: Riemann–Roch with L(2O), L(3O)).
// T is the tangent at O.
// - O a flex: x = L/T, y = M/T with L ≠ T through O and M not through O; the forward map is linear.
// - O not a flex: O' = O * O, T' the tangent at O'; x = L'/T with L' through O' (neither through O nor
//   tangent at O'), y = T'M/T² with M through O and not through O'. Divisors: div x = N2 + N3 − 2O and
//   div y = O'' + M2 + M3 − 3O, so x, y have poles of order 2 and 3 at O only.
// The seven functions y², xy, y, x³, x², x, 1 lie in L(6O), of dimension 6: their one relation is the
// kernel of a linear system (cubics mod λF in the flex case, quartics mod F·ℓ otherwise). The relation
// e·y² + b·xy + c·y = A·x³ + p·x² + q·x + r becomes integral and monic with X = A·e·x, Y = A·e²·y.
//
// The forward map sends O to the point at infinity and is a group isomorphism from the law with base O
// (src/cubic/group.ts) to the usual law on the model. The inverse is a point construction: x fixes the
// line L' − xT through O'; on it P = s·O' + D, and since T and T' pass through O', y = T'M/T² is linear
// in s (flex case: the inverse of the linear map).
//
// Canonical form: the maps go to `a`, the reduced global minimal model (PARI's ellminimalmodel form); the
// integral model read off the relation is kept in `construction` with the change (u, r, s, t) to `a`.
import { Degenerate, NinefoldError, NotExact, NotOnCurve } from '../exact/errors.ts';
import { content } from '../exact/integer.ts';
import { gcd } from '../exact/gcd.ts';
import { matKernel } from '../exact/linalg.ts';
import { rat, ratAdd, ratDiv, ratEq, ratMul, ratNeg, ratToString, type Rational } from '../exact/rational.ts';
import { formAdd, formEval, formMul, formScale, monomialCount, type Form } from '../poly/form.ts';
import { cross, dot, triple, tripleEquals, tripleIsZero, tripleProportional, type Line, type Point } from '../plane/point.ts';
import { cubicGradientAt, cubicRequire, cubicRequireSmoothPoint, tangentThird } from './chord.ts';
import { modelChangePoint, modelChangePointBack, modelNegate, modelQuantities, type AInvariants, type CoordinateChange, type ModelPoint } from './curve-model.ts';
import { cubicInvariants } from './invariants.ts';
import { modelMinimal } from './minimal-model.ts';

export interface WeierstrassModel {
  readonly curve: Form;
  readonly base: Point;
  readonly flex: boolean;
  /** [a1, a2, a3, a4, a6] of the model the maps go to: the reduced global minimal model (see `minimal`). */
  readonly a: AInvariants;
  readonly c4: bigint;
  readonly c6: bigint;
  readonly discriminant: bigint;
  readonly j: Rational;
  /**
   * The same reduced minimal model (its own field: the CLI contract names both); null when gcd(c4, c6)
   * could not be factored, and then `a` is the construction model and `minimalNote` says why.
   */
  readonly minimal: AInvariants | null;
  readonly minimalNote?: string;
  /** Short form y² = x³ + A·x + B with A = −27c4, B = −54c6 (Silverman, AEC III.1). */
  readonly short: { readonly A: bigint; readonly B: bigint };
  /** Forms (X, Y, Z) of degree 1 (flex) or 2 with image (X/Z, Y/Z) on `a`; all vanish only at O and O'. */
  readonly forward: readonly [Form, Form, Form];
  /** The lines of the construction: tangent T at O, L (or L'), M, and for a non-flex O also O' and T'. */
  readonly lines: {
    readonly tangent: Line;
    readonly xLine: Line;
    readonly yLine: Line;
    readonly second?: Point;
    readonly secondTangent?: Line;
  };
  /** The integral model read off the relation (x = scale·xLine/tangent there), and the change to `a`. */
  readonly construction: {
    readonly a: AInvariants;
    readonly scale: bigint;
    /** y there is yScale·(secondTangent·yLine/tangent²) (non-flex) or yScale·yLine/tangent (flex). */
    readonly yScale: bigint;
    readonly forward: readonly [Form, Form, Form];
    readonly toMinimal: CoordinateChange;
  };
}

function lineForm(l: readonly bigint[]): Form {
  return { degree: 1, coeffs: [l[0], l[1], l[2]] };
}

const UNIT: readonly (readonly bigint[])[] = [
  [1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n], [1n, 1n, 0n], [1n, 0n, 1n], [0n, 1n, 1n], [1n, 1n, 1n], [1n, -1n, 0n],
];

/** A line through p, chosen small, satisfying `ok`. */
function lineThrough(p: Point, ok: (l: Line) => boolean): Line {
  for (const e of UNIT) {
    const c = cross(p, e);
    if (tripleIsZero(c)) continue;
    const l = triple(c[0], c[1], c[2]);
    if (ok(l)) return l;
  }
  throw new NinefoldError('internal: no suitable line found', 'base');
}

/** The kernel vector of Σ c_i q_i = F·(multiplier), with multipliers ranging over `mult` (forms). */
function relation(f: Form, q: Form[], mult: Form[]): bigint[] {
  const d = q[0].degree;
  const cols = [...q, ...mult.map((m) => formScale(formMul(f, m), -1n))];
  const rows: bigint[][] = [];
  for (let k = 0; k < monomialCount(d); k++) rows.push(cols.map((c) => c.coeffs[k]));
  const ker = matKernel(rows, cols.length);
  if (ker.length !== 1) throw new Degenerate(`the curve is not a smooth cubic (relation space of dimension ${ker.length})`, 'curve');
  return ker[0];
}

/** The Weierstrass model of the smooth cubic f with base point O, and the maps both ways. */
export function weierstrassModel(f: Form, o: Point): WeierstrassModel {
  cubicRequire(f);
  cubicRequireSmoothPoint(f, o, 'base');
  const inv = cubicInvariants(f);
  if (inv.discriminant.num === 0n) {
    throw new Degenerate('the curve is singular, so it has no Weierstrass model (parametrise it instead)', 'curve');
  }
  const g = cubicGradientAt(f, o);
  const tangent = triple(g[0], g[1], g[2]);
  const o2 = tangentThird(f, o, 'base');
  const flex = tripleEquals(o2, o);
  const T = lineForm(tangent);
  let xLine: Line;
  let yLine: Line;
  let secondTangent: Line | undefined;
  let q: Form[];
  let mult: Form[];
  let numX: Form;
  let numY: Form;
  let den: Form;
  if (flex) {
    xLine = lineThrough(o, (l) => !tripleProportional(l, tangent));
    yLine = [[1n, 0n, 0n], [0n, 1n, 0n], [0n, 0n, 1n]].map((e) => e as unknown as Line).find((l) => dot(l, o) !== 0n)!;
    const L = lineForm(xLine);
    const M = lineForm(yLine);
    q = [formMul(formMul(M, M), T), formMul(formMul(L, M), T), formMul(formMul(M, T), T), formMul(formMul(L, L), L), formMul(formMul(L, L), T), formMul(formMul(L, T), T), formMul(formMul(T, T), T)];
    mult = [{ degree: 0, coeffs: [1n] }];
    numX = L;
    numY = M;
    den = T;
  } else {
    const g2 = cubicGradientAt(f, o2);
    secondTangent = triple(g2[0], g2[1], g2[2]);
    const st = secondTangent;
    xLine = lineThrough(o2, (l) => dot(l, o) !== 0n && !tripleProportional(l, st));
    yLine = lineThrough(o, (l) => dot(l, o2) !== 0n);
    const L = lineForm(xLine);
    const M = lineForm(yLine);
    const Tp = lineForm(st);
    const TpM = formMul(Tp, M);
    const TT = formMul(T, T);
    q = [formMul(TpM, TpM), formMul(formMul(L, T), TpM), formMul(TpM, TT), formMul(formMul(formMul(L, L), L), T), formMul(formMul(L, L), TT), formMul(formMul(L, T), TT), formMul(TT, TT)];
    mult = [lineForm([1n, 0n, 0n]), lineForm([0n, 1n, 0n]), lineForm([0n, 0n, 1n])];
    numX = formMul(L, T);
    numY = TpM;
    den = TT;
  }
  const v = relation(f, q, mult);
  const [e, b, c] = [v[0], v[1], v[2]];
  const [A, p, qq, r] = [-v[3], -v[4], -v[5], -v[6]];
  if (e === 0n || A === 0n) throw new Degenerate('the curve is not a smooth cubic (degenerate relation)', 'curve');
  const a: AInvariants = [b, p * e, c * A * e, qq * A * e * e, r * A * A * e * e * e];
  const quant = modelQuantities(a);
  if (quant.discriminant === 0n || quant.j === null) throw new NinefoldError('internal: the model is singular', 'curve');
  let min: { a: AInvariants; change: CoordinateChange };
  let minimalNote: string | undefined;
  try {
    // The cubic's own c4, c6 (ARVT) are far smaller than the construction model's: factor those.
    min = modelMinimal(a, inv.c4.den === 1n && inv.c6.den === 1n ? { c4: inv.c4.num, c6: inv.c6.num } : undefined);
  } catch (err) {
    if (!(err instanceof NotExact)) throw err;
    minimalNote = err.message;
    min = { a, change: { u: 1n, r: rat(0n), s: rat(0n), t: rat(0n) } };
  }
  const mq = modelQuantities(min.a);
  const scale = A * e;
  const raw: [Form, Form, Form] = [formScale(numX, scale), formScale(numY, scale * e), den];
  return {
    curve: f,
    base: o,
    flex,
    a: min.a,
    c4: mq.c4,
    c6: mq.c6,
    discriminant: mq.discriminant,
    j: mq.j!,
    minimal: minimalNote === undefined ? min.a : null,
    ...(minimalNote === undefined ? {} : { minimalNote }),
    short: { A: -27n * mq.c4, B: -54n * mq.c6 },
    forward: formsChange(raw, min.change),
    lines: flex ? { tangent, xLine, yLine } : { tangent, xLine, yLine, second: o2, secondTangent },
    construction: { a, scale, yScale: scale * e, forward: raw, toMinimal: min.change },
  };
}

/** The forms composed with x' = (x − r)/u², y' = (y − s(x − r) − t)/u³, cleared of denominators. */
function formsChange(h: readonly [Form, Form, Form], ch: CoordinateChange): [Form, Form, Form] {
  const { u, r, s, t } = ch;
  const d = [r.den, s.den, t.den, s.den * r.den].reduce((acc, x) => (acc * x) / gcd(acc, x), 1n);
  const R = (r.num * d) / r.den;
  const S = (s.num * d) / s.den;
  const SRmT = ((s.num * r.num * d) / (s.den * r.den)) - (t.num * d) / t.den;
  const [X, Y, Z] = h;
  const X2 = formScale(formAdd(formScale(X, d), formScale(Z, -R)), u);
  const Y2 = formAdd(formAdd(formScale(Y, d), formScale(X, -S)), formScale(Z, SRmT));
  const Z2 = formScale(Z, u * u * u * d);
  const c = content([...X2.coeffs, ...Y2.coeffs, ...Z2.coeffs]);
  const sc = (g: Form) => ({ degree: g.degree, coeffs: g.coeffs.map((v) => v / c) });
  return [sc(X2), sc(Y2), sc(Z2)];
}

function affine(x: bigint, y: bigint, z: bigint): ModelPoint {
  return { x: rat(x, z), y: rat(y, z) };
}

/** The image of a smooth point P of the cubic on the model `a`. */
export function weierstrassMap(model: WeierstrassModel, p: Point, name = 'point'): ModelPoint {
  cubicRequireSmoothPoint(model.curve, p, name);
  return modelChangePoint(model.construction.toMinimal, constructionMap(model, p, name));
}

// The image on the construction model; assumes p a smooth point of the curve.
function constructionMap(model: WeierstrassModel, p: Point, name: string): ModelPoint {
  if (tripleEquals(p, model.base)) return 'infinity';
  const [fx, fy, fz] = model.construction.forward;
  const X = formEval(fx, p);
  const Y = formEval(fy, p);
  const Z = formEval(fz, p);
  if (Z !== 0n) return affine(X, Y, Z);
  if (model.flex || !model.lines.second || !tripleEquals(p, model.lines.second)) {
    throw new NinefoldError(`internal: ${p.join(':')} has no image`, name);
  }
  // P = O' where all three forms vanish: −O' = O' * O' (the law's −P = P * O'), so use that point.
  const o2 = model.lines.second;
  const o3 = tangentThird(model.curve, o2);
  if (!tripleEquals(o3, o2)) return modelNegate(model.construction.a, constructionMap(model, o3, name));
  // O' a flex: O' is 2-torsion; x from the pencil of lines through O' at the tangent direction there.
  const t2 = model.lines.secondTangent!;
  const d0 = cross(t2, [1n, 0n, 0n]);
  const d = tripleIsZero(d0) || tripleProportional(d0, o2) ? cross(t2, tripleProportional(cross(t2, [0n, 1n, 0n]), o2) ? [0n, 0n, 1n] : [0n, 1n, 0n]) : d0;
  const x = rat(model.construction.scale * dot(model.lines.xLine, d), dot(model.lines.tangent, d));
  const ca = model.construction.a;
  const y = ratDiv(ratNeg(ratAdd(ratMul(rat(ca[0]), x), rat(ca[2]))), rat(2n));
  return { x, y };
}

function modelHas(a: AInvariants, x: Rational, y: Rational): boolean {
  const lhs = ratAdd(ratAdd(ratMul(y, y), ratMul(rat(a[0]), ratMul(x, y))), ratMul(rat(a[2]), y));
  let rhs = ratMul(ratMul(x, x), x);
  rhs = ratAdd(rhs, ratMul(rat(a[1]), ratMul(x, x)));
  rhs = ratAdd(rhs, ratMul(rat(a[3]), x));
  rhs = ratAdd(rhs, rat(a[4]));
  return ratEq(lhs, rhs);
}

/** The point of the cubic whose image on the model `a` is P (the inverse map, as a construction). */
export function weierstrassInverse(model: WeierstrassModel, target: ModelPoint, name = 'image'): Point {
  if (target === 'infinity') return model.base;
  if (!modelHas(model.a, target.x, target.y)) {
    throw new NotOnCurve(`(${ratToString(target.x)}, ${ratToString(target.y)}) is not on the Weierstrass model`, name);
  }
  const image = modelChangePointBack(model.construction.toMinimal, target);
  if (image === 'infinity') return model.base;
  if (!modelHas(model.construction.a, image.x, image.y)) throw new NinefoldError('internal: the change to the minimal model lost the point', name);
  const f = model.curve;
  const candidates: Point[] = [];
  if (model.flex) {
    // Solve the linear map (X : Y : Z) = (forms)(P) by the adjugate.
    const rows = model.construction.forward.map((h) => h.coeffs as readonly bigint[]);
    const l = image.x.den * image.y.den;
    const target = [image.x.num * image.y.den, image.y.num * image.x.den, l];
    const adj = [cross(rows[1], rows[2]), cross(rows[2], rows[0]), cross(rows[0], rows[1])];
    const pt = [0, 1, 2].map((i) => adj[0][i] * target[0] + adj[1][i] * target[1] + adj[2][i] * target[2]);
    candidates.push(triple(pt[0], pt[1], pt[2]));
  } else {
    candidates.push(...weierstrassInverseNonFlex(model, image.x.num, image.x.den, image.y.num, image.y.den));
  }
  for (const c of candidates) {
    if (formEval(f, c) !== 0n) continue;
    const im = constructionMap(model, c, name);
    if (im !== 'infinity' && ratEq(im.x, image.x) && ratEq(im.y, image.y)) return c;
  }
  throw new NinefoldError('internal: the inverse construction found no point', name);
}

// Assumes a non-flex model. On the line ℓ: den(x)·L' − num(x)·T through O', write P = s·O' + D. Since T and
// T' pass through O', y = T'M/T² becomes T'(D)(s·M(O') + M(D))/T(D)², linear in s: no square root.
// When ℓ is the tangent at O' (T'(D) = 0) the points of that x are O' and O' * O'.
/**
 * The candidates for the point with image (xn/xd, yn/yd) on the construction model, O not a flex
 * (internal tier: the fractions need not be reduced, only xd, yd ≠ 0). One point, or O' and O' * O'.
 */
export function weierstrassInverseNonFlex(model: WeierstrassModel, xn: bigint, xdIn: bigint, yn: bigint, ydIn: bigint): Point[] {
  const { xLine, tangent, yLine } = model.lines;
  const o2 = model.lines.second!;
  const t2 = model.lines.secondTangent!;
  const c = model.construction;
  // x on the construction model is scale·L'/T and y is yScale·T'M/T².
  const xd = xdIn * c.scale;
  const ell = [0, 1, 2].map((i) => xd * xLine[i] - xn * tangent[i]);
  let d: readonly bigint[] = [0n, 0n, 0n];
  for (const e of UNIT) {
    d = cross(ell, e);
    if (!tripleIsZero(d) && !tripleProportional(d, o2)) break;
  }
  const tD = dot(tangent, d);
  const t2D = dot(t2, d);
  if (t2D === 0n) return [o2, tangentThird(model.curve, o2)];
  const yd = ydIn * c.yScale;
  const s = yn * tD * tD - yd * t2D * dot(yLine, d);
  const t = yd * t2D * dot(yLine, o2);
  const v = [s * o2[0] + t * d[0], s * o2[1] + t * d[1], s * o2[2] + t * d[2]];
  return tripleIsZero(v) ? [] : [triple(v[0], v[1], v[2])];
}
